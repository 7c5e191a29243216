package barwright.model;

import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.junit.jupiter.api.Test;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;
import static org.assertj.core.api.Assertions.withinPercentage;

/**
 * Section properties of model.md 1 against the handbook: Roark's Formulas for Stress and Strain, torsion of
 * circular sections, and Shigley's Mechanical Engineering Design ch. 3 (J = pi d^4 / 32, I = J / 2 for a
 * circle, tau = T r / J; from memory). Values: docs/validation.md, section "Sections and torsion" (arithmetic).
 */
class SectionTest {
    private static final double MM4 = 1e-12; // m^4 per mm^4

    @Test
    void solidBarPolarMomentMatchesHandbook() {
        // docs/validation.md, "Sections and torsion" (arithmetic): D = 25.4 mm gives J = 40 863.42 mm^4; every printed figure here is checked to
        // half a unit of its last printed place, the most its rounding can hide
        SolidSection bar = new SolidSection(0.0254);
        assertThat(bar.polarMoment() / MM4).isCloseTo(40_863.42, within(0.005));
        // I = pi d^4 / 64 = J / 2 for any circle (Roark, same table); exact up to rounding
        assertThat(bar.bendingMoment()).isCloseTo(bar.polarMoment() / 2, within(1e-22));
        // area pi d^2 / 4 = 506.7075 mm^2 (exact arithmetic)
        assertThat(bar.area() * 1e6).isCloseTo(Math.PI * 25.4 * 25.4 / 4, withinPercentage(1e-10));
    }

    @Test
    void tubePolarMomentMatchesPrintedValue() {
        // docs/validation.md, "Sections and torsion" (arithmetic): D = 40 mm, bore 30 mm: J = 171 805.85 mm^4
        // (to 0.01 mm^4: 1e-8 relative)
        TubeSection tube = new TubeSection(0.040, 0.005);
        assertThat(tube.innerDiameter()).isCloseTo(0.030, within(1e-15));
        assertThat(tube.polarMoment() / MM4).isCloseTo(171_805.85, within(0.01));
        assertThat(tube.bendingMoment()).isCloseTo(tube.polarMoment() / 2, within(1e-22));
        assertThat(tube.area() * 1e6).isCloseTo(Math.PI * (40 * 40 - 30 * 30) / 4.0, withinPercentage(1e-10));
    }

    @Test
    void torsionalRateAndShearOfASolidBarMatchHandbook() {
        // docs/validation.md, "Sections and torsion" (arithmetic): D = 25.4 mm, G = 80 GPa, L = 1 m: G J / L = 3 269.07 N m/rad = 57.0561 N m/deg;
        // T = 500 N m gives tau_max = T r / J = 155.396 MPa (Shigley ch. 3). Half a unit of the last place.
        SolidSection bar = new SolidSection(0.0254);
        double rate = 80e9 * bar.polarMoment() / 1.0;
        assertThat(rate).isCloseTo(3_269.07, within(0.005));
        assertThat(rate * Math.PI / 180).isCloseTo(57.0561, within(0.00005));
        assertThat(500 * bar.outerRadius() / bar.polarMoment() / 1e6).isCloseTo(155.396, within(0.0005));
    }

    @ParameterizedTest
    @ValueSource(doubles = {1e-1, 1e-2, 1e-3, 1e-4})
    void tubeTendsToTheSolidBarAsItsBoreShrinks(double boreOverDiameter) {
        // A bore d in a bar D removes pi d^4 / 32 of J, a fraction (d/D)^4 (Roark): the tube's J, I and area
        // approach the solid bar's as d -> 0, with the relative gap exactly (d/D)^4 for J and (d/D)^2 for area.
        double diameter = 0.0254;
        double bore = boreOverDiameter * diameter;
        TubeSection tube = new TubeSection(diameter, (diameter - bore) / 2);
        SolidSection solid = new SolidSection(diameter);
        double polarGap = 1 - tube.polarMoment() / solid.polarMoment();
        double areaGap = 1 - tube.area() / solid.area();
        // 1e-6 relative on the gap: the subtraction D^4 - d^4 loses digits as d/D shrinks (at 1e-4, 16 of them)
        assertThat(polarGap).isCloseTo(Math.pow(boreOverDiameter, 4), within(1e-15 + 1e-6 * Math.pow(boreOverDiameter, 4)));
        assertThat(areaGap).isCloseTo(boreOverDiameter * boreOverDiameter, within(1e-14));
        assertThat(tube.polarMoment()).isLessThan(solid.polarMoment());
    }

    @Test
    void aTubeWallOfHalfTheDiameterOrMoreIsRefused() {
        // a wall of D/2 leaves no bore: the section is a solid bar and must be entered as one (model.md 1)
        assertThatThrownBy(() -> new TubeSection(0.0254, 0.0127)).isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> new TubeSection(0.0254, 0.014)).isInstanceOf(IllegalArgumentException.class);
        assertThatThrownBy(() -> new SolidSection(Double.NaN)).isInstanceOf(IllegalArgumentException.class);
    }
}
