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
    private final double outsideCamber;
    private final double insideCamber;

    /** An axle whose wheels stand at zero camber to the road. */
    public AxleGrip(TyreModel tyre) {
        this(tyre, 0, 0);
    }

    /**
     * @param outsideCamber the outside wheel's camber to the road, SAE J670 vehicle sense (rad)
     * @param insideCamber  the inside wheel's camber to the road, SAE J670 vehicle sense (rad); it enters the
     *                      tyre model with its sign turned, the inside wheel being the outside one's mirror image
     */
    public AxleGrip(TyreModel tyre, double outsideCamber, double insideCamber) {
        this.tyre = tyre;
        this.outsideCamber = outsideCamber;
        this.insideCamber = insideCamber;
    }

    public TyreModel tyre() {
        return tyre;
    }

    /** @return the axle's capacity: the sum of mu(F_z, gamma) F_z over its two tyres (N) */
    public double capacity(double outsideLoad, double insideLoad) {
        return capacity(outsideLoad, insideLoad, outsideCamber, insideCamber);
    }

    /**
     * @param outsideCamber the outside wheel's camber to the road, SAE J670 (rad)
     * @param insideCamber  the inside wheel's camber to the road, SAE J670 (rad), entering with its sign turned
     * @return the axle's capacity with these cambers instead of the axle's own (N)
     */
    public double capacity(double outsideLoad, double insideLoad, double outsideCamber, double insideCamber) {
        return tyre.peakForce(outsideLoad, outsideCamber) + tyre.peakForce(insideLoad, -insideCamber);
    }

    /**
     * @return the share of the axle's grip lost to load transfer at these loads: 1 - capacity / the capacity
     *     with the same total load shared equally between the two tyres (model.md 8.1)
     */
    public double gripLostToTransfer(double outsideLoad, double insideLoad) {
        return gripLostToTransfer(outsideLoad, insideLoad, outsideCamber, insideCamber);
    }

    /**
     * @return the share of grip lost to load transfer with these cambers: both capacities at the same cambers,
     *     so only the loads differ
     */
    public double gripLostToTransfer(double outsideLoad, double insideLoad, double outsideCamber,
                                     double insideCamber) {
        double even = 0.5 * (outsideLoad + insideLoad);
        double evenCapacity = capacity(even, even, outsideCamber, insideCamber);
        return evenCapacity > 0
                ? 1 - capacity(outsideLoad, insideLoad, outsideCamber, insideCamber) / evenCapacity : 0;
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
        return slipAngleFor(requiredForce, outsideLoad, insideLoad, outsideCamber, insideCamber);
    }

    /**
     * As {@link #slipAngleFor(double, double, double)} with these cambers (SAE J670, rad) instead of the axle's
     * own.
     */
    public double slipAngleFor(double requiredForce, double outsideLoad, double insideLoad, double outsideCamber,
                               double insideCamber) {
        if (requiredForce <= 0) {
            return 0;
        }
        TyreModel.LoadedCurve outside = tyre.atLoad(outsideLoad, outsideCamber);
        TyreModel.LoadedCurve inside = tyre.atLoad(insideLoad, -insideCamber);
        UnivariateFunction surplus = slip -> outside.lateralForce(slip) + inside.lateralForce(slip) - requiredForce;
        double firstPeak = Math.min(outside.peakSlipAngle(), inside.peakSlipAngle());
        if (surplus.value(0) > 0) {
            // camber thrust alone gives more than the force needed: the root lies at a small negative slip, where
            // each tyre's shifted argument alpha + S_H is at most zero and the sum is below the need
            double lower = -Math.max(Math.abs(outside.slipShift()), Math.abs(inside.slipShift()));
            return SLIP_ANGLE.solve(surplus::value, lower, 0);
        }
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
