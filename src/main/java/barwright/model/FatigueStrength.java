package barwright.model;

/**
 * What a material's fatigue life is drawn from (docs/model.md 13).
 *
 * @param ultimateStrength tensile ultimate strength S_ut (Pa)
 * @param enduranceLimit   the rotating-beam endurance limit S'_e of a polished test piece (Pa), before the
 *                         Marin factors; for a material with no true limit (aluminium), the fatigue strength at
 *                         {@code kneeCycles}
 * @param kneeCycles       cycles at which the S-N line reaches {@code enduranceLimit} (10^6 for steels)
 */
public record FatigueStrength(double ultimateStrength, double enduranceLimit, double kneeCycles) {
    /** Cycles of the knee for steels and titanium (Shigley's treatment, from memory). */
    public static final double STEEL_KNEE_CYCLES = 1e6;

    public FatigueStrength {
        Checks.positive("ultimateStrength", ultimateStrength);
        Checks.positive("enduranceLimit", enduranceLimit);
        if (!(kneeCycles > 1e3)) {
            throw new IllegalArgumentException("kneeCycles must exceed 1000, got " + kneeCycles);
        }
        if (enduranceLimit >= ultimateStrength) {
            throw new IllegalArgumentException("the endurance limit " + enduranceLimit / 1e6
                    + " MPa must be below the ultimate strength " + ultimateStrength / 1e6 + " MPa");
        }
    }
}
