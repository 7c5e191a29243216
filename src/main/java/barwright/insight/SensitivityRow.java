package barwright.insight;

import java.util.OptionalDouble;

/**
 * What one change does: the figures of the changed car against those of the car as it is, both from full
 * analyses. Where the changed car cannot be analysed, {@code after} is null and {@code refusal} says why.
 *
 * @param change  the change
 * @param before  the car as it is
 * @param after   the changed car, or null
 * @param refusal why the changed car cannot be analysed, or null
 */
public record SensitivityRow(InputChange change, BalanceFigures before, BalanceFigures after, String refusal) {

    public boolean analysed() {
        return after != null;
    }

    /** @return change of the front share of load transfer (a fraction, not percentage points) */
    public double frontShareChange() {
        return after.frontLoadTransferShare() - before.frontLoadTransferShare();
    }

    /** @return change of the roll gradient (rad s^2/m) */
    public double rollGradientChange() {
        return after.rollGradient() - before.rollGradient();
    }

    /** @return change of front limit minus rear limit (m/s^2) */
    public double limitMarginChange() {
        return after.limitMargin() - before.limitMargin();
    }

    /** @return change of the first inside lift (m/s^2), empty where either car keeps its wheels down */
    public OptionalDouble insideLiftChange() {
        if (Double.isFinite(before.insideLift()) && Double.isFinite(after.insideLift())) {
            return OptionalDouble.of(after.insideLift() - before.insideLift());
        }
        return OptionalDouble.empty();
    }

    public Tendency tendency() {
        return Tendency.of(limitMarginChange(), frontShareChange());
    }
}
