package org.headway.project;

import java.io.IOException;
import java.io.Reader;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.Collections;
import java.util.HashMap;
import java.util.Iterator;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import java.util.NoSuchElementException;
import java.util.OptionalDouble;
import org.headway.caution.Caution;
import org.headway.caution.InputException;
import org.headway.rig.RigFluid;
import org.headway.rig.RigFluidProperties;
import org.headway.rig.RigPoint;
import org.headway.units.Quantities;
import org.headway.units.QuantityKind;

/**
 * Streams the points of a rig data file (CSV) one at a time, never holding the file in memory.
 *
 * <p>The header names each column, with its unit in brackets for the measured quantities: {@code
 * flow [L/s]}, {@code dp [kPa]}, {@code T [degC]}. The unit of a column is read once, as the affine
 * map value → SI it stands for; each cell is then one {@link Double#parseDouble} and one multiply-add.
 * A physical line longer than {@value #MAX_LINE_CHARS} characters, or a record longer than {@value
 * #MAX_RECORD_CHARS}, is refused with a message instead of being buffered. Errors name the file,
 * line, column and value.
 */
public final class RigDataReader implements Iterator<RigPoint>, AutoCloseable {

    /** Longest physical line accepted (characters). */
    public static final int MAX_LINE_CHARS = 1 << 20;
    /** Longest record accepted, quoted line breaks included (characters). */
    public static final int MAX_RECORD_CHARS = 4 << 20;
    /** Distinct temperatures whose fluid properties are remembered. */
    static final int PROPERTY_CACHE_SIZE = 4096;

    private final CsvTableReader table;
    private final String file;
    private final RigFluid fluid;
    private final int flowColumn;
    private final int pressureColumn;
    private final int temperatureColumn;
    private final Affine flowUnit;
    private final Affine pressureUnit;
    private final Affine temperatureUnit;
    private final int[] carriedIndex;
    private final List<String> carriedNames;
    private final List<String> headerNames;
    private final Map<Long, RigFluidProperties> cache = new HashMap<>();
    private final Map<String, Caution> cautions = new LinkedHashMap<>();
    private final RigFluidProperties constantProperties;
    private RigPoint next;

    /** value_SI = scale · value + offset. */
    private record Affine(double scale, double offset) {
        double apply(double value) {
            return scale * value + offset;
        }
    }

    RigDataReader(Reader reader, String file, RigFile.Columns columns, RigFluid fluid) {
        this.file = file;
        this.fluid = fluid;
        CsvTableReader.Options options = CsvTableReader.Options.of(file)
                .withHeader(CsvTableReader.HeaderRule.TRAILING_BRACKETS)
                .withLimit(CsvTableReader.Limit.lines(
                                MAX_LINE_CHARS,
                                "a line is longer than " + MAX_LINE_CHARS
                                        + " characters; this is not a rig data file (or a line break is missing)")
                        .withRecords(
                                MAX_RECORD_CHARS,
                                "a record is longer than " + MAX_RECORD_CHARS + " characters (an unclosed quote?)"));
        try {
            this.table = new CsvTableReader(reader, options);
        } catch (IOException e) {
            throw new InputException(file, "cannot read: " + e.getMessage());
        }
        List<CsvTableReader.Heading> header = reading(table::header);
        if (header == null) {
            close();
            throw new InputException(file, "is empty; expected a header row such as flow [L/s],dp [kPa] and data rows");
        }
        long headerLine = table.headerLine();
        List<String> names = new ArrayList<>();
        List<String> units = new ArrayList<>();
        for (CsvTableReader.Heading heading : header) {
            names.add(heading.name());
            units.add(heading.unit());
        }
        this.headerNames = List.copyOf(names);
        String at = file + " line " + headerLine;
        this.flowColumn = require(names, columns.flow(), "flow", at);
        this.pressureColumn = require(names, columns.pressureDrop(), "pressure drop", at);
        this.temperatureColumn = names.indexOf(columns.temperature());
        this.flowUnit = unit(units.get(flowColumn), QuantityKind.VOLUMETRIC_FLOW, at, names.get(flowColumn), "L/s");
        this.pressureUnit =
                unit(units.get(pressureColumn), QuantityKind.PRESSURE, at, names.get(pressureColumn), "kPa");
        this.temperatureUnit = temperatureColumn < 0
                ? null
                : unit(
                        units.get(temperatureColumn),
                        QuantityKind.TEMPERATURE,
                        at,
                        names.get(temperatureColumn),
                        "degC");
        if (temperatureColumn >= 0 && fluid.fixedTemperature() != null) {
            close();
            throw new InputException(
                    at,
                    "the data have a temperature column '" + names.get(temperatureColumn)
                            + "' and the rig file gives fluid.temperature too; give one or the other");
        }
        if (fluid.model() != null && temperatureColumn < 0 && fluid.fixedTemperature() == null) {
            close();
            throw new InputException(
                    at,
                    "the fluid " + fluid.model().id() + " needs a temperature: add a column '" + columns.temperature()
                            + " [degC]' or give fluid.temperature in the rig file");
        }
        List<Integer> carried = new ArrayList<>();
        List<String> carriedHeader = new ArrayList<>();
        for (int c = 0; c < names.size(); c++) {
            if (c != flowColumn && c != pressureColumn && c != temperatureColumn) {
                carried.add(c);
                carriedHeader.add(header.get(c).text().strip());
            }
        }
        this.carriedIndex = carried.stream().mapToInt(Integer::intValue).toArray();
        this.carriedNames = List.copyOf(carriedHeader);
        if (fluid.model() == null) {
            constantProperties = fluid.constantProperties();
        } else if (fluid.fixedTemperature() != null) {
            constantProperties = properties(fluid.fixedTemperature(), at);
        } else {
            constantProperties = null;
        }
    }

