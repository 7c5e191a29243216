package barwright.sizing;

import barwright.model.Material;
import barwright.sizing.catalogue.StockSize;

/**
 * A tube of (nearly) the same rate as a solid bar, and what it saves.
 *
 * @param size            the tube
 * @param material        its material
 * @param linkRate        its link rate at the same hole (N/m)
 * @param rateDifference  its rate / the solid bar's rate - 1
 * @param mass            its mass (kg)
 * @param massSaved       the solid bar's mass minus its mass (kg)
 * @param maxStress       its largest von Mises stress at the check travel (Pa)
 * @param safetyFactor    its static safety factor at the check travel
 */
public record TubeMatch(StockSize size, Material material, double linkRate, double rateDifference, double mass,
                        double massSaved, double maxStress, double safetyFactor) {
}
