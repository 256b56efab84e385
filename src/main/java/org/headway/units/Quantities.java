package org.headway.units;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.EnumMap;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Objects;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import javax.measure.IncommensurableException;
import javax.measure.MeasurementException;
import javax.measure.UnconvertibleException;
import javax.measure.Unit;
import javax.measure.UnitConverter;
import org.headway.caution.InputException;
import systems.uom.common.USCustomary;
import tech.units.indriya.AbstractUnit;
import tech.units.indriya.format.SimpleUnitFormat;
import tech.units.indriya.unit.Units;

/**
 * Quantities as people type them, parsed to the SI doubles the core uses, and SI doubles
 * formatted back in a chosen unit system.
 *
 * <p>Text is a number, optional spaces, and an optional unit: {@code 150 mm}, {@code 12 L/s},
 * {@code 25degC}. A bare number is taken as SI (K, Pa, m, m³/s, kg/m³, Pa·s, m²/s). Units are read
 * by a {@link SimpleUnitFormat} created fresh for this class, never the library's shared instance,
 * and taught every non-SI name below explicitly, so the result does not depend on which unit
 * classes the JVM happened to load first. SI symbols with metric prefixes ({@code mm}, {@code
 * kPa}, {@code MPa}, {@code mPa·s}), products with {@code ·} or {@code *}, quotients with {@code
 * /}, and powers written {@code m³}, {@code m^3} or {@code m3} are understood as the unit library
 * defines them.
 *
 * <p>Alias table (our own; US customary units are the US survey-independent international ones):
 *
 * <table>
 *   <caption>Unit names Headway adds</caption>
 *   <tr><th>spelling</th><th>meaning</th></tr>
 *   <tr><td>{@code in}</td><td>inch, 0.0254 m</td></tr>
 *   <tr><td>{@code ft}</td><td>foot, 0.3048 m (also feet of head for a head)</td></tr>
 *   <tr><td>{@code um}, {@code µm}</td><td>micrometre</td></tr>
 *   <tr><td>{@code L}, {@code l}</td><td>litre, 0.001 m³</td></tr>
 *   <tr><td>{@code gal}</td><td>US liquid gallon, 3.785411784 L</td></tr>
 *   <tr><td>{@code gpm}</td><td>US gallon per minute</td></tr>
 *   <tr><td>{@code min}, {@code h}</td><td>minute, hour</td></tr>
 *   <tr><td>{@code bar}, {@code mbar}</td><td>100 kPa, 100 Pa</td></tr>
 *   <tr><td>{@code psi}</td><td>pound-force per square inch, 6894.757293168 Pa</td></tr>
 *   <tr><td>{@code atm}</td><td>standard atmosphere, 101.325 kPa</td></tr>
 *   <tr><td>{@code °C}, {@code degC}</td><td>degree Celsius</td></tr>
 *   <tr><td>{@code °F}, {@code degF}</td><td>degree Fahrenheit</td></tr>
 *   <tr><td>{@code lb}</td><td>pound (mass), 0.45359237 kg</td></tr>
 *   <tr><td>{@code cP}</td><td>centipoise, 1 mPa·s</td></tr>
 *   <tr><td>{@code cSt}</td><td>centistokes, 1 mm²/s</td></tr>
 * </table>
 *
 * <p>Refused as ambiguous: a lone {@code F} (farad, or Fahrenheit?) and a lone {@code C} (coulomb,
 * or Celsius?); write {@code °F}/{@code degF} or {@code °C}/{@code degC}.
 *
 * <p>Display units ({@link #unitSymbol}): SI shows m, mm (diameter, roughness), L/s, m/s, kPa, °C,
 * kg/m³, mPa·s and mm²/s; US customary shows ft, in (diameter, roughness), gpm, ft/s, psi, °F,
 * lb/ft³, cP and cSt. Temperatures are shown in °C rather than K because that is what people
 * read; parsing accepts either.
 */
public final class Quantities {

    /** Significant digits used by {@link #format}. */
    public static final int SIGNIFICANT_DIGITS = 4;

    /**
     * Longest unit text accepted (characters). Real units are short ({@code mPa·s}, {@code m^3/h});
     * the unit library parses nested products recursively, so a pasted wall of brackets would
     * otherwise overflow the stack.
     */
    public static final int MAX_UNIT_LENGTH = 40;

