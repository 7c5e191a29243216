package barwright.model;

/**
 * How camber changes a tyre's grip (model.md 8.2). Camber angles follow SAE J670's vehicle sense: negative
 * when the top of the wheel leans in towards the car. The values describe the wheel on the outside of a turn,
 * the one that carries the load; the inside wheel is its mirror image.
 *
 * @param camberForPeakGrip           gamma*: the camber at which the peak friction is highest (rad), usually
 *                                    a little negative
 * @param peakFrictionLossPerRadSquared L: the peak friction falls by L (gamma - gamma*)^2 (per rad^2), zero or
 *                                    more
 * @param camberStiffnessPerLoad      k_gamma: camber thrust per radian of camber, per N of load (1/rad), zero
 *                                    or more; the thrust acts towards the side the top of the wheel leans to
 */
public record TyreCamber(double camberForPeakGrip, double peakFrictionLossPerRadSquared,
                         double camberStiffnessPerLoad) {
    /** No camber effect: what a tyre without camber keys has. */
    public static final TyreCamber NONE = new TyreCamber(0, 0, 0);

    public TyreCamber {
        Checks.finite("camberForPeakGrip", camberForPeakGrip);
        Checks.nonNegative("peakFrictionLossPerRadSquared", peakFrictionLossPerRadSquared);
        Checks.nonNegative("camberStiffnessPerLoad", camberStiffnessPerLoad);
    }

    /** @return true where camber changes nothing */
    public boolean isNone() {
        return peakFrictionLossPerRadSquared == 0 && camberStiffnessPerLoad == 0;
    }
}
