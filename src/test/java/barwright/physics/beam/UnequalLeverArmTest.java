package barwright.physics.beam;

import barwright.model.AntiRollBar;
import barwright.model.BarCentreline;
import barwright.model.Point3;
import barwright.model.SolidSection;
import barwright.physics.bar.BarResult;
import barwright.solver.frame.FrameSolution;
import barwright.solver.frame.FrameSolver;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

import java.util.List;

import static barwright.physics.beam.BarShapes.STEEL;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

/**
 * A bar whose two link points sit at different lever arms about the bushing axis (model.md 2, "Unequal
 * lever arms"), against a closed form derived here by Castigliano's theorem, independent of the frame.
 */
class UnequalLeverArmTest {
    private static final SolidSection SECTION = new SolidSection(0.022);
    private static final double LENGTH = 0.9;
    private static final double TRAVEL = 0.03;

    /**
     * Sharp corners with the bushings right at them, so the tube between the bushings is twisted and not
     * bent, and each arm is a cantilever from its corner. Link forces with no moment about the axis,
     * F_L = a_R / a and F_R = a_L / a (a the mean arm, opposite senses), twist the tube by the torque
     * T = a_L a_R / a. The strain energy of the unit load pattern (Castigliano's theorem with the usual
     * energies U = T^2 L / 2GJ of torsion and F^2 l^3 / 6EI of a tip-loaded cantilever, from memory:
     * docs/validation.md, "Formulas named beside tests") gives the
     * relative travel measure of model.md 2 as c = 2U = T^2 L / GJ + F_L^2 a_L^3 / 3EI + F_R^2 a_R^3 / 3EI,
     * and k_link = 1 / c. Straight elements and loads at nodes: the cubic elements are exact, so the
     * tolerance is round-off, 1e-9 relative.
     */
    @ParameterizedTest
    @ValueSource(doubles = {0.200, 0.205, 0.215, 0.2199})
    void linkRateMatchesCastiglianoForUnequalArms(double rightArm) {
        double leftArm = 0.200;
        AntiRollBar bar = bushingsAtCorners(leftArm, rightArm);
        double mean = (leftArm + rightArm) / 2;
        double gj = STEEL.shearModulus() * SECTION.polarMoment();
        double ei = STEEL.youngsModulus() * SECTION.bendingMoment();
        double torque = leftArm * rightArm / mean;
        double leftForce = rightArm / mean;
        double rightForce = leftArm / mean;
        double compliance = torque * torque * LENGTH / gj
                + leftForce * leftForce * Math.pow(leftArm, 3) / (3 * ei)
                + rightForce * rightForce * Math.pow(rightArm, 3) / (3 * ei);
        double expected = 1 / compliance;
        assertThat(BeamBar.analyse(bar, TRAVEL).linkRate()).isCloseTo(expected, within(1e-9 * expected));
    }

    @Test
    void theConstraintAgainstTurningCarriesNothingAndSidesSwapWithoutChange() {
        // statics: the link forces were chosen with no moment about the axis, so the constraint that stops
        // the bar turning in its bushings carries only round-off; a mirror image (arms swapped) is the same
        // bar seen from behind, so its rate is the same to round-off
        AntiRollBar bar = bushingsAtCorners(0.200, 0.215);
        BarFrame frame = BeamBar.frameOf(bar, BeamBar.DEFAULT_ELEMENT_LENGTH);
        FrameSolution unit = FrameSolver.solve(frame.model(), frame.unitLinkLoads());
        assertThat(Math.abs(frame.rotationConstraintMoment(unit))).isLessThan(1e-9 * frame.meanLeverArm());
        BarResult forward = BeamBar.analyse(bar, TRAVEL);
        BarResult swapped = BeamBar.analyse(bushingsAtCorners(0.215, 0.200), TRAVEL);
        assertThat(swapped.linkRate()).isCloseTo(forward.linkRate(), within(1e-9 * forward.linkRate()));
    }

    @Test
    void armsPointingOppositeWaysAreRefusedNamingBothLeverArms() {
        // a Z-shaped bar: a rigid turn in its bushings moves the links in opposite senses, which is roll,
        // so it gives no roll stiffness at all (statics of a rigid body, common practice to call it no
        // anti-roll bar); both lever arms are 200 mm and the message must not call them unequal
        List<Point3> points = List.of(new Point3(-0.2, LENGTH / 2, 0), new Point3(0, LENGTH / 2, 0),
                new Point3(0, -LENGTH / 2, 0), new Point3(0.2, -LENGTH / 2, 0));
        AntiRollBar zBar = bar(points);
        assertThatThrownBy(() -> BeamBar.frameOf(zBar, BeamBar.DEFAULT_ELEMENT_LENGTH))
                .isInstanceOf(IllegalArgumentException.class)
                .hasMessageContaining("point opposite ways")
                .hasMessageContaining("left link 200.0 mm")
                .hasMessageContaining("right link 200.0 mm")
                .hasMessageNotContaining("unequal");
    }

    @Test
    void armsFurtherApartThanTheModelledBandAreRefusedBeforeAnySolve() {
        // 200 and 230 mm: 14 % apart, past the 10 % band of BarFrame.MAX_LEVER_ARM_DIFFERENCE
        assertThatThrownBy(() -> BeamBar.frameOf(bushingsAtCorners(0.200, 0.230), BeamBar.DEFAULT_ELEMENT_LENGTH))
                .isInstanceOf(IllegalArgumentException.class)
                .hasMessageContaining("left 200.0 mm, right 230.0 mm, 14 % apart");
    }

    private static AntiRollBar bushingsAtCorners(double leftArm, double rightArm) {
        return bar(List.of(new Point3(-leftArm, LENGTH / 2, 0), new Point3(0, LENGTH / 2, 0),
                new Point3(0, -LENGTH / 2, 0), new Point3(-rightArm, -LENGTH / 2, 0)));
    }

    private static AntiRollBar bar(List<Point3> points) {
        BarCentreline centreline = new BarCentreline(points, 0,
                List.of(new Point3(0, LENGTH / 2, 0), new Point3(0, -LENGTH / 2, 0)), null, List.of(0.0));
        return new AntiRollBar(STEEL, SECTION, null, centreline, 0, BarShapes.LINK_MOTION_RATIO);
    }
}
