package barwright.physics.curve;

import barwright.physics.HandlingPoint;
import barwright.physics.SteadyCornering;
import barwright.physics.TurnResult;
import barwright.physics.WheelLoads;

import java.util.List;

/**
 * One turn sampled from rest to its grip limit, in SI: the body roll angle and the four wheel loads at evenly
 * spaced lateral accelerations, and the handling curve. The one producer of these lines for the window's
 * charts, the comparison and the setup sheet, so they all draw the same points.
 *
 * @param accel        lateral accelerations (m/s^2), from 0 to the limit
 * @param roll         body roll angle (rad) at each
 * @param frontOutside wheel loads (N) at each
 * @param frontInside  wheel loads (N) at each
 * @param rearOutside  wheel loads (N) at each
 * @param rearInside   wheel loads (N) at each
 */
public record CorneringCurves(double[] accel, double[] roll, double[] frontOutside, double[] frontInside,
                              double[] rearOutside, double[] rearInside) {

    /** @return the turn sampled at {@code points} evenly spaced accelerations from 0 to its limit */
    public static CorneringCurves sample(TurnResult turn, int points) {
        if (points < 2) {
            throw new IllegalArgumentException("a curve needs at least 2 points, was " + points);
        }
        double[] accel = new double[points];
        double[] roll = new double[points];
        double[] frontOutside = new double[points];
        double[] frontInside = new double[points];
        double[] rearOutside = new double[points];
        double[] rearInside = new double[points];
        SteadyCornering cornering = turn.cornering();
        for (int p = 0; p < points; p++) {
            accel[p] = turn.limit() * p / (points - 1);
            roll[p] = cornering.rollAngle(accel[p]);
            WheelLoads loads = cornering.wheelLoads(accel[p]);
            frontOutside[p] = loads.frontOutside();
            frontInside[p] = loads.frontInside();
            rearOutside[p] = loads.rearOutside();
            rearInside[p] = loads.rearInside();
        }
        return new CorneringCurves(accel, roll, frontOutside, frontInside, rearOutside, rearInside);
    }

    /** @return body roll angle against lateral acceleration */
    public Series roll(String name) {
        return new Series(name, accel, roll);
    }

    public Series frontOutside(String name) {
        return new Series(name, accel, frontOutside);
    }

    public Series frontInside(String name) {
        return new Series(name, accel, frontInside);
    }

    public Series rearOutside(String name) {
        return new Series(name, accel, rearOutside);
    }

    public Series rearInside(String name) {
        return new Series(name, accel, rearInside);
    }

    /** @return the turn's handling curve: front minus rear slip angle (rad) against lateral acceleration */
    public static Series handling(TurnResult turn, String name) {
        List<HandlingPoint> curve = turn.handlingCurve();
        return new Series(name, curve.stream().mapToDouble(HandlingPoint::lateralAcceleration).toArray(),
                curve.stream().mapToDouble(HandlingPoint::slipAngleDifference).toArray());
    }
}
