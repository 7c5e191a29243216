package barwright.model;

import java.util.Arrays;

/**
 * A logged lap in SI: samples at increasing times, a_y and a_x linear between them, held before the first and
 * after the last.
 *
 * @param times        sample times (s), strictly increasing
 * @param lateral      a_y at each sample (m/s^2, positive to the left)
 * @param longitudinal a_x at each sample (m/s^2, forward positive); zeros where the log has none
 * @param speeds       speed at each sample (m/s), or null where the log has none
 */
public record LapLog(double[] times, double[] lateral, double[] longitudinal, double[] speeds) {
    public LapLog {
        if (times.length < 2 || lateral.length != times.length || longitudinal.length != times.length
                || (speeds != null && speeds.length != times.length)) {
            throw new IllegalArgumentException("a log needs at least 2 samples, each with a_y and a_x");
        }
        for (int i = 1; i < times.length; i++) {
            if (!(times[i] > times[i - 1])) {
                throw new IllegalArgumentException("log times must increase, sample " + i);
            }
        }
    }

    /** @return a_y at a time (m/s^2) */
    public double lateralAt(double time) {
        return interpolate(lateral, time);
    }

    /** @return a_x at a time (m/s^2) */
    public double longitudinalAt(double time) {
        return interpolate(longitudinal, time);
    }

    /** @return the shortest time between two samples (s) */
    public double shortestInterval() {
        double finest = Double.POSITIVE_INFINITY;
        for (int i = 1; i < times.length; i++) {
            finest = Math.min(finest, times[i] - times[i - 1]);
        }
        return finest;
    }

    /** @return the log's first time (s) */
    public double start() {
        return times[0];
    }

    /** @return the log's last time (s) */
    public double end() {
        return times[times.length - 1];
    }

    private double interpolate(double[] values, double time) {
        if (time <= times[0]) {
            return values[0];
        }
        int last = times.length - 1;
        if (time >= times[last]) {
            return values[last];
        }
        int found = Arrays.binarySearch(times, time);
        if (found >= 0) {
            return values[found];
        }
        int upper = -found - 1;
        int lower = upper - 1;
        double share = (time - times[lower]) / (times[upper] - times[lower]);
        return values[lower] + share * (values[upper] - values[lower]);
    }
}
