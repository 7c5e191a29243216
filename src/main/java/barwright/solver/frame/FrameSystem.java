package barwright.solver.frame;

import org.ejml.data.DMatrixRMaj;
import org.ejml.data.DMatrixSparseCSC;
import org.ejml.sparse.csc.CommonOps_DSCC;

import java.util.ArrayList;
import java.util.List;

/**
 * The assembled stiffness equations K u = f of a frame, with its rigid constraints removed (the direct
 * stiffness method: Przemieniecki, Theory of Matrix Structural Analysis, ch. 6; McGuire, Gallagher and
 * Ziemian, Matrix Structural Analysis, ch. 2-3). Solve them with {@link FrameSolver}, or with any linear
 * solver, and turn the answer into displacements, end forces and reactions with {@link #results}.
 */
public final class FrameSystem {
    private final FrameModel model;
    private final DofMap dofs;
    private final List<BeamElementMatrix> elementMatrices;
    private final DMatrixSparseCSC stiffness;
    private final double[] diagonal;

    private FrameSystem(FrameModel model, DofMap dofs, List<BeamElementMatrix> elementMatrices,
                        DMatrixSparseCSC stiffness) {
        this.model = model;
        this.dofs = dofs;
        this.elementMatrices = elementMatrices;
        this.stiffness = stiffness;
        this.diagonal = new double[dofs.equationCount()];
        for (int equation = 0; equation < diagonal.length; equation++) {
            diagonal[equation] = stiffness.get(equation, equation);
        }
    }

    /** Assembles the model's elements and springs into the equations of its free freedoms. */
    public static FrameSystem assemble(FrameModel model) {
        DofMap dofs = DofMap.of(model);
        List<BeamElementMatrix> matrices = elementMatrices(model);
        return new FrameSystem(model, dofs, matrices, assembleMatrix(model, dofs, matrices, true));
    }

    /**
     * The stiffness of the elements alone, before any support: 6 n x 6 n, global axes, freedom 6 node + c
     * with c = 0..5 for u_x, u_y, u_z, theta_x, theta_y, theta_z. Symmetric, and singular (rigid-body motion).
     */
    public static DMatrixSparseCSC unsupportedStiffness(FrameModel model) {
        return assembleMatrix(model, DofMap.unconstrained(model.nodes().size()), elementMatrices(model), false);
    }

    /** @return the stiffness matrix of the free freedoms (N/m, N/rad, N m/rad); symmetric, full storage */
    public DMatrixSparseCSC stiffness() {
        return stiffness;
    }

    /** @return how many unknowns the equations have */
    public int equationCount() {
        return dofs.equationCount();
    }

    /** @return the node whose freedom equation {@code equation} is */
    public int nodeOf(int equation) {
        return dofs.nodeOf(equation);
    }

    /** @return whether equation {@code equation} is a translation or a rotation */
    public DofKind kindOf(int equation) {
        return dofs.kindOf(equation);
    }

    /** @return the diagonal entry of the stiffness at {@code equation} */
    double diagonal(int equation) {
        return diagonal[equation];
    }

    /** @return the right-hand side f of the equations for these loads (N, N m); loads on held freedoms go to the supports */
    public DMatrixRMaj loadVector(List<NodalForce> loads) {
        DMatrixRMaj vector = new DMatrixRMaj(dofs.equationCount(), 1);
        for (NodalForce load : loads) {
            checkNode(load.node());
            addToVector(vector, DofMap.slot(load.node(), DofKind.TRANSLATION), load.force());
            addToVector(vector, DofMap.slot(load.node(), DofKind.ROTATION), load.moment());
        }
        return vector;
    }

    /**
     * @param solution the unknowns u of K u = f (m, rad), one column
     * @param loads    the loads f was built from
     * @return displacements, element end forces and support reactions
     */
    public FrameSolution results(DMatrixRMaj solution, List<NodalForce> loads) {
        int nodeCount = model.nodes().size();
        double[] global = new double[6 * nodeCount];
        double[] slotComponents = new double[3];
        for (int slot = 0; slot < 2 * nodeCount; slot++) {
            for (int component = 0; component < 3; component++) {
                int equation = dofs.equation(slot, component);
                slotComponents[component] = equation < 0 ? 0 : solution.get(equation, 0);
            }
            dofs.toGlobal(slot, slotComponents, global, 3 * slot);
        }
        List<NodalDisplacement> displacements = new ArrayList<>(nodeCount);
        for (int node = 0; node < nodeCount; node++) {
            displacements.add(new NodalDisplacement(node, vectorAt(global, 6 * node), vectorAt(global, 6 * node + 3)));
        }
        double[] nodalSums = new double[6 * nodeCount];
        List<ElementEndForces> endForces = new ArrayList<>(model.elements().size());
        for (int index = 0; index < model.elements().size(); index++) {
            BeamElement element = model.elements().get(index);
            BeamElementMatrix matrix = elementMatrices.get(index);
            double[] ends = new double[12];
            System.arraycopy(global, 6 * element.startNode(), ends, 0, 6);
            System.arraycopy(global, 6 * element.endNode(), ends, 6, 6);
            double[] local = matrix.localEndForces(ends);
            endForces.add(new ElementEndForces(index, sectionForces(local, 0, -1), sectionForces(local, 6, 1)));
            double[] atNodes = matrix.toGlobal(local);
            for (int c = 0; c < 6; c++) {
                nodalSums[6 * element.startNode() + c] += atNodes[c];
                nodalSums[6 * element.endNode() + c] += atNodes[6 + c];
            }
        }
        // support force = what the elements take from the node minus what is applied to it
        for (NodalForce load : loads) {
            for (int c = 0; c < 3; c++) {
                nodalSums[6 * load.node() + c] -= load.force().component(c);
                nodalSums[6 * load.node() + 3 + c] -= load.moment().component(c);
            }
        }
        List<NodalForce> reactions = new ArrayList<>(nodeCount);
        for (int node = 0; node < nodeCount; node++) {
            reactions.add(new NodalForce(node, vectorAt(nodalSums, 6 * node), vectorAt(nodalSums, 6 * node + 3)));
        }
        return new FrameSolution(displacements, endForces, reactions);
    }

