package barwright.physics;

/**
 * One point of the handling curve.
 *
 * @param lateralAcceleration a_y (m/s^2)
 * @param frontSlipAngle      the front axle's common slip angle (rad)
 * @param rearSlipAngle       the rear axle's common slip angle (rad)
 */
public record HandlingPoint(double lateralAcceleration, double frontSlipAngle, double rearSlipAngle) {
    /** @return alpha_f - alpha_r (rad): positive is understeer */
    public double slipAngleDifference() {
        return frontSlipAngle - rearSlipAngle;
    }
}
