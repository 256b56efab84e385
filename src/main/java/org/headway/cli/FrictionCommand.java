package org.headway.cli;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.Reader;
import java.io.UncheckedIOException;
import java.io.Writer;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import java.util.stream.Collectors;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVPrinter;
import org.apache.commons.csv.CSVRecord;
import org.headway.caution.Caution;
import org.headway.caution.InputException;
import org.headway.friction.ConvergenceException;
import org.headway.friction.FrictionCorrelation;
import org.headway.friction.FrictionMethods;
import org.headway.friction.FrictionResult;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Option;

/** {@code headway friction}: the Darcy friction factor at one point or for every row of a CSV file. */
@Command(
        name = "friction",
        mixinStandardHelpOptions = true,
        description = {
            "Darcy friction factor for full circular pipes from Reynolds number and relative roughness ε/D.",
            "One point: --re and --relative-roughness. Many: --input FILE with columns re and relative_roughness.",
        },
        footer = {
            "",
            "Methods: auto (laminar 64/Re, Colebrook–White, straight-line blend between Re 2300 and 4000),",
            "laminar, colebrook, swamee-jain, haaland, serghides, churchill, goudar-sonnad, blasius.",
            "Exit status: 0 done, 1 some batch rows failed (listed on stderr), 2 bad usage or input."
        })
public final class FrictionCommand implements Callable<Integer> {

    /** Non-finite values the file may hold: a row with one is reported, not refused as unreadable. */
    private static final java.util.Set<String> NON_FINITE =
            java.util.Set.of("NaN", "+NaN", "-NaN", "Infinity", "+Infinity", "-Infinity");

    /** Input columns a batch file must have. */
    static final String REYNOLDS_COLUMN = "re";

    static final String ROUGHNESS_COLUMN = "relative_roughness";

    /** Columns appended to every batch row. */
    static final List<String> RESULT_COLUMNS = List.of("friction_factor", "regime", "method", "cautions", "error");

    /** Output formats for a single point. */
    enum Format {
        text,
        csv,
        json
    }

    private static final int LISTED_FAILED_ROWS = 20;

    /**
     * A decimal number as people write it, or NaN/Infinity (refused later with their own message).
     * Java's own parser would also take hexadecimal ("0x1p3") and type suffixes ("2f", "1d").
     */
    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Option(names = "--re", paramLabel = "RE", description = "Reynolds number (ratio).")
    Double reynolds;

    @Option(names = "--relative-roughness", paramLabel = "EPS/D", description = "Relative roughness ε/D (ratio).")
    Double relativeRoughness;

    @Option(
            names = "--method",
            paramLabel = "ID",
            defaultValue = "auto",
            description = "Friction method id (default: ${DEFAULT-VALUE}).")
    String method;

    @Option(
            names = "--format",
            paramLabel = "FORMAT",
            description = "Output for one point: ${COMPLETION-CANDIDATES} (default: text).")
    Format format;

    @Option(
            names = "--input",
            paramLabel = "FILE",
            description = "CSV file with a header row and columns re, relative_roughness; other columns are kept.")
    Path input;

    @Option(
            names = "--output",
            paramLabel = "FILE",
            description = "Where to write the batch result (default: standard output). Written whole or not at all.")
    Path output;

    @Option(names = "--force", description = "Replace an existing --output file.")
    boolean force;

    @Override
    public Integer call() throws IOException {
        FrictionCorrelation correlation = FrictionMethods.byId(method);
        if (input != null) {
            if (reynolds != null || relativeRoughness != null || format != null) {
                throw usage(
                        "--input takes its points from the file: leave out --re, --relative-roughness and --format");
            }
            if (output != null) {
                if (Files.exists(output) && Files.exists(input) && Files.isSameFile(output, input)) {
                    throw new InputException("--output " + output, "is the input file; write the results elsewhere");
                }
                if (!force && Files.exists(output, java.nio.file.LinkOption.NOFOLLOW_LINKS)) {
                    throw new InputException("--output " + output, "already exists; give --force to replace it");
                }
                Path folder = output.toAbsolutePath().getParent();
                if (folder != null && !Files.isDirectory(folder)) {
                    throw new InputException("--output " + output, "its folder " + folder + " does not exist");
                }
            }
            return batch(correlation);
        }
        if (output != null) {
            throw usage("--output goes with --input");
        }
        if (reynolds == null || relativeRoughness == null) {
            throw usage("give both --re and --relative-roughness, or --input FILE");
        }
        FrictionResult result = correlation.evaluate(reynolds, relativeRoughness);
        PrintWriter out = spec.commandLine().getOut();
        switch (format == null ? Format.text : format) {
            case csv -> printCsv(out, correlation, result);
            case json -> printJson(out, correlation, result);
            default -> printText(out, correlation, result);
        }
        out.flush();
        return HeadwayCommand.EXIT_OK;
    }

    private CommandLine.ParameterException usage(String message) {
        return new CommandLine.ParameterException(spec.commandLine(), message);
    }

