package barwright.physics.fatigue;

import barwright.model.SurfaceFinish;

import org.junit.jupiter.api.Test;

import java.util.ArrayList;
import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertTrue;

class SnCurveTest {
    private static final double KPSI = 6.894757e6;

    /**
     * Shigley's Mechanical Engineering Design, 9th ed., Example 6-2 as read on a web copy of the book
     * (docs/validation.md, Fatigue, [R3]): a 1050 HR steel, S_ut = 90 kpsi, S'_e = 45 kpsi, f = 0.86 read from the
     * book's chart, a = 133.1 kpsi, b = -0.0785, S_f = 64.6 kpsi at 10^4 cycles. Tolerance 1 %: the book reads f
     * off a chart to two figures, the program uses the chart's fit.
     */
    @Test
    void basquinLineMatchesTheRecalledWorkedExample() {
        SnCurve curve = SnCurve.through(90 * KPSI, 45 * KPSI, 1e6);
        assertEquals(133.1, curve.coefficient() / KPSI, 1.331);
        assertEquals(-0.0785, curve.exponent(), 0.000785);
        assertEquals(64.6, curve.strengthAt(1e4) / KPSI, 0.646);
    }

    /**
     * The same example's part (c): with the book's a = 133.1 kpsi and b = -0.0785, a fully reversed 55 kpsi lasts
     * N = 77,500 cycles ([R3], read). Tolerance 0.5 %: the book rounds N to three figures.
     */
    @Test
    void lifeAtAStressMatchesThePublishedExample() {
        SnCurve curve = new SnCurve(90 * KPSI, 45 * KPSI, 1e6, 133.1 * KPSI, -0.0785);
        assertEquals(77_500, curve.cyclesToFailure(55 * KPSI), 0.005 * 77_500);
    }

    /**
     * Goodman against a published worked example: Marks' Calculation for Machine Design, Example 2 (SI), steps 12
     * and 13, as read on a web copy ([R4]): S_e = 329.0 MPa, S_ut = 735 MPa, sigma_a = 124.3 MPa, sigma_m = 198.9 MPa
     * give 1/n = 0.649, n = 1.54 on the Goodman line, and, holding the mean, n_m = S_e (1 - sigma_m / S_ut) / sigma_a
     * = 1.93 -- the endurance limit over the Goodman-equivalent fully reversed amplitude. Tolerance 0.5 %: the book
     * gives three figures.
     */
    @Test
    void goodmanMatchesThePublishedExample() {
        SnCurve curve = SnCurve.through(735e6, 329.0e6, 1e6);
        assertEquals(1.54, FatigueLife.goodmanSafetyFactor(124.3e6, 198.9e6, curve), 0.005 * 1.54);
        double equivalent = MeanStressCorrection.GOODMAN.equivalentAmplitude(124.3e6, 198.9e6, 735e6);
        assertEquals(1.93, curve.enduranceLimit() / equivalent, 0.005 * 1.93);
    }

    /**
     * Constant amplitude: N cycles at amplitude S do damage N / N_f with N_f from the straight line in log-log
     * axes through (10^3, f S_ut) and (10^6, S_e) -- written here as interpolation of log N, an independent form
     * of Basquin's a N^b. Exact to 1e-9 relative (floating point only).
     */
    @Test
    void constantAmplitudeDamageIsBasquinLife() {
        SnCurve curve = SnCurve.through(1000e6, 400e6, 1e6);
        double top = curve.strengthAt(1e3);
        double amplitude = 550e6;
        double expectedLife = Math.pow(10, 3 + 3 * Math.log10(top / amplitude) / Math.log10(top / 400e6));
        int n = 500;
        List<StressCycle> cycles = new ArrayList<>();
        double[] history = new double[2 * n + 1];
        for (int i = 0; i < history.length; i++) {
            history[i] = i % 2 == 0 ? -amplitude : amplitude;
        }
        cycles.addAll(Rainflow.count(history));
        FatigueResult result = FatigueLife.assess(cycles, curve, 1, MeanStressCorrection.GOODMAN, amplitude, 60);
        assertEquals(n / expectedLife, result.damagePerLap(), 1e-9 * n / expectedLife);
        assertEquals(expectedLife / n, result.lapsToFailure(), 1e-9 * expectedLife / n);
        assertEquals(expectedLife / n * 60 / 3600, result.hoursToFailure(), 1e-9 * expectedLife / n);
    }

    /** Below the endurance limit a cycle does no damage: infinite life (the knee of the S-N line). */
    @Test
    void belowTheEnduranceLimitTheLifeIsInfinite() {
        SnCurve curve = SnCurve.through(1000e6, 400e6, 1e6);
        FatigueResult result = FatigueLife.assess(List.of(new StressCycle(790e6, 0, 1000)), curve, 1,
                MeanStressCorrection.GOODMAN, 395e6, 60);
        assertEquals(0, result.damagePerLap());
        assertTrue(result.infiniteLife());
    }

    /**
     * Goodman line, independent hand calculation done for this test (not a published example): S_e = 400 MPa,
     * S_ut = 1000 MPa, sigma_a = 200 MPa, sigma_m = 300 MPa: n = 1 / (200/400 + 300/1000) = 1 / 0.8 = 1.25; the
     * equivalent reversed stress 200 / (1 - 0.3) = 285.714 MPa; Gerber 200 / (1 - 0.09) = 219.780 MPa. Exact
     * to 1e-12.
     */
    @Test
    void goodmanAndGerberByHand() {
        SnCurve curve = SnCurve.through(1000e6, 400e6, 1e6);
        assertEquals(1.25, FatigueLife.goodmanSafetyFactor(200e6, 300e6, curve), 1e-12);
        assertEquals(285.714285714e6, MeanStressCorrection.GOODMAN.equivalentAmplitude(200e6, 300e6, 1000e6), 1);
        assertEquals(219.780219780e6, MeanStressCorrection.GERBER.equivalentAmplitude(200e6, 300e6, 1000e6), 1);
    }

    /**
     * Marin factors against Shigley's 9th ed. as read on a web copy ([R3]): Example 6-3, a machined surface at
     * S_ut = 520 MPa gives k_a = 0.860; the size factor of a 32 mm round bar in the book's other form of Eq. (6-20),
     * (d/7.62)^-0.107 (the program uses 1.24 d^-0.107, the same fit rounded). Tolerance 0.5 %.
     */
    @Test
    void marinFactorsMatchThePublishedExamples() {
        assertEquals(0.860, SurfaceFinish.MACHINED.surfaceFactor(520e6), 0.0043);
        double bookForm = Math.pow(32 / 7.62, -0.107);
        assertEquals(bookForm, SnCurve.sizeFactor(0.032), 0.005 * bookForm);
    }
}
