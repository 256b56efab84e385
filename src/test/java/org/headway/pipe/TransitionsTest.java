package org.headway.pipe;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

import org.headway.caution.InputException;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

class TransitionsTest {

    private static final double ROUNDING = 1e-12;
    private static final double G = 9.80665;

    @ParameterizedTest
    @ValueSource(doubles = {0.1, 0.3, 0.5, 0.7, 0.9, 0.99})
    void bordaCarnotEqualsTheMomentumBalanceHeadLoss(double beta) {
        // Borda–Carnot: h = (V1 − V2)²/(2g) with continuity V2 = V1 β² (momentum balance, exact for
        // uniform profiles); the K returned must reproduce it with the upstream velocity.
        double d1 = 0.05;
        double d2 = d1 / beta;
        double v1 = 3.0;
        double v2 = v1 * beta * beta;
        TransitionLoss loss = Transitions.suddenExpansion(d1, d2);
        assertEquals(ReferenceSection.UPSTREAM, loss.referredTo());
        double headLoss = (v1 - v2) * (v1 - v2) / (2 * G);
        assertEquals(headLoss, loss.lossCoefficient() * v1 * v1 / (2 * G), ROUNDING);
        // referred to the downstream velocity: K2 = (1/β² − 1)²
        double k2 = Math.pow(1 / (beta * beta) - 1, 2);
        assertEquals(k2, loss.lossCoefficientReferredTo(ReferenceSection.DOWNSTREAM), 1e-9 * k2);
        assertEquals(headLoss, k2 * v2 * v2 / (2 * G), 1e-9 * headLoss);
    }

    @Test
    void bordaCarnotLimits() {
        // β → 0 is the exit into a tank (K = 1), β = 1 is no change (K = 0)
        assertEquals(1.0, Transitions.suddenExpansion(1e-6, 1.0).lossCoefficient(), 1e-11);
        assertEquals(0.0, Transitions.suddenExpansion(0.1, 0.1).lossCoefficient(), 0.0);
    }

    @Test
    void suddenContractionCraneForm() {
        // Crane TP-410 (1988) p. A-26: K = 0.5 (1 − β²) referred to the small (downstream) pipe
        // (from memory); d2/d1 = 0.5 → 0.5 * 0.75 = 0.375 (hand calculation)
        TransitionLoss loss = Transitions.suddenContraction(0.1, 0.05);
        assertEquals(ReferenceSection.DOWNSTREAM, loss.referredTo());
        assertEquals(0.375, loss.lossCoefficient(), ROUNDING);
        // β → 0 gives the sharp-edged entrance K = 0.5 (common textbook value)
        assertEquals(0.5, Transitions.suddenContraction(1.0, 1e-6).lossCoefficient(), 1e-11);
        assertEquals(0.0, Transitions.suddenContraction(0.1, 0.1).lossCoefficient(), 0.0);
        // referred to the larger upstream pipe, whose velocity is β² times smaller: K1 = K2 / β⁴
        assertEquals(0.375 * 16, loss.lossCoefficientReferredTo(ReferenceSection.UPSTREAM), ROUNDING);
    }

    @Test
    void gradualFormsMeetTheSuddenOnesAtTheirLimits() {
        double d1 = 0.05;
        double d2 = 0.1;
        assertEquals(
                Transitions.suddenExpansion(d1, d2).lossCoefficient(),
                Transitions.gradualExpansion(d1, d2, Math.PI).lossCoefficient(),
                ROUNDING);
        assertEquals(
                Transitions.suddenContraction(d2, d1).lossCoefficient(),
                Transitions.gradualContraction(d2, d1, Math.PI).lossCoefficient(),
                ROUNDING);
        // at θ = 45° the two Crane branches nearly meet: 2.6 sin 22.5° = 0.995 vs 1 and
        // 0.8 sin 22.5° = 0.306 vs 0.5 √sin 22.5° = 0.309 (hand calculation)
        double below = Math.toRadians(45);
        double above = Math.toRadians(45.0001);
        double expBelow = Transitions.gradualExpansion(d1, d2, below).lossCoefficient();
        double expAbove = Transitions.gradualExpansion(d1, d2, above).lossCoefficient();
        assertEquals(1.0, expBelow / expAbove, 0.006);
        double conBelow = Transitions.gradualContraction(d2, d1, below).lossCoefficient();
        double conAbove = Transitions.gradualContraction(d2, d1, above).lossCoefficient();
        assertEquals(1.0, conBelow / conAbove, 0.011);
    }

    @Test
    void gentleConeLosesLessThanSuddenExpansion() {
        // Crane θ ≤ 45°: K = 2.6 sin(θ/2)(1 − β²)²; θ = 10°, β = 0.5: 2.6 * 0.0871557 * 0.5625 = 0.127465
        TransitionLoss cone = Transitions.gradualExpansion(0.05, 0.1, Math.toRadians(10));
        assertEquals(2.6 * Math.sin(Math.toRadians(5)) * 0.5625, cone.lossCoefficient(), ROUNDING);
        assertEquals(0.127465, cone.lossCoefficient(), 1e-6);
        assertTrue(
                cone.lossCoefficient() < Transitions.suddenExpansion(0.05, 0.1).lossCoefficient());
    }

    @Test
    void lowReynoldsIsFlagged() {
        assertEquals(
                "transition-low-reynolds", Transitions.cautions(3000).get(0).code());
        assertTrue(Transitions.cautions(3000).get(0).message().contains("Re = 3000"));
        assertTrue(Transitions.cautions(1e5).isEmpty());
        assertThrows(InputException.class, () -> Transitions.cautions(-1));
    }

    @Test
    void badGeometryIsRejected() {
        InputException reversed = assertThrows(InputException.class, () -> Transitions.suddenExpansion(0.1, 0.05));
        assertTrue(reversed.getMessage().startsWith("downstreamDiameter: an expansion needs"), reversed.getMessage());
        InputException contraction = assertThrows(InputException.class, () -> Transitions.suddenContraction(0.05, 0.1));
        assertTrue(contraction.getMessage().contains("not larger than the upstream"), contraction.getMessage());
        InputException angle = assertThrows(InputException.class, () -> Transitions.gradualExpansion(0.05, 0.1, 4.0));
        assertEquals("includedAngle: the included cone angle must lie in (0, π] rad, got 4.0 rad", angle.getMessage());
        assertThrows(InputException.class, () -> Transitions.gradualContraction(0.1, 0.05, 0.0));
        assertThrows(InputException.class, () -> Transitions.suddenExpansion(-0.1, 0.2));
    }
}
