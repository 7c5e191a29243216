package barwright.physics;

import barwright.model.Tyre;
import barwright.model.TyreCamber;
import barwright.solver.RootFinder;

/**
 * One tyre's lateral force (model.md 8): load-sensitive friction, load-dependent cornering stiffness and the
 * Magic Formula (Pacejka, Tyre and Vehicle Dynamics), each from its law or from points against load
 * (model.md 8.1), and the effect of camber (model.md 8.2). Forces in N, slip angles and cambers in rad.
 *
 * <p>A camber argument is the wheel's camber to the road in SAE J670's vehicle sense as the <em>outside</em>
 * wheel of a turn has it (negative: the top leans towards the centre of the turn); for an inside wheel pass
 * its J670 camber negated. Lateral force is positive towards the centre of the turn.
 */
public final class TyreModel {
    /** Slip angles are never sought beyond this (rad, about 29 deg): far past any real tyre's peak. */
    static final double MAX_SLIP = 0.5;

    /** With the law, the friction never falls below this share of mu_0 (model.md 8.1). */
    public static final double LAW_FRICTION_FLOOR_SHARE = LoadCurve.FLOOR_SHARE;
    /** x* to 1e-14, or a relative 1e-12, within 200 evaluations. */
    private static final RootFinder PEAK_ARGUMENT = new RootFinder("the slip at the tyre curve's peak", 1e-14,
            1e-12, RootFinder.DEFAULT_FUNCTION_ACCURACY, 200);

    private final Tyre tyre;
    private final LoadCurve frictionPoints;
    private final LoadCurve stiffnessPoints;
    private final double frictionFloor;
    private final double stiffnessNormaliser;
    // x* = B alpha at the curve's peak: solves x - E (x - atan x) = tan(pi / (2 C)); it does not depend on B
    private final double peakSlipTimesB;

    public TyreModel(Tyre tyre) {
        this.tyre = tyre;
        this.frictionPoints = tyre.hasFrictionPoints() ? new LoadCurve(tyre.frictionByLoad()) : null;
        this.stiffnessPoints = tyre.hasStiffnessPoints() ? new LoadCurve(tyre.corneringStiffnessByLoad()) : null;
        this.frictionFloor = frictionPoints != null ? frictionPoints.floor()
                : LAW_FRICTION_FLOOR_SHARE * tyre.frictionAtNominalLoad();
        this.stiffnessNormaliser = Math.sin(2 * Math.atan(1 / tyre.corneringStiffnessPeakLoadRatio()));
        this.peakSlipTimesB = peakArgument(tyre.shapeFactor(), tyre.curvatureFactor());
    }

    private static double peakArgument(double shape, double curvature) {
        double target = Math.PI / (2 * shape);
        if (target >= Math.PI / 2 - 1e-12) {
            return Double.POSITIVE_INFINITY; // C = 1: the curve only approaches D
        }
        double tangent = Math.tan(target);
        // x - E (x - atan x) rises monotonically for E <= 1, so the root is unique
        double upper = 1;
        while (upper - curvature * (upper - Math.atan(upper)) < tangent) {
            upper *= 2;
            if (Double.isInfinite(upper)) {
                // E = 1 leaves atan x < pi/2: with C below about 1.565 the argument never reaches the peak
                return Double.POSITIVE_INFINITY;
            }
        }
        return PEAK_ARGUMENT.solve(x -> x - curvature * (x - Math.atan(x)) - tangent, 0, upper);
    }

    /** @return the tyre as given */
    public Tyre tyre() {
        return tyre;
    }

    /**
     * @return the peak friction at a load: from the points, or mu_0 (1 + s (F_z/F_z0 - 1)); never below the
     *     floor ({@link #frictionFloor()})
     */
    public double friction(double load) {
        if (frictionPoints != null) {
            return frictionPoints.value(load);
        }
        return Math.max(frictionFloor, lawFriction(load));
    }

    /** @return the friction law's own value, which may fall below the floor (for the warning); points: as used */
    public double unfloredFriction(double load) {
        return frictionPoints != null ? frictionPoints.value(load) : lawFriction(load);
    }

    private double lawFriction(double load) {
        return tyre.frictionAtNominalLoad() * (1 + tyre.frictionLoadSensitivity() * (load / tyre.nominalLoad() - 1));
    }

    /** @return the level the friction never falls below */
    public double frictionFloor() {
        return frictionFloor;
    }

    /** @return the peak friction at a load and camber: mu(F_z) - L (gamma - gamma*)^2, never below the floor */
    public double friction(double load, double camber) {
        TyreCamber terms = tyre.camber();
        double away = camber - terms.camberForPeakGrip();
        return Math.max(frictionFloor, friction(load) - terms.peakFrictionLossPerRadSquared() * away * away);
    }