    private static List<BeamElementMatrix> elementMatrices(FrameModel model) {
        List<BeamElementMatrix> matrices = new ArrayList<>(model.elements().size());
        for (BeamElement element : model.elements()) {
            matrices.add(BeamElementMatrix.of(model.nodes().get(element.startNode()),
                    model.nodes().get(element.endNode()), element));
        }
        return matrices;
    }

    private static DMatrixSparseCSC assembleMatrix(FrameModel model, DofMap dofs, List<BeamElementMatrix> matrices,
                                                   boolean withSprings) {
        StiffnessPattern pattern = StiffnessPattern.of(model, dofs);
        double[] block = new double[9];
        double[] global = new double[144];
        double[] scratch = new double[45];
        for (int index = 0; index < matrices.size(); index++) {
            BeamElement element = model.elements().get(index);
            matrices.get(index).global(global, scratch);
            int[] slots = {
                    DofMap.slot(element.startNode(), DofKind.TRANSLATION),
                    DofMap.slot(element.startNode(), DofKind.ROTATION),
                    DofMap.slot(element.endNode(), DofKind.TRANSLATION),
                    DofMap.slot(element.endNode(), DofKind.ROTATION)};
            for (int row = 0; row < 4; row++) {
                for (int column = 0; column < 4; column++) {
                    for (int i = 0; i < 3; i++) {
                        System.arraycopy(global, 12 * (3 * row + i) + 3 * column, block, 3 * i, 3);
                    }
                    scatter(pattern, dofs, slots[row], slots[column], block);
                }
            }
        }
        if (withSprings) {
            for (Support support : model.supports()) {
                if (!support.isRigid()) {
                    int slot = DofMap.slot(support.node(), support.kind());
                    scatter(pattern, dofs, slot, slot, springBlock(support));
                }
            }
        }
        // a planar member leaves exact zeros between in-plane and out-of-plane freedoms: dropping them
        // lets the factorisation see the two uncoupled problems (about a third of the work on a flat bar)
        DMatrixSparseCSC matrix = pattern.matrix();
        CommonOps_DSCC.removeZeros(matrix, 0);
        return matrix;
    }

    /** @return rate d d^T (global axes, flat row-major) of a spring along the unit direction d */
    private static double[] springBlock(Support support) {
        double[] d = {support.direction().x(), support.direction().y(), support.direction().z()};
        double[] block = new double[9];
        for (int i = 0; i < 3; i++) {
            for (int j = 0; j < 3; j++) {
                block[3 * i + j] = support.rate() * d[i] * d[j];
            }
        }
        return block;
    }

    /** Adds a global 3 x 3 block between two slots, turned into the slots' axes, to the free equations. */
    private static void scatter(StiffnessPattern pattern, DofMap dofs, int rowSlot, int columnSlot,
                                double[] globalBlock) {
        double[] rowAxes = dofs.axes(rowSlot);
        double[] columnAxes = dofs.axes(columnSlot);
        double[] block = rowAxes == null && columnAxes == null ? globalBlock
                : Rotations.toLocal(rowAxes, globalBlock, columnAxes);
        pattern.addBlock(dofs, rowSlot, columnSlot, block);
    }

    private void addToVector(DMatrixRMaj vector, int slot, Vector3 global) {
        double[] components = dofs.toSlotAxes(slot, global);
        for (int component = 0; component < 3; component++) {
            int equation = dofs.equation(slot, component);
            if (equation >= 0) {
                vector.add(equation, 0, components[component]);
            }
        }
    }

    private void checkNode(int node) {
        if (node >= model.nodes().size()) {
            throw new IllegalArgumentException("a load acts on node " + node + " but the frame has "
                    + model.nodes().size() + " nodes");
        }
    }

    /** Section resultants from local end forces: minus the start node's force, plus the end node's. */
    private static SectionForces sectionForces(double[] local, int offset, int sign) {
        return new SectionForces(sign * local[offset], sign * local[offset + 1], sign * local[offset + 2],
                sign * local[offset + 3], sign * local[offset + 4], sign * local[offset + 5]);
    }

    private static Vector3 vectorAt(double[] values, int offset) {
        return new Vector3(values[offset], values[offset + 1], values[offset + 2]);
    }
}
