package barwright.physics;

import java.util.List;

/**
 * The steady turn in one direction: lift, axle limits, balance and the handling curve. Accelerations in
 * m/s^2; an acceleration that is never reached is {@code Double.POSITIVE_INFINITY}.
 *
 * @param cornering       wheel loads and roll against a_y in this direction
 * @param frontInsideLift a_y at which the inside front wheel lifts
 * @param rearInsideLift  a_y at which the inside rear wheel lifts
 * @param rollover        a_y at which both inside wheels are off the ground
 * @param frontLimit      a_y at which the front axle's required force meets its capacity
 * @param rearLimit       the same for the rear
 * @param limit           the vehicle's limit, the lower axle limit
 * @param balance         which axle reaches its limit first
 * @param handlingCurve   slip angles against a_y from 0 to the limit (it may end a little early: see
 *                        {@link AxleGrip#slipAngleFor})
 */
public record TurnResult(SteadyCornering cornering, double frontInsideLift, double rearInsideLift,
                         double rollover, double frontLimit, double rearLimit, double limit, Balance balance,
                         List<HandlingPoint> handlingCurve) {
    public TurnResult {
        handlingCurve = List.copyOf(handlingCurve);
    }

    /** @return the same figures with the wheel loads and roll of another turn (a mirror-image car's other turn) */
    TurnResult withCornering(SteadyCornering mirrored) {
        return new TurnResult(mirrored, frontInsideLift, rearInsideLift, rollover, frontLimit, rearLimit, limit, balance,
                handlingCurve);
    }

    /** @return true where the car rolls over (both inside wheels lifted) at or below its grip limit */
    public boolean rollsOverBeforeSliding() {
        return rollover <= limit;
    }
}
