package org.headway.report;

/**
 * Text from the user made safe for spreadsheets and CSV: a cell starting with {@code =}, {@code +},
 * {@code -}, {@code @}, a tab or a carriage return is prefixed with an apostrophe so no spreadsheet
 * runs it as a formula (OWASP, "CSV Injection"). Plain numbers written by Headway itself are not
 * passed through here.
 */
public final class SafeText {

    private SafeText() {}

    /** The cell text, neutralised. */
    public static String cell(String text) {
        if (text == null || text.isEmpty()) {
            return "";
        }
        char c = text.charAt(0);
        if (c == '=' || c == '+' || c == '-' || c == '@' || c == '\t' || c == '\r') {
            return "'" + text;
        }
        return text;
    }

    /**
     * A cell echoed from the user's own file: a plain number (which a spreadsheet reads as a number,
     * never a formula) is kept as it is, so the output still reads back as the input; any other text
     * is neutralised as by {@link #cell}.
     */
    public static String echoedCell(String text) {
        if (text == null || text.isEmpty()) {
            return "";
        }
        char c = text.charAt(0);
        if (c != '=' && c != '+' && c != '-' && c != '@' && c != '\t' && c != '\r') {
            return text;
        }
        return PLAIN_NUMBER.matcher(text).matches() ? text : "'" + text;
    }

    private static final java.util.regex.Pattern PLAIN_NUMBER =
            java.util.regex.Pattern.compile("[+-]?(\\d+\\.?\\d*|\\.\\d+)([eE][+-]?\\d+)?");

    /**
     * A file-name stem from user text: letters, digits, dot, dash and underscore only, no leading
     * dot, at most 80 characters, so that a name from a project file cannot leave the chosen folder.
     */
    public static String fileStem(String text) {
        String s = text == null ? "" : text.replaceAll("[^A-Za-z0-9._-]+", "-");
        s = s.replaceAll("^[.-]+", "").replaceAll("-+$", "");
        if (s.length() > 80) {
            s = s.substring(0, 80);
        }
        return s.isEmpty() ? "sheet" : s;
    }
}
