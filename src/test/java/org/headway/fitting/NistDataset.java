package org.headway.fitting;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * One NIST StRD regression data set read from its original .dat file (certified values, starting
 * values, model text and data), as published by NIST ITL; see nist-strd/SOURCE.md.
 */
record NistDataset(
        String name,
        String model,
        List<double[]> starts,
        double[] certifiedValues,
        double[] certifiedStandardDeviations,
        double certifiedResidualSumOfSquares,
        double certifiedResidualStandardDeviation,
        double[] y,
        double[][] x) {

    private static final Pattern NONLINEAR_PARAMETER =
            Pattern.compile("^\\s*b\\d+\\s*=\\s*(\\S+)\\s+(\\S+)\\s+(\\S+)\\s+(\\S+)\\s*$");
    private static final Pattern LINEAR_PARAMETER = Pattern.compile("^\\s*B\\d+\\s+(\\S+)\\s+(\\S+)\\s*$");

    static NistDataset load(String kind, String name) {
        String resource = "nist-strd/" + kind + "/" + name + ".dat";
        String text;
        try (InputStream in = NistDataset.class.getResourceAsStream(resource)) {
            if (in == null) {
                throw new IllegalStateException("missing test resource " + resource);
            }
            text = new String(in.readAllBytes(), StandardCharsets.US_ASCII);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
        String[] lines = text.split("\r?\n");
        List<double[]> params = new ArrayList<>();
        double rss = Double.NaN;
        double rsd = Double.NaN;
        StringBuilder model = new StringBuilder();
        boolean inModel = false;
        int dataHeader = -1;
        for (int i = 0; i < lines.length; i++) {
            String line = lines[i];
            if (line.startsWith("Data:")) {
                dataHeader = i;
            }
            Matcher nl = NONLINEAR_PARAMETER.matcher(line);
            Matcher li = LINEAR_PARAMETER.matcher(line);
            if (kind.equals("nonlinear") && nl.matches()) {
                params.add(new double[] {
                    Double.parseDouble(nl.group(1)),
                    Double.parseDouble(nl.group(2)),
                    Double.parseDouble(nl.group(3)),
                    Double.parseDouble(nl.group(4))
                });
            } else if (kind.equals("linear") && li.matches()) {
                params.add(new double[] {Double.parseDouble(li.group(1)), Double.parseDouble(li.group(2))});
            }
            if (line.startsWith("Residual Sum of Squares:")) {
                rss = lastNumber(line);
            }
            if (line.startsWith("Residual Standard Deviation:")) {
                rsd = lastNumber(line);
            }
            if (line.trim().startsWith("Standard Deviation")
                    && kind.equals("linear")
                    && i > 0
                    && lines[i - 1].trim().equals("Residual")) {
                rsd = lastNumber(line);
            }
            if (kind.equals("nonlinear")) {
                String t = line.trim();
                if (t.startsWith("y =") || t.startsWith("y  =")) {
                    inModel = true;
                }
                if (inModel) {
                    if (t.isEmpty() || t.startsWith("Starting")) {
                        inModel = false;
                    } else {
                        model.append(' ').append(t);
                    }
                }
            }
        }
        List<double[]> rows = new ArrayList<>();
        for (int i = dataHeader + 1; i < lines.length; i++) {
            String t = lines[i].trim();
            if (t.isEmpty()) {
                continue;
            }
            String[] parts = t.split("\\s+");
            double[] row = new double[parts.length];
            for (int c = 0; c < parts.length; c++) {
                row[c] = Double.parseDouble(parts[c]);
            }
            rows.add(row);
        }
        int columns = rows.get(0).length;
        double[] y = new double[rows.size()];
        double[][] x = new double[columns - 1][rows.size()];
        for (int i = 0; i < rows.size(); i++) {
            y[i] = rows.get(i)[0];
            for (int c = 1; c < columns; c++) {
                x[c - 1][i] = rows.get(i)[c];
            }
        }
        int p = params.size();
        double[] certified = new double[p];
        double[] sd = new double[p];
        List<double[]> starts = new ArrayList<>();
        if (kind.equals("nonlinear")) {
            double[] s1 = new double[p];
            double[] s2 = new double[p];
            for (int k = 0; k < p; k++) {
                s1[k] = params.get(k)[0];
                s2[k] = params.get(k)[1];
                certified[k] = params.get(k)[2];
                sd[k] = params.get(k)[3];
            }
            starts = List.of(s1, s2);
        } else {
            for (int k = 0; k < p; k++) {
                certified[k] = params.get(k)[0];
                sd[k] = params.get(k)[1];
            }
        }
        String expression = model.toString()
                .trim()
                .replaceFirst("^y\\s*=", "")
                .replaceAll("\\+\\s*e\\s*$", "")
                .replace('[', '(')
                .replace(']', ')')
                .trim();
        return new NistDataset(name, expression, starts, certified, sd, rss, rsd, y, x);
    }

    private static double lastNumber(String line) {
        String[] parts = line.trim().split("\\s+");
        return Double.parseDouble(parts[parts.length - 1]);
    }

    /**
     * Log relative error: the number of significant digits in which an estimate agrees with a
     * certified value, capped at the digits certified (NIST StRD customary score).
     */
    static double logRelativeError(double estimate, double certified, double cap) {
        double error = certified == 0.0 ? Math.abs(estimate) : Math.abs(estimate - certified) / Math.abs(certified);
        if (error == 0.0) {
            return cap;
        }
        return Math.min(cap, -Math.log10(error));
    }
}
