package barwright.solver.frame;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

import java.util.ArrayList;
import java.util.List;

import static barwright.solver.frame.FrameFixtures.ROUND_BAR;
import static barwright.solver.frame.FrameFixtures.chain;
import static barwright.solver.frame.FrameFixtures.line;
import static barwright.solver.frame.FrameFixtures.relative;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * The solver against textbook closed forms for straight members. Cubic Hermite elements reproduce the exact
 * Euler-Bernoulli solution at the nodes when loads act at nodes only (Przemieniecki, Theory of Matrix
 * Structural Analysis, ch. 5), so only round-off separates the two: the tolerance is 1e-9 relative.
 */
class FrameClosedFormTest {
    private static final double EXACT = 1e-9;
    /** a member along a skewed direction, so that the transformation to global axes is exercised */
    private static final Vector3 SKEW_END = new Vector3(0.6, 0.9, 0.3);
    private static final double LOAD = 250;

    @ParameterizedTest
    @ValueSource(ints = {1, 3, 10})
    void cantileverTipDeflectionAndSlopeMatchTheHandbook(int elementCount) {
        List<Vector3> nodes = line(Vector3.ZERO, SKEW_END, elementCount);
        Vector3 axis = SKEW_END.unit();
        Vector3 across = axis.cross(Vector3.UNIT_Z).unit();
        FrameModel model = new FrameModel(nodes, chain(nodes.size(), ROUND_BAR, null), Support.clamp(0));
        int tip = nodes.size() - 1;

        FrameSolution solution = FrameSolver.solve(model, List.of(NodalForce.force(tip, across.times(LOAD))));

        double length = SKEW_END.length();
        double rigidity = ROUND_BAR.youngsModulus() * ROUND_BAR.secondMomentY();
        // cantilever with an end load: tip deflection P L^3 / (3 E I), tip slope P L^2 / (2 E I)
        // (Gere & Goodno, Mechanics of Materials, appendix table of cantilever deflections; Roark's
        // Formulas for Stress and Strain, table of beam deflections, cantilever with end load; from memory:
        // docs/validation.md, "Formulas named beside tests")
        double deflection = LOAD * Math.pow(length, 3) / (3 * rigidity);
        double slope = LOAD * length * length / (2 * rigidity);
        Vector3 tipMove = solution.translation(tip);
        assertThat(tipMove.dot(across)).isCloseTo(deflection, within(relative(deflection, EXACT)));
        assertThat(tipMove.minus(across.times(tipMove.dot(across))).length()).isLessThan(deflection * EXACT);
        Vector3 tipTurn = solution.displacements().get(tip).rotation();
        assertThat(tipTurn.dot(axis.cross(across))).isCloseTo(slope, within(relative(slope, EXACT)));
    }

    @Test
    void shaftTwistAndStretchMatchTheHandbook() {
        List<Vector3> nodes = line(Vector3.ZERO, SKEW_END, 4);
        Vector3 axis = SKEW_END.unit();
        int tip = nodes.size() - 1;
        FrameModel model = new FrameModel(nodes, chain(nodes.size(), ROUND_BAR, null), Support.clamp(0));
        double torque = 120;
        double pull = 8000;

        FrameSolution solution = FrameSolver.solve(model,
                List.of(new NodalForce(tip, axis.times(pull), axis.times(torque))));

        double length = SKEW_END.length();
        // twist of a round shaft T L / (G J); stretch of a bar P L / (E A) (Gere & Goodno, Mechanics of
        // Materials, chapters on torsion and axially loaded members; Roark, torsion of circular shafts)
        double twist = torque * length / (ROUND_BAR.shearModulus() * ROUND_BAR.torsionConstant());
        double stretch = pull * length / (ROUND_BAR.youngsModulus() * ROUND_BAR.area());
        assertThat(solution.displacements().get(tip).rotation().dot(axis)).isCloseTo(twist, within(relative(twist, EXACT)));
        assertThat(solution.translation(tip).dot(axis)).isCloseTo(stretch, within(relative(stretch, EXACT)));
        SectionForces root = solution.elementForces().get(0).start();
        assertThat(root.torque()).isCloseTo(torque, within(relative(torque, EXACT)));
        assertThat(root.axial()).isCloseTo(pull, within(relative(pull, EXACT)));
    }

