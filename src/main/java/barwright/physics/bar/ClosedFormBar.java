package barwright.physics.bar;

import barwright.model.AntiRollBar;
import barwright.model.BarSection;
import barwright.model.Material;
import barwright.model.UBarDimensions;

import java.util.List;

/**
 * Rate and stresses of a plain U-bar (model.md 2). With equal and opposite link forces F, Castigliano's
 * theorem over the torsion tube, both arms as cantilevers, the overhangs and the span between the bushings
 * gives the relative displacement of the link ends:
 * <pre>Delta = 2 F [ a^3/(3 E I) + a^2 L/(2 G J) + c^3/(3 E I) + c^2 s/(6 E I) ]</pre>
 */
public final class ClosedFormBar {
    private ClosedFormBar() {
    }

    /**
     * @return the link rate F / Delta (N per metre of relative link travel) of the selected hole
     */
    public static double linkRate(AntiRollBar bar) {
        return linkRate(bar.material(), bar.section(), bar.dimensions(), bar.selectedArmLength());
    }

    /**
     * @param arm effective arm length a (m)
     * @return the link rate F / Delta (N/m)
     */
    public static double linkRate(Material material, BarSection section, UBarDimensions dimensions, double arm) {
        return 1.0 / complianceOf(material, section, dimensions, arm);
    }

    /** @return Delta / F (m/N) of model.md 2 */
    public static double complianceOf(Material material, BarSection section, UBarDimensions dimensions, double arm) {
        double e = material.youngsModulus();
        double g = material.shearModulus();
        double i = section.bendingMoment();
        double j = section.polarMoment();
        double length = dimensions.torsionLength();
        double span = dimensions.bushingSpan();
        double overhang = dimensions.overhang();
        double armBending = Math.pow(arm, 3) / (3 * e * i);
        double tubeTorsion = arm * arm * length / (2 * g * j);
        double overhangBending = Math.pow(overhang, 3) / (3 * e * i);
        double spanBending = overhang * overhang * span / (6 * e * i);
        return 2 * (armBending + tubeTorsion + overhangBending + spanBending);
    }

    /** @return the bar's mass: density * area * (L + 2 * longest arm) (kg), model.md 1 */
    public static double mass(AntiRollBar bar) {
        UBarDimensions dimensions = bar.dimensions();
        return bar.material().density() * bar.section().area()
                * (dimensions.torsionLength() + 2 * dimensions.longestArm());
    }

    /**
     * Rate and the stresses at a relative link displacement (model.md 2).
     *
     * @param relativeLinkTravel Delta, the relative displacement of the two link ends (m)
     */
    public static BarResult analyse(AntiRollBar bar, double relativeLinkTravel) {
        BarSection section = bar.section();
        UBarDimensions dimensions = bar.dimensions();
        double arm = bar.selectedArmLength();
        double overhang = dimensions.overhang();
        double radius = section.outerRadius();
        double linkRate = linkRate(bar);
        double force = linkRate * relativeLinkTravel;

        double torsionalShear = force * arm * radius / section.polarMoment();
        double armRootBending = force * arm * radius / section.bendingMoment();
        double bushingBending = force * overhang * radius / section.bendingMoment();
        double bushingVonMises = Math.sqrt(bushingBending * bushingBending + 3 * torsionalShear * torsionalShear);
        boolean armRootGoverns = armRootBending >= bushingVonMises;
        double maxVonMises = Math.max(armRootBending, bushingVonMises);
        // distance from the left link point: along the arm to its root, then along the overhang to the bushing
        double maxStressAt = armRootGoverns ? arm : arm + overhang;
        double safetyFactor = maxVonMises > 0 ? bar.material().yieldStrength() / maxVonMises
                : Double.POSITIVE_INFINITY;
        // the link forces form a couple F L about the car's x axis, held by the bushings: R s = F L
        double bushingLoad = force * dimensions.torsionLength() / dimensions.bushingSpan();
        return new BarResult(BarModel.CLOSED_FORM, linkRate, mass(bar), relativeLinkTravel, force, torsionalShear,
                maxVonMises, maxStressAt, safetyFactor, List.of(bushingLoad, bushingLoad), List.of());
    }
}
