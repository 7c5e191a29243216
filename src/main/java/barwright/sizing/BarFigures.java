package barwright.sizing;

/**
 * What one bar does in a setup, in SI.
 *
 * @param linkRate         force per metre of relative link travel (N/m)
 * @param rollStiffness    roll stiffness the bar adds to its axle, K_bar = k_link r^2 t^2 (N m/rad)
 * @param mass             the bar's mass (kg)
 * @param maxStress        the largest von Mises stress at the check travel (Pa)
 * @param safetyFactor     yield strength / maxStress (static)
 */
public record BarFigures(double linkRate, double rollStiffness, double mass, double maxStress, double safetyFactor) {
}
