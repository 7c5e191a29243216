package barwright.physics;

import org.apache.commons.math3.analysis.UnivariateFunction;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.optim.MaxEval;
import org.apache.commons.math3.optim.nonlinear.scalar.GoalType;
import org.apache.commons.math3.optim.univariate.BrentOptimizer;
import org.apache.commons.math3.optim.univariate.SearchInterval;
import org.apache.commons.math3.optim.univariate.UnivariateObjectiveFunction;

/**
 * The lateral grip of an axle's two tyres (model.md 8): capacity, and the common slip angle that gives a
 * required force. Forces in N, slip angles in rad.
 */
public final class AxleGrip {
    private static final double SLIP_ACCURACY = 1e-10;
    /** Newton's method stops when a step is below this (rad): with quadratic convergence the root is then exact. */
    private static final double NEWTON_STEP_TOLERANCE = 1e-13;
    private static final int NEWTON_MAX_ITERATIONS = 100;
    private final TyreModel tyre;

    public AxleGrip(TyreModel tyre) {
        this.tyre = tyre;
    }

    public TyreModel tyre() {
        return tyre;
    }

    /** @return the axle's capacity: the sum of mu F_z over its two tyres (N) */
    public double capacity(double outsideLoad, double insideLoad) {
        return tyre.peakForce(outsideLoad) + tyre.peakForce(insideLoad);
    }

    /** @return the axle's cornering stiffness at these loads: C(F_z,o) + C(F_z,i) (N/rad) */
    public double corneringStiffness(double outsideLoad, double insideLoad) {
        return tyre.corneringStiffness(outsideLoad) + tyre.corneringStiffness(insideLoad);
    }

    /**
     * The smallest common slip angle at which both tyres together give the required force, below the curve's
     * peak.
     *
     * @return the slip angle (rad), or NaN where the two tyres at a common slip angle cannot give that force
     */
    public double slipAngleFor(double requiredForce, double outsideLoad, double insideLoad) {
        if (requiredForce <= 0) {
            return 0;
        }
        TyreModel.LoadedCurve outside = tyre.atLoad(outsideLoad);
        TyreModel.LoadedCurve inside = tyre.atLoad(insideLoad);
        UnivariateFunction surplus = slip -> outside.lateralForce(slip) + inside.lateralForce(slip) - requiredForce;
        double firstPeak = Math.min(outside.peakSlipAngle(), inside.peakSlipAngle());
        if (surplus.value(firstPeak) >= 0) {
            // both curves still rise up to the first tyre's peak: the root is unique there
            return risingRoot(outside, inside, requiredForce, firstPeak);
        }
        BrentSolver solver = new BrentSolver(SLIP_ACCURACY);
        double lastPeak = Math.max(outside.peakSlipAngle(), inside.peakSlipAngle());
        if (lastPeak <= firstPeak) {
            return Double.NaN;
        }
        // between the two tyres' peaks the sum still may rise: find its highest point first
        double top = new BrentOptimizer(1e-10, 1e-12).optimize(new MaxEval(200),
                new UnivariateObjectiveFunction(surplus), GoalType.MAXIMIZE,
                new SearchInterval(firstPeak, lastPeak)).getPoint();
        if (surplus.value(top) < 0) {
            return Double.NaN;
        }
        return solver.solve(200, surplus, firstPeak, top);
    }

    /**
     * The root of F_o(alpha) + F_i(alpha) = required on [0, high], where the sum rises from below the force to at
     * least it: Newton's method from the linear estimate required / (C_o + C_i), kept inside the bracket that the
     * signs narrow, with bisection wherever a step would leave it (a safeguarded Newton iteration, e.g. Press et
     * al., Numerical Recipes, "rtsafe"). It needs about four evaluations where a Brent search needs ten.
     */
    private static double risingRoot(TyreModel.LoadedCurve outside, TyreModel.LoadedCurve inside, double required,
                                     double high) {
        double low = 0;
        double[] sums = new double[2];
        double slip = required / (outside.initialSlope() + inside.initialSlope());
        if (!(slip > low && slip < high)) {
            slip = (low + high) / 2;
        }
        for (int iteration = 0; iteration < NEWTON_MAX_ITERATIONS; iteration++) {
            sums[0] = -required;
            sums[1] = 0;
            outside.addForceAndSlope(slip, sums);
            inside.addForceAndSlope(slip, sums);
            if (sums[0] == 0) {
                return slip;
            }
            if (sums[0] < 0) {
                low = slip;
            } else {
                high = slip;
            }
            double step = sums[0] / sums[1];
            if (Math.abs(step) <= NEWTON_STEP_TOLERANCE) {
                return slip - step;
            }
            double next = slip - step;
            slip = next > low && next < high ? next : (low + high) / 2;
        }
        return slip;
    }
}
