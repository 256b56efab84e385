package org.headway.project;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

import java.nio.file.Path;
import java.util.List;
import java.util.OptionalDouble;
import org.headway.caution.Caution;
import org.headway.pipe.Catalog;
import org.headway.pipe.Fitting;
import org.headway.system.Segment;
import org.junit.jupiter.api.Test;

/**
 * Darby's 3-K size term in a project: K = K₁/Re + Kᵢ (1 + K_d/Dₙ^0.3) with Dₙ the NOMINAL diameter
 * in inches (Darby, R., Chemical Engineering Fluid Mechanics, 2nd ed., 2001, 3-K method, from
 * memory). Expected values are the printed formula evaluated here by hand; the catalog row used is
 * darby-elbow-90-standard-flanged (800, 0.091, 4.0, Darby's table, from memory).
 */
class DarbyNominalSizeTest {

    private static final double INCH = 0.0254;
    /** The formula is evaluated in the same double arithmetic: only rounding error. */
    private static final double ROUNDING = 1e-12;

    private static final String TEMPLATE = """
            {
              "format": "headway-project", "version": 2, "title": "invented 3-K check",
              "fluid": { "name": "water", "temperature": "20 degC" },
              "flow": "0.5 L/s",
              "elements": [ PIPE ]
            }
            """;

    private static Segment resolveOne(String pipe) {
        ResolvedProject r = ProjectResolver.resolve(
                ProjectFile.parse(TEMPLATE.replace("PIPE", pipe)), Catalog.bundled(), Path.of("."));
        return r.run().segments().get(0);
    }

    private static double darby(double reynolds, double inches) {
        return 800 / reynolds + 0.091 * (1 + 4.0 / Math.pow(inches, 0.3));
    }

    @Test
    void catalogPipeUsesItsNominalSizeNotItsBore() {
        Segment s = resolveOne("""
                { "id": "p", "kind": "pipe", "length": "3 m",
                  "pipe": { "material": "steel-commercial-new", "size": "1/2", "schedule": "40" },
                  "fittings": [ { "kind": "darby-elbow-90-standard-flanged", "count": 1 } ] }
                """);
        Fitting elbow = s.fittings().get(0).fitting();
        // NPS 1/2 Sch 40: bore 21.3 − 2 × 2.77 = 15.76 mm = 0.620 in (ASME B36.10M, from memory), Dn = 0.5 in
        assertEquals(darby(1e5, 0.5), elbow.lossCoefficient(1e5, s.innerDiameter()), ROUNDING);
        assertTrue(
                Math.abs(darby(1e5, s.innerDiameter() / INCH) - darby(1e5, 0.5)) > 0.01,
                "bore and nominal size must differ enough for this check to mean something");
        List<Caution> cautions = elbow.cautions(1e5, s.innerDiameter());
        assertTrue(cautions.isEmpty(), cautions.toString());
    }

    @Test
    void explicitBoreFallsBackToTheInnerDiameterWithACaution() {
        Segment s = resolveOne("""
                { "id": "p", "kind": "pipe", "length": "3 m", "innerDiameter": "15.76 mm", "roughness": "0.045 mm",
                  "fittings": [ { "kind": "darby-elbow-90-standard-flanged", "count": 1 } ] }
                """);
        Fitting elbow = s.fittings().get(0).fitting();
        assertEquals(darby(1e5, 15.76e-3 / INCH), elbow.lossCoefficient(1e5, s.innerDiameter()), ROUNDING);
        List<Caution> cautions = elbow.cautions(1e5, s.innerDiameter());
        assertEquals(1, cautions.size(), cautions.toString());
        assertEquals("three-k-nominal-size-unknown", cautions.get(0).code());
        assertTrue(
                cautions.get(0).message().contains("0.620 in"), cautions.get(0).message());
    }

    @Test
    void sizingEvaluatesTheFittingAtEachCandidatesNominalSize() {
        Segment s = resolveOne("""
                { "id": "p", "kind": "pipe", "length": "3 m",
                  "pipe": { "material": "steel-commercial-new", "size": "1/2", "schedule": "40" },
                  "fittings": [ { "kind": "darby-elbow-90-standard-flanged", "count": 1 } ] }
                """);
        // NPS 2 Sch 40 bore 52.5 mm (ASME B36.10M, from memory), nominal 2 in
        Segment resized = s.withPipe(
                0.0525, s.roughness(), s.roughnessLow(), s.roughnessHigh(), "NPS 2", OptionalDouble.of(2 * INCH));
        assertEquals(darby(1e5, 2.0), resized.fittings().get(0).fitting().lossCoefficient(1e5, 0.0525), ROUNDING);
        Segment unknown = s.withPipe(0.0525, s.roughness(), s.roughnessLow(), s.roughnessHigh(), "a bore");
        assertEquals(
                darby(1e5, 0.0525 / INCH), unknown.fittings().get(0).fitting().lossCoefficient(1e5, 0.0525), ROUNDING);
    }
}
