package barwright.physics.linkage;

/**
 * One side of an independent suspension as a function of a single coordinate (an arm's angle), in closed form:
 * the loop-closure equations with that coordinate given. {@link SideSolver} finds the coordinate of a travel.
 */
interface SideLinkage {
    /** @return the coordinate at the measured position (rad) */
    double staticCoordinate();

    /** @return a step of the coordinate small enough to follow the motion: a quarter degree of an arm (rad) */
    default double coordinateStep() {
        return Math.toRadians(0.25);
    }

    /** @return the pose at the coordinate, or null where the linkage cannot be put together there */
    SidePose poseAt(double coordinate);

    /** @return in words, what stops the linkage where it cannot be put together */
    String whyItLocks();
}
