package barwright.physics.linkage;

/**
 * One side of an independent suspension as a function of a single coordinate (an arm's angle), in closed form:
 * the loop-closure equations with that coordinate given. {@link SideSolver} finds the coordinate of a travel.
 */
interface SideLinkage {
    /** @return the coordinate at the measured position (rad) */
    double staticCoordinate();

    /** @return a step of the coordinate small enough to bracket one travel: half a degree of an arm (rad) */
    default double coordinateStep() {
        return Math.toRadians(0.5);
    }

    /** @return the pose at the coordinate, or null where the linkage cannot be put together there */
    SidePose poseAt(double coordinate);

    /**
     * The contact point alone, for the solves (no instant centre, no objects kept).
     *
     * @return {y, z} of the contact point at the coordinate (m), or null where the linkage cannot be put together
     */
    double[] contactAt(double coordinate);

    /** @return in words, what stops the linkage where it cannot be put together */
    String whyItLocks();
}
