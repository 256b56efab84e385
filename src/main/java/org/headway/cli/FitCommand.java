package org.headway.cli;

import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.SerializationFeature;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import java.io.IOException;
import java.io.PrintWriter;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.concurrent.Callable;
import org.headway.caution.Caution;
import org.headway.caution.InputException;
import org.headway.correlation.FittedCorrelation;
import org.headway.fitting.FitComparison;
import org.headway.fitting.FitForm;
import org.headway.fitting.FitResult;
import org.headway.fitting.FittedParameter;
import org.headway.fitting.LeastSquaresFitter;
import org.headway.fitting.Observations;
import org.headway.fitting.VariableRange;
import org.headway.project.CsvTableReader;
import org.headway.project.FittedCorrelationFile;
import picocli.CommandLine;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;

/** {@code headway fit}: least-squares fit of a form or expression to columns of a CSV file. */
@Command(
        name = "fit",
        mixinStandardHelpOptions = true,
        description = {
            "Fit a correlation to your own data (CSV with a header row; units may follow a name in brackets,"
                    + " e.g. 'Re [-]').",
            "Forms: constant, linear, through-origin, log (y = a + b ln x), power (y = a x^b), power-log (power"
                    + " fitted in log space), exponential (y = a exp(b x)), polynomial:N, power-product"
                    + " (y = C x1^n1 x2^n2 ...).",
            "Expressions: + - * / ^ (or **), unary minus, parentheses, exp log ln log10 sqrt sin cos tan atan abs, pi;"
                    + " log is the natural logarithm.",
            "Exit status: 0 fitted, 1 the iteration budget ran out (result printed), 2 bad input."
        })
public final class FitCommand implements Callable<Integer> {

    @CommandLine.Spec
    CommandLine.Model.CommandSpec spec;

    @Parameters(index = "0", paramLabel = "DATA.csv", description = "data file")
    Path data;

    @Option(names = "--y", required = true, paramLabel = "COL", description = "response column")
    String y;

    @Option(names = "--x", split = ",", paramLabel = "COL", description = "explanatory column(s), comma-separated")
    List<String> x = new ArrayList<>();

    @Option(names = "--form", paramLabel = "FORM", description = "built-in form (see above)")
    String form;

    @Option(
            names = "--expression",
            paramLabel = "EXPR",
            description = "model over column and parameter names, e.g. \"a*exp(-b*x) + c\"")
    String expression;

    @Option(
            names = "--start",
            paramLabel = "NAME=VALUE,…",
            description = "starting value of every parameter of --expression, e.g. a=1,b=0.1,c=0")
    String start;

    @Option(names = "--weights", paramLabel = "COL", description = "column of weights w (minimises Σ w r²)")
    String weights;

    @Option(
            names = "--max-iterations",
            defaultValue = "10000",
            paramLabel = "N",
            description = "iteration budget of the nonlinear solver (default: ${DEFAULT-VALUE})")
    int maxIterations;

    @Option(names = "--compare", description = "fit the usual forms side by side, ranked by AICc")
    boolean compare;

    @Mixin
    SharedOptions.TextOrJson formatOption;

    /** Largest magnitude of a data value accepted: its square and sums of squares stay finite. */
    static final double MAX_MAGNITUDE = 1e100;

    /** Smallest non-zero magnitude accepted: its square and products stay normal doubles. */
    static final double MIN_MAGNITUDE = 1e-100;

    @Option(names = "--save", paramLabel = "FIT.json", description = "save the (best) fit as a correlation file")
    Path save;

    @Mixin
    SharedOptions.Force forceOption;

