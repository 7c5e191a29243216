package barwright.solver.frame;

import org.ejml.data.DMatrixRMaj;
import org.ejml.data.DMatrixSparseCSC;
import org.ejml.sparse.csc.CommonOps_DSCC;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;

import static barwright.solver.frame.FrameFixtures.chain;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

/**
 * Properties any linear elastic frame must have, checked on seeded random 3-D chains with skewed members,
 * unequal second moments and explicit orientations: Maxwell-Betti reciprocity (a symmetric stiffness),
 * no force from a rigid-body motion, and supports that balance the applied loads (Przemieniecki, Theory of
 * Matrix Structural Analysis, ch. 6; any statics text for the balance). Tolerances are relative to the
 * largest stiffness entry or load and allow for round-off over a few hundred terms (1e-12 to 1e-9).
 */
class FrameEquilibriumTest {

    @ParameterizedTest
    @ValueSource(longs = {1, 7, 42})
    void stiffnessIsSymmetric(long seed) {
        FrameModel model = randomChain(new Random(seed), List.of());
        DMatrixSparseCSC stiffness = FrameSystem.unsupportedStiffness(model);
        double largest = CommonOps_DSCC.elementMaxAbs(stiffness);
        DMatrixSparseCSC transpose = CommonOps_DSCC.transpose(stiffness, null, null);
        DMatrixSparseCSC difference = new DMatrixSparseCSC(stiffness.numRows, stiffness.numCols);
        CommonOps_DSCC.add(1, stiffness, -1, transpose, difference, null, null);
        assertThat(CommonOps_DSCC.elementMaxAbs(difference)).isLessThanOrEqualTo(1e-12 * largest);
    }

    @ParameterizedTest
    @ValueSource(longs = {3, 11})
    void reducedStiffnessWithSkewedSupportsIsSymmetric(long seed) {
        Random random = new Random(seed);
        FrameModel model = randomChain(random, skewedSupports(random));
        DMatrixSparseCSC stiffness = FrameSystem.assemble(model).stiffness();
        double largest = CommonOps_DSCC.elementMaxAbs(stiffness);
        for (int row = 0; row < stiffness.numRows; row++) {
            for (int column = 0; column < stiffness.numCols; column++) {
                assertThat(Math.abs(stiffness.get(row, column) - stiffness.get(column, row)))
                        .isLessThanOrEqualTo(1e-12 * largest);
            }
        }
    }

    @ParameterizedTest
    @ValueSource(longs = {5, 13, 99})
    void rigidBodyMotionProducesNoForce(long seed) {
        Random random = new Random(seed);
        FrameModel model = randomChain(random, List.of());
        DMatrixSparseCSC stiffness = FrameSystem.unsupportedStiffness(model);
        double largest = CommonOps_DSCC.elementMaxAbs(stiffness);
        Vector3 pivot = randomVector(random);
        Vector3 translation = randomVector(random).times(1e-3);
        Vector3 rotation = randomVector(random).times(1e-3);
        // small rigid motion: u = t + theta x (r - p), every node turning by theta
        DMatrixRMaj motion = new DMatrixRMaj(model.freedomCount(), 1);
        for (int node = 0; node < model.nodes().size(); node++) {
            Vector3 move = translation.plus(rotation.cross(model.nodes().get(node).minus(pivot)));
            for (int c = 0; c < 3; c++) {
                motion.set(6 * node + c, 0, move.component(c));
                motion.set(6 * node + 3 + c, 0, rotation.component(c));
            }
        }
        DMatrixRMaj forces = new DMatrixRMaj(model.freedomCount(), 1);
        CommonOps_DSCC.mult(stiffness, motion, forces);
        double scale = largest * 1e-3;
        for (int i = 0; i < forces.numRows; i++) {
            assertThat(Math.abs(forces.get(i, 0))).isLessThanOrEqualTo(1e-10 * scale);
        }
    }

