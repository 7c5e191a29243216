package barwright.model;

/**
 * One axle's optional linkage with its ride-height change and static camber.
 *
 * @param linkage          the wheels' linkage, or null where the roll-centre height is typed in instead
 * @param rideHeightChange how far the body is raised from the height the points were measured at (m);
 *                         negative: lowered
 * @param staticCamber     each wheel's camber at the measured ride height (rad), SAE J670 sign: the top leaning
 *                         away from the car's centre is positive
 */
public record SuspensionGeometry(Linkage linkage, double rideHeightChange, double staticCamber) {
    /** No linkage, no ride-height change, no camber: the axle as every version-1 file describes it. */
    public static final SuspensionGeometry NONE = new SuspensionGeometry(null, 0, 0);

    public SuspensionGeometry {
        Checks.finite("rideHeightChange", rideHeightChange);
        Checks.finite("staticCamber", staticCamber);
    }

    public boolean hasLinkage() {
        return linkage != null;
    }

    public SuspensionGeometry withLinkage(Linkage newLinkage) {
        return new SuspensionGeometry(newLinkage, rideHeightChange, staticCamber);
    }

    public SuspensionGeometry withRideHeightChange(double newChange) {
        return new SuspensionGeometry(linkage, newChange, staticCamber);
    }
}
