package barwright.report.work;

import barwright.model.AntiRollBar;
import barwright.model.AxlePosition;
import barwright.model.BarSection;
import barwright.model.TubeSection;
import barwright.model.UBarDimensions;
import barwright.physics.AnalysisResult;
import barwright.physics.bar.BarModel;
import barwright.physics.bar.BarResult;
import barwright.units.Quantity;

import java.util.ArrayList;
import java.util.List;

import static barwright.units.Conversions.toMillimetres;

/** The working of a bar's link rate, mass and safety factor (model.md 1 and 2). */
final class BarWork {
    private static final String RATE_SOURCE = "model.md section 2: Castigliano's theorem over the torsion tube, "
            + "both arms as cantilevers, the overhangs and the span between the bushings; J and I from Roark's "
            + "Formulas for Stress and Strain (torsion of circular sections), model.md section 1";
    private static final String BEAM_SOURCE = "model.md section 2: a bar with a bent centreline is solved as a "
            + "frame of 3-D beam elements; for a plain U-bar it agrees with the closed form";
    private static final String STRESS_SOURCE = "model.md section 2 (stresses at the check travel): τ = F a R / J, "
            + "σ = M R / I, von Mises sqrt(σ² + 3 τ²)";

    private BarWork() {
    }

    static Derivation linkRate(AnalysisResult result, AxlePosition axle) {
        AntiRollBar bar = result.vehicle().axle(axle).bar();
        BarResult barResult = result.axle(axle).bar();
        String title = StiffnessWork.capital(axle) + " bar link rate";
        WorkValue rate = new WorkValue("k_link", "force per unit of relative travel of the two link ends",
                barResult.linkRate(), Quantity.LINEAR_RATE);
        if (barResult.model() == BarModel.BEAM) {
            return new Derivation(title, "k_link = F / Δ from the beam-element frame", sectionInputs(bar), List.of(),
                    rate, BEAM_SOURCE, "A shaped bar: its bends and offsets are taken into account by the frame.");
        }
        UBarDimensions dimensions = bar.dimensions();
        List<WorkValue> inputs = sectionInputs(bar);
        inputs.add(new WorkValue("E", "Young's modulus", bar.material().youngsModulus(), Quantity.MODULUS));
        inputs.add(new WorkValue("G", "shear modulus", bar.material().shearModulus(), Quantity.MODULUS));
        inputs.add(new WorkValue("a", "arm length of the hole in use", bar.selectedArmLength(), Quantity.LENGTH));
        inputs.add(new WorkValue("L", "torsion length", dimensions.torsionLength(), Quantity.LENGTH));
        inputs.add(new WorkValue("s", "bushing span", dimensions.bushingSpan(), Quantity.LENGTH));
        BarSection section = bar.section();
        return new Derivation(title,
                "Δ / F = 2 [ a³/(3 E I) + a² L/(2 G J) + c³/(3 E I) + c² s/(6 E I) ],   k_link = F / Δ",
                inputs,
                List.of(new Step(section instanceof TubeSection ? "J = π (D⁴ − d⁴) / 32, d = D − 2 w" : "J = π D⁴ / 32",
                                new WorkValue("J", "polar second moment of area", section.polarMoment(),
                                        Quantity.SECOND_MOMENT_OF_AREA)),
                        new Step("I = J / 2", new WorkValue("I", "second moment of area about a diameter",
                                section.bendingMoment(), Quantity.SECOND_MOMENT_OF_AREA)),
                        new Step("c = (L − s) / 2", new WorkValue("c", "overhang of each bar end beyond its bushing",
                                dimensions.overhang(), Quantity.LENGTH))),
                rate, RATE_SOURCE, "With the bushings at the bends (c = 0) and rigid arms this is the pure "
                + "torsion rate G J / (a² L); the arms' bending makes the real bar softer.");
    }

    static Derivation mass(AnalysisResult result, AxlePosition axle) {
        AntiRollBar bar = result.vehicle().axle(axle).bar();
        BarResult barResult = result.axle(axle).bar();
        String title = StiffnessWork.capital(axle) + " bar mass";
        WorkValue mass = new WorkValue("m_bar", "mass of the bar", barResult.mass(), Quantity.MASS);
        List<WorkValue> inputs = sectionInputs(bar);
        inputs.add(new WorkValue("ρ", "density", bar.material().density(), Quantity.DENSITY));
        List<Step> steps = List.of(new Step("A = section area", new WorkValue("A", "cross-section area",
                bar.section().area(), Quantity.AREA)));
        if (barResult.model() == BarModel.BEAM) {
            return new Derivation(title, "m_bar = ρ A × (length of the centreline)", inputs, steps, mass,
                    BEAM_SOURCE, "");
        }
        inputs.add(new WorkValue("L", "torsion length", bar.dimensions().torsionLength(), Quantity.LENGTH));
        inputs.add(new WorkValue("a_max", "longest arm", bar.dimensions().longestArm(), Quantity.LENGTH));
        return new Derivation(title, "m_bar = ρ A (L + 2 a_max)", inputs, steps, mass, "model.md section 1",
                "The arms are counted to their outermost hole; bends, splines and end eyes are left out.");
    }

