package barwright.solver.frame;

/**
 * How far a node moved, in global axes.
 *
 * @param node        index of the node
 * @param translation displacement (m)
 * @param rotation    small rotation (rad), right-handed about the global axes
 */
public record NodalDisplacement(int node, Vector3 translation, Vector3 rotation) {
}
