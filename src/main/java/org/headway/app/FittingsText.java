package org.headway.app;

import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import org.headway.caution.InputException;
import org.headway.pipe.BoreChange;
import org.headway.pipe.Catalog;
import org.headway.project.Project;

/**
 * A segment's fittings as one line of text, e.g. {@code entrance-rounded, gate-valve ×2,
 * tee-branch K=1.3}: catalog ids separated by commas, each with an optional count ({@code ×2},
 * {@code x2} or {@code *2}) and an optional loss coefficient that replaces the catalog's; and a
 * reducer or enlarger at the pipe's outlet as {@code bore-change to 73.6 mm} or {@code bore-change to
 * 73.6 mm cone 30} (the included cone angle in degrees; sudden without it).
 */
final class FittingsText {

    private static final Pattern ITEM =
            Pattern.compile("^([^\\s×*,]+?)(?:\\s*[×xX*]\\s*(\\d+))?(?:\\s+K\\s*=\\s*(\\S+))?$");

    private static final Pattern BORE_CHANGE =
            Pattern.compile("^bore-change\\s+to\\s+(.+?)(?:\\s+cone\\s+([^\\s°]+)\\s*°?)?$", Pattern.CASE_INSENSITIVE);

    private FittingsText() {}

    /** The fittings as text in the form {@link #parse} reads. */
    static String format(List<Project.FittingSpec> fittings) {
        List<String> items = new ArrayList<>();
        for (Project.FittingSpec f : fittings) {
            if (f.kind().equals(BoreChange.KIND)) {
                items.add(BoreChange.KIND + " to " + f.toDiameter()
                        + (f.includedAngleDegrees().isEmpty() ? "" : " cone " + f.includedAngleDegrees()));
                continue;
            }
            String item = f.kind() + (f.count() == 1 ? "" : " ×" + f.count());
            if (!f.lossCoefficient().isEmpty()) {
                item += " K=" + f.lossCoefficient();
            }
            items.add(item);
        }
        return String.join(", ", items);
    }

    /** A short summary for a table cell, e.g. "7 fittings". */
    static String summary(List<Project.FittingSpec> fittings) {
        int n = fittings.stream().mapToInt(Project.FittingSpec::count).sum();
        return n == 0 ? "none" : n == 1 ? "1 fitting" : n + " fittings";
    }

    /**
     * @param text as typed; blank means no fittings
     * @param catalog where fitting ids are looked up (ids starting {@code fitted:} are taken as given)
     * @return the fittings in order
     * @throws InputException naming the item and what is wrong with it
     */
    static List<Project.FittingSpec> parse(String text, Catalog catalog) {
        List<Project.FittingSpec> list = new ArrayList<>();
        if (text == null || text.isBlank()) {
            return list;
        }
        String[] items = text.split(",");
        for (int i = 0; i < items.length; i++) {
            String item = items[i].strip();
            String where = "fittings item " + (i + 1);
            if (item.isEmpty()) {
                throw new InputException(where, "empty item; separate fittings with single commas");
            }
            Matcher change = BORE_CHANGE.matcher(item);
            if (change.matches()) {
                String to = change.group(1).strip();
                String cone = change.group(2) == null ? "" : change.group(2);
                if (to.contains(",")) {
                    throw new InputException(where, "expected \"bore-change to 73.6 mm\", got \"" + item + "\"");
                }
                list.add(new Project.FittingSpec(BoreChange.KIND, 1, "", to, cone));
                continue;
            }
            if (item.toLowerCase(java.util.Locale.ROOT).startsWith(BoreChange.KIND)) {
                throw new InputException(
                        where,
                        "a bore change is written \"bore-change to 73.6 mm\" (optionally \"cone 30\"), got \"" + item
                                + "\"");
            }
            Matcher m = ITEM.matcher(item);
            if (!m.matches()) {
                throw new InputException(
                        where,
                        "expected a fitting id with an optional count, e.g. \"gate-valve ×2\", got \"" + item + "\"");
            }
            String kind = m.group(1);
            int count = 1;
            if (m.group(2) != null) {
                try {
                    count = Integer.parseInt(m.group(2));
                } catch (NumberFormatException e) {
                    throw new InputException(where, "count too large in \"" + item + "\"");
                }
                if (count < 1) {
                    throw new InputException(where, "count must be at least 1 in \"" + item + "\"");
                }
            }
            String k = "";
            if (m.group(3) != null) {
                k = m.group(3);
                double value;
                try {
                    value = Double.parseDouble(k);
                } catch (NumberFormatException e) {
                    throw new InputException(where, "K must be a number, got \"" + k + "\"");
                }
                if (!Double.isFinite(value) || value < 0) {
                    throw new InputException(where, "K must be a finite number ≥ 0, got \"" + k + "\"");
                }
            }
            if (!kind.startsWith("fitted:") && k.isEmpty()) {
                try {
                    catalog.fitting(kind);
                } catch (InputException e) {
                    throw new InputException(where, e.problem());
                }
            }
            list.add(new Project.FittingSpec(kind, count, k));
        }
        return list;
    }
}
