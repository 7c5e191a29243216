package barwright.physics.beam;

import barwright.model.AntiRollBar;
import barwright.model.SolidSection;
import barwright.physics.bar.BarResult;
import org.junit.jupiter.api.Test;

import java.util.List;

import static barwright.physics.beam.BarShapes.uBar;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/** The stress profile along the bar, for the chart, and the stresses in the result. */
class BeamBarProfileTest {
    private static final SolidSection SECTION = new SolidSection(0.0254);
    private static final double TRAVEL = 0.03;

    @Test
    void theProfileRunsFromTheLeftEndToTheRightEndAndHoldsTheMaximum() {
        List<Double> arms = List.of(0.25, 0.21);
        AntiRollBar bar = uBar(SECTION, 1.0, 0.8, arms, 0.04, 1);
        BeamBarSolution solution = BeamBar.solve(bar, TRAVEL);
        List<StressStation> profile = solution.stressProfile();
        BarResult result = solution.result();
        double setback = arms.get(0) - arms.get(1);

        assertThat(profile).hasSize(2 * solution.elementCount());
        assertThat(profile.get(0).distanceFromLeftLink()).isCloseTo(-setback, within(1e-12));
        double length = 1.0 + 2 * 0.25 - 4 * 0.04 + Math.PI * 0.04;
        assertThat(profile.get(profile.size() - 1).distanceFromLeftLink()).isCloseTo(length - setback, within(1e-9));
        for (int i = 1; i < profile.size(); i++) {
            assertThat(profile.get(i).distanceFromLeftLink()).isGreaterThanOrEqualTo(profile.get(i - 1).distanceFromLeftLink());
        }
        double peak = profile.stream().mapToDouble(StressStation::vonMisesStress).max().orElseThrow();
        // of mirror-image peaks equal to round-off (1e-6) the result reports the one nearer the left link
        assertThat(result.maxVonMisesStress()).isCloseTo(peak, within(1e-6 * peak));
        assertThat(result.maxStressAt()).isLessThan(length / 2);
        assertThat(result.safetyFactor()).isCloseTo(BarShapes.STEEL.yieldStrength() / result.maxVonMisesStress(),
                within(1e-12));
        // the stub beyond the link hole carries nothing (free body of the stub: no load on it)
        assertThat(profile.get(0).vonMisesStress()).isLessThan(1e-6 * peak);
    }

    @Test
    void eachStationCombinesBendingAndTorsionByVonMises() {
        // von Mises for a normal stress with a shear: sqrt(sigma^2 + 3 tau^2) (Shigley's Mechanical
        // Engineering Design, ch. 5, from memory: docs/validation.md, "Formulas named beside tests"); in the tube of a plain U-bar the torque is F a everywhere (statics)
        AntiRollBar bar = uBar(SECTION, 1.0, 0.8, 0.25, 0.04);
        BeamBarSolution solution = BeamBar.solve(bar, TRAVEL);
        double tubeShear = solution.result().linkForce() * 0.25 * SECTION.outerRadius() / SECTION.polarMoment();
        // the middle of the tube: halfway along the centreline, where the antisymmetric bending is zero
        double middle = (1.0 + 2 * 0.25 - 4 * 0.04 + Math.PI * 0.04) / 2;
        StressStation centre = solution.stressProfile().stream()
                .min((a, b) -> Double.compare(Math.abs(a.distanceFromLeftLink() - middle),
                        Math.abs(b.distanceFromLeftLink() - middle)))
                .orElseThrow();
        assertThat(centre.torsionalShearStress()).isCloseTo(tubeShear, within(1e-9 * tubeShear));
        assertThat(centre.normalStress()).isLessThan(1e-6 * tubeShear);
        assertThat(centre.vonMisesStress()).isCloseTo(Math.sqrt(3) * tubeShear, within(1e-6 * tubeShear));
    }

    @Test
    void noTravelMeansNoStressAndAnInfiniteSafetyFactor() {
        BarResult result = BeamBar.analyse(uBar(SECTION, 1.0, 0.8, 0.25, 0.04), 0);
        assertThat(result.linkRate()).isPositive();
        assertThat(result.maxVonMisesStress()).isZero();
        assertThat(result.safetyFactor()).isInfinite();
    }
}