    private static final Pattern NUMBER_THEN_UNIT =
            Pattern.compile("^([+-]?(?:\\d+(?:\\.\\d*)?|\\.\\d+)(?:[eE][+-]?\\d+)?)\\s*(.*)$");
    private static final Pattern NON_FINITE = Pattern.compile("(?i)^[+-]?(nan|inf|infinity|∞)\\b.*");
    /** A letter followed by a bare 2 or 3 that is not part of a longer number: m3 → m³. */
    private static final Pattern PLAIN_POWER = Pattern.compile("(?<=[A-Za-z])([23])(?![0-9.])");
    /** A power of two or more digits: no unit needs one, and the unit library recurses on it. */
    private static final Pattern LARGE_POWER = Pattern.compile("\\^\\s*[+-]?\\d{2,}");

    private static final Unit<?> FOOT = USCustomary.FOOT;
    private static final Unit<?> INCH = USCustomary.INCH;
    private static final Unit<?> US_GALLON = USCustomary.GALLON_LIQUID;
    private static final Unit<?> POUND = USCustomary.POUND;
    private static final Unit<?> FAHRENHEIT = USCustomary.FAHRENHEIT;
    private static final Unit<?> LITRE = Units.LITRE;
    private static final Unit<?> BAR = Units.PASCAL.multiply(100_000);
    private static final Unit<?> MILLIBAR = Units.PASCAL.multiply(100);
    private static final Unit<?> ATMOSPHERE = Units.PASCAL.multiply(101_325);
    /** 1 lbf / in² = 4.4482216152605 N / 0.00064516 m² (exact by definition of lb and in). */
    private static final Unit<?> PSI = Units.NEWTON
            .multiply(44482216152605L)
            .divide(10_000_000_000_000L)
            .divide(Units.METRE.pow(2).multiply(64516).divide(100_000_000));

    private static final Unit<?> CENTIPOISE =
            Units.PASCAL.multiply(Units.SECOND).divide(1000);
    private static final Unit<?> CENTISTOKES =
            Units.METRE.pow(2).divide(Units.SECOND).divide(1_000_000);
    private static final Unit<?> GPM = US_GALLON.divide(Units.MINUTE);
    private static final Unit<?> MICROMETRE = Units.METRE.divide(1_000_000);

    /** Each kind's SI unit in the core. */
    private static final Map<QuantityKind, Unit<?>> SI_UNITS = new EnumMap<>(QuantityKind.class);

    /** Display units per system: the parseable spelling shown to users. */
    private static final Map<QuantityKind, String> SI_DISPLAY = new EnumMap<>(QuantityKind.class);

    private static final Map<QuantityKind, String> US_DISPLAY = new EnumMap<>(QuantityKind.class);

    static {
        Unit<?> m = Units.METRE;
        SI_UNITS.put(QuantityKind.LENGTH, m);
        SI_UNITS.put(QuantityKind.DIAMETER, m);
        SI_UNITS.put(QuantityKind.ROUGHNESS, m);
        SI_UNITS.put(QuantityKind.HEAD, m);
        SI_UNITS.put(QuantityKind.VOLUMETRIC_FLOW, Units.CUBIC_METRE.divide(Units.SECOND));
        SI_UNITS.put(QuantityKind.VELOCITY, Units.METRE_PER_SECOND);
        SI_UNITS.put(QuantityKind.PRESSURE, Units.PASCAL);
        SI_UNITS.put(QuantityKind.TEMPERATURE, Units.KELVIN);
        SI_UNITS.put(QuantityKind.DENSITY, Units.KILOGRAM.divide(Units.CUBIC_METRE));
        SI_UNITS.put(QuantityKind.DYNAMIC_VISCOSITY, Units.PASCAL.multiply(Units.SECOND));
        SI_UNITS.put(QuantityKind.KINEMATIC_VISCOSITY, Units.METRE.pow(2).divide(Units.SECOND));
        SI_UNITS.put(QuantityKind.DIMENSIONLESS, AbstractUnit.ONE);

        SI_DISPLAY.put(QuantityKind.LENGTH, "m");
        SI_DISPLAY.put(QuantityKind.DIAMETER, "mm");
        SI_DISPLAY.put(QuantityKind.ROUGHNESS, "mm");
        SI_DISPLAY.put(QuantityKind.HEAD, "m");
        SI_DISPLAY.put(QuantityKind.VOLUMETRIC_FLOW, "L/s");
        SI_DISPLAY.put(QuantityKind.VELOCITY, "m/s");
        SI_DISPLAY.put(QuantityKind.PRESSURE, "kPa");
        SI_DISPLAY.put(QuantityKind.TEMPERATURE, "°C");
        SI_DISPLAY.put(QuantityKind.DENSITY, "kg/m³");
        SI_DISPLAY.put(QuantityKind.DYNAMIC_VISCOSITY, "mPa·s");
        SI_DISPLAY.put(QuantityKind.KINEMATIC_VISCOSITY, "mm²/s");
        SI_DISPLAY.put(QuantityKind.DIMENSIONLESS, "");

        US_DISPLAY.put(QuantityKind.LENGTH, "ft");
        US_DISPLAY.put(QuantityKind.DIAMETER, "in");
        US_DISPLAY.put(QuantityKind.ROUGHNESS, "in");
        US_DISPLAY.put(QuantityKind.HEAD, "ft");
        US_DISPLAY.put(QuantityKind.VOLUMETRIC_FLOW, "gpm");
        US_DISPLAY.put(QuantityKind.VELOCITY, "ft/s");
        US_DISPLAY.put(QuantityKind.PRESSURE, "psi");
        US_DISPLAY.put(QuantityKind.TEMPERATURE, "°F");
        US_DISPLAY.put(QuantityKind.DENSITY, "lb/ft³");
        US_DISPLAY.put(QuantityKind.DYNAMIC_VISCOSITY, "cP");
        US_DISPLAY.put(QuantityKind.KINEMATIC_VISCOSITY, "cSt");
        US_DISPLAY.put(QuantityKind.DIMENSIONLESS, "");
    }

