package barwright.model;

/**
 * A bar's fatigue inputs beyond its material.
 *
 * @param surface               the surface finish (Marin k_a)
 * @param stressConcentration   the fatigue stress-concentration factor K_f at the bends and ends, at least 1
 */
public record BarFatigueSettings(SurfaceFinish surface, double stressConcentration) {
    /**
     * K_f = 1.5 where none is given: a round bar's bends and splined or eye ends typically give K_t of 1.5 to 2.5
     * with notch sensitivity q of 0.8 to 0.9 for hard steel, so K_f = 1 + q (K_t - 1) of about 1.4 to 2.3
     * (common practice, from memory). A measured or published K_f for the actual end wins.
     */
    public static final double DEFAULT_STRESS_CONCENTRATION = 1.5;

    /** The defaults: a machined surface (neither the best nor the worst of the four) and K_f = 1.5. */
    public static final BarFatigueSettings DEFAULT = new BarFatigueSettings(SurfaceFinish.MACHINED,
            DEFAULT_STRESS_CONCENTRATION);

    public BarFatigueSettings {
        if (surface == null) {
            throw new IllegalArgumentException("a surface finish is required");
        }
        if (!(stressConcentration >= 1 && stressConcentration <= 10)) {
            throw new IllegalArgumentException("stressConcentration must be 1 to 10, got " + stressConcentration);
        }
    }
}
