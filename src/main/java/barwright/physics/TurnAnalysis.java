package barwright.physics;

import barwright.model.AxlePosition;
import barwright.solver.RootFinder;

import java.util.function.DoubleUnaryOperator;

import java.util.ArrayList;
import java.util.List;

import static barwright.units.Constants.STANDARD_GRAVITY;

/** Axle limits, balance and the handling curve of one turn direction (model.md 7 and 8). */
public final class TurnAnalysis {
    /** Limits are sought up to this lateral acceleration (m/s^2): 5 g, past any tyre on the road. */
    static final double SEARCH_CEILING = 5 * STANDARD_GRAVITY;
    /** Step of the scan for the first crossing of required force and capacity (m/s^2). */
    private static final double SCAN_STEP = 0.1 * STANDARD_GRAVITY;
    /** An axle's grip limit to 1e-9 m/s^2, within 200 evaluations. */
    private static final RootFinder GRIP_LIMIT = RootFinder.of("an axle's grip limit", 1e-9, 200);

    private TurnAnalysis() {
    }

    /**
     * @param mass              total mass m (kg)
     * @param frontMassFraction f: the front axle must give m a_y f, the rear m a_y (1 - f)
     * @param curvePoints       how many points the handling curve has (at least 2)
     */
    public static TurnResult analyse(SteadyCornering cornering, double mass, double frontMassFraction,
                                     AxleGrip frontGrip, AxleGrip rearGrip, int curvePoints) {
        double rollover = cornering.rollover();
        double ceiling = Math.min(SEARCH_CEILING, rollover);
        double[] limits = axleLimits(cornering, mass * frontMassFraction, mass * (1 - frontMassFraction), frontGrip,
                rearGrip, ceiling);
        double frontLimit = limits[0];
        double rearLimit = limits[1];
        double limit = Math.min(frontLimit, rearLimit);
        List<HandlingPoint> curve = handlingCurve(cornering, mass, frontMassFraction, frontGrip, rearGrip, limit,
                curvePoints);
        return new TurnResult(cornering, cornering.insideLift(AxlePosition.FRONT),
                cornering.insideLift(AxlePosition.REAR), rollover, frontLimit, rearLimit, limit,
                Balance.of(frontLimit, rearLimit), curve);
    }

    /**
     * @param massShare the mass whose lateral force this axle must supply: m b/l or m a/l (kg)
     * @return the first a_y at which the required force meets the capacity, or the ceiling where it never
     *     does before it
     */
    static double axleLimit(SteadyCornering cornering, AxlePosition axle, double massShare, AxleGrip grip,
                            double ceiling) {
        DoubleUnaryOperator surplus = accel -> capacityAt(cornering, axle, grip, accel) - massShare * accel;
        double low = 0;
        while (low < ceiling) {
            double high = Math.min(ceiling, low + SCAN_STEP);
            if (surplus.applyAsDouble(high) <= 0) {
                return GRIP_LIMIT.solve(surplus, low, high);
            }
            low = high;
        }
        return ceiling;
    }

    /**
     * Both axles' limits from one scan: each step's wheel loads (and roll) serve both axles, then each axle's
     * crossing is solved on its own. The same steps and solves as {@link #axleLimit} for each axle.
     *
     * @return {front limit, rear limit} (m/s^2)
     */
    static double[] axleLimits(SteadyCornering cornering, double frontMassShare, double rearMassShare,
                               AxleGrip frontGrip, AxleGrip rearGrip, double ceiling) {
        DoubleUnaryOperator frontSurplus = accel -> capacityAt(cornering, AxlePosition.FRONT, frontGrip, accel)
                - frontMassShare * accel;
        DoubleUnaryOperator rearSurplus = accel -> capacityAt(cornering, AxlePosition.REAR, rearGrip, accel)
                - rearMassShare * accel;
        double front = Double.NaN;
        double rear = Double.NaN;
        double low = 0;
        while (low < ceiling && (Double.isNaN(front) || Double.isNaN(rear))) {
            double high = Math.min(ceiling, low + SCAN_STEP);
            SteadyCornering.Point point = cornering.at(high);
            if (Double.isNaN(front) && capacityAt(cornering, AxlePosition.FRONT, frontGrip, point)
                    - frontMassShare * high <= 0) {
                front = GRIP_LIMIT.solve(frontSurplus, low, high);
            }
            if (Double.isNaN(rear) && capacityAt(cornering, AxlePosition.REAR, rearGrip, point)
                    - rearMassShare * high <= 0) {
                rear = GRIP_LIMIT.solve(rearSurplus, low, high);
            }
            low = high;
        }
        return new double[] {Double.isNaN(front) ? ceiling : front, Double.isNaN(rear) ? ceiling : rear};
    }

    /** @return the axle's capacity at the loads of that a_y, and the linkage's cambers there where it has one */
    private static double capacityAt(SteadyCornering cornering, AxlePosition axle, AxleGrip grip, double accel) {
        return capacityAt(cornering, axle, grip, cornering.at(accel));
    }

    private static double capacityAt(SteadyCornering cornering, AxlePosition axle, AxleGrip grip,
                                     SteadyCornering.Point point) {
        double outside = point.loads().outside(axle);
        double inside = point.loads().inside(axle);
        Double outsideCamber = cornering.outsideCamber(axle, point);
        return outsideCamber == null ? grip.capacity(outside, inside)
                : grip.capacity(outside, inside, outsideCamber, cornering.insideCamber(axle, point));
    }

    /** @return the axle's common slip angle for the force at that a_y, with the linkage's cambers where it has one */
    private static double slipAngle(SteadyCornering cornering, AxlePosition axle, AxleGrip grip, double force,
                                    SteadyCornering.Point point) {
        double outside = point.loads().outside(axle);
        double inside = point.loads().inside(axle);
        Double outsideCamber = cornering.outsideCamber(axle, point);
        return outsideCamber == null ? grip.slipAngleFor(force, outside, inside)
                : grip.slipAngleFor(force, outside, inside, outsideCamber, cornering.insideCamber(axle, point));
    }

    private static List<HandlingPoint> handlingCurve(SteadyCornering cornering, double mass,
                                                     double frontMassFraction, AxleGrip frontGrip,
                                                     AxleGrip rearGrip, double limit, int points) {
        List<HandlingPoint> curve = new ArrayList<>(points);
        for (int i = 0; i < points; i++) {
            double accel = limit * i / (points - 1);
            SteadyCornering.Point point = cornering.at(accel);
            double front = slipAngle(cornering, AxlePosition.FRONT, frontGrip, mass * frontMassFraction * accel,
                    point);
            double rear = slipAngle(cornering, AxlePosition.REAR, rearGrip, mass * (1 - frontMassFraction) * accel,
                    point);
            if (Double.isNaN(front) || Double.isNaN(rear)) {
                break; // an axle at a common slip angle cannot give the force: the curve ends here
            }
            curve.add(new HandlingPoint(accel, front, rear));
        }
        return curve;
    }
}
