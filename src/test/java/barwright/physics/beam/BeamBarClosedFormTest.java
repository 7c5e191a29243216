package barwright.physics.beam;

import barwright.model.AntiRollBar;
import barwright.model.BarSection;
import barwright.model.SolidSection;
import barwright.model.TubeSection;
import barwright.physics.bar.BarModel;
import barwright.physics.bar.BarResult;
import barwright.physics.bar.ClosedFormBar;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

import java.util.List;
import java.util.stream.Stream;

import static barwright.physics.beam.BarShapes.uBar;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * The beam-element bar against the closed form of model.md 2 (Castigliano over the tube's torsion, the
 * arms as cantilevers, the overhangs and the span) for plain U-bars, several bushing spans, solid and tube.
 */
class BeamBarClosedFormTest {
    private static final double TORSION_LENGTH = 1.0;
    private static final List<Double> ARMS = List.of(0.25, 0.21);
    private static final double TRAVEL = 0.02;
    /**
     * A sharp-cornered U-bar on rigid bushings is, for the frame, exactly the structure the closed form
     * integrates (no axial or shear energy arises: every load is along z and every member in the x-y
     * plane), and cubic elements are exact for loads at nodes, so only round-off remains: 1e-8 relative,
     * with margin over the 1e-10 to 1e-9 seen on ~150-element meshes.
     */
    private static final double SAME_MODEL = 1e-8;
    /**
     * The tolerance for a centreline with tiny bends: a bend of radius r moves the corner's
     * material inwards, changing arm and tube lengths by a fraction of order r / a (0.4 % at 1 mm).
     */
    private static final double TINY_BEND = 0.005;
    private static final double TINY_RADIUS = 0.001;

    static Stream<Arguments> bars() {
        List<BarSection> sections = List.of(new SolidSection(0.0254), new SolidSection(0.018),
                new TubeSection(0.030, 0.004), new TubeSection(0.040, 0.005));
        Stream.Builder<Arguments> bars = Stream.builder();
        for (BarSection section : sections) {
            for (double span : new double[] {1.0, 0.8, 0.55}) {
                for (int hole = 0; hole < ARMS.size(); hole++) {
                    bars.add(Arguments.of(section, span, hole));
                }
            }
        }
        return bars.build();
    }

    @ParameterizedTest
    @MethodSource("bars")
    void tinyBendsAgreeWithTheClosedFormWithinHalfAPercent(BarSection section, double span, int hole) {
        AntiRollBar bar = uBar(section, TORSION_LENGTH, span, ARMS, TINY_RADIUS, hole);
        double closedForm = ClosedFormBar.linkRate(bar);
        assertThat(BeamBar.analyse(bar, TRAVEL).linkRate()).isCloseTo(closedForm, within(TINY_BEND * closedForm));
    }

    @ParameterizedTest
    @MethodSource("bars")
    void sharpCornersGiveTheClosedFormRateAndStresses(BarSection section, double span, int hole) {
        AntiRollBar bar = uBar(section, TORSION_LENGTH, span, ARMS, 0, hole);
        BarResult closed = ClosedFormBar.analyse(bar, TRAVEL);
        BarResult beam = BeamBar.analyse(bar, TRAVEL);
        assertThat(beam.model()).isEqualTo(BarModel.BEAM);
        assertThat(beam.linkRate()).isCloseTo(closed.linkRate(), within(SAME_MODEL * closed.linkRate()));
        assertThat(beam.linkForce()).isCloseTo(closed.linkForce(), within(SAME_MODEL * closed.linkForce()));
        // model.md 2: the largest of the arm-root bending F a R / I and, at a bushing, sqrt(sigma_b^2 + 3 tau^2)
        assertThat(beam.maxVonMisesStress()).isCloseTo(closed.maxVonMisesStress(),
                within(SAME_MODEL * closed.maxVonMisesStress()));
        assertThat(beam.maxStressAt()).isCloseTo(closed.maxStressAt(), within(1e-9));
        // bushing loads: the link couple F L is held by the bushing pair, R s = F L (statics, model.md 2)
        for (double load : beam.bushingLoads()) {
            assertThat(load).isCloseTo(closed.bushingLoads().get(0), within(SAME_MODEL * load));
        }
        // model.md 1: mass = density * area * (L + 2 * longest arm), which is the centreline's length here
        assertThat(beam.mass()).isCloseTo(closed.mass(), within(1e-12 * closed.mass()));
    }

    @ParameterizedTest
    @MethodSource("bars")
    void torsionalShearIsLinkForceTimesArmOverTheSection(BarSection section, double span, int hole) {
        // model.md 2: tau = F a R / J. By statics the torque in the tube is F a for any bend radius (the
        // bushings push through the axis), and the bends carry less, so the maximum along the bar is F a R / J.
        double radius = 0.03;
        // bushings must sit on the straight tube, not in the bends: s <= L - 2 r
        AntiRollBar bar = uBar(section, TORSION_LENGTH, Math.min(span, TORSION_LENGTH - 2 * radius), ARMS, radius, hole);
        BarResult beam = BeamBar.analyse(bar, TRAVEL);
        double expected = beam.linkForce() * ARMS.get(hole) * section.outerRadius() / section.polarMoment();
        // 1e-9: a statics identity, limited by round-off of the element end forces
        assertThat(beam.torsionalShearStress()).isCloseTo(expected, within(1e-9 * expected));
    }

    @Test
    void matchesTheSeriesModelValue() {
        // docs/validation.md, section "Bar rate, series model" (arithmetic, Castigliano): D = 25.4 mm solid,
        // L = 1.0 m, a = 0.25 m, bushings at the bends, G = 80 GPa, E = 205 GPa: 46.2844 N/mm. The value is
        // given to 6 figures, so it is good to 1.1e-6 relative: allow 2e-6.
        AntiRollBar bar = uBar(new SolidSection(0.0254), 1.0, 1.0, 0.25, 0);
        double newtonsPerMillimetre = BeamBar.analyse(bar, TRAVEL).linkRate() / 1000;
        assertThat(newtonsPerMillimetre).isCloseTo(46.2844, within(2e-6 * 46.2844));
    }

    @Test
    void roundedBendsCountTheirArcsInTheMass() {
        // hand geometry: each 90-degree bend of radius r replaces two straight lengths r by an arc pi r / 2,
        // so the centreline is L + 2 a - 4 r + pi r; mass = density * area * length (model.md 1)
        double radius = 0.05;
        SolidSection section = new SolidSection(0.022);
        AntiRollBar bar = uBar(section, 1.1, 0.9, 0.24, radius);
        double length = 1.1 + 2 * 0.24 - 4 * radius + Math.PI * radius;
        double expected = BarShapes.STEEL.density() * section.area() * length;
        assertThat(BeamBar.analyse(bar, TRAVEL).mass()).isCloseTo(expected, within(1e-12 * expected));
    }
}