    /** Our own unit reader, taught its aliases here and nowhere else. */
    private static final SimpleUnitFormat FORMAT = newFormat();

    /** Converters from each display unit to SI, resolved once. */
    private static final Map<String, UnitConverter> DISPLAY_TO_SI = new LinkedHashMap<>();

    private Quantities() {}

    private static SimpleUnitFormat newFormat() {
        SimpleUnitFormat f = SimpleUnitFormat.getNewInstance();
        f.alias(INCH, "in");
        f.alias(FOOT, "ft");
        f.alias(MICROMETRE, "um");
        f.alias(LITRE, "L");
        f.alias(LITRE, "l");
        f.alias(US_GALLON, "gal");
        f.alias(GPM, "gpm");
        f.alias(Units.MINUTE, "min");
        f.alias(Units.HOUR, "h");
        f.alias(BAR, "bar");
        f.alias(MILLIBAR, "mbar");
        f.alias(PSI, "psi");
        f.alias(ATMOSPHERE, "atm");
        f.alias(Units.CELSIUS, "°C");
        f.alias(Units.CELSIUS, "degC");
        f.alias(FAHRENHEIT, "°F");
        f.alias(FAHRENHEIT, "degF");
        f.alias(POUND, "lb");
        f.alias(CENTIPOISE, "cP");
        f.alias(CENTISTOKES, "cSt");
        return f;
    }

    /**
     * Parses typed text to an SI value.
     *
     * @param text e.g. {@code 150 mm}; a bare number is SI
     * @param kind what the text must be
     * @return the value in the kind's SI unit (K, Pa, m, m³/s, kg/m³, Pa·s, m²/s, ratio)
     * @throws InputException on an empty, non-finite or malformed number, an unknown or ambiguous
     *     unit, or a unit of the wrong dimension
     */
    public static double parse(String text, QuantityKind kind) {
        return parse(text, kind, kind.name().toLowerCase(Locale.ROOT).replace('_', ' '));
    }

