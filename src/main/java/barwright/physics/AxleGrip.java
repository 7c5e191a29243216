package barwright.physics;

import barwright.solver.RootFinder;
import org.apache.commons.math3.analysis.UnivariateFunction;
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
    /** The common slip angle to 1e-10 rad (about 6e-9 deg), within 200 evaluations. */
    private static final RootFinder SLIP_ANGLE = RootFinder.of("the common slip angle of an axle's tyres", 1e-10,
            200);
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
            return SLIP_ANGLE.solve(surplus::value, 0, firstPeak);
        }
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
        return SLIP_ANGLE.solve(surplus::value, firstPeak, top);
    }
}
