package org.headway.cli;

import java.io.IOException;
import java.io.PrintWriter;
import java.io.StringWriter;
import java.io.UncheckedIOException;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.Callable;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVPrinter;
import org.headway.caution.InputException;
import org.headway.pipe.Catalog;
import org.headway.pipe.Darby2001ThreeK;
import org.headway.pipe.Fitting;
import org.headway.pipe.Hooper1981TwoK;
import org.headway.pipe.Material;
import org.headway.pipe.PipeSize;
import org.headway.pipe.Weisbach1845FixedK;
import picocli.CommandLine.Command;
import picocli.CommandLine.Mixin;
import picocli.CommandLine.Option;
import picocli.CommandLine.Parameters;
import picocli.CommandLine.Spec;

/** {@code headway catalog}: lists the materials, pipe sizes and fittings Headway knows. */
@Command(
        name = "catalog",
        mixinStandardHelpOptions = true,
        versionProvider = HeadwayCommand.Version.class,
        description = {
            "List catalog data: materials (roughness), sizes (nominal size and schedule to diameters) or"
                    + " fittings (loss-coefficient method and coefficients).",
            "Lengths are printed in mm."
        })
public final class CatalogCommand implements Callable<Integer> {

    private static final List<String> LISTS = List.of("materials", "sizes", "fittings");
    private static final double MILLIMETRES_PER_METRE = 1000.0;

    @Spec
    picocli.CommandLine.Model.CommandSpec spec;

    @Parameters(
            index = "0",
            paramLabel = "LIST",
            description = "What to list: materials, sizes or fittings.",
            completionCandidates = Lists.class)
    String list;

    @Option(
            names = "--filter",
            paramLabel = "TEXT",
            description = "Keep rows whose id, name or description contains TEXT (case ignored).")
    String filter;

    @Option(
            names = "--table",
            paramLabel = "ID",
            description = "Size table to list (sizes only), e.g. asme-b36.10m. Default: all tables.")
    String table;

    @Option(
            names = "--schedule",
            paramLabel = "S",
            description = "Schedule, type or class to keep (sizes only), e.g. 40, STD, 10S, L.")
    String schedule;

    @Mixin
    SharedOptions.CatalogFolder catalogOption;

    @Option(
            names = "--format",
            paramLabel = "FORMAT",
            defaultValue = "text",
            description = "Output format: text or csv (default: ${DEFAULT-VALUE}).")
    String format;

    static final class Lists extends ArrayList<String> {
        Lists() {
            super(LISTS);
        }
    }

    @Override
    public Integer call() {
        Path catalogFolder = catalogOption.catalogFolder;
        String what = list.strip().toLowerCase(Locale.ROOT);
        if (!LISTS.contains(what)) {
            throw new InputException("LIST", "unknown list '" + list + "'; expected materials, sizes or fittings");
        }
        String fmt = format.strip().toLowerCase(Locale.ROOT);
        if (!fmt.equals("text") && !fmt.equals("csv")) {
            throw new InputException("--format", "unknown format '" + format + "'; expected text or csv");
        }
        if (!what.equals("sizes") && (table != null || schedule != null)) {
            throw new InputException("--table/--schedule", "only apply to 'catalog sizes'");
        }
        Catalog catalog = catalogFolder == null ? Catalog.bundled() : Catalog.withUserFolder(catalogFolder);
        List<List<String>> rows = new ArrayList<>();
        switch (what) {
            case "materials":
                materials(catalog, rows);
                break;
            case "sizes":
                sizes(catalog, rows);
                break;
            default:
                fittings(catalog, rows);
                break;
        }
        PrintWriter out = spec.commandLine().getOut();
        if (fmt.equals("csv")) {
            out.print(csv(rows));
        } else {
            out.print(text(rows));
            out.println(
                    (rows.size() - 1) + " " + what + (catalogFolder == null ? "" : " (with " + catalogFolder + ")"));
        }
        out.flush();
        return HeadwayCommand.EXIT_OK;
    }

    private boolean kept(String... texts) {
        if (filter == null || filter.isBlank()) {
            return true;
        }
        String wanted = filter.strip().toLowerCase(Locale.ROOT);
        for (String t : texts) {
            if (t != null && t.toLowerCase(Locale.ROOT).contains(wanted)) {
                return true;
            }
        }
        return false;
    }

    private void materials(Catalog catalog, List<List<String>> rows) {
        rows.add(List.of("id", "name", "roughness_mm", "low_mm", "high_mm", "condition", "size_table", "source"));
        for (Material m : catalog.materials()) {
            if (kept(m.id(), m.name())) {
                rows.add(List.of(
                        m.id(),
                        m.name(),
                        mm(m.roughness()),
                        mm(m.roughnessLow()),
                        mm(m.roughnessHigh()),
                        m.condition(),
                        m.sizeTable(),
                        m.source()));
            }
        }
    }

