package barwright.model;

import java.util.Locale;
import java.util.Optional;

/**
 * The bar's surface, for the Marin surface factor k_a = a S_ut^b (S_ut in MPa). Coefficients: Shigley's
 * Mechanical Engineering Design, 9th ed., Table 6-2 (ground a = 1.58, b = -0.085; machined or cold-drawn 4.51,
 * -0.265; as-forged 272, -0.995), read on a web copy of the book (docs/validation.md, Fatigue, [R3]). Shot-peening has no row in that table; its
 * compressive skin helps, but no credit is taken for it here: a shot-peened bar is given the ground factor
 * (common practice, on the safe side).
 */
public enum SurfaceFinish {
    AS_FORGED("as-forged", 272, -0.995),
    MACHINED("machined", 4.51, -0.265),
    GROUND("ground", 1.58, -0.085),
    SHOT_PEENED("shot-peened", 1.58, -0.085);

    private final String key;
    private final double coefficient;
    private final double exponent;

    SurfaceFinish(String key, double coefficient, double exponent) {
        this.key = key;
        this.coefficient = coefficient;
        this.exponent = exponent;
    }

    /** @return the file and command-line spelling */
    public String key() {
        return key;
    }

    /** @return k_a for that ultimate strength (Pa), at most 1 */
    public double surfaceFactor(double ultimateStrength) {
        return Math.min(1, coefficient * Math.pow(ultimateStrength / 1e6, exponent));
    }

    /** @return the finish of that spelling, or empty */
    public static Optional<SurfaceFinish> byKey(String key) {
        String wanted = key.trim().toLowerCase(Locale.ROOT);
        for (SurfaceFinish finish : values()) {
            if (finish.key.equals(wanted)) {
                return Optional.of(finish);
            }
        }
        return Optional.empty();
    }
}
