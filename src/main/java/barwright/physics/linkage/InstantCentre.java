package barwright.physics.linkage;

/**
 * A front-view instant centre of one side, in the body's axes (m); or, where the lines that define it are
 * parallel, the direction in which it lies infinitely far away.
 *
 * @param y          lateral position (m), or the direction's y component where at infinity
 * @param z          height above the static ground (m), or the direction's z component where at infinity
 * @param atInfinity true where the two lines are parallel: (y, z) is then a unit direction
 */
public record InstantCentre(double y, double z, boolean atInfinity) {
    /** Lines closer to parallel than this (sine of the angle between them) meet at infinity. */
    static final double PARALLEL_SINE = 1e-12;

    /** @return the instant centre of a homogeneous point (y, z, w): w = 0 is at infinity */
    static InstantCentre of(double[] point) {
        double scale = Math.sqrt(point[0] * point[0] + point[1] * point[1]);
        if (Math.abs(point[2]) <= PARALLEL_SINE * scale) {
            return new InstantCentre(point[0] / scale, point[1] / scale, true);
        }
        return new InstantCentre(point[0] / point[2], point[1] / point[2], false);
    }

    /** @return the homogeneous coordinates (y, z, w) */
    double[] homogeneous() {
        return atInfinity ? new double[] {y, z, 0} : new double[] {y, z, 1};
    }

    /**
     * The front-view swing-arm length seen from a contact point: the lateral distance from the contact point
     * to the instant centre, positive where the instant centre lies inboard.
     *
     * @param contactY the contact point's lateral position, left side (m)
     * @return the length (m), or positive infinity where the instant centre is at infinity
     */
    public double swingArmLength(double contactY) {
        if (atInfinity) {
            return Double.POSITIVE_INFINITY;
        }
        return contactY - y;
    }
}