    private static void printText(PrintWriter out, FrictionCorrelation correlation, FrictionResult result) {
        out.println("Darcy friction factor f = " + result.frictionFactor());
        out.println("  Reynolds number       " + result.reynolds());
        out.println("  relative roughness    " + result.relativeRoughness());
        out.println("  flow regime           " + regime(result));
        out.println("  method                " + result.method() + " (chosen by " + correlation.id() + ": "
                + correlation.displayName() + ")");
        if (result.iterations() > 0) {
            out.println("  iterations            " + result.iterations());
        }
        if (result.cautions().isEmpty()) {
            out.println("Cautions: none");
            return;
        }
        out.println("Cautions:");
        for (Caution caution : result.cautions()) {
            out.println("  [" + caution.severity().name().toLowerCase(Locale.ROOT) + "] " + caution.code() + ": "
                    + caution.message());
            out.println("      basis: " + caution.basis());
        }
    }

    private static void printCsv(PrintWriter out, FrictionCorrelation correlation, FrictionResult result)
            throws IOException {
        List<String> header = new ArrayList<>(List.of(REYNOLDS_COLUMN, ROUGHNESS_COLUMN));
        header.addAll(RESULT_COLUMNS);
        CSVPrinter printer = CSVFormat.DEFAULT
                .builder()
                .setHeader(header.toArray(String[]::new))
                .get()
                .print(out);
        printer.printRecord(
                org.headway.units.Decimals.format(result.reynolds()),
                org.headway.units.Decimals.format(result.relativeRoughness()),
                org.headway.units.Decimals.format(result.frictionFactor()),
                regime(result),
                result.method(),
                cautionCodes(result),
                "");
        printer.flush();
    }

    private static void printJson(PrintWriter out, FrictionCorrelation correlation, FrictionResult result)
            throws IOException {
        ObjectMapper mapper = new ObjectMapper();
        ObjectNode node = mapper.createObjectNode();
        node.put("reynolds", result.reynolds());
        node.put("relative_roughness", result.relativeRoughness());
        node.put("friction_factor", result.frictionFactor());
        node.put("regime", regime(result));
        node.put("method", result.method());
        node.put("requested_method", correlation.id());
        node.put("iterations", result.iterations());
        ArrayNode cautions = node.putArray("cautions");
        for (Caution caution : result.cautions()) {
            ObjectNode c = cautions.addObject();
            c.put("code", caution.code());
            c.put("severity", caution.severity().name().toLowerCase(Locale.ROOT));
            c.put("message", caution.message());
            c.put("basis", caution.basis());
        }
        out.println(mapper.writerWithDefaultPrettyPrinter().writeValueAsString(node));
    }

    private static String regime(FrictionResult result) {
        return result.regime().name().toLowerCase(Locale.ROOT);
    }

    private static String cautionCodes(FrictionResult result) {
        return result.cautions().stream().map(Caution::code).collect(Collectors.joining(";"));
    }