    @Test
    void unequalSecondMomentsActInTheirOwnPlanes() {
        // a member along X has local axes x' = X, y' = Y, z' = Z (package description); I_z resists loads
        // along Y, I_y loads along Z: cantilever P L^3 / (3 E I) in each plane (Gere & Goodno, as above)
        SectionProperties flat = new SectionProperties(200e9, 77e9, 3e-4, 2e-8, 9e-8, 5e-8);
        List<Vector3> nodes = line(Vector3.ZERO, new Vector3(0.8, 0, 0), 5);
        FrameModel model = new FrameModel(nodes, chain(nodes.size(), flat, null), Support.clamp(0));
        int tip = nodes.size() - 1;

        FrameSolution solution = FrameSolver.solve(model, List.of(NodalForce.force(tip, new Vector3(0, LOAD, LOAD))));

        double cube = Math.pow(0.8, 3);
        double alongY = LOAD * cube / (3 * flat.youngsModulus() * flat.secondMomentZ());
        double alongZ = LOAD * cube / (3 * flat.youngsModulus() * flat.secondMomentY());
        assertThat(solution.translation(tip).y()).isCloseTo(alongY, within(relative(alongY, EXACT)));
        assertThat(solution.translation(tip).z()).isCloseTo(alongZ, within(relative(alongZ, EXACT)));
    }

    @Test
    void rootResultantsOfACantileverFollowStatics() {
        // free body of the part beyond a cut at x: M_y(x) = P (L - x), V_z = -P for a tip load -P along Z on
        // a member along X (equilibrium of the cut-off part; signs as the package description defines them)
        double length = 0.7;
        List<Vector3> nodes = line(Vector3.ZERO, new Vector3(length, 0, 0), 7);
        FrameModel model = new FrameModel(nodes, chain(nodes.size(), ROUND_BAR, null), Support.clamp(0));
        int tip = nodes.size() - 1;

        FrameSolution solution = FrameSolver.solve(model, List.of(NodalForce.force(tip, new Vector3(0, 0, -LOAD))));

        SectionForces root = solution.elementForces().get(0).start();
        SectionForces atTip = solution.elementForces().get(tip - 1).end();
        assertThat(root.momentY()).isCloseTo(LOAD * length, within(relative(LOAD * length, EXACT)));
        assertThat(root.shearZ()).isCloseTo(-LOAD, within(relative(LOAD, EXACT)));
        assertThat(atTip.momentY()).isCloseTo(0, within(LOAD * length * EXACT));
        NodalForce clamp = solution.reaction(0);
        assertThat(clamp.force().z()).isCloseTo(LOAD, within(relative(LOAD, EXACT)));
        // the clamp's moment balances r x F of the tip load: (L X) x (-P Z) = +P L Y
        assertThat(clamp.moment().y()).isCloseTo(-LOAD * length, within(relative(LOAD * length, EXACT)));
    }

    @ParameterizedTest
    @ValueSource(doubles = {Double.POSITIVE_INFINITY, 2.0e6, 3.0e5})
    void simplySupportedBeamOnSkewedSupportsMatchesTheHandbook(double supportRate) {
        // a simply supported span with a centre load: P L^3 / (48 E I) (Gere & Goodno, appendix table of
        // simple-beam deflections; Roark, simply supported beam with centre load); each elastic support
        // sinks (P/2)/k, which adds P/(2k) at the centre (superposition of a rigid-body move; hand statics)
        Vector3 axis = new Vector3(1, 1, 0).unit();
        Vector3 down = new Vector3(0, 0, -1);
        Vector3 side = axis.cross(down);
        double length = 1.2;
        List<Vector3> nodes = line(Vector3.ZERO, axis.times(length), 8);
        int last = nodes.size() - 1;
        int centre = last / 2;
        List<Support> supports = new ArrayList<>();
        // held across and down by the supports, along the axis at one end, and against spinning about the axis
        for (int end : new int[] {0, last}) {
            supports.add(new Support(end, DofKind.TRANSLATION, down.plus(side), supportRate));
            supports.add(new Support(end, DofKind.TRANSLATION, down.minus(side), supportRate));
        }
        supports.add(Support.rigidTranslation(0, axis));
        supports.add(Support.rigidRotation(0, axis));
        FrameModel model = new FrameModel(nodes, chain(nodes.size(), ROUND_BAR, null), supports);

        FrameSolution solution = FrameSolver.solve(model, List.of(NodalForce.force(centre, down.times(LOAD))));

        double rigidity = ROUND_BAR.youngsModulus() * ROUND_BAR.secondMomentY();
        // two springs at 45 degrees share the vertical load: together they are 2 k cos^2(45) = k vertically
        double sinking = Double.isInfinite(supportRate) ? 0 : LOAD / (2 * supportRate);
        double expected = LOAD * Math.pow(length, 3) / (48 * rigidity) + sinking;
        assertThat(solution.translation(centre).dot(down)).isCloseTo(expected, within(relative(expected, EXACT)));
        assertThat(solution.reaction(0).force().dot(down)).isCloseTo(-LOAD / 2, within(relative(LOAD, EXACT)));
        assertThat(solution.reaction(last).force().dot(down)).isCloseTo(-LOAD / 2, within(relative(LOAD, EXACT)));
    }
}