    @Override
    public Integer call() throws IOException {
        boolean force = forceOption.force;
        String format = formatOption.format;
        if (!format.equals("text") && !format.equals("json")) {
            throw new InputException("--format", "must be text or json, got '" + format + "'");
        }
        if (save != null && !force && java.nio.file.Files.exists(save, java.nio.file.LinkOption.NOFOLLOW_LINKS)) {
            throw new InputException("--save " + save, "already exists; give --force to replace it");
        }
        if (form != null && expression != null) {
            throw new InputException("--form", "give either --form or --expression, not both");
        }
        if (form == null && expression == null && !compare) {
            throw new InputException("--form", "give --form, --expression or --compare");
        }
        if (expression == null && start != null) {
            throw new InputException("--start", "starting values go with --expression");
        }
        List<String> used = new ArrayList<>();
        used.add(y.trim());
        x.forEach(c -> used.add(c.trim()));
        if (weights != null) {
            used.add(weights.trim());
        }
        Table table = Table.read(data, java.util.Set.copyOf(used));
        Observations observations = observations(table);
        List<FitForm> forms = new ArrayList<>();
        if (form != null) {
            forms.add(parseForm(form));
        }
        if (expression != null) {
            forms.add(new FitForm.UserExpression(expression, parseStart(start)));
        }
        LeastSquaresFitter fitter;
        try {
            fitter = new LeastSquaresFitter().withMaxIterations(maxIterations);
        } catch (InputException e) {
            throw new InputException("--max-iterations", e.problem());
        }
        PrintWriter out = spec.commandLine().getOut();
        FitResult chosen;
        if (compare) {
            if (forms.isEmpty() || forms.get(0) instanceof FitForm.UserExpression) {
                forms.addAll(standardForms(observations.variableNames().size()));
            } else {
                for (FitForm f : standardForms(observations.variableNames().size())) {
                    if (!f.equals(forms.get(0))) {
                        forms.add(f);
                    }
                }
            }
            FitComparison comparison = fitter.compare(observations, forms);
            if (comparison.ranked().isEmpty()) {
                throw new InputException("--compare", "no form could be fitted: " + comparison.skipped());
            }
            chosen = comparison.ranked().get(0);
            if (format.equals("json")) {
                out.println(Json.MAPPER.writeValueAsString(Json.comparison(comparison)));
            } else {
                Text.comparison(out, comparison);
            }
        } else {
            chosen = fitter.fit(observations, forms.get(0));
            if (format.equals("json")) {
                out.println(Json.MAPPER.writeValueAsString(Json.fit(chosen)));
            } else {
                Text.fit(out, chosen);
            }
        }
        if (save != null) {
            try {
                FittedCorrelationFile.save(save, FittedCorrelation.of(chosen), force);
            } catch (InputException e) {
                throw new InputException("--save " + save, "already exists; give --force to replace it", e);
            }
            if (format.equals("text")) {
                out.println("Saved " + chosen.formId() + " fit to " + save);
            }
        }
        out.flush();
        return chosen.converged() ? HeadwayCommand.EXIT_OK : HeadwayCommand.EXIT_FAILED;
    }

    private static List<FitForm> standardForms(int columns) {
        if (columns == 1) {
            return List.of(
                    new FitForm.Constant(),
                    new FitForm.Linear(),
                    new FitForm.Logarithmic(),
                    new FitForm.Power(false),
                    new FitForm.Exponential(),
                    new FitForm.Polynomial(2),
                    new FitForm.Polynomial(3));
        }
        return List.of(new FitForm.Constant(), new FitForm.Linear(), new FitForm.PowerProduct());
    }

    static FitForm parseForm(String text) {
        String t = text.trim().toLowerCase(Locale.ROOT);
        if (t.startsWith("polynomial:")) {
            String degree = t.substring("polynomial:".length());
            try {
                return new FitForm.Polynomial(Integer.parseInt(degree));
            } catch (NumberFormatException e) {
                throw new InputException("--form", "polynomial degree must be a whole number, got '" + degree + "'");
            } catch (InputException e) {
                throw e.at("--form");
            }
        }
        return switch (t) {
            case "constant" -> new FitForm.Constant();
            case "linear" -> new FitForm.Linear();
            case "through-origin" -> new FitForm.ThroughOrigin();
            case "log", "logarithmic" -> new FitForm.Logarithmic();
            case "power" -> new FitForm.Power(false);
            case "power-log" -> new FitForm.Power(true);
            case "exponential" -> new FitForm.Exponential();
            case "power-product" -> new FitForm.PowerProduct();
            default ->
                throw new InputException(
                        "--form",
                        "unknown form '" + text + "'; use constant, linear, through-origin, log, power, power-log,"
                                + " exponential, polynomial:N or power-product");
        };
    }

    static Map<String, Double> parseStart(String text) {
        if (text == null || text.isBlank()) {
            throw new InputException("--start", "give a starting value for each parameter, e.g. --start a=1,b=0.1");
        }
        Map<String, Double> values = new LinkedHashMap<>();
        for (String part : text.split(",")) {
            int eq = part.indexOf('=');
            if (eq <= 0) {
                throw new InputException("--start", "expected NAME=VALUE, got '" + part.trim() + "'");
            }
            String name = part.substring(0, eq).trim();
            String value = part.substring(eq + 1).trim();
            try {
                values.put(name, Double.parseDouble(value));
            } catch (NumberFormatException e) {
                throw new InputException("--start " + name, "'" + value + "' is not a number");
            }
        }
        return values;
    }