    /**
     * Parses typed text to an SI value, naming {@code where} in any error.
     *
     * @param text e.g. {@code 12 L/s}
     * @param kind what the text must be
     * @param where the field, option or file position the text came from
     * @return the value in the kind's SI unit
     */
    public static double parse(String text, QuantityKind kind, String where) {
        Objects.requireNonNull(kind, "kind");
        if (text == null || text.isBlank()) {
            throw new InputException(where, kind.dimensionName() + " expected, got an empty value");
        }
        String trimmed = text.strip();
        if (NON_FINITE.matcher(trimmed).matches()) {
            throw new InputException(where, "a finite number is required, got \"" + abbreviate(trimmed) + "\"");
        }
        Matcher matcher = NUMBER_THEN_UNIT.matcher(trimmed);
        if (!matcher.matches()) {
            throw new InputException(
                    where,
                    kind.dimensionName() + " expected as a number and unit (e.g. " + example(kind) + "), got \""
                            + abbreviate(trimmed) + "\"");
        }
        double number = Double.parseDouble(matcher.group(1));
        if (!Double.isFinite(number)) {
            throw new InputException(where, "number out of range in \"" + abbreviate(trimmed) + "\"");
        }
        String unitText = matcher.group(2).strip();
        if (unitText.isEmpty()) {
            return number;
        }
        Unit<?> unit = parseUnit(unitText, trimmed, kind, where);
        Unit<?> si = SI_UNITS.get(kind);
        if (!unit.isCompatible(si)) {
            throw new InputException(
                    where,
                    kind.dimensionName() + " expected, got \"" + abbreviate(trimmed) + "\" (" + dimensionNameOf(unit)
                            + ")");
        }
        double value = convert(unit, si, number);
        if (!Double.isFinite(value)) {
            throw new InputException(where, "value out of range in \"" + abbreviate(trimmed) + "\"");
        }
        return value;
    }

    private static Unit<?> parseUnit(String unitText, String whole, QuantityKind kind, String where) {
        if (unitText.length() > MAX_UNIT_LENGTH) {
            throw new InputException(
                    where,
                    "unit text is " + unitText.length() + " characters long, more than the " + MAX_UNIT_LENGTH
                            + " a unit may have, in \"" + abbreviate(whole) + "\"");
        }
        if (unitText.equals("F")) {
            throw new InputException(
                    where, "unit \"F\" in \"" + whole + "\" is ambiguous (farad or Fahrenheit?): write °F or degF");
        }
        if (unitText.equals("C")) {
            throw new InputException(
                    where, "unit \"C\" in \"" + whole + "\" is ambiguous (coulomb or Celsius?): write °C or degC");
        }
        if (LARGE_POWER.matcher(unitText).find()) {
            throw new InputException(
                    where,
                    "unit \"" + unitText + "\" in \"" + abbreviate(whole) + "\" has a power of more than one digit;"
                            + " units use powers such as ^2 or ^3");
        }
        String normalised = PLAIN_POWER
                .matcher(unitText.replace(" ", ""))
                .replaceAll(r -> r.group(1).equals("2") ? "²" : "³");
        try {
            return FORMAT.parse(normalised);
        } catch (MeasurementException | IllegalArgumentException | IndexOutOfBoundsException e) {
            throw new InputException(
                    where,
                    kind.dimensionName() + " expected, got \"" + abbreviate(whole) + "\": unknown unit \"" + unitText
                            + "\" (e.g. " + example(kind) + ")",
                    e);
        }
    }

    private static String abbreviate(String text) {
        return text.length() <= 60 ? text : text.substring(0, 60) + "…";
    }

    private static double convert(Unit<?> from, Unit<?> to, double value) {
        return converter(from, to).convert(value);
    }

    @SuppressWarnings({"unchecked", "rawtypes"})
    private static UnitConverter converter(Unit<?> from, Unit<?> to) {
        try {
            return ((Unit) from).getConverterToAny(to);
        } catch (IncommensurableException | UnconvertibleException e) {
            throw new IllegalStateException("units " + from + " and " + to + " are compatible but not convertible", e);
        }
    }

    private static String dimensionNameOf(Unit<?> unit) {
        for (QuantityKind k : List.of(
                QuantityKind.LENGTH,
                QuantityKind.VOLUMETRIC_FLOW,
                QuantityKind.VELOCITY,
                QuantityKind.PRESSURE,
                QuantityKind.TEMPERATURE,
                QuantityKind.DENSITY,
                QuantityKind.DYNAMIC_VISCOSITY,
                QuantityKind.KINEMATIC_VISCOSITY,
                QuantityKind.DIMENSIONLESS)) {
            if (unit.isCompatible(SI_UNITS.get(k))) {
                return k.dimensionName();
            }
        }
        return "dimension " + unit.getDimension();
    }

