package barwright.physics.beam;

import barwright.model.AntiRollBar;
import barwright.model.SolidSection;
import barwright.model.TubeSection;
import org.junit.jupiter.api.Test;

import java.util.List;

import static barwright.physics.beam.BarShapes.droppedCentreBar;
import static barwright.physics.beam.BarShapes.sweptBar;
import static barwright.physics.beam.BarShapes.uBar;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * Mesh convergence at the default element length (the criterion): halving it changes the rate by
 * less than 0.1 %. The bars have realistic bend radii, 1 to 3 bar diameters (common practice for bent
 * bars), so that the bends, the only part a finer mesh changes, are cut into more than the minimum 8 chords.
 */
class BeamBarConvergenceTest {
    private static final double TRAVEL = 0.02;
    private static final double CONVERGED = 0.001;

    static List<AntiRollBar> realisticBars() {
        SolidSection solid = new SolidSection(0.022);
        return List.of(
                uBar(solid, 1.0, 0.8, 0.25, 0.022),
                uBar(solid, 1.0, 0.8, 0.25, 0.066),
                uBar(new TubeSection(0.030, 0.004), 1.1, 0.8, 0.22, 0.06),
                sweptBar(solid, 1.0, 0.8, 0.25, Math.toRadians(20), 0.05),
                droppedCentreBar(solid, 1.0, 0.9, 0.25, 0.3, 0.06, 0.04));
    }

    @Test
    void halvingTheDefaultElementChangesTheRateByLessThanATenthOfAPercent() {
        for (AntiRollBar bar : realisticBars()) {
            BeamBarSolution standard = BeamBar.solve(bar, TRAVEL);
            BeamBarSolution finer = BeamBar.solve(bar, TRAVEL, BeamBar.DEFAULT_ELEMENT_LENGTH / 2);
            assertThat(finer.elementCount()).isGreaterThan(standard.elementCount());
            double rate = standard.result().linkRate();
            assertThat(finer.result().linkRate()).isCloseTo(rate, within(CONVERGED * rate));
            // the stress check converges too (it sits at element ends, where the resultants are exact for a
            // given geometry); 0.5 % for the peak, which can sit in a bend
            double stress = standard.result().maxVonMisesStress();
            assertThat(finer.result().maxVonMisesStress()).isCloseTo(stress, within(0.005 * stress));
        }
    }

    @Test
    void aCoarseMeshOfTheBendsIsVisiblyWorse() {
        // the check above can fail: a 10 cm element with large bends (only the minimum 8 chords each, the
        // straights unaffected) is further from the fine answer than the default mesh is
        AntiRollBar bar = uBar(new SolidSection(0.022), 1.0, 0.7, 0.25, 0.1);
        double fine = BeamBar.solve(bar, TRAVEL, BeamBar.DEFAULT_ELEMENT_LENGTH / 4).result().linkRate();
        double standard = BeamBar.solve(bar, TRAVEL).result().linkRate();
        double coarse = BeamBar.solve(bar, TRAVEL, 0.1).result().linkRate();
        assertThat(Math.abs(coarse / fine - 1)).isGreaterThan(Math.abs(standard / fine - 1));
    }
}