    private static int require(List<String> names, String wanted, String what, String at) {
        int index = names.indexOf(wanted);
        if (index < 0) {
            throw new InputException(
                    at,
                    "no " + what + " column '" + wanted + "' in the header; columns are " + names
                            + " (set the column names under \"columns\" in the rig file)");
        }
        return index;
    }

    private static Affine unit(String unit, QuantityKind kind, String at, String column, String example) {
        String where = at + ", column " + column;
        if (unit.isEmpty()) {
            throw new InputException(
                    where, "the header must give the unit in brackets, e.g. '" + column + " [" + example + "]'");
        }
        double offset = Quantities.parse("0 " + unit, kind, where);
        // A large argument keeps the rounding of the offset out of the scale.
        double scale = (Quantities.parse("1000000 " + unit, kind, where) - offset) / 1e6;
        return new Affine(scale, offset);
    }

    /** Names of the columns carried through, as written in the header. */
    public List<String> carriedColumns() {
        return carriedNames;
    }

    /** Cautions met while reading (fluid property range), the first of each kind. */
    public List<Caution> cautions() {
        return Collections.unmodifiableList(new ArrayList<>(cautions.values()));
    }

    /** Reads through the table, locating a failure of the CSV parser at the line it was reading. */
    private <T> T reading(java.util.function.Supplier<T> read) {
        try {
            return read.get();
        } catch (UncheckedIOException e) {
            throw new InputException(
                    file + " line " + (table.lineNumber() + 1),
                    "cannot read as CSV: " + e.getCause().getMessage());
        }
    }

    @Override
    public boolean hasNext() {
        if (next == null) {
            next = read();
        }
        return next != null;
    }

    @Override
    public RigPoint next() {
        if (!hasNext()) {
            throw new NoSuchElementException();
        }
        RigPoint p = next;
        next = null;
        return p;
    }

    private RigPoint read() {
        CsvTableReader.Row row = reading(table::next);
        if (row == null) {
            return null;
        }
        long line = row.line();
        double flow = positive(flowUnit.apply(number(row, flowColumn)), row, flowColumn);
        double dp = positive(pressureUnit.apply(number(row, pressureColumn)), row, pressureColumn);
        OptionalDouble temperature = OptionalDouble.empty();
        RigFluidProperties properties = constantProperties;
        if (temperatureColumn >= 0) {
            double t = temperatureUnit.apply(number(row, temperatureColumn));
            if (!(t > 0)) {
                throw row.problem(temperatureColumn, "is not above absolute zero");
            }
            temperature = OptionalDouble.of(t);
            if (fluid.model() != null) {
                properties = cachedProperties(t, line);
            }
        } else if (fluid.fixedTemperature() != null) {
            temperature = OptionalDouble.of(fluid.fixedTemperature());
        }
        List<String> carried;
        if (carriedIndex.length == 0) {
            carried = List.of();
        } else {
            String[] values = new String[carriedIndex.length];
            for (int i = 0; i < carriedIndex.length; i++) {
                values[i] = row.text(carriedIndex[i]);
            }
            carried = List.of(values);
        }
        return new RigPoint(line, flow, dp, temperature, properties, carried);
    }

    /** A cell by the number rule; the rig data have always called any refusal "not a finite number". */
    private static double number(CsvTableReader.Row row, int column) {
        return row.finiteNumber(column, CsvTableReader.NOT_FINITE);
    }

    private static double positive(double value, CsvTableReader.Row row, int column) {
        if (!(value > 0)) {
            throw row.problem(column, "must be greater than zero");
        }
        return value;
    }

    private RigFluidProperties cachedProperties(double temperature, long line) {
        Long key = Double.doubleToLongBits(temperature);
        RigFluidProperties p = cache.get(key);
        if (p == null) {
            if (cache.size() >= PROPERTY_CACHE_SIZE) {
                cache.clear();
            }
            p = properties(temperature, file + " line " + line + ", column " + headerNames.get(temperatureColumn));
            cache.put(key, p);
        }
        return p;
    }

    private RigFluidProperties properties(double temperature, String where) {
        RigFluidProperties properties;
        try {
            properties = fluid.propertiesAt(temperature);
        } catch (InputException e) {
            throw e.at(where + ": ");
        }
        for (Caution c : properties.state().cautions()) {
            cautions.putIfAbsent(c.code(), c.about("first at " + where));
        }
        return properties;
    }

    @Override
    public void close() {
        try {
            table.close();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }
}
