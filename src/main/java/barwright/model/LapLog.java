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
        return valueAt(values, intervalOf(time, -1), time);
    }

    /**
     * @param time  (s)
     * @param guess an interval index to try first (the last call's, when walking along the log), or -1
     * @return the index i of the sample interval [t_i, t_i+1] that holds the time, clamped to the log's first and
     *     last intervals; from a good guess this costs no search
     */
    public int intervalOf(double time, int guess) {
        int last = times.length - 1;
        if (guess >= 0 && guess < last && times[guess] <= time && time <= times[guess + 1]) {
            return guess;
        }
        if (guess >= 0 && guess + 1 < last && times[guess + 1] <= time && time <= times[guess + 2]) {
            return guess + 1;
        }
        if (time <= times[0]) {
            return 0;
        }
        if (time >= times[last]) {
            return last - 1;
        }
        int found = Arrays.binarySearch(times, time);
        return found >= 0 ? Math.min(found, last - 1) : -found - 2;
    }

    /**
     * @param values   one of this log's columns
     * @param interval the index of the interval holding the time, from {@link #intervalOf}
     * @return the column at a time: linear inside the log, held before its first and after its last sample (the
     *     interval's end values outside it)
     */
    public double valueAt(double[] values, int interval, double time) {
        double lower = times[interval];
        double upper = times[interval + 1];
        if (time <= lower) {
            return values[interval];
        }
        if (time >= upper) {
            return values[interval + 1];
        }
        double share = (time - lower) / (upper - lower);
        return values[interval] + share * (values[interval + 1] - values[interval]);
    }
}
