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
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
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

    private static final Pattern HEADER = Pattern.compile("^\\s*(.*?)\\s*(?:\\[(.*)\\])?\\s*$");

    private final LimitedReader limited;
    private final CSVParser parser;
    private final Iterator<CSVRecord> records;
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
    private final int columnCount;
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
        this.limited = new LimitedReader(reader);
        CSVFormat format = CSVFormat.DEFAULT
                .builder()
                .setIgnoreSurroundingSpaces(true)
                .setCommentMarker('#')
                .setIgnoreEmptyLines(true)
                .get();
        try {
            this.parser = format.parse(limited);
        } catch (IOException e) {
            throw new InputException(file, "cannot read: " + e.getMessage());
        }
        this.records = parser.iterator();
        CSVRecord header = nextRecord();
        if (header == null) {
            close();
            throw new InputException(file, "is empty; expected a header row such as flow [L/s],dp [kPa] and data rows");
        }
        long headerLine = parser.getCurrentLineNumber();
        List<String> names = new ArrayList<>();
        List<String> units = new ArrayList<>();
        for (String cell : header) {
            Matcher m = HEADER.matcher(cell);
            m.matches();
            String name = m.group(1);
            if (name.startsWith("\uFEFF")) {
                name = name.substring(1);
            }
            names.add(name);
            units.add(m.group(2) == null ? "" : m.group(2).strip());
        }
        this.headerNames = List.copyOf(names);
        this.columnCount = names.size();
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
                carriedHeader.add(header.get(c).strip());
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

    private CSVRecord nextRecord() {
        limited.startRecord();
        try {
            return records.hasNext() ? records.next() : null;
        } catch (UncheckedIOException e) {
            long line = parser.getCurrentLineNumber() + 1;
            if (e.getCause() instanceof TooLongException tooLong) {
                throw new InputException(
                        file + " "
                                + tooLong.getMessage()
                                        .substring(0, tooLong.getMessage().indexOf(':')),
                        tooLong.getMessage().substring(tooLong.getMessage().indexOf(':') + 2));
            }
            throw new InputException(
                    file + " line " + line,
                    "cannot read as CSV: " + e.getCause().getMessage());
        } catch (IllegalStateException e) {
            throw new InputException(
                    file + " line " + (parser.getCurrentLineNumber() + 1), "cannot read as CSV: " + e.getMessage());
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
        CSVRecord record = nextRecord();
        if (record == null) {
            return null;
        }
        long line = parser.getCurrentLineNumber();
        if (record.size() != columnCount) {
            throw new InputException(
                    file + " line " + line,
                    "has " + record.size() + " values but the header names " + columnCount + " columns");
        }
        double flow = positive(flowUnit.apply(number(record, flowColumn, line)), record, flowColumn, line);
        double dp = positive(pressureUnit.apply(number(record, pressureColumn, line)), record, pressureColumn, line);
        OptionalDouble temperature = OptionalDouble.empty();
        RigFluidProperties properties = constantProperties;
        if (temperatureColumn >= 0) {
            double t = temperatureUnit.apply(number(record, temperatureColumn, line));
            if (!(t > 0)) {
                throw cell(record, temperatureColumn, line, "is not above absolute zero");
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
                values[i] = record.get(carriedIndex[i]);
            }
            carried = List.of(values);
        }
        return new RigPoint(line, flow, dp, temperature, properties, carried);
    }

    private double number(CSVRecord record, int column, long line) {
        String cell = record.get(column);
        try {
            double v = org.headway.units.Decimals.parseDecimal(cell);
            if (Double.isFinite(v)) {
                return v;
            }
        } catch (NumberFormatException e) {
            // reported below with the cell
        }
        throw cell(record, column, line, "is not a finite number");
    }

    private double positive(double value, CSVRecord record, int column, long line) {
        if (!(value > 0)) {
            throw cell(record, column, line, "must be greater than zero");
        }
        return value;
    }

    private InputException cell(CSVRecord record, int column, long line, String problem) {
        return new InputException(
                file + " line " + line + ", column " + headerNames.get(column),
                "'" + record.get(column) + "' " + problem);
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
            parser.close();
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** Refusal of an over-long line or record. */
    static final class TooLongException extends IOException {
        TooLongException(String message) {
            super(message);
        }
    }

    /**
     * Counts characters per physical line and per record, and refuses to go on past the caps, so
     * that one huge line cannot fill the heap.
     */
    static final class LimitedReader extends Reader {
        private final Reader in;
        private long lineChars;
        private long recordChars;
        private long lineBreaks;
        private boolean afterCarriageReturn;

        LimitedReader(Reader in) {
            this.in = in;
        }

        void startRecord() {
            recordChars = 0;
        }

        @Override
        public int read(char[] buffer, int offset, int length) throws IOException {
            int n = in.read(buffer, offset, length);
            for (int i = offset; i < offset + n; i++) {
                char c = buffer[i];
                if (c == '\n' || c == '\r') {
                    // CR LF is one line break, as the CSV parser counts it.
                    if (!(c == '\n' && afterCarriageReturn)) {
                        lineBreaks++;
                    }
                    afterCarriageReturn = c == '\r';
                    lineChars = 0;
                } else {
                    afterCarriageReturn = false;
                    if (++lineChars > MAX_LINE_CHARS) {
                        throw new TooLongException("line " + (lineBreaks + 1) + ": a line is longer than "
                                + MAX_LINE_CHARS + " characters; this is not a rig data file (or a line break is"
                                + " missing)");
                    }
                }
            }
            if (n > 0) {
                recordChars += n;
                // Read-ahead of the parser's buffer counts too, so the cap is loose by one buffer.
                if (recordChars > MAX_RECORD_CHARS) {
                    throw new TooLongException("line " + (lineBreaks + 1) + ": a record is longer than "
                            + MAX_RECORD_CHARS + " characters (an unclosed quote?)");
                }
            }
            return n;
        }

        @Override
        public void close() throws IOException {
            in.close();
        }
    }
}
