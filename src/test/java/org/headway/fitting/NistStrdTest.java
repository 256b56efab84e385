package org.headway.fitting;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.LinkedHashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.TreeMap;
import org.junit.jupiter.api.AfterAll;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

/**
 * Accuracy of the fitter against the NIST Statistical Reference Datasets (certified values from the
 * .dat files in src/test/resources/org/headway/fitting/nist-strd, see SOURCE.md there).
 *
 * <p>Score: LRE = −log10(|estimate − certified| / |certified|), capped at the certified digits
 * (11 nonlinear, 15 linear). Writes the table to target/nist-lre.txt.
 */
class NistStrdTest {

    /** Certified nonlinear values have 11 significant digits; we require 7 of them (task target). */
    static final double NONLINEAR_MIN_LRE = 7.0;

    static final double NONLINEAR_CAP = 11.0;
    /** Certified linear values have 15 significant digits; we require 9 for coefficients. */
    static final double LINEAR_MIN_LRE = 9.0;
    /** … and 7 for their certified standard deviations. */
    static final double LINEAR_SE_MIN_LRE = 7.0;

    static final double LINEAR_CAP = 15.0;

    /**
     * Nonlinear standard deviations are certified to 11 digits but depend on the linearisation at the
     * solution; 4 agreeing digits (LRE ≥ 4) is what a correct Jacobian at a correct minimum gives
     * (common practice in StRD reviews, no single source).
     */
    static final double NONLINEAR_SE_MIN_LRE = 4.0;

    /** Levenberg–Marquardt iterations a certified problem may take from either NIST start. */
    static final int NONLINEAR_ITERATION_CAP = 1_000;

    private static final Map<String, String> ROWS = new TreeMap<>();

    @ParameterizedTest
    @ValueSource(
            strings = {
                "BoxBOD",
                "Chwirut2",
                "DanWood",
                "ENSO",
                "Eckerle4",
                "Gauss3",
                "Kirby2",
                "Lanczos3",
                "MGH09",
                "MGH17",
                "Misra1a",
                "Misra1c",
                "Thurber"
            })
    void nonlinearSetReachesCertifiedValuesFromBothStarts(String name) {
        NistDataset set = NistDataset.load("nonlinear", name);
        List<String> names = new ArrayList<>();
        for (int k = 1; k <= set.certifiedValues().length; k++) {
            names.add("b" + k);
        }
        Observations data = Observations.of("y", set.y(), List.of("x"), set.x()[0]);
        List<String> failures = new ArrayList<>();
        for (int s = 0; s < 2; s++) {
            Map<String, Double> start = new LinkedHashMap<>();
            for (int k = 0; k < names.size(); k++) {
                start.put(names.get(k), set.starts().get(s)[k]);
            }
            FitResult fit = new LeastSquaresFitter().fit(data, new FitForm.UserExpression(set.model(), start));
            double minParameter = NONLINEAR_CAP;
            double minSd = NONLINEAR_CAP;
            for (int k = 0; k < names.size(); k++) {
                FittedParameter p = fit.parameters().get(k);
                minParameter = Math.min(
                        minParameter, NistDataset.logRelativeError(p.value(), set.certifiedValues()[k], NONLINEAR_CAP));
                minSd = Math.min(
                        minSd,
                        NistDataset.logRelativeError(
                                p.standardError(), set.certifiedStandardDeviations()[k], NONLINEAR_CAP));
            }
            double rss = NistDataset.logRelativeError(
                    fit.residualSumOfSquares(), set.certifiedResidualSumOfSquares(), NONLINEAR_CAP);
            double rsd = NistDataset.logRelativeError(
                    fit.residualStandardDeviation(), set.certifiedResidualStandardDeviation(), NONLINEAR_CAP);
            ROWS.put(
                    "nonlinear " + name + " start " + (s + 1),
                    String.format(
                            Locale.ROOT,
                            "| %-9s | %d | %5.1f | %5.1f | %5.1f | %5.1f | %4d | %s |",
                            name,
                            s + 1,
                            minParameter,
                            minSd,
                            rss,
                            rsd,
                            fit.iterations(),
                            fit.converged() ? "yes" : "no"));
            if (minParameter < NONLINEAR_MIN_LRE || rss < NONLINEAR_MIN_LRE) {
                failures.add(String.format(
                        Locale.ROOT, "start %d: parameter LRE %.1f, RSS LRE %.1f", s + 1, minParameter, rss));
            }
            if (minSd < NONLINEAR_SE_MIN_LRE) {
                failures.add(String.format(Locale.ROOT, "start %d: standard deviation LRE %.1f", s + 1, minSd));
            }
            if (!fit.converged()) {
                failures.add("start " + (s + 1) + ": not converged");
            }
            if (fit.iterations() > NONLINEAR_ITERATION_CAP) {
                failures.add("start " + (s + 1) + ": " + fit.iterations() + " iterations");
            }
        }
        assertTrue(failures.isEmpty(), name + ": " + failures);
    }

