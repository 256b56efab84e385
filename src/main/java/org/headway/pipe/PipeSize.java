package org.headway.pipe;

/**
 * One nominal size and schedule (or type/class) of a size table.
 *
 * @param table id of the size table, e.g. {@code asme-b36.10m}
 * @param nominal nominal size as the standard writes it, e.g. {@code 2}, {@code 1-1/2}, {@code 3/4}
 * @param schedule schedule, type or class, e.g. {@code 40}, {@code 10S}, {@code L}
 * @param outsideDiameter outside diameter (m)
 * @param wallThickness nominal wall thickness (m)
 * @param innerDiameter inner diameter = OD − 2·wall (m)
 * @param source standard, edition and table
 */
public record PipeSize(
        String table,
        String nominal,
        String schedule,
        double outsideDiameter,
        double wallThickness,
        double innerDiameter,
        String source) {}
