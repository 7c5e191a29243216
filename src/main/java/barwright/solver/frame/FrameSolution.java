package barwright.solver.frame;

import java.util.List;

/**
 * The response of a frame to one set of nodal loads.
 *
 * @param displacements one per node, in global axes (m, rad)
 * @param elementForces one per element: the stress resultants at its two ends, in its local axes (N, N m)
 * @param reactions     one per node, in global axes: the force (N) and moment (N m) its supports (springs and
 *                      rigid constraints) exert on it; at a node without supports, the round-off residual
 *                      of the solve, near zero
 */
public record FrameSolution(List<NodalDisplacement> displacements, List<ElementEndForces> elementForces,
                            List<NodalForce> reactions) {
    public FrameSolution {
        displacements = List.copyOf(displacements);
        elementForces = List.copyOf(elementForces);
        reactions = List.copyOf(reactions);
    }

    /** @return the displacement of node {@code node} (m) */
    public Vector3 translation(int node) {
        return displacements.get(node).translation();
    }

    /** @return the reaction at node {@code node} */
    public NodalForce reaction(int node) {
        return reactions.get(node);
    }
}
