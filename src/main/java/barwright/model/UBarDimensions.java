package barwright.model;

import java.util.List;

/**
 * The dimensions of a plain U-shaped bar for the closed-form rate of model.md 2.
 *
 * @param torsionLength length L of the torsion tube between the two arm bends (m)
 * @param bushingSpan   distance s between the bushing centres, symmetric, s <= L (m)
 * @param armLengths    effective arm length a of each link hole (m): perpendicular distance from the bar
 *                      axis to the link pin
 */
public record UBarDimensions(double torsionLength, double bushingSpan, List<Double> armLengths) {
    public UBarDimensions {
        Checks.positive("torsionLength", torsionLength);
        Checks.positive("bushingSpan", bushingSpan);
        if (bushingSpan > torsionLength) {
            throw new IllegalArgumentException("bushingSpan " + bushingSpan + " exceeds torsionLength " + torsionLength);
        }
        armLengths = List.copyOf(armLengths);
        if (armLengths.isEmpty()) {
            throw new IllegalArgumentException("armLengths must hold at least one arm");
        }
        armLengths.forEach(arm -> Checks.positive("armLength", arm));
    }

    /** @return overhang c = (L - s) / 2 of each bar end beyond its bushing (m) */
    public double overhang() {
        return (torsionLength - bushingSpan) / 2;
    }

    /** @return the longest arm (m), which sets the bar's length for its mass */
    public double longestArm() {
        return armLengths.stream().mapToDouble(Double::doubleValue).max().orElseThrow();
    }
}
