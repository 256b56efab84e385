package org.headway;

import static org.junit.jupiter.api.Assertions.assertFalse;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.charset.StandardCharsets;
import java.util.Random;
import org.headway.caution.InputException;

/**
 * Shared pieces of the seeded fuzz tests: generators of random text, random bytes and mutations of
 * valid inputs, and the check that a rejection says where. Every fuzz test prints its seed in
 * failure messages so that a case can be replayed.
 */
public final class Fuzz {

    /** Non-finite and extreme numbers spelled the ways people and programs write them. */
    public static final String[] NASTY_NUMBERS = {
        "NaN",
        "nan",
        "NAN",
        "-NaN",
        "Infinity",
        "-Infinity",
        "+Infinity",
        "inf",
        "-inf",
        "INF",
        "∞",
        "-∞",
        "1e308",
        "-1e308",
        "1e309",
        "1.7976931348623157e308",
        "4.9e-324",
        "1e-320",
        "2.2250738585072014E-308",
        "1e-400",
        "-0",
        "-0.0",
        "0",
        "0x1p3",
        "1d",
        "2f",
        "1,5",
        "1.5.5",
        "1e",
        "e5",
        ".",
        "-",
        "+",
        "",
        " ",
        "9".repeat(400),
        "0." + "0".repeat(400) + "1",
        "1" + "0".repeat(330),
        "2147483648",
        "-2147483649",
        "9223372036854775808"
    };

    private Fuzz() {}

    /** Random text over an alphabet that reaches the parser's interesting branches. */
    public static String randomText(Random random, String alphabet, int maxLength) {
        StringBuilder b = new StringBuilder();
        int n = random.nextInt(maxLength + 1);
        for (int i = 0; i < n; i++) {
            b.append(alphabet.charAt(random.nextInt(alphabet.length())));
        }
        return b.toString();
    }

    /** Random bytes decoded as UTF-8 (malformed sequences become U+FFFD, as a reader would see). */
    public static String randomBytesAsText(Random random, int maxLength) {
        return new String(randomBytes(random, maxLength), StandardCharsets.UTF_8);
    }

    /** Random bytes. */
    public static byte[] randomBytes(Random random, int maxLength) {
        byte[] bytes = new byte[random.nextInt(maxLength + 1)];
        random.nextBytes(bytes);
        return bytes;
    }

    /** One of {@link #NASTY_NUMBERS}. */
    public static String nastyNumber(Random random) {
        return NASTY_NUMBERS[random.nextInt(NASTY_NUMBERS.length)];
    }

    /**
     * A few character-level mutations of valid text: delete, duplicate, swap a piece, insert a
     * stray character, CRLF line ends, a BOM.
     */
    public static String mutate(Random random, String text, int times) {
        String s = text;
        for (int t = 0; t < times; t++) {
            if (s.isEmpty()) {
                s = randomText(random, "0123456789,.-e \n", 10);
                continue;
            }
            int a = random.nextInt(s.length());
            int b = Math.min(s.length(), a + 1 + random.nextInt(40));
            switch (random.nextInt(7)) {
                case 0 -> s = s.substring(0, a) + s.substring(b);
                case 1 -> s = s.substring(0, b) + s.substring(a, b) + s.substring(b);
                case 2 -> {
                    int c = b + random.nextInt(Math.max(1, s.length() - b));
                    int d = Math.min(s.length(), c + random.nextInt(40));
                    if (c <= d && d <= s.length()) {
                        s = s.substring(0, a)
                                + s.substring(c, d)
                                + s.substring(b, c)
                                + s.substring(a, b)
                                + s.substring(d);
                    }
                }
                case 3 -> s = s.substring(0, a) + (char) random.nextInt(0x3000) + s.substring(a);
                case 4 -> s = s.replace("\n", "\r\n");
                case 5 -> s = "\uFEFF" + s;
                default -> s = s.substring(0, a) + nastyNumber(random) + s.substring(b);
            }
        }
        return s;
    }

    /** Replaces the n-th comma-separated cell of a random line by a nasty number. */
    public static String replaceCell(Random random, String csv) {
        String[] lines = csv.split("\n", -1);
        int l = random.nextInt(lines.length);
        String[] cells = lines[l].split(",", -1);
        cells[random.nextInt(cells.length)] = nastyNumber(random);
        lines[l] = String.join(",", cells);
        return String.join("\n", lines);
    }

    /** Deletes, duplicates or swaps whole lines. */
    public static String mutateLines(Random random, String csv) {
        String[] lines = csv.split("\n", -1);
        StringBuilder b = new StringBuilder();
        int a = random.nextInt(lines.length);
        int c = random.nextInt(lines.length);
        int op = random.nextInt(3);
        for (int i = 0; i < lines.length; i++) {
            String line = lines[i];
            if (op == 2 && i == a) {
                line = lines[c];
            } else if (op == 2 && i == c) {
                line = lines[a];
            }
            if (op == 0 && i == a) {
                continue;
            }
            b.append(line).append('\n');
            if (op == 1 && i == a) {
                b.append(line).append('\n');
            }
        }
        return b.toString();
    }

    /** Deletes, duplicates or swaps cells in the column direction (every line the same way). */
    public static String mutateColumns(Random random, String csv) {
        String[] lines = csv.split("\n", -1);
        int a = random.nextInt(4);
        int c = random.nextInt(4);
        int op = random.nextInt(3);
        StringBuilder b = new StringBuilder();
        for (String line : lines) {
            String[] cells = line.split(",", -1);
            java.util.List<String> list = new java.util.ArrayList<>(java.util.List.of(cells));
            if (a < list.size() && c < list.size()) {
                switch (op) {
                    case 0 -> list.remove(a);
                    case 1 -> list.add(a, list.get(a));
                    default -> java.util.Collections.swap(list, a, c);
                }
            }
            b.append(String.join(",", list)).append('\n');
        }
        return b.toString();
    }

    /**
     * Checks that a rejection names a place: a non-empty {@link InputException#where()} that
     * contains the expected fragment (file name, option, field), and a non-blank problem.
     */
    public static void assertLocated(InputException e, String expectedWhere, long seed, int index) {
        assertFalse(
                e.problem() == null || e.problem().isBlank(), "case " + index + " (seed " + seed + "): empty problem");
        assertTrue(
                e.where().contains(expectedWhere),
                "case " + index + " (seed " + seed + "): message does not name '" + expectedWhere + "': "
                        + e.getMessage());
    }

    /** The first characters of a long input, for a failure message. */
    public static String abbreviate(String s) {
        return s.length() <= 600 ? s : s.substring(0, 600) + "… (" + s.length() + " chars)";
    }

    /**
     * Records a fuzz run's counts in {@code target/fuzz-summaries.txt} (one line per run) instead of
     * printing them to standard output, so that the test log stays quiet and the counts stay readable.
     */
    public static synchronized void summary(String line) {
        try {
            java.nio.file.Path file = java.nio.file.Path.of("target", "fuzz-summaries.txt");
            java.nio.file.Files.createDirectories(file.getParent());
            java.nio.file.Files.writeString(
                    file,
                    line + System.lineSeparator(),
                    java.nio.charset.StandardCharsets.UTF_8,
                    java.nio.file.StandardOpenOption.CREATE,
                    java.nio.file.StandardOpenOption.APPEND);
        } catch (java.io.IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
    }
}
