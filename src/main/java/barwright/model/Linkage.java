package barwright.model;

/**
 * How one axle's wheels are located, described by the pickup points a person measures on the car (front-view
 * coordinates of the left side, {@link FrontViewPoint}). The kinematics are in {@code barwright.physics.linkage}.
 */
public sealed interface Linkage permits DoubleWishbone, Strut, LiveAxlePanhard, LiveAxleWatts, TrailingArm,
        SemiTrailingArm {

    /** @return true for a beam axle, whose two wheels move together */
    default boolean isLiveAxle() {
        return this instanceof LiveAxlePanhard || this instanceof LiveAxleWatts;
    }
}
