package barwright.physics.beam;

/**
 * The stresses at one cross-section of the bar at the check travel, at the outer fibre.
 *
 * @param distanceFromLeftLink arc length along the centreline from the left link point (m); negative on the
 *                             stub of the left arm beyond the link point
 * @param vonMisesStress       von Mises equivalent stress sqrt(sigma^2 + 3 tau^2) (Pa)
 * @param normalStress         largest normal stress |N| / A + M R / I from axial force and bending (Pa)
 * @param torsionalShearStress torsional shear |T| R / J (Pa)
 */
public record StressStation(double distanceFromLeftLink, double vonMisesStress, double normalStress,
                            double torsionalShearStress) {
}
