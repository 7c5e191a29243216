package barwright.model;

/**
 * One row of a lateral-acceleration spectrum: a corner of that peak a_y, met that many times per lap.
 *
 * @param lateralAcceleration the corner's peak a_y (m/s^2); positive in a left turn, negative in a right turn
 * @param countPerLap         how many such corners a lap has (a whole number, at least 0)
 */
public record SpectrumLevel(double lateralAcceleration, int countPerLap) {
    public SpectrumLevel {
        if (!Double.isFinite(lateralAcceleration)) {
            throw new IllegalArgumentException("lateralAcceleration must be finite");
        }
        if (countPerLap < 0) {
            throw new IllegalArgumentException("countPerLap must not be negative, got " + countPerLap);
        }
    }
}
