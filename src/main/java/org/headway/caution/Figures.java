package org.headway.caution;

import java.util.Locale;

/** Figures in caution texts. */
public final class Figures {

    private Figures() {}

    /** Six significant digits without trailing zeros: 4000, 90760.8, 1.2e+06 (not 4000.00, 1.20000e+06). */
    public static String significant(double x) {
        String t = String.format(Locale.ROOT, "%.6g", x);
        int e = t.indexOf('e');
        String mantissa = e < 0 ? t : t.substring(0, e);
        if (mantissa.indexOf('.') >= 0) {
            mantissa = mantissa.replaceAll("0+$", "").replaceAll("\\.$", "");
        }
        return e < 0 ? mantissa : mantissa + t.substring(e);
    }
}
