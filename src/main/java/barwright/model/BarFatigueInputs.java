package barwright.model;


/**
 * Everything the fatigue check needs of one bar beyond its geometry.
 *
 * @param strength  the material's fatigue data
 * @param settings  surface finish and K_f
 */
public record BarFatigueInputs(FatigueStrength strength, BarFatigueSettings settings) {
}