    /** Streams the input file row by row into the output; a bad row gets its error and the rest go on. */
    private int batch(FrictionCorrelation correlation) throws IOException {
        if (!Files.isRegularFile(input) || !Files.isReadable(input)) {
            throw new InputException("--input", "cannot read file '" + input + "'");
        }
        Path temporary = null;
        // Only the first rows are listed, so memory stays flat however many rows fail.
        List<Long> failed = new ArrayList<>();
        long failedCount = 0;
        long rows = 0;
        try (Reader reader = new LineLengthLimit(
                        Files.newBufferedReader(input, StandardCharsets.UTF_8),
                        "--input " + input,
                        LineLengthLimit.MAX_LINE_LENGTH,
                        input);
                CSVParser parser = CSVFormat.DEFAULT
                        .builder()
                        .setHeader()
                        .setSkipHeaderRecord(true)
                        .setIgnoreSurroundingSpaces(true)
                        .get()
                        .parse(reader)) {
            List<String> inputColumns = parser.getHeaderNames();
            requireColumns(inputColumns);
            List<String> header = new ArrayList<>();
            for (String name : inputColumns) {
                header.add(org.headway.report.SafeText.echoedCell(name));
            }
            header.addAll(RESULT_COLUMNS);
            Writer target;
            if (output == null) {
                // Standard output belongs to picocli: the printer may flush it but never close it,
                // not even when a bad row ends the stream early.
                target = new java.io.FilterWriter(spec.commandLine().getOut()) {
                    @Override
                    public void close() throws IOException {
                        flush();
                    }
                };
            } else {
                try {
                    temporary = org.headway.project.AtomicFiles.createTemporary(output);
                } catch (IOException e) {
                    throw new InputException(
                            "--output " + output,
                            "cannot create a file in " + output.toAbsolutePath().getParent() + ": " + e.getMessage());
                }
                target = Files.newBufferedWriter(temporary, StandardCharsets.UTF_8);
            }
            try (CSVPrinter printer = CSVFormat.DEFAULT
                    .builder()
                    .setHeader(header.toArray(String[]::new))
                    .get()
                    .print(target)) {
                List<String> row = new ArrayList<>(header.size());
                for (CSVRecord record : parser) {
                    rows++;
                    row.clear();
                    for (int i = 0; i < inputColumns.size(); i++) {
                        row.add(i < record.size() ? org.headway.report.SafeText.echoedCell(record.get(i)) : "");
                    }
                    try {
                        FrictionResult result = evaluateRow(correlation, record, rows, inputColumns.size());
                        row.add(org.headway.units.Decimals.format(result.frictionFactor()));
                        row.add(regime(result));
                        row.add(result.method());
                        row.add(cautionCodes(result));
                        row.add("");
                    } catch (InputException | ConvergenceException e) {
                        failedCount++;
                        if (failed.size() < LISTED_FAILED_ROWS) {
                            failed.add(rows);
                        }
                        row.add("");
                        row.add("");
                        row.add(correlation.id());
                        row.add("");
                        row.add(e.getMessage());
                    }
                    printer.printRecord(row);
                }
                printer.flush();
                if (output == null) {
                    // Standard output belongs to picocli: flush, never close it.
                    target.flush();
                } else {
                    target.close();
                }
            }
            if (temporary != null) {
                try {
                    org.headway.project.AtomicFiles.place(temporary, output.toAbsolutePath(), force);
                } catch (java.nio.file.FileAlreadyExistsException e) {
                    throw new InputException(
                            "--output " + output,
                            "was created by another program meanwhile; give --force to replace it");
                }
                temporary = null;
            }
        } catch (UncheckedIOException e) {
            // commons-csv reports a malformed file (e.g. an unterminated quote) this way
            throw new InputException(
                    "--input " + input, "cannot parse the CSV: " + e.getCause().getMessage(), e);
        } catch (org.apache.commons.csv.CSVException e) {
            // a malformed header record (e.g. a quote left open across lines) fails while opening
            throw new InputException("--input " + input, "cannot parse the CSV: " + e.getMessage(), e);
        } catch (IllegalArgumentException e) {
            // commons-csv refuses a header row with an empty or repeated column name this way
            throw new InputException("--input " + input, "the header row is not usable: " + e.getMessage(), e);
        } catch (IOException e) {
            if (output != null && !(e instanceof java.nio.charset.CharacterCodingException)) {
                throw new InputException("--output " + output, "not written: " + e.getMessage(), e);
            }
            throw e;
        } finally {
            if (temporary != null) {
                Files.deleteIfExists(temporary);
                org.headway.project.AtomicFiles.release(temporary);
            }
        }
        if (failedCount == 0) {
            return HeadwayCommand.EXIT_OK;
        }
        PrintWriter err = spec.commandLine().getErr();
        String listed = failed.stream().map(String::valueOf).collect(Collectors.joining(", "));
        if (failedCount > LISTED_FAILED_ROWS) {
            listed += " and " + (failedCount - LISTED_FAILED_ROWS) + " more";
        }
        err.println("headway: " + failedCount + " of " + rows + " rows failed (data rows " + listed
                + "; row 1 is the first after the header); see their error column");
        err.flush();
        return HeadwayCommand.EXIT_FAILED;
    }

    private void requireColumns(List<String> columns) {
        for (String needed : List.of(REYNOLDS_COLUMN, ROUGHNESS_COLUMN)) {
            if (!columns.contains(needed)) {
                throw new InputException(
                        "--input " + input,
                        "the header row needs a column '" + needed + "'; found: " + String.join(", ", columns));
            }
        }
        for (String produced : RESULT_COLUMNS) {
            if (columns.contains(produced)) {
                throw new InputException(
                        "--input " + input,
                        "the header row already has a column '" + produced + "', which the output adds");
            }
        }
    }

    private static FrictionResult evaluateRow(
            FrictionCorrelation correlation, CSVRecord record, long row, int expectedFields) {
        String where = "row " + row;
        if (record.size() != expectedFields) {
            throw new InputException(where, "has " + record.size() + " fields, the header has " + expectedFields);
        }
        double re = number(record.get(REYNOLDS_COLUMN), where + ", column " + REYNOLDS_COLUMN);
        double rr = number(record.get(ROUGHNESS_COLUMN), where + ", column " + ROUGHNESS_COLUMN);
        try {
            return correlation.evaluate(re, rr);
        } catch (InputException e) {
            throw e.at(where + ", ");
        }
    }

    private static double number(String text, String where) {
        if (!org.headway.units.Decimals.isPlainDecimal(text) && !NON_FINITE.contains(text.strip())) {
            throw new InputException(where, "not a number: '" + text + "'");
        }
        try {
            return org.headway.units.Decimals.parse(text);
        } catch (NumberFormatException e) {
            throw new InputException(where, "not a number: '" + text + "'");
        }
    }
}
