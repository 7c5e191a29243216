package barwright.report.work;

/**
 * An intermediate result of a derivation, with the formula that gives it.
 *
 * @param formula e.g. "k_w = k_s MR²"
 * @param value   what it gives
 */
public record Step(String formula, WorkValue value) {
}