    @ParameterizedTest
    @ValueSource(strings = {"Longley", "NoInt1", "Norris", "Pontius", "Wampler1", "Wampler4"})
    void linearSetReachesCertifiedValues(String name) {
        NistDataset set = NistDataset.load("linear", name);
        FitForm form;
        Observations data;
        switch (name) {
            case "Longley" -> {
                form = new FitForm.Linear();
                data = Observations.of("y", set.y(), List.of("x1", "x2", "x3", "x4", "x5", "x6"), set.x());
            }
            case "NoInt1" -> {
                form = new FitForm.ThroughOrigin();
                data = Observations.of("y", set.y(), List.of("x"), set.x()[0]);
            }
            case "Norris" -> {
                form = new FitForm.Linear();
                data = Observations.of("y", set.y(), List.of("x"), set.x()[0]);
            }
            case "Pontius" -> {
                form = new FitForm.Polynomial(2);
                data = Observations.of("y", set.y(), List.of("x"), set.x()[0]);
            }
            default -> {
                form = new FitForm.Polynomial(5);
                data = Observations.of("y", set.y(), List.of("x"), set.x()[0]);
            }
        }
        FitResult fit = new LeastSquaresFitter().fit(data, form);
        assertEquals(set.certifiedValues().length, fit.parameters().size(), "parameter count");
        double minParameter = LINEAR_CAP;
        double minSd = LINEAR_CAP;
        boolean exact = true;
        for (int k = 0; k < fit.parameters().size(); k++) {
            FittedParameter p = fit.parameters().get(k);
            minParameter = Math.min(
                    minParameter, NistDataset.logRelativeError(p.value(), set.certifiedValues()[k], LINEAR_CAP));
            if (set.certifiedStandardDeviations()[k] != 0.0) {
                exact = false;
                minSd = Math.min(
                        minSd,
                        NistDataset.logRelativeError(
                                p.standardError(), set.certifiedStandardDeviations()[k], LINEAR_CAP));
            }
        }
        double rsd = NistDataset.logRelativeError(
                fit.residualStandardDeviation(), set.certifiedResidualStandardDeviation(), LINEAR_CAP);
        ROWS.put(
                "linear " + name,
                String.format(
                        Locale.ROOT,
                        "| %-9s | - | %5.1f | %5s | %5s | %5s | %4d | %s |",
                        name,
                        minParameter,
                        exact ? "exact" : String.format(Locale.ROOT, "%5.1f", minSd),
                        "",
                        exact ? "exact" : String.format(Locale.ROOT, "%5.1f", rsd),
                        fit.iterations(),
                        "yes"));
        assertTrue(minParameter >= LINEAR_MIN_LRE, name + " coefficient LRE " + minParameter);
        if (!exact) {
            assertTrue(minSd >= LINEAR_SE_MIN_LRE, name + " standard error LRE " + minSd);
        } else {
            // Wampler1 is an exact fit: certified SDs and residual SD are 0.
            assertTrue(
                    fit.residualStandardDeviation() < 1e-6, "exact fit residual SD " + fit.residualStandardDeviation());
        }
    }

    @AfterAll
    static void writeTable() throws IOException {
        StringBuilder s = new StringBuilder();
        s.append("NIST StRD log relative errors (LRE, digits; capped at 11 nonlinear / 15 linear)\n");
        s.append(
                "| set       | start | min LRE parameters | min LRE std. dev. | LRE RSS | LRE res. SD | iterations | converged |\n");
        s.append("|---|---|---|---|---|---|---|---|\n");
        ROWS.values().forEach(r -> s.append(r).append('\n'));
        Path out = Path.of("target", "nist-lre.txt");
        Files.createDirectories(out.getParent());
        Files.writeString(out, s.toString());
    }
}