    private void sizes(Catalog catalog, List<List<String>> rows) {
        List<String> header = new ArrayList<>(List.of("table", "nominal", "schedule", "od_mm", "wall_mm", "id_mm"));
        List<String> ids = table == null ? catalog.tables() : List.of(table.strip());
        List<PipeSize> listed = new ArrayList<>();
        for (String id : ids) {
            boolean scheduleHere = schedule == null
                    || catalog.schedules(id).stream().anyMatch(s -> s.equalsIgnoreCase(schedule.strip()));
            if (!scheduleHere && table == null) {
                continue;
            }
            for (PipeSize s : catalog.sizes(id, schedule)) {
                if (kept(s.nominal(), s.table())) {
                    listed.add(s);
                }
            }
        }
        // a lined table (cement-mortar lined ductile iron) shows its lining; other listings keep their columns
        boolean lined = listed.stream().anyMatch(s -> s.liningThickness() > 0);
        if (lined) {
            header.add("lining_mm");
        }
        rows.add(header);
        for (PipeSize s : listed) {
            List<String> row = new ArrayList<>(List.of(
                    s.table(),
                    s.nominal(),
                    s.schedule(),
                    mm(s.outsideDiameter()),
                    mm(s.wallThickness()),
                    mm(s.innerDiameter())));
            if (lined) {
                row.add(mm(s.liningThickness()));
            }
            rows.add(row);
        }
        if (rows.size() == 1 && schedule != null && table == null) {
            throw new InputException("--schedule", "no size table has schedule " + schedule);
        }
    }

    private void fittings(Catalog catalog, List<List<String>> rows) {
        rows.add(List.of("id", "method", "k", "k1", "k_inf", "k_d", "description", "source"));
        for (Fitting f : catalog.fittings()) {
            if (!kept(f.id(), f.description())) {
                continue;
            }
            String k = "";
            String k1 = "";
            String kInf = "";
            String kd = "";
            if (f instanceof Weisbach1845FixedK) {
                k = number(((Weisbach1845FixedK) f).coefficient());
            } else if (f instanceof Hooper1981TwoK) {
                k1 = number(((Hooper1981TwoK) f).laminarCoefficient());
                kInf = number(((Hooper1981TwoK) f).turbulentCoefficient());
            } else if (f instanceof Darby2001ThreeK) {
                k1 = number(((Darby2001ThreeK) f).laminarCoefficient());
                kInf = number(((Darby2001ThreeK) f).turbulentCoefficient());
                kd = number(((Darby2001ThreeK) f).sizeCoefficient());
            }
            rows.add(List.of(f.id(), f.method(), k, k1, kInf, kd, f.description(), f.source()));
        }
    }

    private static String mm(double metres) {
        return number(metres * MILLIMETRES_PER_METRE);
    }

    /** Shortest plain decimal that round-trips to 6 significant digits, e.g. 52.48, 0.0015. */
    private static String number(double value) {
        String s = new java.math.BigDecimal(String.format(Locale.ROOT, "%.6g", value))
                .stripTrailingZeros()
                .toPlainString();
        return s.equals("-0") ? "0" : s;
    }

    private static String csv(List<List<String>> rows) {
        StringWriter w = new StringWriter();
        try (CSVPrinter printer = new CSVPrinter(
                w, CSVFormat.DEFAULT.builder().setRecordSeparator("\n").get())) {
            for (List<String> row : rows) {
                List<String> safe = new java.util.ArrayList<>(row.size());
                for (String cell : row) {
                    safe.add(org.headway.report.SafeText.echoedCell(cell));
                }
                printer.printRecord(safe);
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return w.toString();
    }

    private static String text(List<List<String>> rows) {
        int columns = rows.get(0).size();
        int[] widths = new int[columns];
        for (List<String> row : rows) {
            for (int c = 0; c < columns; c++) {
                widths[c] = Math.max(widths[c], row.get(c).length());
            }
        }
        StringBuilder b = new StringBuilder();
        for (List<String> row : rows) {
            StringBuilder line = new StringBuilder();
            for (int c = 0; c < columns; c++) {
                String cell = row.get(c);
                line.append(cell);
                if (c < columns - 1) {
                    line.append(" ".repeat(widths[c] - cell.length() + 2));
                }
            }
            b.append(line.toString().stripTrailing()).append('\n');
        }
        return b.toString();
    }
}