    private Observations observations(Table table) {
        if (x.isEmpty() && !(form != null && parseForm(form) instanceof FitForm.Constant)) {
            throw new InputException("--x", "name the explanatory column(s), e.g. --x Re");
        }
        double[] response = table.column(y, "--y");
        List<String> names = new ArrayList<>();
        double[][] columns = new double[x.size()][];
        for (int i = 0; i < x.size(); i++) {
            names.add(x.get(i).trim());
            columns[i] = table.column(x.get(i).trim(), "--x");
        }
        double[] w = weights == null ? null : table.column(weights, "--weights");
        try {
            return new Observations(y, response, names, columns, w);
        } catch (InputException e) {
            throw e.at(data + ": ");
        }
    }

    /**
     * A numeric CSV table with names taken from the header (text before a bracketed unit). Only the
     * columns asked for are read as numbers; the others (a regime, a run label) are skipped, so the
     * CSV that {@code rig --format csv} writes can be fitted as it is.
     */
    static final class Table {
        /**
         * A decimal number as people write it, or NaN/Infinity (refused later with their own message).
         * Java's own parser would also take hexadecimal ("0x1p3") and type suffixes ("2f", "1d").
         */

        /** Widest table read: each column reserves its own array up front. */
        static final int MAX_COLUMNS = 1_000;

        private final Path file;
        private final List<String> names;
        private final List<double[]> columns;

        private Table(Path file, List<String> names, List<double[]> columns) {
            this.file = file;
            this.names = names;
            this.columns = columns;
        }

        /** Reads every column as numbers. */
        static Table read(Path file) throws IOException {
            return read(file, null);
        }

        /**
         * @param file the CSV file
         * @param wanted names of the columns to read as numbers; null for all
         */
        static Table read(Path file, java.util.Set<String> wanted) throws IOException {
            CsvTableReader.Options options = CsvTableReader.Options.of(file.toString())
                    .withHeader(CsvTableReader.HeaderRule.BRACKETS_MARK_AFTER_TRIM)
                    .withMaxColumns(MAX_COLUMNS)
                    .withLimit(LineLengthLimit.limit(LineLengthLimit.MAX_LINE_LENGTH, file));
            List<String> names = new ArrayList<>();
            List<double[]> values = new ArrayList<>();
            int rows = 0;
            try (CsvTableReader reader = CsvTableReader.open(file, options)) {
                List<CsvTableReader.Heading> header = reader.header();
                if (header != null) {
                    for (CsvTableReader.Heading h : header) {
                        names.add(h.name());
                        values.add(new double[1024]);
                    }
                    for (CsvTableReader.Row row = reader.next(); row != null; row = reader.next()) {
                        if (rows == values.get(0).length) {
                            for (int c = 0; c < values.size(); c++) {
                                values.set(c, java.util.Arrays.copyOf(values.get(c), 2 * rows));
                            }
                        }
                        for (int c = 0; c < names.size(); c++) {
                            if (wanted != null && !wanted.contains(names.get(c))) {
                                continue;
                            }
                            double value = row.number(c, CsvTableReader.NOT_A_NUMBER);
                            double magnitude = Math.abs(value);
                            if (magnitude > MAX_MAGNITUDE || (magnitude > 0 && magnitude < MIN_MAGNITUDE)) {
                                // Squares of such numbers over- or underflow a double: sums of squares, the
                                // residual variance and the standard errors would come out as 0, NaN or ∞.
                                throw row.problem(
                                        c,
                                        "is beyond the magnitudes a fit handles (1e-100 to 1e100 in size); give the"
                                                + " column in another unit, or rescale it so its values lie nearer 1");
                            }
                            values.get(c)[rows] = value;
                        }
                        rows++;
                    }
                }
            } catch (java.io.UncheckedIOException e) {
                throw new InputException(
                        file.toString(), "cannot read as CSV: " + e.getCause().getMessage());
            } catch (IOException e) {
                throw new InputException(file.toString(), "cannot read: " + e.getMessage());
            }
            if (names.isEmpty()) {
                throw new InputException(file.toString(), "is empty; expected a header row and data rows");
            }
            List<double[]> columns = new ArrayList<>();
            for (double[] v : values) {
                columns.add(java.util.Arrays.copyOf(v, rows));
            }
            return new Table(file, names, columns);
        }

        double[] column(String name, String option) {
            int c = names.indexOf(name.trim());
            if (c < 0) {
                throw new InputException(option, "no column '" + name + "' in " + file + "; columns are " + names);
            }
            return columns.get(c);
        }
    }

    /** JSON output (keys in snake_case; doubles in shortest round-trip form). */
    static final class Json {
        static final ObjectMapper MAPPER = new ObjectMapper().enable(SerializationFeature.INDENT_OUTPUT);

        private Json() {}

