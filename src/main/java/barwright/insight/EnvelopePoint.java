package barwright.insight;

/**
 * One point of a wheel's lift boundary.
 *
 * @param longitudinalAcceleration a_x, forward positive: braking is negative (m/s^2)
 * @param lateralAcceleration      a_y at which the wheel's load reaches zero with that a_x (m/s^2);
 *                                 {@code Double.POSITIVE_INFINITY} where it never does
 * @param rollover                 true where this wheel is the second inside wheel to lift: the car rolls over
 *                                 there (model.md 7)
 */
public record EnvelopePoint(double longitudinalAcceleration, double lateralAcceleration, boolean rollover) {
}
