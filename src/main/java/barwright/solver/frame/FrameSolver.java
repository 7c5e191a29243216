package barwright.solver.frame;

import org.ejml.data.DMatrixRMaj;
import org.ejml.data.DMatrixSparseCSC;
import org.ejml.interfaces.linsol.LinearSolverSparse;
import org.ejml.sparse.FillReducing;
import org.ejml.sparse.csc.decomposition.chol.CholeskyUpLooking_DSCC;
import org.ejml.sparse.csc.factory.LinearSolverFactory_DSCC;

import java.util.List;

/**
 * Solves a frame by a sparse Cholesky factorisation of its stiffness (EJML, up-looking Cholesky, no
 * reordering: the node numbering is kept, so a chain costs time in proportion to its length).
 */
public final class FrameSolver {
    /**
     * A Cholesky pivot below this fraction of its diagonal entry means the frame can move without
     * straining (a mechanism). A fine cantilever of n elements has a tip pivot near (1/n)^3 / 4 of its
     * diagonal, so this still admits chains of thousands of elements.
     */
    static final double MECHANISM_PIVOT_RATIO = 1e-12;

    private FrameSolver() {
    }

    /**
     * @param model the frame
     * @param loads nodal forces (N) and moments (N m)
     * @return displacements, end forces and reactions
     * @throws IllegalArgumentException where the supports leave the frame free to move as a mechanism
     */
    public static FrameSolution solve(FrameModel model, List<NodalForce> loads) {
        FrameSystem system = FrameSystem.assemble(model);
        DMatrixRMaj rightHandSide = system.loadVector(loads);
        DMatrixRMaj solution = new DMatrixRMaj(system.equationCount(), 1);
        LinearSolverSparse<DMatrixSparseCSC, DMatrixRMaj> cholesky = LinearSolverFactory_DSCC.cholesky(FillReducing.NONE);
        if (!cholesky.setA(system.stiffness())) {
            throw new IllegalArgumentException("the frame's stiffness is not positive definite: its supports"
                    + " leave it free to move (add supports)");
        }
        checkForMechanism(system, cholesky.getDecomposition());
        cholesky.solve(rightHandSide, solution);
        return system.results(solution, loads);
    }

    private static void checkForMechanism(FrameSystem system, CholeskyUpLooking_DSCC decomposition) {
        DMatrixSparseCSC factor = decomposition.getL();
        for (int equation = 0; equation < system.equationCount(); equation++) {
            double pivot = factor.nz_values[factor.col_idx[equation]];
            if (pivot * pivot < MECHANISM_PIVOT_RATIO * system.diagonal(equation)) {
                throw new IllegalArgumentException("the frame is free to move at node " + system.nodeOf(equation)
                        + " (" + system.kindOf(equation).name().toLowerCase() + "): its supports do not hold"
                        + " every rigid-body motion");
            }
        }
    }
}