    @ParameterizedTest
    @ValueSource(longs = {2, 17, 23})
    void reactionsBalanceTheLoads(long seed) {
        Random random = new Random(seed);
        List<Support> supports = new ArrayList<>(Support.clamp(0));
        FrameModel unsupported = randomChain(random, List.of());
        int last = unsupported.nodes().size() - 1;
        supports.add(Support.translationSpring(last, randomVector(random), 4e5));
        supports.add(Support.rigidTranslation(last, randomVector(random)));
        FrameModel model = new FrameModel(unsupported.nodes(), unsupported.elements(), supports);
        List<NodalForce> loads = new ArrayList<>();
        for (int node = 1; node < model.nodes().size(); node += 2) {
            loads.add(new NodalForce(node, randomVector(random).times(300), randomVector(random).times(40)));
        }

        FrameSolution solution = FrameSolver.solve(model, loads);

        Vector3 force = Vector3.ZERO;
        Vector3 moment = Vector3.ZERO;
        double loadScale = 0;
        List<NodalForce> all = new ArrayList<>(loads);
        all.addAll(solution.reactions());
        for (NodalForce nodal : all) {
            Vector3 at = model.nodes().get(nodal.node());
            force = force.plus(nodal.force());
            moment = moment.plus(nodal.moment()).plus(at.cross(nodal.force()));
            loadScale = Math.max(loadScale, nodal.force().length() + nodal.moment().length());
        }
        assertThat(force.length()).isLessThanOrEqualTo(1e-9 * loadScale);
        assertThat(moment.length()).isLessThanOrEqualTo(1e-9 * loadScale);
        for (int node = 1; node < last; node++) {
            NodalForce residual = solution.reaction(node);
            assertThat(residual.force().length() + residual.moment().length()).isLessThanOrEqualTo(1e-9 * loadScale);
        }
    }

    @Test
    void anUnheldFrameIsRefusedWithAMessage() {
        FrameModel floating = randomChain(new Random(8), List.of(Support.rigidTranslation(0, Vector3.UNIT_X)));
        List<NodalForce> load = List.of(NodalForce.force(1, Vector3.UNIT_Z));
        assertThatThrownBy(() -> FrameSolver.solve(floating, load))
                .isInstanceOf(IllegalArgumentException.class)
                .hasMessageContaining("free to move");
    }

    @Test
    void aPinnedChainThatCanSpinAboutItsAxisIsRefused() {
        // a straight shaft held in translation at both ends can still spin about its own axis
        List<Vector3> nodes = FrameFixtures.line(Vector3.ZERO, new Vector3(1, 0, 0), 4);
        List<Support> supports = new ArrayList<>();
        for (int end : new int[] {0, 4}) {
            supports.add(Support.rigidTranslation(end, Vector3.UNIT_Y));
            supports.add(Support.rigidTranslation(end, Vector3.UNIT_Z));
        }
        supports.add(Support.rigidTranslation(0, Vector3.UNIT_X));
        FrameModel model = new FrameModel(nodes, chain(nodes.size(), FrameFixtures.ROUND_BAR, null), supports);
        assertThatThrownBy(() -> FrameSolver.solve(model, List.of(NodalForce.force(2, Vector3.UNIT_Z))))
                .isInstanceOf(IllegalArgumentException.class)
                .hasMessageContaining("free to move");
    }

    /** A zig-zag chain of 12 members in random directions, unequal I_y and I_z, random orientations. */
    private static FrameModel randomChain(Random random, List<Support> supports) {
        List<Vector3> nodes = new ArrayList<>();
        nodes.add(Vector3.ZERO);
        List<BeamElement> elements = new ArrayList<>();
        for (int i = 0; i < 12; i++) {
            Vector3 step = randomVector(random).unit().times(0.05 + 0.2 * random.nextDouble());
            nodes.add(nodes.get(i).plus(step));
            SectionProperties section = new SectionProperties(200e9, 78e9, 2e-4 * (1 + random.nextDouble()),
                    1e-8 * (1 + random.nextDouble()), 1e-8 * (1 + 3 * random.nextDouble()), 1.5e-8);
            Vector3 orientation = step.cross(randomVector(random));
            elements.add(new BeamElement(i, i + 1, section, orientation));
        }
        return new FrameModel(nodes, elements, supports);
    }

    private static List<Support> skewedSupports(Random random) {
        List<Support> supports = new ArrayList<>(Support.clamp(0));
        supports.add(Support.rigidTranslation(12, randomVector(random)));
        supports.add(Support.rigidTranslation(12, randomVector(random)));
        supports.add(Support.rigidRotation(6, randomVector(random)));
        supports.add(new Support(9, DofKind.ROTATION, randomVector(random), 3e3));
        return supports;
    }

    private static Vector3 randomVector(Random random) {
        return new Vector3(random.nextGaussian(), random.nextGaussian(), random.nextGaussian());
    }
}
