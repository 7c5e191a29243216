package barwright.physics.fatigue;

import barwright.model.SurfaceFinish;
import barwright.model.BarFatigueSettings;
import barwright.model.BarFatigueInputs;
import barwright.model.SpectrumLevel;

import barwright.model.AntiRollBar;
import barwright.model.AxlePosition;
import barwright.model.FatigueStrength;
import barwright.model.MaterialLibrary;
import barwright.model.TubeSection;
import barwright.model.Vehicle;
import barwright.physics.AnalysisPipeline;
import barwright.physics.TestCars;
import org.junit.jupiter.api.Test;

import java.util.List;

import static org.junit.jupiter.api.Assertions.assertEquals;
import static org.junit.jupiter.api.Assertions.assertThrows;
import static org.junit.jupiter.api.Assertions.assertTrue;

class TubeAgainstSolidTest {
    private static final double G = 9.80665;

    /**
     * A 22 mm solid U-bar and a 26 mm tube of the same polar moment J (so the same rate: both the torsion and
     * the bending terms of the closed form go with J, I = J / 2 for any round section) on the same spectrum. At
     * equal link force the outer-fibre stresses go as r / J (torsion T r / J, bending M r / I), so the tube's
     * stress is the solid's times 26 / 22 (independent closed form, exact to 1e-9). Its damage is then the
     * solid's times N_solid / N_tube, with each life from the log-log straight line through (10^3, f S_ut) and
     * (10^6, S_e) of each bar's own curve (S_e differs by the size factor of the outside diameter).
     */
    @Test
    void theTubeOfEqualRateWorksHarderAndLivesShorter() {
        Vehicle car = TestCars.clubCar();
        AntiRollBar solid = car.front().bar();
        double d = 0.022;
        double outer = 0.026;
        double inner = Math.pow(Math.pow(outer, 4) - Math.pow(d, 4), 0.25);
        AntiRollBar tube = solid.withSection(new TubeSection(outer, (outer - inner) / 2));
        Vehicle tubeCar = car.withFront(car.front().withBar(tube));

        AnalysisPipeline solidPipeline = new AnalysisPipeline(car);
        AnalysisPipeline tubePipeline = new AnalysisPipeline(tubeCar);
        assertEquals(solidPipeline.barResult(solid).linkRate(), tubePipeline.barResult(tube).linkRate(),
                1e-9 * solidPipeline.barResult(solid).linkRate(), "equal rate");
        double solidStress = BarStressHistory.stressPerAcceleration(solidPipeline, AxlePosition.FRONT);
        double tubeStress = BarStressHistory.stressPerAcceleration(tubePipeline, AxlePosition.FRONT);
        assertEquals(outer / d, tubeStress / solidStress, 1e-9);

        List<SpectrumLevel> spectrum = List.of(new SpectrumLevel(1.2 * G, 3), new SpectrumLevel(-1.2 * G, 3));
        BarFatigueInputs inputs = new BarFatigueInputs(MaterialLibrary.fatigueStrength("spring steel").orElseThrow(),
                new BarFatigueSettings(SurfaceFinish.AS_FORGED, 1.5));
        FatigueResult solidLife = FatigueAnalysis.ofSpectrum(solidPipeline, AxlePosition.FRONT, inputs,
                MeanStressCorrection.GOODMAN, spectrum, 90);
        FatigueResult tubeLife = FatigueAnalysis.ofSpectrum(tubePipeline, AxlePosition.FRONT, inputs,
                MeanStressCorrection.GOODMAN, spectrum, 90);
        assertTrue(solidLife.damagePerLap() > 0, "the spectrum must reach past the endurance limit");
        assertTrue(tubeLife.damagePerLap() > solidLife.damagePerLap());

        // the tube counts the same cycles at stresses 26/22 times the solid's; each cycle's life from the log-log
        // straight line with the Goodman-equivalent amplitude K_f s_a / (1 - K_f |s_m| / S_ut)
        assertEquals(solidLife.cycles().size(), tubeLife.cycles().size());
        double expectedSolid = 0;
        double expectedTube = 0;
        for (int i = 0; i < solidLife.cycles().size(); i++) {
            StressCycle s = solidLife.cycles().get(i);
            StressCycle t = tubeLife.cycles().get(i);
            assertEquals(outer / d, t.range() / s.range(), 1e-9);
            assertEquals(s.count(), t.count());
            expectedSolid += s.count() / life(solidLife.curve(), s, 1);
            expectedTube += s.count() / life(tubeLife.curve(), s, outer / d);
        }
        assertEquals(expectedSolid, solidLife.damagePerLap(), 1e-9 * expectedSolid);
        double ratio = expectedTube / expectedSolid;
        assertEquals(ratio, tubeLife.damagePerLap() / solidLife.damagePerLap(), 1e-9 * ratio);
    }

    /** Cycles to failure at K_f = 1.5, Goodman, on a log-log straight line (independent of Basquin's a and b). */
    private static double life(SnCurve curve, StressCycle cycle, double stressRatio) {
        double amplitude = 1.5 * stressRatio * cycle.amplitude()
                / (1 - 1.5 * stressRatio * Math.abs(cycle.mean()) / curve.ultimateStrength());
        if (amplitude < curve.enduranceLimit()) {
            return Double.POSITIVE_INFINITY;
        }
        double top = curve.strengthAt(1e3);
        return Math.pow(10, 3 + 3 * Math.log10(top / amplitude) / Math.log10(top / curve.enduranceLimit()));
    }

    @Test
    void anEnduranceLimitAboveTheUltimateStrengthIsRefused() {
        assertThrows(IllegalArgumentException.class, () -> new FatigueStrength(600e6, 700e6, 1e6));
    }
}