    /** @return the peak lateral force D = mu F_z (N); zero for an unloaded tyre */
    public double peakForce(double load) {
        return load > 0 ? friction(load) * load : 0;
    }

    /** @return the peak lateral force at a camber, D = mu(F_z, gamma) F_z (N); zero for an unloaded tyre */
    public double peakForce(double load, double camber) {
        return load > 0 ? friction(load, camber) * load : 0;
    }

    /**
     * @return the camber thrust at zero slip, -k_gamma F_z gamma (N), positive towards the turn's centre: J670's
     *     camber thrust acts towards the side the top of the wheel leans to
     */
    public double camberThrust(double load, double camber) {
        return load > 0 ? -tyre.camber().camberStiffnessPerLoad() * load * camber : 0;
    }

    /**
     * @return C(F_z) from the points, or k_c F_z0 sin(2 atan(F_z/(p F_z0))) / sin(2 atan(1/p)) (N/rad); zero
     *     when unloaded
     */
    public double corneringStiffness(double load) {
        if (load <= 0) {
            return 0;
        }
        if (stiffnessPoints != null) {
            return stiffnessPoints.value(load);
        }
        double nominal = tyre.nominalLoad();
        return tyre.corneringStiffnessPerLoad() * nominal
                * Math.sin(2 * Math.atan(load / (tyre.corneringStiffnessPeakLoadRatio() * nominal)))
                / stiffnessNormaliser;
    }

    /** @return the Magic Formula lateral force F_y at a slip angle (N) */
    public double lateralForce(double slipAngle, double load) {
        return atLoad(load).lateralForce(slipAngle);
    }

    /** @return the slip angle at which the force peaks for this load (rad), at most {@link #MAX_SLIP} */
    public double peakSlipAngle(double load) {
        return atLoad(load).peakSlipAngle();
    }

    /**
     * @return the force curve at one load, its Magic Formula factors worked out once: a root search over the
     *     slip angle evaluates the curve many times at the same load
     */
    public LoadedCurve atLoad(double load) {
        double peak = peakForce(load);
        if (peak <= 0) {
            return new LoadedCurve(0, 0, tyre.shapeFactor(), tyre.curvatureFactor(), MAX_SLIP, 0);
        }
        double stiffnessFactor = corneringStiffness(load) / (tyre.shapeFactor() * peak);
        return new LoadedCurve(peak, stiffnessFactor, tyre.shapeFactor(), tyre.curvatureFactor(),
                Math.min(MAX_SLIP, peakSlipTimesB / stiffnessFactor), 0);
    }

    /**
     * @return the force curve at one load and camber (model.md 8.2): the peak lowered by the camber loss and
     *     the curve shifted along the slip axis by S_H = camber thrust / cornering stiffness, at most half the
     *     peak slip angle either way, so that it gives about the camber thrust at zero slip
     */
    public LoadedCurve atLoad(double load, double camber) {
        if (tyre.camber().isNone()) {
            return atLoad(load);
        }
        double peak = peakForce(load, camber);
        if (peak <= 0) {
            return new LoadedCurve(0, 0, tyre.shapeFactor(), tyre.curvatureFactor(), MAX_SLIP, 0);
        }
        double stiffness = corneringStiffness(load);
        double stiffnessFactor = stiffness / (tyre.shapeFactor() * peak);
        double peakSlip = Math.min(MAX_SLIP, peakSlipTimesB / stiffnessFactor);
        double limit = 0.5 * peakSlip;
        double shift = Math.max(-limit, Math.min(limit, camberThrust(load, camber) / stiffness));
        return new LoadedCurve(peak, stiffnessFactor, tyre.shapeFactor(), tyre.curvatureFactor(), peakSlip - shift,
                shift);
    }

    /**
     * The tyre's lateral force curve at one vertical load (Magic Formula, model.md 8).
     *
     * @param peak            D = mu F_z (N); zero for an unloaded tyre, which gives no force
     * @param stiffnessFactor B (1/rad)
     * @param shape           C
     * @param curvature       E
     * @param peakSlipAngle   the slip angle of the peak (rad), at most {@link #MAX_SLIP} (less the shift)
     * @param slipShift       S_H, the horizontal shift that carries the camber thrust (rad); zero without camber
     */
    public record LoadedCurve(double peak, double stiffnessFactor, double shape, double curvature,
                              double peakSlipAngle, double slipShift) {
        /** @return F_y = D sin(C atan(B a - E (B a - atan(B a)))), a = alpha + S_H (N) */
        public double lateralForce(double slipAngle) {
            if (peak <= 0) {
                return 0;
            }
            double x = stiffnessFactor * (slipAngle + slipShift);
            return peak * Math.sin(shape * Math.atan(x - curvature * (x - Math.atan(x))));
        }
    }
}
