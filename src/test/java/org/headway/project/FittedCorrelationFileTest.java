package org.headway.project;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import org.headway.caution.InputException;
import org.headway.correlation.FittedCorrelation;
import org.headway.fitting.FitForm;
import org.headway.fitting.LeastSquaresFitter;
import org.headway.fitting.Observations;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

/** Saving and loading fitted correlations. */
class FittedCorrelationFileTest {

    @TempDir
    Path dir;

    private static FittedCorrelation sample() {
        double[] x = {1, 2, 3, 4, 5, 6};
        double[] y = {2.1, 3.9, 6.2, 7.8, 10.1, 12.2};
        return FittedCorrelation.of(
                new LeastSquaresFitter().fit(Observations.of("dp", y, List.of("Q"), x), new FitForm.Polynomial(2)));
    }

    @Test
    void savedFitReloadsIdentically() throws Exception {
        FittedCorrelation fit = sample();
        Path file = dir.resolve("fit.json");
        FittedCorrelationFile.save(file, fit);
        FittedCorrelation back = FittedCorrelationFile.load(file);
        assertEquals(fit, back);
        assertEquals(fit.evaluate(3.5), back.evaluate(3.5), 0.0);
        try (var files = Files.list(dir)) {
            assertEquals(List.of(file), files.toList(), "no temporary file left behind");
        }
        FittedCorrelationFile.save(file, fit);
        assertEquals(fit, FittedCorrelationFile.load(file), "overwrite in place");
    }

    @Test
    void unknownKeyIsAnErrorWithItsJsonPath() throws Exception {
        Path file = dir.resolve("fit.json");
        FittedCorrelationFile.save(file, sample());
        String text = Files.readString(file).replace("\"standard_error\"", "\"std_err\"");
        Files.writeString(file, text);
        InputException e = assertThrows(InputException.class, () -> FittedCorrelationFile.load(file));
        assertTrue(e.getMessage().contains("$.parameters[0].std_err: unknown key"), e.getMessage());
        assertTrue(e.getMessage().startsWith(file.toString()), e.getMessage());
    }

    @Test
    void wrongTypeAndBrokenJsonAreReported() throws Exception {
        Path file = dir.resolve("fit.json");
        FittedCorrelationFile.save(file, sample());
        Files.writeString(file, Files.readString(file).replace("\"points\" : 6", "\"points\" : \"six\""));
        InputException e = assertThrows(InputException.class, () -> FittedCorrelationFile.load(file));
        assertTrue(e.getMessage().contains("$.statistics.points: expected a whole number"), e.getMessage());
        Files.writeString(file, "{ \"format\": ");
        InputException broken = assertThrows(InputException.class, () -> FittedCorrelationFile.load(file));
        assertTrue(broken.getMessage().contains("not valid JSON"), broken.getMessage());
    }
}
