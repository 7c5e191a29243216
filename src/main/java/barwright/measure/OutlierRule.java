package barwright.measure;

import java.util.Arrays;

/**
 * The outlier rule of the fits: a residual is flagged where its modified z-score,
 * 0.6745 (r - median) / MAD, exceeds 3.5 (the Iglewicz-Hoaglin rule; the 0.6745 and the 3.5 are recalled
 * from memory). The median absolute deviation (MAD) is robust: one reading far off the line does not hide
 * itself by inflating the scatter, as it would with a rule on the standard deviation.
 */
final class OutlierRule {
    /** The modified z-score past which a residual is flagged. */
    static final double LIMIT = 3.5;
    /** Converts the MAD to a standard deviation for normal scatter: 1 / 1.4826. */
    static final double MAD_TO_Z = 0.6745;

    private OutlierRule() {
    }

    /**
     * @param residuals the residuals of one fit
     * @param floor     the smallest scatter taken as real (same unit): below it, readings that agree to
     *                  within the instrument's resolution are not called outliers
     * @return a flag per residual
     */
    static boolean[] flag(double[] residuals, double floor) {
        double median = median(residuals);
        double[] deviations = Arrays.stream(residuals).map(r -> Math.abs(r - median)).toArray();
        double mad = Math.max(median(deviations), floor);
        boolean[] flags = new boolean[residuals.length];
        for (int i = 0; i < residuals.length; i++) {
            flags[i] = MAD_TO_Z * Math.abs(residuals[i] - median) / mad > LIMIT;
        }
        return flags;
    }

    static double median(double[] values) {
        double[] sorted = values.clone();
        Arrays.sort(sorted);
        int middle = sorted.length / 2;
        return sorted.length % 2 == 1 ? sorted[middle] : (sorted[middle - 1] + sorted[middle]) / 2;
    }
}
