package org.headway.pipe;

import java.util.Locale;
import java.util.OptionalDouble;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * One nominal size and schedule (or type/class) of a size table.
 *
 * @param table id of the size table, e.g. {@code asme-b36.10m}
 * @param nominal nominal size as the standard writes it, e.g. {@code 2}, {@code 1-1/2}, {@code 3/4}
 * @param schedule schedule, type or class, e.g. {@code 40}, {@code 10S}, {@code L}
 * @param outsideDiameter outside diameter (m)
 * @param wallThickness wall thickness (m), nominal or minimum as the table's header says
 * @param innerDiameter inner diameter = OD − 2·wall − 2·lining (m)
 * @param source standard, edition and table
 * @param liningThickness thickness of an internal lining such as cement mortar (m), 0 for an unlined
 *     pipe; the lining sits inside the wall and narrows the bore
 */
public record PipeSize(
        String table,
        String nominal,
        String schedule,
        double outsideDiameter,
        double wallThickness,
        double innerDiameter,
        String source,
        double liningThickness) {

    /** An unlined size (inner diameter = OD − 2·wall). */
    public PipeSize(
            String table,
            String nominal,
            String schedule,
            double outsideDiameter,
            double wallThickness,
            double innerDiameter,
            String source) {
        this(table, nominal, schedule, outsideDiameter, wallThickness, innerDiameter, source, 0.0);
    }

    private static final Pattern DN = Pattern.compile("(?i)DN\\s*(\\d+(?:\\.\\d+)?)");
    private static final Pattern INCHES = Pattern.compile("(?:(\\d+)[- ])?(\\d+(?:\\.\\d+)?)(?:/(\\d+))?");
    private static final double METRES_PER_INCH = 0.0254;
    /**
     * Smallest ratio of nominal size to outside diameter read as plausible: NPS 1/8 has OD 0.405 in
     * (ratio 0.31); copper tube OD = nominal + 1/8 in; ASME sizes from NPS 14 have OD = NPS
     * (ASME B36.10M, from memory).
     */
    private static final double NOMINAL_TO_OUTSIDE_LOW = 0.3;
    /** Largest ratio: 1 with room for SI tables that round OD to 0.1 mm (NPS 18 is 457 mm, 18 in = 457.2 mm). */
    private static final double NOMINAL_TO_OUTSIDE_HIGH = 1.001;

    /**
     * The nominal diameter this size stands for (m), for methods published on the nominal size
     * (Darby's 3-K). {@code DN 50} or {@code DN50} is 50 mm; a number or fraction in inches
     * ({@code 2}, {@code 1-1/2}, {@code 3/4}) is NPS or a copper-tube standard size, read as inches
     * × 0.0254 when it lies between 0.3 and 1.001 times the outside diameter (every bundled table), else
     * as DN in millimetres when that does (a user's metric table). Empty when neither reading fits.
     *
     * @return nominal diameter (m), or empty
     */
    public OptionalDouble nominalDiameter() {
        String text = nominal.strip().toUpperCase(Locale.ROOT);
        Matcher dn = DN.matcher(text);
        if (dn.matches()) {
            return OptionalDouble.of(Double.parseDouble(dn.group(1)) / 1000.0);
        }
        Matcher in = INCHES.matcher(text);
        if (!in.matches()) {
            return OptionalDouble.empty();
        }
        double whole = in.group(1) == null ? 0 : Double.parseDouble(in.group(1));
        double value = in.group(3) == null
                ? Double.parseDouble(in.group(2))
                : whole + Double.parseDouble(in.group(2)) / Double.parseDouble(in.group(3));
        if (in.group(1) != null && in.group(3) == null) {
            return OptionalDouble.empty();
        }
        if (plausible(value * METRES_PER_INCH)) {
            return OptionalDouble.of(value * METRES_PER_INCH);
        }
        if (in.group(3) == null && plausible(value / 1000.0)) {
            return OptionalDouble.of(value / 1000.0);
        }
        return OptionalDouble.empty();
    }

    private boolean plausible(double nominalDiameter) {
        return nominalDiameter > 0
                && nominalDiameter >= NOMINAL_TO_OUTSIDE_LOW * outsideDiameter
                && nominalDiameter <= outsideDiameter * NOMINAL_TO_OUTSIDE_HIGH;
    }
}
