package org.headway.project;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Map;
import org.headway.caution.InputException;
import org.headway.network.design.ValveSettingTable;

/**
 * A CSV of balancing-valve settings against K_v, as a maker tabulates them: columns {@code setting}
 * and {@code kv} (m³/h at 1 bar; a bracketed unit is not allowed, so that a C_v column is not taken
 * for K_v), and optionally {@code valve}, the valve id or name (model) the row belongs to. Rows with
 * a blank {@code valve} form the one table applied to every balanced valve without its own. Each
 * table's rows are sorted by setting; K_v must rise with the setting. Bad cells are refused with the
 * file, line and column.
 */
public final class ValveSettingsFile {

    /** Columns understood. */
    public static final List<String> COLUMNS = List.of("valve", "setting", "kv");

    private ValveSettingsFile() {}

    /** Reads the tables from a file. */
    public static List<ValveSettingTable> read(Path file) {
        return tables(LineList.Table.read(file, COLUMNS));
    }

    /** Reads the tables from text, naming the file as given (tests). */
    public static List<ValveSettingTable> parse(String name, String text) {
        return tables(LineList.Table.parse(name, text, COLUMNS));
    }

    private static List<ValveSettingTable> tables(LineList.Table t) {
        t.require("setting");
        t.require("kv");
        for (String key : List.of("setting", "kv")) {
            if (t.unit.containsKey(key)) {
                throw new InputException(
                        t.name + " header",
                        "column \"" + key + "\" takes plain numbers (kv in m³/h at 1 bar); drop the unit ["
                                + t.unit.get(key) + "]");
            }
        }
        Map<String, List<LineList.Row>> byValve = new LinkedHashMap<>();
        for (LineList.Row r : t.rows) {
            byValve.computeIfAbsent(r.text("valve"), v -> new ArrayList<>()).add(r);
        }
        if (byValve.isEmpty()) {
            throw new InputException(t.name, "has no rows of setting and kv");
        }
        List<ValveSettingTable> out = new ArrayList<>();
        for (var e : byValve.entrySet()) {
            List<LineList.Row> rows = new ArrayList<>(e.getValue());
            double[][] pairs = new double[rows.size()][];
            for (int i = 0; i < rows.size(); i++) {
                LineList.Row r = rows.get(i);
                double setting = number(r, "setting");
                double kv = number(r, "kv");
                if (!(kv > 0)) {
                    throw r.error("kv", "must be a positive flow coefficient (m³/h at 1 bar), got " + r.text("kv"));
                }
                pairs[i] = new double[] {setting, kv, r.line()};
            }
            java.util.Arrays.sort(pairs, java.util.Comparator.comparingDouble(p -> p[0]));
            double[] settings = new double[pairs.length];
            double[] kvs = new double[pairs.length];
            for (int i = 0; i < pairs.length; i++) {
                settings[i] = pairs[i][0];
                kvs[i] = pairs[i][1];
            }
            String where = t.name
                    + (e.getKey().isEmpty() ? " (table for all valves)" : " (table for valve " + e.getKey() + ")")
                    + " lines " + (long) rows.get(0).line() + "–"
                    + (long) rows.get(rows.size() - 1).line();
            out.add(new ValveSettingTable(e.getKey(), settings, kvs, where));
        }
        return out;
    }

    private static double number(LineList.Row r, String key) {
        String v = r.text(key);
        if (v.isEmpty()) {
            throw r.error(key, "is blank; every row needs a setting and a kv");
        }
        try {
            double d = org.headway.units.Decimals.parseDecimal(v);
            if (!Double.isFinite(d)) {
                throw new NumberFormatException();
            }
            return d;
        } catch (NumberFormatException ex) {
            throw r.error(key, "expected a plain number, got \"" + v + "\"");
        }
    }
}
