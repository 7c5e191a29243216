package barwright.solver.frame;

/**
 * A force and a moment acting on one node, in global axes: an applied load, or a support reaction.
 *
 * @param node   index of the node
 * @param force  force (N)
 * @param moment moment (N m), right-handed about the global axes
 */
public record NodalForce(int node, Vector3 force, Vector3 moment) {
    public NodalForce {
        if (node < 0) {
            throw new IllegalArgumentException("load node must be zero or more, was " + node);
        }
        if (force == null || moment == null) {
            throw new IllegalArgumentException("a nodal force needs a force and a moment (use Vector3.ZERO)");
        }
    }

    /** A pure force (N) on a node. */
    public static NodalForce force(int node, Vector3 force) {
        return new NodalForce(node, force, Vector3.ZERO);
    }

    /** A pure moment (N m) on a node. */
    public static NodalForce moment(int node, Vector3 moment) {
        return new NodalForce(node, Vector3.ZERO, moment);
    }
}
