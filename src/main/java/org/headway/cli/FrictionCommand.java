package org.headway.cli;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.io.PrintWriter;
import java.io.Reader;
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
import org.apache.commons.csv.CSVPrinter;
import org.headway.caution.Caution;
import org.headway.caution.InputException;
import org.headway.friction.ConvergenceException;
import org.headway.friction.FrictionCorrelation;
import org.headway.friction.FrictionMethods;
import org.headway.friction.FrictionResult;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
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

    @Mixin
    SharedOptions.Force forceOption;

    @Override
    public Integer call() throws IOException {
        boolean force = forceOption.force;
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
        switch (result.regime()) {
            case LAMINAR:
                return "laminar";
            case TRANSITIONAL:
                return "transitional";
            case TURBULENT:
                return "turbulent";
            default:
                return result.regime().name().toLowerCase(Locale.ROOT);
        }
    }

    private static String cautionCodes(FrictionResult result) {
        List<Caution> cautions = result.cautions();
        if (cautions.isEmpty()) {
            return "";
        }
        if (cautions.size() == 1) {
            return cautions.get(0).code();
        }
        StringBuilder codes = new StringBuilder();
        for (Caution caution : cautions) {
            if (codes.length() > 0) {
                codes.append(';');
            }
            codes.append(caution.code());
        }
        return codes.toString();
    }

    /** Rows handed to a worker at a time: large enough to amortise the hand-over, small for memory. */
    private static final int BLOCK_ROWS = 4096;

    /** One block's output text and its failed rows (the first few listed). */
    private record Block(CsvRecordReader.Block input, Utf8Text utf8, long failedCount, long[] listedFailures) {}

    /**
     * Streams the input file into the output; a bad row gets its error and the rest go on. The main
     * thread reads records and writes finished blocks in order while worker threads evaluate and
     * format blocks of rows, so a large file uses every core and memory stays flat (a few blocks in
     * flight, whatever the file's size).
     */
    private int batch(FrictionCorrelation correlation) throws IOException {
        if (!Files.isRegularFile(input) || !Files.isReadable(input)) {
            throw new InputException("--input", "cannot read file '" + input + "'");
        }
        String label = "--input " + input;
        Path temporary = null;
        // Only the first rows are listed, so memory stays flat however many rows fail.
        List<Long> failed = new ArrayList<>();
        long failedCount = 0;
        long rows = 0;
        int threads = Math.max(1, Runtime.getRuntime().availableProcessors());
        java.util.concurrent.ExecutorService workers =
                java.util.concurrent.Executors.newFixedThreadPool(threads, task -> {
                    Thread t = new Thread(task, "headway-friction-batch");
                    t.setDaemon(true);
                    return t;
                });
        try (Reader reader = new LineLengthLimit(
                Files.newBufferedReader(input, StandardCharsets.UTF_8),
                label,
                LineLengthLimit.MAX_LINE_LENGTH,
                input)) {
            CsvRecordReader csv = new CsvRecordReader(reader, label);
            String[] first = csv.next();
            List<String> inputColumns = first == null ? List.of() : List.of(first);
            for (int i = 0; i < inputColumns.size(); i++) {
                if (inputColumns.get(i).isBlank()) {
                    throw new InputException(
                            label,
                            "the header row is not usable: column " + (i + 1) + " has no name (header: "
                                    + String.join(", ", inputColumns) + ")");
                }
            }
            requireColumns(inputColumns);
            int columns = inputColumns.size();
            // A repeated column name: the last column of that name is read.
            int reColumn = inputColumns.lastIndexOf(REYNOLDS_COLUMN);
            int roughnessColumn = inputColumns.lastIndexOf(ROUGHNESS_COLUMN);
            Utf8Text head = new Utf8Text(256);
            for (int i = 0; i < columns; i++) {
                CsvCells.append(head, org.headway.report.SafeText.echoedCell(inputColumns.get(i)), i == 0);
            }
            for (String name : RESULT_COLUMNS) {
                CsvCells.append(head, name, false);
            }
            CsvCells.endRecord(head);
            Writer target = null;
            java.io.OutputStream file = null;
            boolean standardBytes = false;
            if (output == null) {
                // Standard output belongs to picocli: written and flushed here, never closed. Where it
                // is the process's own, the blocks' bytes go straight to it after what was printed.
                target = spec.commandLine().getOut();
                file = HeadwayCommand.bytesBehind(spec.commandLine().getOut());
                if (file != null) {
                    target.flush();
                    standardBytes = true;
                }
            } else {
                try {
                    temporary = org.headway.project.AtomicFiles.createTemporary(output);
                } catch (IOException e) {
                    throw new InputException(
                            "--output " + output,
                            "cannot create a file in " + output.toAbsolutePath().getParent() + ": " + e.getMessage());
                }
                // Blocks arrive as UTF-8 bytes encoded by the workers and are written as they are.
                file = Files.newOutputStream(temporary);
            }
            try {
                write(head, file, target, standardBytes);
                java.util.ArrayDeque<java.util.concurrent.Future<Block>> pending = new java.util.ArrayDeque<>();
                boolean more = true;
                // Blocks and output buffers go back to these once written: the batch reuses a few
                // of each instead of allocating two large arrays per 4,096 rows.
                java.util.ArrayDeque<CsvRecordReader.Block> freeBlocks = new java.util.ArrayDeque<>();
                java.util.concurrent.ConcurrentLinkedQueue<Utf8Text> freeTexts =
                        new java.util.concurrent.ConcurrentLinkedQueue<>();
                while (more) {
                    CsvRecordReader.Block records =
                            freeBlocks.isEmpty() ? new CsvRecordReader.Block() : freeBlocks.poll();
                    records.clear();
                    while (records.records < BLOCK_ROWS) {
                        if (!csv.readRecord(records)) {
                            more = false;
                            break;
                        }
                    }
                    if (records.records == 0) {
                        break;
                    }
                    long firstRow = rows + 1;
                    rows += records.records;
                    pending.add(workers.submit(() -> evaluateBlock(
                            correlation, records, freeTexts, firstRow, columns, reColumn, roughnessColumn)));
                    while (pending.size() > 2 * threads || (!more && !pending.isEmpty())) {
                        Block block = finished(pending.poll());
                        write(block.utf8(), file, target, standardBytes);
                        freeBlocks.add(block.input());
                        block.utf8().clear();
                        freeTexts.add(block.utf8());
                        failedCount += block.failedCount();
                        for (long row : block.listedFailures()) {
                            if (failed.size() < LISTED_FAILED_ROWS) {
                                failed.add(row);
                            }
                        }
                    }
                }
                if (target != null) {
                    target.flush();
                }
                if (standardBytes) {
                    try {
                        file.flush();
                    } catch (IOException e) {
                        throw new StandardOutputFailed(e);
                    }
                }
            } finally {
                if (file != null && !standardBytes) {
                    file.close();
                }
            }
            if (temporary != null) {
                try {
                    org.headway.project.AtomicFiles.place(temporary, output.toAbsolutePath(), forceOption.force);
                } catch (java.nio.file.FileAlreadyExistsException e) {
                    throw new InputException(
                            "--output " + output,
                            "was created by another program meanwhile; give --force to replace it");
                }
                temporary = null;
            }
        } catch (StandardOutputFailed e) {
            PrintWriter err = spec.commandLine().getErr();
            err.println("headway: writing to standard output failed (a full disk or a closed pipe?); the output is"
                    + " incomplete: " + e.getCause().getMessage());
            err.flush();
            return HeadwayCommand.EXIT_FAILED;
        } catch (IOException e) {
            if (output != null && !(e instanceof java.nio.charset.CharacterCodingException)) {
                throw new InputException("--output " + output, "not written: " + e.getMessage(), e);
            }
            throw e;
        } finally {
            workers.shutdownNow();
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

    /** Writes UTF-8 bytes to the file, or as text to standard output. */
    /** A write to the process's standard output failed (not a problem of the input). */
    private static final class StandardOutputFailed extends RuntimeException {
        StandardOutputFailed(IOException cause) {
            super(cause);
        }
    }

    private static void write(Utf8Text utf8, java.io.OutputStream file, Writer target, boolean standard)
            throws IOException {
        if (file != null) {
            try {
                utf8.writeTo(file);
            } catch (IOException e) {
                if (standard) {
                    throw new StandardOutputFailed(e);
                }
                throw e;
            }
        } else {
            target.write(new String(utf8.toByteArray(), StandardCharsets.UTF_8));
        }
    }

    /** Waits for a block; a worker's unexpected failure is rethrown as it was. */
    private static Block finished(java.util.concurrent.Future<Block> future) throws IOException {
        try {
            return future.get();
        } catch (InterruptedException e) {
            Thread.currentThread().interrupt();
            throw new java.io.InterruptedIOException("interrupted while evaluating the batch");
        } catch (java.util.concurrent.ExecutionException e) {
            Throwable cause = e.getCause();
            if (cause instanceof RuntimeException r) {
                throw r;
            }
            if (cause instanceof Error r) {
                throw r;
            }
            throw new IOException(cause);
        }
    }

    /** Evaluates and formats one block of rows (run on a worker thread; touches nothing shared). */
    private static Block evaluateBlock(
            FrictionCorrelation correlation,
            CsvRecordReader.Block records,
            java.util.Queue<Utf8Text> freeTexts,
            long firstRow,
            int columns,
            int reColumn,
            int roughnessColumn) {
        Utf8Text out = freeTexts.poll();
        if (out == null) {
            out = new Utf8Text(records.length + records.records * (columns + 64));
        }
        CharSlice slice = new CharSlice();
        long failedCount = 0;
        long[] listed = new long[LISTED_FAILED_ROWS];
        int listedCount = 0;
        for (int r = 0; r < records.records; r++) {
            long row = firstRow + r;
            int first = records.firstField(r);
            int count = records.recordEnd[r] - first;
            for (int i = 0; i < columns; i++) {
                if (i < count) {
                    echo(out, field(records, first + i, slice), i == 0);
                } else {
                    CsvCells.append(out, "", i == 0);
                }
            }
            try {
                if (count != columns) {
                    throw new InputException("row " + row, "has " + count + " fields, the header has " + columns);
                }
                double re = number(field(records, first + reColumn, slice), row, REYNOLDS_COLUMN);
                double rr = number(field(records, first + roughnessColumn, slice), row, ROUGHNESS_COLUMN);
                FrictionResult result;
                try {
                    result = correlation.evaluate(re, rr);
                } catch (InputException e) {
                    throw e.at("row " + row + ", ");
                }
                CsvCells.append(out, org.headway.units.Decimals.format(result.frictionFactor()), false);
                CsvCells.append(out, regime(result), false);
                CsvCells.append(out, result.method(), false);
                CsvCells.append(out, cautionCodes(result), false);
                out.append(',');
            } catch (InputException | ConvergenceException e) {
                failedCount++;
                if (listedCount < listed.length) {
                    listed[listedCount++] = row;
                }
                out.append(',').append(',');
                CsvCells.append(out, correlation.id(), false);
                out.append(',');
                CsvCells.append(out, e.getMessage(), false);
            }
            CsvCells.endRecord(out);
        }
        return new Block(records, out, failedCount, java.util.Arrays.copyOf(listed, listedCount));
    }

    private static CharSlice field(CsvRecordReader.Block records, int field, CharSlice slice) {
        int from = records.fieldStart(field);
        return slice.set(records.chars, from, records.fieldEnd[field] - from);
    }

    /** An input cell echoed, neutralised where a spreadsheet would take it for a formula. */
    private static void echo(Utf8Text out, CharSlice cell, boolean first) {
        if (cell.length() > 0) {
            char c = cell.charAt(0);
            if (c == '=' || c == '+' || c == '-' || c == '@' || c == '\t' || c == '\r') {
                CsvCells.append(out, org.headway.report.SafeText.echoedCell(cell.toString()), first);
                return;
            }
        }
        CsvCells.append(out, cell, first);
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

    private static double number(CharSlice cell, long row, String column) {
        if (org.headway.units.Decimals.isPlainDecimal(cell)) {
            try {
                return org.headway.units.Decimals.parse(cell.array(), cell.offset(), cell.length());
            } catch (NumberFormatException e) {
                // not expected for a plain decimal; reported as any unreadable cell
            }
        } else {
            String text = cell.toString();
            if (NON_FINITE.contains(text.strip())) {
                return org.headway.units.Decimals.parse(text);
            }
        }
        throw new InputException("row " + row + ", column " + column, "not a number: '" + cell + "'");
    }
}
