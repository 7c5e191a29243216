package barwright.insight;

/**
 * A span of longitudinal acceleration a_x, forward positive (m/s^2), with {@code from <= to}.
 */
public record LongitudinalRange(double from, double to) {
    public LongitudinalRange {
        if (!(from <= to)) {
            throw new IllegalArgumentException("range from " + from + " to " + to + " is empty");
        }
    }

    /** @return true where a_x lies in the range, ends included */
    public boolean contains(double longitudinalAcceleration) {
        return longitudinalAcceleration >= from && longitudinalAcceleration <= to;
    }
}
