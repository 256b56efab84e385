package org.headway.fitting;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import org.headway.caution.InputException;

/** Splits an {@link Expression}'s text into numbers, names and symbols ({@code **} read as {@code ^}). */
final class ExpressionLexer {

    private ExpressionLexer() {}

    /**
     * A token of the text.
     *
     * @param number the value of a {@link Kind#NUMBER}, else 0
     * @param position index of its first character in the text (0-based)
     */
    record Token(Kind kind, String text, double number, int position) {}

    /** What a token is. */
    enum Kind {
        NUMBER,
        NAME,
        SYMBOL,
        END
    }

    /**
     * @param s the expression text
     * @return its tokens, ending with one {@link Kind#END} at the end of the text
     * @throws InputException naming the column of a malformed number or an unexpected character
     */
    static List<Token> tokenize(String s) {
        List<Token> out = new ArrayList<>();
        int i = 0;
        while (i < s.length()) {
            char c = s.charAt(i);
            if (Character.isWhitespace(c)) {
                i++;
            } else if (Character.isDigit(c) || (c == '.' && i + 1 < s.length() && Character.isDigit(s.charAt(i + 1)))) {
                int start = i;
                while (i < s.length() && (Character.isDigit(s.charAt(i)) || s.charAt(i) == '.')) {
                    i++;
                }
                if (i < s.length() && (s.charAt(i) == 'e' || s.charAt(i) == 'E')) {
                    int mark = i;
                    i++;
                    if (i < s.length() && (s.charAt(i) == '+' || s.charAt(i) == '-')) {
                        i++;
                    }
                    if (i < s.length() && Character.isDigit(s.charAt(i))) {
                        while (i < s.length() && Character.isDigit(s.charAt(i))) {
                            i++;
                        }
                    } else {
                        i = mark;
                    }
                }
                String number = s.substring(start, i);
                try {
                    out.add(new Token(Kind.NUMBER, number, Double.parseDouble(number), start));
                } catch (NumberFormatException e) {
                    throw new InputException(
                            "expression column " + (start + 1), "'" + number + "' is not a number in \"" + s + "\"");
                }
            } else if (Character.isLetter(c) || c == '_') {
                int start = i;
                while (i < s.length() && (Character.isLetterOrDigit(s.charAt(i)) || s.charAt(i) == '_')) {
                    i++;
                }
                out.add(new Token(Kind.NAME, s.substring(start, i), 0.0, start));
            } else if (c == '*' && i + 1 < s.length() && s.charAt(i + 1) == '*') {
                out.add(new Token(Kind.SYMBOL, "^", 0.0, i));
                i += 2;
            } else if ("+-*/^()".indexOf(c) >= 0) {
                out.add(new Token(Kind.SYMBOL, String.valueOf(c), 0.0, i));
                i++;
            } else {
                throw new InputException(
                        "expression column " + (i + 1),
                        String.format(Locale.ROOT, "unexpected character '%c' in \"%s\"", c, s));
            }
        }
        out.add(new Token(Kind.END, "", 0.0, s.length()));
        return out;
    }
}
