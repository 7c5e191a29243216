package barwright.model;

/**
 * A tyre with load-sensitive grip and cornering stiffness, for the Magic Formula of model.md 8.
 *
 * @param nominalLoad                     F_z0 (N)
 * @param frictionAtNominalLoad           mu_0 at F_z0
 * @param frictionLoadSensitivity         s in mu = mu_0 (1 + s (F_z/F_z0 - 1)); negative for real tyres
 * @param corneringStiffnessPerLoad       k_c (1/rad): C(F_z0) = k_c F_z0
 * @param corneringStiffnessPeakLoadRatio p: the cornering stiffness peaks at F_z = p F_z0
 * @param shapeFactor                     Magic Formula C, between 1 and 2
 * @param curvatureFactor                 Magic Formula E, at most 1
 */
public record Tyre(double nominalLoad, double frictionAtNominalLoad, double frictionLoadSensitivity,
                   double corneringStiffnessPerLoad, double corneringStiffnessPeakLoadRatio,
                   double shapeFactor, double curvatureFactor) {
    public Tyre {
        Checks.positive("nominalLoad", nominalLoad);
        Checks.positive("frictionAtNominalLoad", frictionAtNominalLoad);
        Checks.finite("frictionLoadSensitivity", frictionLoadSensitivity);
        Checks.positive("corneringStiffnessPerLoad", corneringStiffnessPerLoad);
        Checks.positive("corneringStiffnessPeakLoadRatio", corneringStiffnessPeakLoadRatio);
        Checks.positive("shapeFactor", shapeFactor);
        Checks.finite("curvatureFactor", curvatureFactor);
    }
}
