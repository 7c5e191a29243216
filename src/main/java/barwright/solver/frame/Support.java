package barwright.solver.frame;

import java.util.List;

/**
 * A restraint of one node along one direction: a spring, or a rigid constraint (rate infinite). Rigid
 * constraints of one node and kind may point in any independent directions; the node's freedoms along the
 * plane or line they span are removed from the equations.
 *
 * @param node      index of the node held
 * @param kind      a translation (force-displacement) or rotation (moment-rotation) restraint
 * @param direction the direction held (any length but zero; it is made a unit vector)
 * @param rate      spring rate: N/m for a translation, N m/rad for a rotation; {@link Double#POSITIVE_INFINITY}
 *                  for a rigid constraint
 */
public record Support(int node, DofKind kind, Vector3 direction, double rate) {
    public Support {
        if (node < 0) {
            throw new IllegalArgumentException("support node must be zero or more, was " + node);
        }
        if (kind == null || direction == null) {
            throw new IllegalArgumentException("a support needs a kind and a direction");
        }
        direction = direction.unit();
        if (!(rate > 0)) {
            throw new IllegalArgumentException("support rate must be positive (or infinite for rigid), was " + rate);
        }
    }

    /** A rigid constraint of the node's displacement along {@code direction}. */
    public static Support rigidTranslation(int node, Vector3 direction) {
        return new Support(node, DofKind.TRANSLATION, direction, Double.POSITIVE_INFINITY);
    }

    /** A rigid constraint of the node's rotation about {@code axis}. */
    public static Support rigidRotation(int node, Vector3 axis) {
        return new Support(node, DofKind.ROTATION, axis, Double.POSITIVE_INFINITY);
    }

    /**
     * A linear translational spring to ground.
     *
     * @param rate spring rate (N/m)
     */
    public static Support translationSpring(int node, Vector3 direction, double rate) {
        return new Support(node, DofKind.TRANSLATION, direction, rate);
    }

    /** @return true for a rigid constraint */
    public boolean isRigid() {
        return Double.isInfinite(rate);
    }

    /** Every rigid translation and rotation constraint of one node: it is clamped. */
    public static List<Support> clamp(int node) {
        return List.of(rigidTranslation(node, Vector3.UNIT_X), rigidTranslation(node, Vector3.UNIT_Y),
                rigidTranslation(node, Vector3.UNIT_Z), rigidRotation(node, Vector3.UNIT_X),
                rigidRotation(node, Vector3.UNIT_Y), rigidRotation(node, Vector3.UNIT_Z));
    }
}