    static Derivation safetyFactor(AnalysisResult result, AxlePosition axle) {
        AntiRollBar bar = result.vehicle().axle(axle).bar();
        BarResult barResult = result.axle(axle).bar();
        String title = StiffnessWork.capital(axle) + " bar safety factor";
        WorkValue factor = new WorkValue("SF", "static safety factor against yield", barResult.safetyFactor(),
                Quantity.RATIO);
        List<WorkValue> inputs = new ArrayList<>();
        inputs.add(new WorkValue("σ_y", "yield strength", bar.material().yieldStrength(), Quantity.STRESS));
        inputs.add(new WorkValue("travel", "check travel: left minus right wheel travel",
                result.vehicle().differentialWheelTravel(), Quantity.LENGTH));
        inputs.add(new WorkValue("r", "link motion ratio", bar.linkMotionRatio(), Quantity.RATIO));
        inputs.add(new WorkValue("k_link", "bar link rate", barResult.linkRate(), Quantity.LINEAR_RATE));
        String note = "Static, against yield, at the check travel. Stress concentrations at bends, splines and "
                + "end eyes, and fatigue, are not modelled: a bar cycled for a season needs a fatigue margin on "
                + "top. Below 1.5 Barwright warns.";
        List<Step> steps = new ArrayList<>();
        steps.add(new Step("Δ = r × travel", new WorkValue("Δ", "relative travel of the link ends",
                barResult.relativeLinkTravel(), Quantity.LENGTH)));
        steps.add(new Step("F = k_link Δ", new WorkValue("F", "link force", barResult.linkForce(), Quantity.FORCE)));
        if (barResult.model() == BarModel.BEAM) {
            steps.add(new Step("largest von Mises stress along the frame", new WorkValue("σ_max",
                    "largest stress, " + Math.round(toMillimetres(barResult.maxStressAt()))
                    + " mm along the bar from the left link", barResult.maxVonMisesStress(), Quantity.STRESS)));
            return new Derivation(title, "SF = σ_y / σ_max", inputs, steps, factor, BEAM_SOURCE, note);
        }
        inputs.add(new WorkValue("a", "arm length of the hole in use", bar.selectedArmLength(), Quantity.LENGTH));
        inputs.add(new WorkValue("c", "overhang beyond each bushing", bar.dimensions().overhang(), Quantity.LENGTH));
        inputs.add(new WorkValue("R", "outer radius", bar.section().outerRadius(), Quantity.LENGTH));
        double force = barResult.linkForce();
        double radius = bar.section().outerRadius();
        double arm = bar.selectedArmLength();
        double overhang = bar.dimensions().overhang();
        double bending = bar.section().bendingMoment();
        double bushingBending = force * overhang * radius / bending;
        steps.add(new Step("τ = F a R / J", new WorkValue("τ", "torsional shear in the tube",
                barResult.torsionalShearStress(), Quantity.STRESS)));
        steps.add(new Step("σ_a = F a R / I", new WorkValue("σ_a", "bending at the arm root",
                force * arm * radius / bending, Quantity.STRESS)));
        steps.add(new Step("σ_b = F c R / I", new WorkValue("σ_b", "bending at a bushing", bushingBending,
                Quantity.STRESS)));
        steps.add(new Step("σ_vm = sqrt(σ_b² + 3 τ²)", new WorkValue("σ_vm", "von Mises stress at a bushing",
                Math.sqrt(bushingBending * bushingBending
                        + 3 * barResult.torsionalShearStress() * barResult.torsionalShearStress()), Quantity.STRESS)));
        steps.add(new Step("σ_max = larger of σ_a and σ_vm", new WorkValue("σ_max", "largest stress",
                barResult.maxVonMisesStress(), Quantity.STRESS)));
        return new Derivation(title, "SF = σ_y / σ_max", inputs, steps, factor, STRESS_SOURCE, note);
    }

    static Derivation bushingLoad(AnalysisResult result, AxlePosition axle) {
        AntiRollBar bar = result.vehicle().axle(axle).bar();
        BarResult barResult = result.axle(axle).bar();
        String title = StiffnessWork.capital(axle) + " bar bushing load";
        double largest = barResult.bushingLoads().stream().mapToDouble(Double::doubleValue).max().orElse(0);
        WorkValue load = new WorkValue("R", "radial load on the more loaded bushing at the check travel", largest,
                Quantity.FORCE);
        List<WorkValue> inputs = new ArrayList<>();
        inputs.add(new WorkValue("k_link", "bar link rate", barResult.linkRate(), Quantity.LINEAR_RATE));
        inputs.add(new WorkValue("Δ", "relative travel of the link ends at the check travel",
                barResult.relativeLinkTravel(), Quantity.LENGTH));
        List<Step> steps = new ArrayList<>();
        steps.add(new Step("F = k_link Δ", new WorkValue("F", "link force", barResult.linkForce(), Quantity.FORCE)));
        String note = "What the bushing brackets and their bolts must carry at the check travel, before any "
                + "bump or kerb strike on top.";
        if (barResult.model() == BarModel.BEAM) {
            return new Derivation(title, "R = the largest bushing reaction of the frame", inputs, steps, load,
                    BEAM_SOURCE, note);
        }
        inputs.add(new WorkValue("L", "torsion length, between the link points", bar.dimensions().torsionLength(),
                Quantity.LENGTH));
        inputs.add(new WorkValue("s", "bushing span", bar.dimensions().bushingSpan(), Quantity.LENGTH));
        return new Derivation(title, "R = F L / s", inputs, steps, load,
                "model.md section 2: the two link forces form a couple F L about the car's length axis, held by "
                        + "the two bushings as a couple R s", note);
    }

    private static List<WorkValue> sectionInputs(AntiRollBar bar) {
        List<WorkValue> inputs = new ArrayList<>();
        inputs.add(new WorkValue("D", "outside diameter", bar.section().outerDiameter(), Quantity.LENGTH));
        if (bar.section() instanceof TubeSection tube) {
            inputs.add(new WorkValue("w", "tube wall", tube.wall(), Quantity.LENGTH));
        }
        return inputs;
    }
}
