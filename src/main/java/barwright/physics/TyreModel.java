package barwright.physics;

import barwright.model.Tyre;
import barwright.solver.RootFinder;

/**
 * One tyre's lateral force (model.md 8): load-sensitive friction, load-dependent cornering stiffness and the
 * Magic Formula (Pacejka, Tyre and Vehicle Dynamics). Forces in N, slip angles in rad.
 */
public final class TyreModel {
    /** Slip angles are never sought beyond this (rad, about 29 deg): far past any real tyre's peak. */
    static final double MAX_SLIP = 0.5;

    /** x* to 1e-14, or a relative 1e-12, within 200 evaluations. */
    private static final RootFinder PEAK_ARGUMENT = new RootFinder("the slip at the tyre curve's peak", 1e-14,
            1e-12, RootFinder.DEFAULT_FUNCTION_ACCURACY, 200);

    private final Tyre tyre;
    private final double stiffnessNormaliser;
    // x* = B alpha at the curve's peak: solves x - E (x - atan x) = tan(pi / (2 C)); it does not depend on B
    private final double peakSlipTimesB;

    public TyreModel(Tyre tyre) {
        this.tyre = tyre;
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

    /** @return mu(F_z) = mu_0 (1 + s (F_z/F_z0 - 1)), never below zero */
    public double friction(double load) {
        double mu = tyre.frictionAtNominalLoad()
                * (1 + tyre.frictionLoadSensitivity() * (load / tyre.nominalLoad() - 1));
        return Math.max(0, mu);
    }

    /** @return the peak lateral force D = mu F_z (N); zero for an unloaded tyre */
    public double peakForce(double load) {
        return load > 0 ? friction(load) * load : 0;
    }

    /** @return C(F_z) = k_c F_z0 sin(2 atan(F_z/(p F_z0))) / sin(2 atan(1/p)) (N/rad); zero when unloaded */
    public double corneringStiffness(double load) {
        if (load <= 0) {
            return 0;
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
            return new LoadedCurve(0, 0, tyre.shapeFactor(), tyre.curvatureFactor(), MAX_SLIP);
        }
        double stiffnessFactor = corneringStiffness(load) / (tyre.shapeFactor() * peak);
        return new LoadedCurve(peak, stiffnessFactor, tyre.shapeFactor(), tyre.curvatureFactor(),
                Math.min(MAX_SLIP, peakSlipTimesB / stiffnessFactor));
    }

    /**
     * The tyre's lateral force curve at one vertical load (Magic Formula, model.md 8).
     *
     * @param peak            D = mu F_z (N); zero for an unloaded tyre, which gives no force
     * @param stiffnessFactor B (1/rad)
     * @param shape           C
     * @param curvature       E
     * @param peakSlipAngle   the slip angle of the peak (rad), at most {@link #MAX_SLIP}
     */
    public record LoadedCurve(double peak, double stiffnessFactor, double shape, double curvature,
                              double peakSlipAngle) {
        /** @return F_y = D sin(C atan(B alpha - E (B alpha - atan(B alpha)))) (N) */
        public double lateralForce(double slipAngle) {
            if (peak <= 0) {
                return 0;
            }
            double x = stiffnessFactor * slipAngle;
            return peak * Math.sin(shape * Math.atan(x - curvature * (x - Math.atan(x))));
        }
    }
}
