package org.headway.fluid;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.headway.caution.Caution;
import org.headway.caution.InputException;

/**
 * Reads a fluid table file: comment lines starting with {@code #}, a header, then one row per
 * temperature.
 *
 * <p>The header is fixed to one of two layouts, so that this package needs no unit parser:
 *
 * <pre>
 * temperature [degC], density [kg/m3], viscosity [mPa*s]
 * temperature [K], density [kg/m3], viscosity [Pa*s]
 * </pre>
 *
 * <p>Optional comment lines {@code # name: …} and {@code # source: …} give the display name and
 * the source carried into every state; a {@code # from memory} line marks the whole table as
 * recalled values and makes every state carry a caution saying so. The built-in glycol tables in
 * {@code fluids-data/fluids/} use the same format.
 */
public final class UserFluidTable {

    /** The Celsius header layout. */
    public static final String CELSIUS_HEADER = "temperature [degC], density [kg/m3], viscosity [mPa*s]";
    /** The SI header layout. */
    public static final String SI_HEADER = "temperature [K], density [kg/m3], viscosity [Pa*s]";

    /** Largest table file read (bytes): far above any real table, far below memory trouble. */
    public static final long MAX_FILE_SIZE = 4L * 1024 * 1024;

    /**
     * A decimal number as people write it, or NaN/Infinity (refused later with their own message).
     * Java's own parser would also take hexadecimal ("0x1p3") and type suffixes ("2f", "1d").
     */
    private static final String[] COLUMNS = {"temperature", "density", "viscosity"};

    private UserFluidTable() {}

    /**
     * Loads a user's fluid table; its id is the file name without {@code .csv}.
     *
     * @param csv the file
     * @return the tabulated fluid
     * @throws InputException naming file, line, column and value for any bad entry, or the file if
     *     it cannot be read
     */
    public static TabulatedFluid load(Path csv) {
        // A root such as "/" has no file name.
        String fileName =
                csv.getFileName() == null ? csv.toString() : csv.getFileName().toString();
        String text;
        try {
            if (Files.size(csv) > MAX_FILE_SIZE) {
                throw new InputException(
                        csv.toString(),
                        "file is larger than " + MAX_FILE_SIZE / (1024 * 1024)
                                + " MB; a fluid table has one short line per temperature");
            }
            text = org.headway.caution.TextFiles.decode(Files.readAllBytes(csv), csv.toString());
        } catch (IOException e) {
            throw new InputException(csv.toString(), "cannot read the fluid table: " + e.getMessage(), e);
        }
        String id = fileName.toLowerCase(Locale.ROOT).endsWith(".csv")
                ? fileName.substring(0, fileName.length() - 4)
                : fileName;
        return parse(text, fileName, id, "user table " + fileName);
    }

    /**
     * Parses table text.
     *
     * @param text the file's content
     * @param fileName name used in error messages
     * @param id the fluid id
     * @param defaultSource source used when the file has no {@code # source:} line
     * @return the tabulated fluid
     */
    static TabulatedFluid parse(String text, String fileName, String id, String defaultSource) {
        String name = id;
        String source = defaultSource;
        boolean fromMemory = false;
        for (String line : text.split("\\R")) {
            String stripped = line.strip();
            if (!stripped.startsWith("#")) {
                continue;
            }
            String comment = stripped.substring(1).strip();
            String lower = comment.toLowerCase(Locale.ROOT);
            if (lower.startsWith("name:")) {
                name = comment.substring(5).strip();
            } else if (lower.startsWith("source:")) {
                source = comment.substring(7).strip();
            } else if (lower.startsWith("from memory")) {
                fromMemory = true;
            }
        }
        List<TabulatedFluid.Row> rows = new ArrayList<>();
        boolean celsius = false;
        boolean headerSeen = false;
        String[] lines = text.split("\\R", -1);
        for (int index = 0; index < lines.length; index++) {
            int line = index + 1;
            String content = lines[index].strip();
            if (content.isEmpty() || content.startsWith("#")) {
                continue;
            }
            String[] cells = content.split(",", -1);
            if (!headerSeen) {
                celsius = readHeader(cells, fileName, line);
                headerSeen = true;
                continue;
            }
            if (cells.length != COLUMNS.length) {
                throw new InputException(
                        fileName + " line " + line,
                        "expected 3 values (temperature, density, viscosity), got " + cells.length + ": \"" + content
                                + "\"");
            }
            double temperature = number(cells, 0, fileName, line);
            double density = number(cells, 1, fileName, line);
            double viscosity = number(cells, 2, fileName, line);
            String at = fileName + " line " + line + ", column ";
            double kelvin = celsius ? temperature + 273.15 : temperature;
            if (!(kelvin > 0)) {
                throw new InputException(at + "temperature", "must be above absolute zero, got " + cells[0].strip());
            }
            if (!(density > 0)) {
                throw new InputException(at + "density", "must be greater than zero, got " + cells[1].strip());
            }
            if (!(viscosity > 0)) {
                throw new InputException(at + "viscosity", "must be greater than zero, got " + cells[2].strip());
            }
            if (!rows.isEmpty() && kelvin <= rows.get(rows.size() - 1).temperature()) {
                throw new InputException(
                        at + "temperature", "temperatures must increase row by row, got " + cells[0].strip());
            }
            double viscosityPaS = celsius ? viscosity * 1e-3 : viscosity;
            double kinematic = viscosityPaS / density;
            // Checked here, in SI, so that a value that underflows or overflows on conversion is
            // reported with its file and line rather than later without them.
            if (!(viscosityPaS > 0) || !(kinematic > 0) || !Double.isFinite(kinematic)) {
                throw new InputException(
                        at + "viscosity",
                        "viscosity " + cells[2].strip() + " with density " + cells[1].strip()
                                + " is outside what a double can hold in SI units (Pa·s, m²/s)");
            }
            rows.add(new TabulatedFluid.Row(kelvin, density, viscosityPaS));
        }
        if (!headerSeen) {
            throw new InputException(fileName, "no header line; expected \"" + CELSIUS_HEADER + "\"");
        }
        if (rows.size() < 2) {
            throw new InputException(fileName, "a fluid table needs at least two rows, got " + rows.size());
        }
        List<Caution> standing = fromMemory
                ? List.of(Caution.warning(
                        "values-from-memory",
                        name + ": table values were recalled from memory, not copied from a document; check them"
                                + " against the supplier's data before design use",
                        source))
                : List.of();
        return new TabulatedFluid(id, name, source, standing, rows);
    }

    private static boolean readHeader(String[] cells, String fileName, int line) {
        List<String> parts = new ArrayList<>();
        for (String cell : cells) {
            parts.add(cell.strip().replaceAll("\\s+", " "));
        }
        String header = String.join(", ", parts);
        if (header.equalsIgnoreCase(CELSIUS_HEADER)) {
            return true;
        }
        if (header.equalsIgnoreCase(SI_HEADER)) {
            return false;
        }
        throw new InputException(
                fileName + " line " + line,
                "header must be \"" + CELSIUS_HEADER + "\" or \"" + SI_HEADER + "\", got \"" + header + "\"");
    }

    private static double number(String[] cells, int column, String fileName, int line) {
        String cell = cells[column].strip();
        String where = fileName + " line " + line + ", column " + COLUMNS[column];
        double value;
        try {
            value = org.headway.units.Decimals.parseDecimal(cell);
        } catch (NumberFormatException e) {
            throw new InputException(where, "not a number: \"" + cell + "\"");
        }
        if (!Double.isFinite(value)) {
            throw new InputException(where, "must be a finite number, got \"" + cell + "\"");
        }
        return value;
    }
}
