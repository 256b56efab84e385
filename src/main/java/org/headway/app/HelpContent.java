package org.headway.app;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import org.headway.friction.FrictionCorrelation;
import org.headway.friction.FrictionMethods;

/**
 * What the Help menu shows, as plain text: the window's keyboard shortcuts (read from its menus, so
 * the list is the real one), the methods with their citations (from the engine where it states them),
 * the bundled reference pages, and the version with the licences of the bundled libraries.
 */
final class HelpContent {

    /** Reference pages packaged from {@code src/site/docs} (a jar cannot list a folder). */
    static final List<String> PAGES = List.of(
            "desktop-app.md",
            "network.md",
            "friction.md",
            "fluids-and-units.md",
            "catalogs.md",
            "fitting.md",
            "rig-data.md",
            "project-format.md");

    /** Where the build puts the pages in the jar. */
    static final String PAGES_FOLDER = "/org/headway/app/docs/";

    private HelpContent() {}

    /** One shortcut: where it is in the menus and its keys as the platform writes them. */
    record Shortcut(String command, String keys) {}

    /** The shortcuts as text lines, padded to line up. */
    static String shortcutsText(List<Shortcut> shortcuts) {
        int width = shortcuts.stream().mapToInt(s -> s.keys().length()).max().orElse(0);
        StringBuilder out = new StringBuilder();
        for (Shortcut s : shortcuts) {
            out.append(String.format(java.util.Locale.ROOT, "%-" + width + "s   %s%n", s.keys(), s.command()));
        }
        out.append("\nIn the tables: Enter or F2 edits a cell, Tab moves to the next one, Escape drops the edit.");
        return out.toString();
    }

    /** A method the engine uses, with where it comes from. */
    record Method(String topic, String name, String citation) {}

    /**
     * The methods: every friction correlation as the engine registers it (its own citation and
     * equation), then the network and design methods as their classes cite them.
     */
    static List<Method> methods() {
        List<Method> out = new ArrayList<>();
        for (FrictionCorrelation f : FrictionMethods.all()) {
            out.add(new Method("friction factor", f.id() + ": " + f.equation(), f.citation()));
        }
        out.add(new Method(
                "fittings",
                "2-K method",
                "Hooper, W.B. (1981), \"The two-K method predicts head losses in pipe fittings\", Chemical"
                        + " Engineering, Aug. 24, 1981, pp. 96–100 (as org.headway.pipe.TwoK cites it)"));
        out.add(new Method(
                "fittings",
                "3-K method",
                "Darby, R., Chemical Engineering Fluid Mechanics, 2nd ed., Marcel Dekker, 2001 (as"
                        + " org.headway.pipe.ThreeK cites it; the size term on the nominal size in inches)"));
        out.add(new Method(
                "network solve",
                "global gradient algorithm",
                "Todini & Pilati, \"A gradient algorithm for the analysis of pipe networks\", in Coulbeck & Orr"
                        + " (eds.), Computer Applications in Water Supply, vol. 1, 1988, pp. 1–20"));
        out.add(new Method(
                "network solve",
                "approximate minimum degree ordering",
                "Amestoy, Davis & Duff, \"An approximate minimum degree ordering algorithm\", SIAM J. Matrix"
                        + " Anal. Appl. 17(4):886–905, 1996"));
        out.add(new Method(
                "valves", "K_v and C_v, Δp = (ρ/ρ₀)(Q/K_v)² × 1 bar", "IEC 60534-1:2005 §3 and IEC 60534-2-1:2011 §4"));
        out.add(new Method(
                "fire flow",
                "bracket, then Brent's method",
                "R. P. Brent, Algorithms for Minimization without Derivatives, 1973 (Commons Math"
                        + " BracketingNthOrderBrentSolver)"));
        out.add(new Method(
                "water properties",
                "IAPWS-IF97 regions 1 and 4; viscosity",
                "IAPWS R7-97(2012); IAPWS 2008 (as org.headway.fluid.Water cites them)"));
        return out;
    }

    static String methodsText() {
        StringBuilder out = new StringBuilder();
        String topic = "";
        for (Method m : methods()) {
            if (!m.topic().equals(topic)) {
                topic = m.topic();
                out.append(out.length() == 0 ? "" : "\n")
                        .append(topic.toUpperCase(java.util.Locale.ROOT))
                        .append('\n');
            }
            out.append("  ")
                    .append(m.name())
                    .append("\n      ")
                    .append(m.citation())
                    .append('\n');
        }
        return out.toString();
    }

    /** A bundled reference page's text, empty when the build did not package it. */
    static Optional<String> page(String name) {
        try (InputStream in = HelpContent.class.getResourceAsStream(PAGES_FOLDER + name)) {
            return in == null ? Optional.empty() : Optional.of(new String(in.readAllBytes(), StandardCharsets.UTF_8));
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** One bundled library. */
    record Library(String library, String artifacts, String version, String licence, String from, String checked) {}

    /** The bundled libraries from the packaged list ({@code bundled-libraries.csv}). */
    static List<Library> libraries() {
        List<Library> out = new ArrayList<>();
        try (InputStream in = HelpContent.class.getResourceAsStream("bundled-libraries.csv")) {
            if (in == null) {
                throw new IllegalStateException("bundled-libraries.csv is missing from the build");
            }
            String[] lines = new String(in.readAllBytes(), StandardCharsets.UTF_8).split("\n");
            boolean header = true;
            for (String line : lines) {
                if (line.startsWith("#") || line.isBlank()) {
                    continue;
                }
                if (header) {
                    header = false;
                    continue;
                }
                String[] f = line.split(",", -1);
                if (f.length != 6) {
                    throw new IllegalStateException(
                            "bundled-libraries.csv: expected 6 fields, got " + f.length + " in \"" + line + "\"");
                }
                out.add(new Library(f[0], f[1], f[2], f[3], f[4], f[5]));
            }
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        return out;
    }

    static String aboutText(String version) {
        StringBuilder out = new StringBuilder();
        out.append("Headway ")
                .append(version)
                .append(" — head loss and pipe sizing for runs and networks.\n")
                .append(
                        "Results are estimates for review against the applicable local codes by a qualified engineer.\n\n")
                .append("Bundled libraries (licence; where from):\n");
        for (Library l : libraries()) {
            out.append("  ")
                    .append(l.library())
                    .append(' ')
                    .append(l.version())
                    .append(" — ")
                    .append(l.licence())
                    .append("\n      ")
                    .append(l.artifacts())
                    .append("; ")
                    .append(l.from())
                    .append('\n');
        }
        return out.toString();
    }
}
