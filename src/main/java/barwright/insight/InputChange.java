package barwright.insight;

import barwright.model.Vehicle;
import barwright.units.Quantity;

import java.util.function.UnaryOperator;

/**
 * One small change a setter can make to a car, stated as the value before and after.
 *
 * @param key      a stable identifier for scripts, e.g. "rearBarArmHole"
 * @param subject  what is changed, e.g. "rear bar arm length"
 * @param effect   the change in words, e.g. "stiffer rear bar (shorter arm)"
 * @param quantity the kind of figure {@code from} and {@code to} are
 * @param from     the value before, in SI base units of the quantity
 * @param to       the value after
 * @param apply    builds the changed car from the car as it is
 */
public record InputChange(String key, String subject, String effect, Quantity quantity, double from, double to,
                          UnaryOperator<Vehicle> apply) {
}
