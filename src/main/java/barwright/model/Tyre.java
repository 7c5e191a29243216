package barwright.model;

import java.util.Comparator;
import java.util.Objects;

/**
 * A tyre with load-sensitive grip and cornering stiffness, for the Magic Formula of model.md 8. The friction
 * and the cornering stiffness each come either from a law (the scalar parameters) or from points against load
 * (model.md 8.1); camber may change both (model.md 8.2).
 *
 * @param nominalLoad                     F_z0 (N)
 * @param frictionAtNominalLoad           mu_0 at F_z0. With friction points it is not used by the model and holds
 *                                        the points' straight-line value at F_z0 ({@link LoadTable#linearAt})
 * @param frictionLoadSensitivity         s in mu = mu_0 (1 + s (F_z/F_z0 - 1)); negative for real tyres. With
 *                                        friction points it holds the slope of the straight line between the two
 *                                        points nearest F_z0, as an s (display only)
 * @param corneringStiffnessPerLoad       k_c (1/rad): C(F_z0) = k_c F_z0. With stiffness points it holds the
 *                                        points' straight-line value at F_z0 divided by F_z0 (display only)
 * @param corneringStiffnessPeakLoadRatio p: the cornering stiffness peaks at F_z = p F_z0. With stiffness points
 *                                        it holds the load of the stiffest point over F_z0 (display only)
 * @param shapeFactor                     Magic Formula C, between 1 and 2
 * @param curvatureFactor                 Magic Formula E, at most 1
 * @param frictionByLoad                  peak friction against load, or null to use the law
 * @param corneringStiffnessByLoad        cornering stiffness (N/rad) against load, or null to use the law
 * @param camber                          the camber terms; {@link TyreCamber#NONE} for none
 */
public record Tyre(double nominalLoad, double frictionAtNominalLoad, double frictionLoadSensitivity,
                   double corneringStiffnessPerLoad, double corneringStiffnessPeakLoadRatio,
                   double shapeFactor, double curvatureFactor, LoadTable frictionByLoad,
                   LoadTable corneringStiffnessByLoad, TyreCamber camber) {
    public Tyre {
        Checks.positive("nominalLoad", nominalLoad);
        Checks.positive("frictionAtNominalLoad", frictionAtNominalLoad);
        Checks.finite("frictionLoadSensitivity", frictionLoadSensitivity);
        Checks.positive("corneringStiffnessPerLoad", corneringStiffnessPerLoad);
        Checks.positive("corneringStiffnessPeakLoadRatio", corneringStiffnessPeakLoadRatio);
        Checks.positive("shapeFactor", shapeFactor);
        Checks.finite("curvatureFactor", curvatureFactor);
        Objects.requireNonNull(camber, "camber");
    }

    /** A tyre with both laws and no camber effect (version-1 files). */
    public Tyre(double nominalLoad, double frictionAtNominalLoad, double frictionLoadSensitivity,
                double corneringStiffnessPerLoad, double corneringStiffnessPeakLoadRatio,
                double shapeFactor, double curvatureFactor) {
        this(nominalLoad, frictionAtNominalLoad, frictionLoadSensitivity, corneringStiffnessPerLoad,
                corneringStiffnessPeakLoadRatio, shapeFactor, curvatureFactor, null, null, TyreCamber.NONE);
    }

    /** @return true where the peak friction comes from points against load */
    public boolean hasFrictionPoints() {
        return frictionByLoad != null;
    }

    /** @return true where the cornering stiffness comes from points against load */
    public boolean hasStiffnessPoints() {
        return corneringStiffnessByLoad != null;
    }

    /**
     * @return the same tyre with its friction from points; the law's two values become the points' display
     *     stand-ins (see the record's parameters)
     */
    public Tyre withFrictionByLoad(LoadTable points) {
        double atNominal = points.linearAt(nominalLoad);
        double sensitivity = points.linearSlopeAt(nominalLoad) * nominalLoad / atNominal;
        return new Tyre(nominalLoad, atNominal, sensitivity, corneringStiffnessPerLoad,
                corneringStiffnessPeakLoadRatio, shapeFactor, curvatureFactor, points, corneringStiffnessByLoad,
                camber);
    }

    /** @return the same tyre with its cornering stiffness (N/rad) from points; display stand-ins as above */
    public Tyre withCorneringStiffnessByLoad(LoadTable points) {
        LoadPoint stiffest = points.points().stream()
                .max(Comparator.comparingDouble(LoadPoint::value)).orElseThrow();
        return new Tyre(nominalLoad, frictionAtNominalLoad, frictionLoadSensitivity,
                points.linearAt(nominalLoad) / nominalLoad, stiffest.load() / nominalLoad, shapeFactor,
                curvatureFactor, frictionByLoad, points, camber);
    }

    public Tyre withCamber(TyreCamber newCamber) {
        return new Tyre(nominalLoad, frictionAtNominalLoad, frictionLoadSensitivity, corneringStiffnessPerLoad,
                corneringStiffnessPeakLoadRatio, shapeFactor, curvatureFactor, frictionByLoad,
                corneringStiffnessByLoad, newCamber);
    }
}
