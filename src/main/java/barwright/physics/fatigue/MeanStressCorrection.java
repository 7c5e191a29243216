package barwright.physics.fatigue;

/**
 * Turns an alternating stress with a mean into the fully reversed stress of equal life. Goodman and Gerber as in
 * Shigley's Mechanical Engineering Design, fatigue chapter (from memory): Goodman sigma_ar = sigma_a / (1 -
 * sigma_m / S_ut), Gerber sigma_ar = sigma_a / (1 - (sigma_m / S_ut)^2). A compressive mean takes no credit
 * (sigma_ar = sigma_a), the usual caution.
 */
public enum MeanStressCorrection {
    GOODMAN("goodman"),
    GERBER("gerber");

    private final String key;

    MeanStressCorrection(String key) {
        this.key = key;
    }

    public String key() {
        return key;
    }

    /**
     * @return the equivalent fully reversed amplitude (Pa); +infinity where the mean reaches the ultimate
     * strength (the bar breaks on that cycle)
     */
    public double equivalentAmplitude(double amplitude, double mean, double ultimateStrength) {
        if (mean <= 0) {
            return amplitude;
        }
        double ratio = mean / ultimateStrength;
        double denominator = this == GOODMAN ? 1 - ratio : 1 - ratio * ratio;
        return denominator > 0 ? amplitude / denominator : Double.POSITIVE_INFINITY;
    }
}