        static ObjectNode fit(FitResult fit) {
            ObjectNode root = MAPPER.createObjectNode();
            root.put("form", fit.formId());
            root.put("description", fit.formDescription());
            root.put("model", fit.responseName() + " = " + fit.modelExpression());
            ArrayNode params = root.putArray("parameters");
            for (FittedParameter p : fit.parameters()) {
                ObjectNode n = params.addObject();
                n.put("name", p.name());
                n.put("value", p.value());
                n.put("standard_error", p.standardError());
                n.put("ci95_low", p.ci95Low());
                n.put("ci95_high", p.ci95High());
            }
            root.put("residual_sum_of_squares", fit.residualSumOfSquares());
            root.put("residual_standard_deviation", fit.residualStandardDeviation());
            root.put("r_squared", fit.rSquared());
            root.put("adjusted_r_squared", fit.adjustedRSquared());
            root.put("degrees_of_freedom", fit.degreesOfFreedom());
            root.put("points", fit.pointCount());
            root.put("aicc", fit.informationCriterion());
            root.put("iterations", fit.iterations());
            root.put("converged", fit.converged());
            root.put("stop_reason", fit.stopReason());
            ArrayNode ranges = root.putArray("data_ranges");
            for (VariableRange r : fit.variableRanges()) {
                ranges.addObject().put("name", r.name()).put("min", r.min()).put("max", r.max());
            }
            ArrayNode cautions = root.putArray("cautions");
            for (Caution c : fit.cautions()) {
                ObjectNode n = cautions.addObject();
                n.put("code", c.code());
                n.put("severity", c.severity().name().toLowerCase(Locale.ROOT));
                n.put("message", c.message());
                n.put("basis", c.basis());
            }
            return root;
        }

        static ObjectNode comparison(FitComparison comparison) {
            ObjectNode root = MAPPER.createObjectNode();
            root.put("ranking", "corrected Akaike information criterion (AICc), lowest first");
            ArrayNode ranked = root.putArray("fits");
            int rank = 1;
            for (FitResult f : comparison.ranked()) {
                ObjectNode n = fit(f);
                n.put("rank", rank++);
                ranked.add(n);
            }
            ObjectNode skipped = root.putObject("skipped");
            comparison.skipped().forEach(skipped::put);
            return root;
        }
    }

    /** Text output for people. */
    static final class Text {
        private Text() {}

        static void fit(PrintWriter out, FitResult fit) {
            out.println("Fit: " + fit.formDescription());
            out.println("Model: " + fit.responseName() + " = " + fit.modelExpression());
            out.printf("%-12s %15s %15s %15s %15s%n", "parameter", "value", "std. error", "95% CI low", "95% CI high");
            for (FittedParameter p : fit.parameters()) {
                out.printf(
                        Locale.ROOT,
                        "%-12s %15.8g %15.4g %15.8g %15.8g%n",
                        p.name(),
                        p.value(),
                        p.standardError(),
                        p.ci95Low(),
                        p.ci95High());
            }
            out.printf(
                    Locale.ROOT,
                    "RSS %.6g   residual SD %.6g   R² %.6f   adjusted R² %.6f   ν = %d (%d points)%n",
                    fit.residualSumOfSquares(),
                    fit.residualStandardDeviation(),
                    fit.rSquared(),
                    fit.adjustedRSquared(),
                    fit.degreesOfFreedom(),
                    fit.pointCount());
            out.println("Solver: " + fit.stopReason() + " (" + fit.iterations() + " iterations; converged: "
                    + (fit.converged() ? "yes" : "NO") + ")");
            for (VariableRange r : fit.variableRanges()) {
                out.printf(Locale.ROOT, "Fitted range: %s from %.6g to %.6g%n", r.name(), r.min(), r.max());
            }
            for (Caution c : fit.cautions()) {
                out.println("Caution [" + c.severity().name().toLowerCase(Locale.ROOT) + ", " + c.code() + "]: "
                        + c.message() + " (basis: " + c.basis() + ")");
            }
        }

        static void comparison(PrintWriter out, FitComparison comparison) {
            out.println("Forms ranked by AICc (corrected Akaike information criterion; lowest is best):");
            out.printf("%-4s %-16s %14s %12s %12s  %s%n", "rank", "form", "AICc", "adj. R²", "resid. SD", "model");
            int rank = 1;
            for (FitResult f : comparison.ranked()) {
                out.printf(
                        Locale.ROOT,
                        "%-4d %-16s %14.6g %12.6f %12.6g  %s = %s%n",
                        rank++,
                        f.formId(),
                        f.informationCriterion(),
                        f.adjustedRSquared(),
                        f.residualStandardDeviation(),
                        f.responseName(),
                        f.modelExpression());
            }
            comparison.skipped().forEach((form, why) -> out.println("not fitted: " + form + ": " + why));
            out.println();
            out.println("Best form in detail:");
            fit(out, comparison.ranked().get(0));
        }
    }
}
