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
 * defines them. Units are read left to right: {@code a/b/c} is {@code (a/b)/c}, so {@code m/s/s} is
 * m/s² and {@code L/s/s} a volumetric flow per second; parentheses group as written.
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
 *   <tr><td>{@code min}, {@code h}, {@code hr}</td><td>minute, hour</td></tr>
 *   <tr><td>{@code t}</td><td>tonne, 1000 kg (for mass flows such as {@code t/h})</td></tr>
 *   <tr><td>{@code bar}, {@code mbar}</td><td>100 kPa, 100 Pa</td></tr>
 *   <tr><td>{@code psi}</td><td>pound-force per square inch, 6894.757293168 Pa</td></tr>
 *   <tr><td>{@code atm}</td><td>standard atmosphere, 101.325 kPa</td></tr>
 *   <tr><td>{@code mH2O}, {@code mmH2O}</td><td>conventional metre (millimetre) of water, 9806.65 Pa
 *       (9.80665 Pa): the pressure of that height of water of density 1000 kg/m³ under standard
 *       gravity 9.80665 m/s²</td></tr>
 *   <tr><td>{@code ftH2O}, {@code inH2O}</td><td>conventional foot (inch) of water, 0.3048 × 9806.65
 *       = 2989.06692 Pa (0.0254 × 9806.65 = 249.08891 Pa); not the slightly smaller foot of water
 *       at 39.2 °F (about 2988.98 Pa)</td></tr>
 *   <tr><td>{@code barg}, {@code psig}, {@code kPag}, {@code kPa(g)}, {@code bar(g)}, … {@code
 *       gauge}</td><td>a gauge reading; any pressure unit with {@code (g)}, or {@code g} glued to
 *       {@code bar}, {@code psi} or {@code Pa}; only where a field takes readings ({@link
 *       #parsePressure})</td></tr>
 *   <tr><td>{@code bara}, {@code psia}, {@code kPaa}, {@code kPa(a)}, … {@code abs}</td><td>an
 *       absolute reading, likewise</td></tr>
 *   <tr><td>{@code °C}, {@code degC}</td><td>degree Celsius</td></tr>
 *   <tr><td>{@code °F}, {@code degF}</td><td>degree Fahrenheit</td></tr>
 *   <tr><td>{@code lb}</td><td>pound (mass), 0.45359237 kg</td></tr>
 *   <tr><td>{@code cP}</td><td>centipoise, 1 mPa·s</td></tr>
 *   <tr><td>{@code cSt}</td><td>centistokes, 1 mm²/s</td></tr>
 * </table>
 *
 * <p>Written H2O or H₂O, with or without a space ({@code m H2O}). A plain {@code kPa}, {@code bar},
 * {@code psi} or {@code mH2O} is a pressure that says neither gauge nor absolute; {@link #parse}
 * refuses a gauge or absolute marker (the field would have to guess), {@link #parsePressure} keeps
 * it in a {@link PressureReading}. Mass flows ({@code kg/h}, {@code kg/s}, {@code lb/h}, {@code
 * t/h}) are read by {@link #parseFlow} into a {@link FlowReading}; friction-loss gradients ({@code 4
 * m per 100 m}, {@code 4 ft/100ft}, {@code 0.04 m/m}, {@code 400 Pa/m}) by {@link #parseGradient}.
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
    /** A letter followed by a bare 2 or 3 that is not part of a longer number: m3 → m^3 (not the 2 of H2O). */
    private static final Pattern PLAIN_POWER = Pattern.compile("(?<=[A-Za-z])(?<!H)([23])(?![0-9.])");
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
    private static final Unit<?> TONNE = Units.KILOGRAM.multiply(1000);
    /** Conventional metre of water: 1000 kg/m³ × 9.80665 m/s² × 1 m = 9806.65 Pa, exactly. */
    private static final Unit<?> METRE_OF_WATER = Units.PASCAL.multiply(980_665).divide(100);

    private static final Unit<?> MILLIMETRE_OF_WATER =
            Units.PASCAL.multiply(980_665).divide(100_000);
    /** Conventional foot of water: 0.3048 × 9806.65 Pa = 2989.06692 Pa, exactly. */
    private static final Unit<?> FOOT_OF_WATER =
            Units.PASCAL.multiply(298_906_692).divide(100_000);
    /** Conventional inch of water: 0.0254 × 9806.65 Pa = 249.08891 Pa, exactly. */
    private static final Unit<?> INCH_OF_WATER =
            Units.PASCAL.multiply(24_908_891).divide(100_000);

    private static final Unit<?> MASS_FLOW = Units.KILOGRAM.divide(Units.SECOND);
    private static final Unit<?> PRESSURE_GRADIENT = Units.PASCAL.divide(Units.METRE);

    /** A pressure unit and a gauge/absolute marker in brackets: {@code kPa(g)}, {@code bar (a)}. */
    private static final Pattern MARKER_IN_BRACKETS =
            Pattern.compile("^(.+?)\\s*\\(\\s*(?i:(g|gauge)|(a|abs|absolute))\\s*\\)$");
    /** A marker glued to bar, psi or Pa: {@code barg}, {@code psia}, {@code kPag}, {@code MPaa}. */
    private static final Pattern MARKER_GLUED = Pattern.compile("^(.*(?:bar|psi|Pa))(?:(g)|(a))$");
    /** A marker as a word: {@code kPa gauge}, {@code psi abs}. */
    private static final Pattern MARKER_WORD = Pattern.compile("^(.+?)\\s+(?i:(gauge)|(abs|absolute))$");
    /** Head (or pressure) and the length of pipe it is lost over: {@code 4 m per 100 m}. */
    private static final Pattern PER = Pattern.compile("(?i)\\s+per\\s+");
    /** Head over a numbered length: {@code 4 m/100m}, {@code 1.2 psi/100 ft}. */
    private static final Pattern OVER_NUMBERED_LENGTH = Pattern.compile("^(.*?)/\\s*([0-9.].*)$");

    /** Each kind's SI unit in the core. */
    private static final Map<QuantityKind, Unit<?>> SI_UNITS = new EnumMap<>(QuantityKind.class);

    /** Display units per system: the parseable spelling shown to users. */
    private static final Map<QuantityKind, String> SI_DISPLAY = new EnumMap<>(QuantityKind.class);

    private static final Map<QuantityKind, String> US_DISPLAY = new EnumMap<>(QuantityKind.class);

    private static final Map<QuantityKind, String> PROCESS_DISPLAY = new EnumMap<>(QuantityKind.class);

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

        PROCESS_DISPLAY.putAll(SI_DISPLAY);
        PROCESS_DISPLAY.put(QuantityKind.VOLUMETRIC_FLOW, "m³/h");
        PROCESS_DISPLAY.put(QuantityKind.PRESSURE, "bar");

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
        f.alias(Units.HOUR, "hr");
        f.alias(TONNE, "t");
        f.alias(BAR, "bar");
        f.alias(MILLIBAR, "mbar");
        f.alias(PSI, "psi");
        f.alias(ATMOSPHERE, "atm");
        f.alias(METRE_OF_WATER, "mH2O");
        f.alias(MILLIMETRE_OF_WATER, "mmH2O");
        f.alias(FOOT_OF_WATER, "ftH2O");
        f.alias(INCH_OF_WATER, "inH2O");
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
     * Parses typed text to an SI value, naming {@code where} in any error. A pressure marked gauge
     * or absolute ({@code barg}, {@code psia}, {@code kPa(g)}) is refused: only {@link
     * #parsePressure} keeps that distinction, for fields that know what to do with it.
     *
     * @param text e.g. {@code 12 L/s}
     * @param kind what the text must be
     * @param where the field, option or file position the text came from
     * @return the value in the kind's SI unit
     */
    public static double parse(String text, QuantityKind kind, String where) {
        Objects.requireNonNull(kind, "kind");
        Typed typed = split(text, kind.dimensionName(), example(kind), where);
        if (typed.unitText.isEmpty()) {
            if (kind == QuantityKind.TEMPERATURE) {
                // "5" is 5 °C to most people and 5 K to the SI rule for bare numbers: too far apart to guess.
                throw new InputException(
                        where,
                        "a temperature needs its unit, got \"" + abbreviate(typed.whole) + "\" (write e.g. "
                                + typed.numberText + " degC, " + typed.numberText + " degF or " + typed.numberText
                                + " K)");
            }
            return typed.number;
        }
        java.util.concurrent.ConcurrentHashMap<String, Conversion> accepted = ACCEPTED.get(kind);
        Conversion known = accepted.get(typed.unitText);
        if (known != null) {
            return finite(known.apply(typed.number), typed, where);
        }
        Marked marked = marked(typed.unitText);
        Unit<?> si = SI_UNITS.get(kind);
        Unit<?> base = marked == null ? null : unitOrNull(marked.base);
        if (base != null) {
            if (base.isCompatible(Units.PASCAL)) {
                if (kind == QuantityKind.PRESSURE) {
                    throw new InputException(
                            where,
                            "\"" + abbreviate(typed.whole) + "\" is marked as " + marked.describe()
                                    + " pressure, which this field does not take; write it as a plain pressure in"
                                    + " the field's own convention, e.g. " + typed.numberText + " " + marked.base);
                }
                throw wrongDimension(kind.dimensionName(), typed, base, where);
            }
        }
        Unit<?> unit = parseUnit(typed.unitText, typed.whole, kind.dimensionName(), example(kind), where);
        if (!unit.isCompatible(si)) {
            throw wrongDimension(kind.dimensionName(), typed, unit, where);
        }
        Conversion toSi = conversion(unit, si);
        remember(accepted, typed.unitText, toSi);
        return finite(toSi.apply(typed.number), typed, where);
    }

    /**
     * Parses a pressure reading: gauge ({@code 3 barg}, {@code 45 psig}, {@code 250 kPag}, {@code 250
     * kPa(g)}, {@code 2.5 bar(g)}, {@code 40 kPa gauge}), absolute ({@code 1.2 bara}, {@code 14.7
     * psia}, {@code 80 kPa(a)}, {@code 80 kPa abs}) or neither (a plain {@code kPa}, {@code bar},
     * {@code psi}, {@code mH2O}, or a bare number of Pa). No atmosphere is added or taken away here;
     * {@link PressureReading#asGauge} and {@link PressureReading#asAbsolute} do that with the
     * caller's barometric pressure.
     *
     * @param text the typed pressure
     * @param where the field, for messages
     * @return the pressure in Pa and what it is measured from
     * @throws InputException naming {@code where} and the text when it is not a pressure
     */
    public static PressureReading parsePressure(String text, String where) {
        String expected = QuantityKind.PRESSURE.dimensionName();
        String example = "250 kPa, 2.4 barg or 35 psia";
        Typed typed = split(text, expected, example, where);
        if (typed.unitText.isEmpty()) {
            return new PressureReading(typed.number, PressureReading.Reference.UNSPECIFIED);
        }
        PressureUnit known = ACCEPTED_PRESSURE.get(typed.unitText);
        if (known != null) {
            return new PressureReading(finite(known.toPascal().apply(typed.number), typed, where), known.reference());
        }
        Marked marked = marked(typed.unitText);
        String unitText = marked == null ? typed.unitText : marked.base;
        Unit<?> unit = parseUnit(unitText, typed.whole, expected, example, where);
        if (!unit.isCompatible(Units.PASCAL)) {
            throw wrongDimension(expected, typed, unit, where);
        }
        PressureUnit accepted = new PressureUnit(
                conversion(unit, Units.PASCAL),
                marked == null ? PressureReading.Reference.UNSPECIFIED : marked.reference);
        remember(ACCEPTED_PRESSURE, typed.unitText, accepted);
        return new PressureReading(finite(accepted.toPascal().apply(typed.number), typed, where), accepted.reference());
    }

    /**
     * Parses a flow given by volume ({@code 12 L/s}, {@code 43 m3/h}, {@code 190 gpm}, a bare number
     * of m³/s) or by mass ({@code 4300 kg/h}, {@code 1.2 kg/s}, {@code 9500 lb/h}, {@code 43 t/h}).
     *
     * @param text the typed flow
     * @param where the field, for messages
     * @return the flow in m³/s or kg/s, saying which
     * @throws InputException naming {@code where} and the text when it is neither
     */
    public static FlowReading parseFlow(String text, String where) {
        String expected = QuantityKind.VOLUMETRIC_FLOW.dimensionName();
        String example = example(QuantityKind.VOLUMETRIC_FLOW) + ", or by mass 4300 kg/h";
        Typed typed = split(text, expected, example, where);
        if (typed.unitText.isEmpty()) {
            return new FlowReading(typed.number, FlowReading.Basis.VOLUMETRIC, typed.whole);
        }
        FlowUnit known = ACCEPTED_FLOW.get(typed.unitText);
        if (known == null) {
            Unit<?> unit = parseUnit(typed.unitText, typed.whole, expected, example, where);
            Unit<?> volumetric = SI_UNITS.get(QuantityKind.VOLUMETRIC_FLOW);
            if (unit.isCompatible(volumetric)) {
                known = new FlowUnit(conversion(unit, volumetric), FlowReading.Basis.VOLUMETRIC);
            } else if (unit.isCompatible(MASS_FLOW)) {
                known = new FlowUnit(conversion(unit, MASS_FLOW), FlowReading.Basis.MASS);
            } else {
                throw new InputException(
                        where,
                        expected + " expected (or a mass flow such as 4300 kg/h), got \"" + abbreviate(typed.whole)
                                + "\" (" + dimensionNameOf(unit) + ")");
            }
            remember(ACCEPTED_FLOW, typed.unitText, known);
        }
        return new FlowReading(finite(known.toSi().apply(typed.number), typed, where), known.basis(), typed.whole);
    }

    /**
     * Parses a friction-loss gradient, the head (or pressure) lost per length of pipe:
     *
     * <ul>
     *   <li>a bare number: m of head per 100 m of pipe ({@code 4});
     *   <li>a head or pressure, {@code per} or {@code /}, and a length: {@code 4 m per 100 m},
     *       {@code 4 ft per 100 ft}, {@code 4 m/100m}, {@code 1.2 psi/100ft}, {@code 40 mm per m};
     *   <li>a ratio of lengths: {@code 0.04 m/m}, {@code 40 mm/m};
     *   <li>a pressure per length: {@code 400 Pa/m}, {@code 0.4 kPa/m}.
     * </ul>
     *
     * <p>A head or pressure alone ({@code 4 ft}, {@code 4 m}, {@code 40 kPa}) is refused: it says
     * nothing of the length it is lost over.
     *
     * @param text the typed gradient
     * @param where the field, for messages
     * @return m per 100 m, or Pa per m for a gradient typed as a pressure per length
     * @throws InputException naming {@code where} and the text, with the spellings above
     */
    public static FrictionGradient parseGradient(String text, String where) {
        String expected = "friction-loss gradient";
        String example = "4 m per 100 m, 4 ft per 100 ft or 400 Pa/m";
        if (text == null || text.isBlank()) {
            throw new InputException(where, expected + " expected, got an empty value");
        }
        String whole = text.strip();
        String[] perParts = PER.split(whole, -1);
        if (perParts.length > 2) {
            throw new InputException(
                    where,
                    expected + " expected with one \"per\", got \"" + abbreviate(whole) + "\" (e.g. " + example + ")");
        }
        if (perParts.length == 2) {
            return lostOver(perParts[0], perParts[1], whole, where);
        }
        Matcher over = OVER_NUMBERED_LENGTH.matcher(whole);
        if (over.matches() && NUMBER_THEN_UNIT.matcher(over.group(1).strip()).matches()) {
            return lostOver(over.group(1), over.group(2), whole, where);
        }
        Typed typed = split(whole, expected, example, where);
        if (typed.unitText.isEmpty()) {
            return new FrictionGradient(typed.number, FrictionGradient.Basis.HEAD_PER_100_M, whole);
        }
        Unit<?> unit = parseUnit(typed.unitText, whole, expected, example, where);
        if (unit.isCompatible(AbstractUnit.ONE)) {
            double ratio = finite(convert(unit, AbstractUnit.ONE, typed.number), typed, where);
            return new FrictionGradient(100.0 * ratio, FrictionGradient.Basis.HEAD_PER_100_M, whole);
        }
        if (unit.isCompatible(PRESSURE_GRADIENT)) {
            return new FrictionGradient(
                    finite(convert(unit, PRESSURE_GRADIENT, typed.number), typed, where),
                    FrictionGradient.Basis.PRESSURE_PER_METRE,
                    whole);
        }
        if (unit.isCompatible(Units.METRE)) {
            String unitText = typed.unitText;
            String perSame = whole + " per 100 " + unitText;
            String suggestion =
                    unitText.equals("m") ? "\"" + perSame + "\"" : "\"" + perSame + "\" or \"" + whole + " per 100 m\"";
            throw new InputException(
                    where,
                    "\"" + abbreviate(whole) + "\" is a head alone, not a head per length of pipe; write " + suggestion
                            + " (a bare number is m per 100 m)");
        }
        if (unit.isCompatible(Units.PASCAL)) {
            throw new InputException(
                    where,
                    "\"" + abbreviate(whole)
                            + "\" is a pressure alone, not a pressure per length of pipe; write e.g. \"" + whole
                            + " per 100 m\" or a value in Pa/m");
        }
        throw wrongDimension(expected, typed, unit, where);
    }

    /** {@code head per length}: numerator a head (m) or a pressure (Pa), denominator a length. */
    private static FrictionGradient lostOver(String lostText, String lengthText, String whole, String where) {
        String expected = "friction-loss gradient";
        String example = "4 m per 100 m, 4 ft per 100 ft or 1.2 psi per 100 ft";
        Typed lost = split(lostText, expected, example, where);
        if (lost.unitText.isEmpty()) {
            throw new InputException(
                    where,
                    "the loss in \"" + abbreviate(whole) + "\" needs its unit, e.g. " + lost.whole + " m per 100 m");
        }
        Unit<?> unit = parseUnit(lost.unitText, whole, expected, example, where);
        String length = lengthText.strip();
        if (!length.isEmpty() && !Character.isDigit(length.charAt(0)) && length.charAt(0) != '.') {
            length = "1 " + length;
        }
        Typed over = split(length, "length of pipe", "100 m or 100 ft", where);
        if (over.unitText.isEmpty()) {
            throw new InputException(
                    where,
                    "the length of pipe in \"" + abbreviate(whole) + "\" needs its unit, e.g. per 100 m or per 100 ft");
        }
        Unit<?> lengthUnit = parseUnit(over.unitText, whole, "length of pipe", "100 m or 100 ft", where);
        if (!lengthUnit.isCompatible(Units.METRE)) {
            throw new InputException(
                    where,
                    "the length of pipe in \"" + abbreviate(whole) + "\" must be a length, got \"" + over.whole + "\" ("
                            + dimensionNameOf(lengthUnit) + ")");
        }
        double metres = finite(convert(lengthUnit, Units.METRE, over.number), over, where);
        if (!(metres > 0)) {
            throw new InputException(
                    where, "the length of pipe in \"" + abbreviate(whole) + "\" must be greater than zero");
        }
        if (unit.isCompatible(Units.METRE)) {
            double head = finite(convert(unit, Units.METRE, lost.number), lost, where);
            return new FrictionGradient(
                    finite(head * 100.0 / metres, lost, where), FrictionGradient.Basis.HEAD_PER_100_M, whole);
        }
        if (unit.isCompatible(Units.PASCAL)) {
            double pascals = finite(convert(unit, Units.PASCAL, lost.number), lost, where);
            return new FrictionGradient(
                    finite(pascals / metres, lost, where), FrictionGradient.Basis.PRESSURE_PER_METRE, whole);
        }
        throw new InputException(
                where,
                "the loss in \"" + abbreviate(whole) + "\" must be a head or a pressure, got \"" + lost.whole + "\" ("
                        + dimensionNameOf(unit) + ")");
    }

    /** The number and unit text of typed input, checked for emptiness and finiteness. */
    private record Typed(double number, String numberText, String unitText, String whole) {}

    /**
     * The common case without regular expressions: digits with at most one point, optional sign and
     * no exponent, then optional spaces and a unit of letters and {@code /} only ({@code 95.04 m},
     * {@code 0.05 L/s}). Anything else returns null and takes the general path.
     */
    private static Typed plainDecimal(String t) {
        int n = t.length();
        int i = 0;
        if (i < n && (t.charAt(i) == '-' || t.charAt(i) == '+')) {
            i++;
        }
        int digits = 0;
        boolean point = false;
        while (i < n) {
            char c = t.charAt(i);
            if (c >= '0' && c <= '9') {
                digits++;
            } else if (c == '.' && !point) {
                point = true;
            } else {
                break;
            }
            i++;
        }
        if (digits == 0 || digits > 17) {
            return null;
        }
        int numberEnd = i;
        while (i < n && t.charAt(i) == ' ') {
            i++;
        }
        for (int j = i; j < n; j++) {
            char c = t.charAt(j);
            if (!((c >= 'a' && c <= 'z') || (c >= 'A' && c <= 'Z') || c == '/')) {
                return null;
            }
        }
        String numberText = t.substring(0, numberEnd);
        return new Typed(Decimals.parse(numberText), numberText, t.substring(i), t);
    }

    private static Typed split(String text, String expected, String example, String where) {
        if (text == null || text.isBlank()) {
            throw new InputException(where, expected + " expected, got an empty value");
        }
        String trimmed = text.strip();
        Typed fast = plainDecimal(trimmed);
        if (fast != null) {
            return fast;
        }
        if (NON_FINITE.matcher(trimmed).matches()) {
            throw new InputException(where, "a finite number is required, got \"" + abbreviate(trimmed) + "\"");
        }
        Matcher matcher = NUMBER_THEN_UNIT.matcher(trimmed);
        if (!matcher.matches()) {
            throw new InputException(
                    where,
                    expected + " expected as a number and unit (e.g. " + example + "), got \"" + abbreviate(trimmed)
                            + "\"");
        }
        double number = Decimals.parse(matcher.group(1));
        if (!Double.isFinite(number)) {
            throw new InputException(where, "number out of range in \"" + abbreviate(trimmed) + "\"");
        }
        return new Typed(number, matcher.group(1), matcher.group(2).strip(), trimmed);
    }

    private static double finite(double value, Typed typed, String where) {
        if (!Double.isFinite(value)) {
            throw new InputException(where, "value out of range in \"" + abbreviate(typed.whole) + "\"");
        }
        return value;
    }

    private static InputException wrongDimension(String expected, Typed typed, Unit<?> unit, String where) {
        return new InputException(
                where, expected + " expected, got \"" + abbreviate(typed.whole) + "\" (" + dimensionNameOf(unit) + ")");
    }

    /** The unit, or null when the text is not one (the caller then reports the whole unit text). */
    private static Unit<?> unitOrNull(String unitText) {
        try {
            return parseUnit(unitText, unitText, "unit", "", "");
        } catch (InputException e) {
            return null;
        }
    }

    /** A unit text with a gauge or absolute marker taken off. */
    private record Marked(String base, PressureReading.Reference reference) {
        String describe() {
            return reference == PressureReading.Reference.GAUGE ? "a gauge" : "an absolute";
        }
    }

    /** The unit without its gauge/absolute marker, or null when it carries none. */
    private static final Marked UNMARKED = new Marked("", PressureReading.Reference.ABSOLUTE);

    private static final java.util.concurrent.ConcurrentHashMap<String, Marked> MARKED_CACHE =
            new java.util.concurrent.ConcurrentHashMap<>();

    private static Marked marked(String unitText) {
        Marked cached = MARKED_CACHE.get(unitText);
        if (cached != null) {
            return cached == UNMARKED ? null : cached;
        }
        Marked m = markedUncached(unitText);
        if (MARKED_CACHE.size() < CACHE_LIMIT) {
            MARKED_CACHE.put(unitText, m == null ? UNMARKED : m);
        }
        return m;
    }

    private static Marked markedUncached(String unitText) {
        for (Pattern p : List.of(MARKER_IN_BRACKETS, MARKER_GLUED, MARKER_WORD)) {
            Matcher m = p.matcher(unitText);
            if (m.matches()) {
                return new Marked(
                        m.group(1).strip(),
                        m.group(2) != null ? PressureReading.Reference.GAUGE : PressureReading.Reference.ABSOLUTE);
            }
        }
        return null;
    }

    /**
     * Units already read, by their text: a line list of 10⁶ rows repeats a handful of units, and the
     * unit library's parser is slow. Bounded so that fuzzed input cannot grow it without end.
     */
    private static final java.util.concurrent.ConcurrentHashMap<String, Unit<?>> UNIT_CACHE =
            new java.util.concurrent.ConcurrentHashMap<>();

    private static final java.util.concurrent.ConcurrentHashMap<List<Unit<?>>, UnitConverter> CONVERTER_CACHE =
            new java.util.concurrent.ConcurrentHashMap<>();

    private static final int CACHE_LIMIT = 512;

    private static Unit<?> parseUnit(String unitText, String whole, String expected, String example, String where) {
        Unit<?> cached = UNIT_CACHE.get(unitText);
        if (cached != null) {
            return cached;
        }
        Unit<?> unit = parseUnitUncached(unitText, whole, expected, example, where);
        if (UNIT_CACHE.size() < CACHE_LIMIT) {
            UNIT_CACHE.put(unitText, unit);
        }
        return unit;
    }

    private static Unit<?> parseUnitUncached(
            String unitText, String whole, String expected, String example, String where) {
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
        String compact = BRACKETED_EXPONENT
                .matcher(unitText.replace(" ", "").replace("H₂O", "H2O").replace("**", "^"))
                .replaceAll("^$1");
        // Powers are handed to the unit library as ^2 and ^3: it reads a lone "mm²" as milli-(m²),
        // 10⁻³ m², but "mm^2" as (mm)², 10⁻⁶ m².
        String normalised = PLAIN_POWER
                .matcher(compact)
                .replaceAll("^$1")
                .replace("²", "^2")
                .replace("³", "^3");
        try {
            return new LeftToRight(normalised).unit();
        } catch (MeasurementException | IllegalArgumentException | IndexOutOfBoundsException | ArithmeticException e) {
            throw new InputException(
                    where,
                    expected + " expected, got \"" + abbreviate(whole) + "\": unknown unit \"" + unitText + "\" (e.g. "
                            + example + ")",
                    e);
        }
    }

    /**
     * Reads a unit expression left to right, so that {@code a/b/c} is {@code (a/b)/c} and {@code
     * a/b*c} is {@code (a/b)·c}. ISO 80000-1 and the SI Brochure ask for brackets rather than a
     * second solidus, so no standard says how to read one; left to right is how calculators and
     * programming languages read it, and how {@link DimensionParser} does. The unit library alone
     * would read {@code a/b/c} as {@code a/(b/c)}, which made {@code m/s/s} a length. Each symbol with
     * its power ({@code m³}, {@code s^-1}) is handed to the unit library; products and quotients are
     * formed here. Input is at most {@link #MAX_UNIT_LENGTH} characters, so the recursion on
     * parentheses is shallow.
     */
    private static final class LeftToRight {
        private final String text;
        private int pos;

        LeftToRight(String text) {
            this.text = text;
        }

        Unit<?> unit() {
            Unit<?> u = product();
            if (pos < text.length()) {
                throw new IllegalArgumentException("unexpected '" + text.charAt(pos) + "'");
            }
            return u;
        }

        private Unit<?> product() {
            Unit<?> result = factor();
            while (pos < text.length()) {
                char c = text.charAt(pos);
                if (c == '/') {
                    pos++;
                    result = result.divide(factor());
                } else if (c == '*' || c == '·') {
                    pos++;
                    result = result.multiply(factor());
                } else {
                    break;
                }
            }
            return result;
        }

        private Unit<?> factor() {
            if (pos < text.length() && text.charAt(pos) == '(') {
                pos++;
                Unit<?> inner = product();
                if (pos >= text.length() || text.charAt(pos) != ')') {
                    throw new IllegalArgumentException("expected ')'");
                }
                pos++;
                return power(inner);
            }
            int start = pos;
            while (pos < text.length() && "/*·()".indexOf(text.charAt(pos)) < 0) {
                pos++;
            }
            String symbol = text.substring(start, pos);
            if (symbol.isEmpty()) {
                throw new IllegalArgumentException("a unit symbol is missing at " + (start + 1));
            }
            if (symbol.equals("1")) {
                return AbstractUnit.ONE;
            }
            return FORMAT.parse(symbol);
        }

        /** A power after a bracket: {@code (m/s)^2}, {@code (m/s)²}. */
        private Unit<?> power(Unit<?> base) {
            if (pos >= text.length()) {
                return base;
            }
            char c = text.charAt(pos);
            int exponent;
            if (c == '^') {
                Matcher m = BRACKET_POWER.matcher(text).region(pos, text.length());
                if (!m.lookingAt()) {
                    throw new IllegalArgumentException("expected a one-digit power after '^'");
                }
                exponent = Integer.parseInt(m.group(1));
                pos = m.end();
            } else if (c == '²' || c == '³') {
                exponent = c == '²' ? 2 : 3;
                pos++;
            } else {
                return base;
            }
            if (exponent == 0) {
                return AbstractUnit.ONE;
            }
            Unit<?> raised = base.pow(Math.abs(exponent));
            return exponent < 0 ? raised.inverse() : raised;
        }
    }

    private static final Pattern BRACKET_POWER = Pattern.compile("\\^([+-]?\\d)");
    /** {@code ^(-1)} written for {@code ^-1}. */
    private static final Pattern BRACKETED_EXPONENT = Pattern.compile("\\^\\(([+-]?\\d)\\)");

    static String abbreviate(String text) {
        return text.length() <= 60 ? text : text.substring(0, 60) + "…";
    }

    private static double convert(Unit<?> from, Unit<?> to, double value) {
        return conversion(from, to).apply(value);
    }

    /** The conversion from one unit to another, from the caches when already seen. */
    private static Conversion conversion(Unit<?> from, Unit<?> to) {
        UnitConverter c = converter(from, to);
        Integer decimal = DECIMAL_EXPONENT.get(c);
        if (decimal == null) {
            decimal = decimalExponent(c);
            if (DECIMAL_EXPONENT.size() < CACHE_LIMIT) {
                DECIMAL_EXPONENT.put(c, decimal);
            }
        }
        return new Conversion(c, decimal);
    }

    /**
     * A unit conversion ready to apply: a pure power of ten is one correctly rounded multiplication
     * or division, which gives the same double as the unit library's exact decimal arithmetic
     * without its big-number cost; anything else goes through the library's converter.
     */
    private record Conversion(UnitConverter converter, int decimal) {
        double apply(double value) {
            if (decimal == NOT_DECIMAL) {
                return converter.convert(value);
            }
            return decimal >= 0 ? value * POWERS_OF_TEN[decimal] : value / POWERS_OF_TEN[-decimal];
        }
    }

    /**
     * Per quantity kind, the conversion to SI of each unit text already read and accepted for that
     * kind: a line list of 10⁶ rows repeats a handful of units, and checking a unit's dimension in
     * the unit library costs far more than reading the number. Only texts that passed every check
     * are stored, so a hit needs no check but the number's. Bounded like the other caches.
     */
    private static final Map<QuantityKind, java.util.concurrent.ConcurrentHashMap<String, Conversion>> ACCEPTED =
            new EnumMap<>(QuantityKind.class);

    static {
        for (QuantityKind k : QuantityKind.values()) {
            ACCEPTED.put(k, new java.util.concurrent.ConcurrentHashMap<>());
        }
    }

    /** Accepted pressure unit texts: their conversion to Pa and what they are measured from. */
    private record PressureUnit(Conversion toPascal, PressureReading.Reference reference) {}

    private static final java.util.concurrent.ConcurrentHashMap<String, PressureUnit> ACCEPTED_PRESSURE =
            new java.util.concurrent.ConcurrentHashMap<>();

    /** Accepted flow unit texts: their conversion to m³/s or kg/s and which of the two. */
    private record FlowUnit(Conversion toSi, FlowReading.Basis basis) {}

    private static final java.util.concurrent.ConcurrentHashMap<String, FlowUnit> ACCEPTED_FLOW =
            new java.util.concurrent.ConcurrentHashMap<>();

    private static <V> void remember(java.util.concurrent.ConcurrentHashMap<String, V> cache, String key, V value) {
        if (cache.size() < CACHE_LIMIT) {
            cache.put(key, value);
        }
    }

    private static final int NOT_DECIMAL = Integer.MIN_VALUE;

    /** 10⁰ … 10²², each exactly representable as a double. */
    private static final double[] POWERS_OF_TEN = new double[23];

    static {
        double p = 1;
        for (int i = 0; i < POWERS_OF_TEN.length; i++) {
            POWERS_OF_TEN[i] = p;
            p *= 10;
        }
    }

    private static final java.util.concurrent.ConcurrentHashMap<UnitConverter, Integer> DECIMAL_EXPONENT =
            new java.util.concurrent.ConcurrentHashMap<>();

    /** k when the converter multiplies by exactly 10^k (|k| ≤ 22), else {@link #NOT_DECIMAL}. */
    private static int decimalExponent(UnitConverter c) {
        if (c.isIdentity()) {
            return 0;
        }
        if (!c.isLinear()) {
            return NOT_DECIMAL;
        }
        double f = c.convert(1.0);
        if (!(f > 0) || !Double.isFinite(f)) {
            return NOT_DECIMAL;
        }
        long k = Math.round(Math.log10(f));
        if (Math.abs(k) > 22) {
            return NOT_DECIMAL;
        }
        int ki = (int) k;
        if (f != (ki >= 0 ? POWERS_OF_TEN[ki] : 1.0 / POWERS_OF_TEN[-ki])) {
            return NOT_DECIMAL;
        }
        for (double probe : new double[] {3.0, 7.0, 0.1, 123.456}) {
            double fast = ki >= 0 ? probe * POWERS_OF_TEN[ki] : probe / POWERS_OF_TEN[-ki];
            if (c.convert(probe) != fast) {
                return NOT_DECIMAL;
            }
        }
        return ki;
    }

    private static UnitConverter converter(Unit<?> from, Unit<?> to) {
        List<Unit<?>> key = List.of(from, to);
        UnitConverter c = CONVERTER_CACHE.get(key);
        if (c == null) {
            c = converterUncached(from, to);
            if (CONVERTER_CACHE.size() < CACHE_LIMIT) {
                CONVERTER_CACHE.put(key, c);
            }
        }
        return c;
    }

    @SuppressWarnings({"unchecked", "rawtypes"})
    private static UnitConverter converterUncached(Unit<?> from, Unit<?> to) {
        try {
            return ((Unit) from).getConverterToAny(to);
        } catch (IncommensurableException | UnconvertibleException e) {
            throw new IllegalStateException("units " + from + " and " + to + " are compatible but not convertible", e);
        }
    }

    /** Kinds named in messages, in the order they are tried. */
    private static final List<QuantityKind> NAMED_KINDS = List.of(
            QuantityKind.LENGTH,
            QuantityKind.VOLUMETRIC_FLOW,
            QuantityKind.VELOCITY,
            QuantityKind.PRESSURE,
            QuantityKind.TEMPERATURE,
            QuantityKind.DENSITY,
            QuantityKind.DYNAMIC_VISCOSITY,
            QuantityKind.KINEMATIC_VISCOSITY,
            QuantityKind.DIMENSIONLESS);

    /** The plain name of a unit's dimension, or null when it is none we name. */
    private static String kindName(Unit<?> unit, boolean withDimensionless) {
        for (QuantityKind k : NAMED_KINDS) {
            if ((withDimensionless || k != QuantityKind.DIMENSIONLESS) && unit.isCompatible(SI_UNITS.get(k))) {
                return k.dimensionName();
            }
        }
        if (unit.isCompatible(MASS_FLOW)) {
            return "mass flow";
        }
        return withDimensionless && unit.isCompatible(Units.HERTZ) ? "frequency" : null;
    }

    /**
     * What a unit measures, for messages: a kind ({@code volumetric flow}), a kind per second or per
     * metre ({@code volumetric flow per second, dimension [L]³/[T]²}), or the bare dimension.
     */
    private static String dimensionNameOf(Unit<?> unit) {
        String exact = kindName(unit, true);
        if (exact != null) {
            return exact;
        }
        String dimension = "dimension " + unit.getDimension();
        String perSecond = kindName(unit.multiply(Units.SECOND), false);
        if (perSecond != null) {
            return perSecond + " per second, " + dimension;
        }
        String perMetre = kindName(unit.multiply(Units.METRE), false);
        if (perMetre != null) {
            return perMetre + " per metre, " + dimension;
        }
        return dimension;
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

    /** A number with an SI unit as the core writes them into messages (longest symbols first). */
    private static final java.util.regex.Pattern SI_IN_TEXT = java.util.regex.Pattern.compile(
            "(?<![\\w.])(-?(?:\\d+(?:\\.\\d*)?|\\.\\d+)(?:[eE][-+]?\\d+)?) ?(m³/s|L/s|m/s|kPa|Pa|mm|°C|m)"
                    + "(?![\\w²³/·])( per 100 m(?![\\w²³/·]))?");

    /**
     * A message written in SI by the core (cautions, notes, laws) shown in the chosen system: each
     * number with an SI unit (m³/s, L/s, m/s, kPa, Pa, mm, °C, m) is converted and printed with
     * {@value #SIGNIFICANT_DIGITS} significant digits in the system's display unit; "X m per 100 m"
     * is a ratio and keeps its number. In SI only flows change (m³/s to the display L/s); other SI
     * text is left as written.
     *
     * @param text message text in SI
     * @param system the system to show it in
     * @return the text in that system
     */
    public static String inSystem(String text, UnitSystem system) {
        java.util.regex.Matcher m = SI_IN_TEXT.matcher(text);
        StringBuilder out = new StringBuilder();
        while (m.find()) {
            double value = Double.parseDouble(m.group(1));
            String unit = m.group(2);
            String replacement;
            if (m.group(3) != null) {
                replacement = system == UnitSystem.US_CUSTOMARY ? m.group(1) + " ft per 100 ft" : m.group();
            } else if (system == UnitSystem.SI && !unit.equals("m³/s")) {
                replacement = m.group();
            } else if (system == UnitSystem.SI_PROCESS
                    && !(unit.equals("m³/s") || unit.equals("L/s") || unit.equals("kPa") || unit.equals("Pa"))) {
                replacement = m.group();
            } else {
                replacement = switch (unit) {
                    case "m³/s" -> format(value, QuantityKind.VOLUMETRIC_FLOW, system);
                    case "L/s" -> format(value / 1000.0, QuantityKind.VOLUMETRIC_FLOW, system);
                    case "m/s" -> format(value, QuantityKind.VELOCITY, system);
                    case "kPa" -> format(value * 1000.0, QuantityKind.PRESSURE, system);
                    case "Pa" -> format(value, QuantityKind.PRESSURE, system);
                    case "mm" -> format(value / 1000.0, QuantityKind.DIAMETER, system);
                    case "°C" -> format(value + 273.15, QuantityKind.TEMPERATURE, system);
                    default -> format(value, QuantityKind.HEAD, system);
                };
            }
            m.appendReplacement(out, java.util.regex.Matcher.quoteReplacement(replacement));
        }
        m.appendTail(out);
        return out.toString();
    }

    /**
     * A value converted between units, for machine-readable output: rounded to 15 significant
     * digits (below a double's 15.95), which drops the binary noise a conversion adds (291.16 K →
     * 18.00999999999999 °C prints 18.01) and keeps every digit a measurement carries.
     *
     * @param value the converted value
     * @return its shortest decimal text at 15 significant digits
     */
    public static String formatConverted(double value) {
        if (!Double.isFinite(value) || value == 0) {
            return Double.toString(value);
        }
        return Double.toString(new BigDecimal(value).round(new MathContext(15)).doubleValue());
    }

    /**
     * The unit a kind is shown in.
     *
     * @param kind the quantity kind
     * @param system SI or US customary
     * @return a symbol such as {@code kPa} or {@code gpm} (empty for dimensionless)
     */
    public static String unitSymbol(QuantityKind kind, UnitSystem system) {
        return (system == UnitSystem.US_CUSTOMARY
                        ? US_DISPLAY
                        : system == UnitSystem.SI_PROCESS ? PROCESS_DISPLAY : SI_DISPLAY)
                .get(kind);
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
            Unit<?> unit = parseUnit(symbol, symbol, kind.dimensionName(), example(kind), "display unit");
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