    private static String example(QuantityKind kind) {
        return switch (kind) {
            case LENGTH, HEAD -> "35 m or 12 ft";
            case DIAMETER -> "150 mm or 6 in";
            case ROUGHNESS -> "0.045 mm";
            case VOLUMETRIC_FLOW -> "12 L/s, 43 m3/h or 190 gpm";
            case VELOCITY -> "2.5 m/s or 8 ft/s";
            case PRESSURE -> "250 kPa, 2.4 bar or 35 psi";
            case TEMPERATURE -> "20 degC, 68 degF or 293.15 K";
            case DENSITY -> "998 kg/m3";
            case DYNAMIC_VISCOSITY -> "1.0 mPa*s or 1 cP";
            case KINEMATIC_VISCOSITY -> "1.0e-6 m2/s or 1 cSt";
            case DIMENSIONLESS -> "0.5";
        };
    }

    /**
     * A result that is the difference of larger numbers, with the rounding noise of that difference
     * removed: 0 when |value| is below 10⁻⁹ of the scale it was computed from (a total head of
     * −1.4·10⁻¹⁴ m beside a 12 m static head is zero, not a number to print).
     *
     * @param value the computed value
     * @param scale the size of the terms it was computed from
     * @return the value, or 0 when it is rounding noise
     */
    public static double withoutNoise(double value, double scale) {
        return Math.abs(value) <= 1e-9 * Math.abs(scale) ? 0.0 : value;
    }

    /**
     * The unit a kind is shown in.
     *
     * @param kind the quantity kind
     * @param system SI or US customary
     * @return a symbol such as {@code kPa} or {@code gpm} (empty for dimensionless)
     */
    public static String unitSymbol(QuantityKind kind, UnitSystem system) {
        return (system == UnitSystem.US_CUSTOMARY ? US_DISPLAY : SI_DISPLAY).get(kind);
    }

    /**
     * Converts an SI value to the display unit of {@link #unitSymbol}.
     *
     * @param si value in the kind's SI unit
     * @param kind the quantity kind
     * @param system SI or US customary
     * @return the value in the display unit
     */
    public static double fromSi(double si, QuantityKind kind, UnitSystem system) {
        String symbol = unitSymbol(kind, system);
        if (symbol.isEmpty()) {
            return si;
        }
        UnitConverter toSi = displayConverter(kind, symbol);
        return toSi.inverse().convert(si);
    }

    private static synchronized UnitConverter displayConverter(QuantityKind kind, String symbol) {
        return DISPLAY_TO_SI.computeIfAbsent(kind.name() + "|" + symbol, key -> {
            Unit<?> unit = parseUnit(symbol, symbol, kind, "display unit");
            return converter(unit, SI_UNITS.get(kind));
        });
    }

    /**
     * Formats an SI value in the chosen system with {@value #SIGNIFICANT_DIGITS} significant
     * digits and its unit, e.g. {@code 998.2 kg/m³}, {@code 1.004e-6 m²/s}.
     *
     * @param si value in the kind's SI unit
     * @param kind the quantity kind
     * @param system SI or US customary
     * @return number and unit separated by one space (number only for dimensionless)
     */
    public static String format(double si, QuantityKind kind, UnitSystem system) {
        String number = formatNumber(fromSi(si, kind, system));
        String symbol = unitSymbol(kind, system);
        return symbol.isEmpty() ? number : number + " " + symbol;
    }

    /**
     * Formats a plain number with {@value #SIGNIFICANT_DIGITS} significant digits: positional
     * between 0.001 and 10⁶, otherwise {@code 1.234e-7}.
     *
     * @param value any double
     * @return the text; {@code NaN} and infinities as Java writes them
     */
    public static String formatNumber(double value) {
        if (!Double.isFinite(value)) {
            return Double.toString(value);
        }
        if (value == 0) {
            return "0";
        }
        BigDecimal rounded = new BigDecimal(value).round(new MathContext(SIGNIFICANT_DIGITS));
        double magnitude = Math.abs(rounded.doubleValue());
        if (magnitude >= 1e-3 && magnitude < 1e6) {
            // Keep trailing zeros so that 150 mm prints as 150.0 mm: the digits shown are the digits known.
            int exponent = rounded.precision() - rounded.scale() - 1;
            int scale = SIGNIFICANT_DIGITS - 1 - exponent;
            return (scale > rounded.scale() ? rounded.setScale(scale) : rounded).toPlainString();
        }
        BigDecimal unscaled = rounded.stripTrailingZeros();
        int exponent = unscaled.precision() - unscaled.scale() - 1;
        BigDecimal mantissa = unscaled.movePointLeft(exponent);
        return mantissa.toPlainString() + "e" + exponent;
    }
}
