package barwright.physics.bar;

import barwright.model.Point3;

import java.util.List;

/**
 * What a bar does on its own: its rate at the links and its stresses at the check travel.
 *
 * @param model                 which model computed it
 * @param linkRate              force per metre of relative link travel, k_link = F / Delta (N/m)
 * @param mass                  the bar's mass (kg)
 * @param relativeLinkTravel    relative link displacement at the check travel (m)
 * @param linkForce             link force at the check travel (N)
 * @param torsionalShearStress  torsional shear in the tube at the check travel (Pa)
 * @param maxVonMisesStress     the largest von Mises stress at the check travel (Pa)
 * @param maxStressAt           where it occurs: distance along the centreline from the left link point (m)
 * @param safetyFactor          yield strength / the largest stress (static)
 * @param bushingLoads          radial load of each bushing at the check travel (N)
 * @param deflectedShape        the centreline displaced at the check travel (m); empty for the closed form
 */
public record BarResult(BarModel model, double linkRate, double mass, double relativeLinkTravel, double linkForce,
                        double torsionalShearStress, double maxVonMisesStress, double maxStressAt,
                        double safetyFactor, List<Double> bushingLoads, List<Point3> deflectedShape) {
    public BarResult {
        bushingLoads = List.copyOf(bushingLoads);
        deflectedShape = List.copyOf(deflectedShape);
    }

    /**
     * The result with a measured factor on the rate (model.md 12.1). At the same link travel the link force
     * scales with the rate; the bar's stresses and bushing loads scale with the force it carries, and the
     * safety factor inversely. The deflected shape is that of the model.
     *
     * @param factor measured link rate / this result's link rate
     */
    public BarResult calibrated(double factor) {
        if (factor == 1) {
            return this;
        }
        return new BarResult(model, linkRate * factor, mass, relativeLinkTravel, linkForce * factor,
                torsionalShearStress * factor, maxVonMisesStress * factor, maxStressAt, safetyFactor / factor,
                bushingLoads.stream().map(load -> load * factor).toList(), deflectedShape);
    }
}
