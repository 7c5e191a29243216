package barwright.sizing;

import barwright.model.AntiRollBar;
import barwright.model.MaterialLibrary;
import barwright.model.SolidSection;
import barwright.model.TubeSection;
import barwright.model.UBarDimensions;
import barwright.sizing.catalogue.Catalogues;
import barwright.sizing.catalogue.StockSize;
import org.junit.jupiter.api.Test;

import java.util.ArrayList;
import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * Tubes of equal rate: each rate and mass recomputed here from the formulas themselves, Castigliano's link
 * compliance of model.md 2 and mass = density x area x (L + 2 a_max) of model.md 1 (areas and moments of a
 * circle and an annulus, Roark's Formulas for Stress and Strain; docs/validation.md, "Sections and torsion").
 */
class TubeEquivalentsTest {
    private static final double E = 207e9;
    private static final double G = 79.3e9;
    private static final double DENSITY = 7850;

    /** Delta / F = 2 [a^3/(3EI) + a^2 L/(2GJ) + c^3/(3EI) + c^2 s/(6EI)], written out again for the test. */
    private static double rate(double outer, double inner, double arm, double length, double span) {
        double polar = Math.PI * (Math.pow(outer, 4) - Math.pow(inner, 4)) / 32;
        double bending = polar / 2;
        double overhang = (length - span) / 2;
        double compliance = 2 * (Math.pow(arm, 3) / (3 * E * bending) + arm * arm * length / (2 * G * polar)
                + Math.pow(overhang, 3) / (3 * E * bending) + overhang * overhang * span / (6 * E * bending));
        return 1 / compliance;
    }

    @Test
    void everyTubeListedIsWithinTwoPercentAndNoneLeftOutIs() {
        UBarDimensions dimensions = new UBarDimensions(0.9, 0.76, List.of(0.18, 0.2, 0.22));
        AntiRollBar solid = new AntiRollBar(MaterialLibrary.SPRING_STEEL, new SolidSection(25e-3), dimensions, null, 1,
                0.85);
        List<StockSize> tubes = new ArrayList<>(Catalogues.builtIn("tube-metric").orElseThrow().sizes());
        tubes.addAll(Catalogues.builtIn("tube-inch").orElseThrow().sizes());
        TubeEquivalents.Comparison comparison = TubeEquivalents.compare(solid, 0.06, tubes,
                List.of(MaterialLibrary.SPRING_STEEL), TubeEquivalents.DEFAULT_TOLERANCE);
        double solidRate = rate(25e-3, 0, 0.2, 0.9, 0.76);
        double length = 0.9 + 2 * 0.22;
        double solidMass = DENSITY * Math.PI * 25e-3 * 25e-3 / 4 * length;
        assertThat(comparison.solid().linkRate()).isCloseTo(solidRate, within(solidRate * 1e-12));
        assertThat(comparison.solid().mass()).isCloseTo(solidMass, within(solidMass * 1e-12));
        assertThat(comparison.matches()).isNotEmpty();
        for (StockSize size : tubes) {
            TubeSection tube = (TubeSection) size.section();
            double tubeRate = rate(tube.outerDiameter(), tube.innerDiameter(), 0.2, 0.9, 0.76);
            boolean equalRate = Math.abs(tubeRate / solidRate - 1) <= 0.02;
            var match = comparison.matches().stream().filter(m -> m.size().equals(size)).findFirst();
            assertThat(match.isPresent()).as(size.label()).isEqualTo(equalRate);
            if (match.isPresent()) {
                double area = Math.PI * (Math.pow(tube.outerDiameter(), 2) - Math.pow(tube.innerDiameter(), 2)) / 4;
                double mass = DENSITY * area * length;
                assertThat(match.get().mass()).isCloseTo(mass, within(mass * 1e-12));
                assertThat(match.get().massSaved()).isCloseTo(solidMass - mass, within(1e-9));
                assertThat(Math.abs(match.get().rateDifference())).isLessThanOrEqualTo(0.02);
                // a tube of the same rate carries a higher stress than the solid bar: its outer fibre sits
                // further out for the same torque (tau = T R / J, Roark)
                assertThat(match.get().maxStress()).isGreaterThan(comparison.solid().maxVonMisesStress());
            }
        }
        for (int i = 1; i < comparison.matches().size(); i++) {
            assertThat(comparison.matches().get(i).mass()).isGreaterThanOrEqualTo(comparison.matches().get(i - 1).mass());
        }
    }
}
