package barwright.physics.bar;

import barwright.model.AntiRollBar;
import barwright.model.Material;
import barwright.model.SolidSection;
import barwright.model.TubeSection;
import barwright.model.UBarDimensions;
import barwright.physics.AxleStiffness;
import barwright.physics.TestCars;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

import java.util.List;
import java.util.Random;
import java.util.function.DoubleUnaryOperator;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;
import static org.assertj.core.api.Assertions.withinPercentage;

/**
 * The closed-form U-bar of model.md 2 against independent derivations: pure torsion G J / (a^2 L) (Roark,
 * torsion of circular shafts), the cantilever deflection F a^3 / (3 E I) (Roark / Shigley, beam tables), an
 * energy integration of the bar's moment diagram worked out by statics in this test (Castigliano's theorem),
 * the series values of docs/validation.md (section "Bar rate, series model"), and the stress formulas of Shigley ch. 3 and 5.
 */
class ClosedFormBarTest {
    /** Effectively rigid: 1e30 Pa makes a compliance term 1e-19 of the others, far below double rounding. */
    private static final double RIGID = 1e30;
    private static final double CHECKS_D = 0.0254;

    private static Material material(double youngs, double shear) {
        return new Material("test", youngs, shear, 7850, 1000e6);
    }

    private static UBarDimensions dimensions(double torsionLength, double bushingSpan, double arm) {
        return new UBarDimensions(torsionLength, bushingSpan, List.of(arm));
    }

    @Test
    void rigidArmsAndBushingsAtTheBendsGivePureTorsion() {
        // Derivation: the link forces put a torque T = F a on the tube; its two ends turn relative to each other by
        // theta = T L / (G J) (Roark, torsion of a circular shaft); the link ends sit a from the axis, so their
        // relative travel is a theta = F a^2 L / (G J), a rate of G J / (a^2 L).
        SolidSection section = new SolidSection(CHECKS_D);
        double expected = 80e9 * section.polarMoment() / (0.25 * 0.25 * 1.0);
        double rate = ClosedFormBar.linkRate(material(RIGID, 80e9), section, dimensions(1.0, 1.0, 0.25), 0.25);
        // closed form against closed form: 1e-12 relative (rounding only)
        assertThat(rate).isCloseTo(expected, withinPercentage(1e-10));
        // docs/validation.md, "Bar rate, series model" (arithmetic): 52.3052 N/mm, checked to half a unit of the last printed place
        assertThat(rate / 1e3).isCloseTo(52.3052, within(0.00005));
    }

    @Test
    void armBendingAloneIsTwoCantileversInSeries() {
        // Each arm is a cantilever from its root: deflection F a^3 / (3 E I) (Roark, cantilever with end load).
        // The two arms add their deflections to the relative travel: rate 3 E I / (2 a^3).
        SolidSection section = new SolidSection(CHECKS_D);
        double oneCantilever = 3 * 205e9 * section.bendingMoment() / Math.pow(0.25, 3);
        // docs/validation.md, "Bar rate, series model" (arithmetic): one arm as a cantilever 804.192 N/mm
        assertThat(oneCantilever / 1e3).isCloseTo(804.192, within(0.0005));
        double rate = ClosedFormBar.linkRate(material(205e9, RIGID), section, dimensions(1.0, 1.0, 0.25), 0.25);
        assertThat(rate).isCloseTo(oneCantilever / 2, withinPercentage(1e-10));
    }

    @Test
    void seriesModelMatchesTheChecksValues() {
        // docs/validation.md, "Bar rate, series model" (arithmetic): 1 / (1/52.3052 + 2/804.192) = 46.2844 N/mm; with link motion ratio 0.70 and track
        // 1.40 m, K_bar = k_link r^2 t^2 = 44 451.6 N m/rad = 775.826 N m/deg (torsion only 876.747 N m/deg)
        Material steel = material(205e9, 80e9);
        AntiRollBar bar = new AntiRollBar(steel, new SolidSection(CHECKS_D), dimensions(1.0, 1.0, 0.25), null, 0, 0.70);
        double linkRate = ClosedFormBar.linkRate(bar);
        assertThat(linkRate / 1e3).isCloseTo(46.2844, within(0.00005));

        BarResult result = ClosedFormBar.analyse(bar, 0);
        AxleStiffness stiffness = AxleStiffness.of(TestCars.axle(1.40, 0.05, 60, 0.3, 30e3, 1.0, 200e3, bar),
                result, 200);
        assertThat(stiffness.barRollStiffness()).isCloseTo(44_451.6, within(0.05));
        assertThat(stiffness.barRollStiffness() * Math.PI / 180).isCloseTo(775.826, within(0.0005));
        double torsionOnly = 80e9 * new SolidSection(CHECKS_D).polarMoment() / (0.25 * 0.25) * 0.49 * 1.96;
        assertThat(torsionOnly * Math.PI / 180).isCloseTo(876.747, within(0.0005));
    }

    @Test
    void imperialRuleOfThumbAgreesLoosely() {
        // Puhn, How to Make Your Car Handle (from memory; docs/validation.md, "Bar rate, series model"): k = 500 000 D^4 / (0.4244 A^2 B +
        // 0.2264 C^3) lb/in; D = 1 in, A = 10 in, B = 40 in, C = 10 in gives 259.875 lb/in for G = 12.0 Msi and
        // E = 30.0 Msi. A loose cross-check only: 0.01 % (its constants are rounded to 4 figures).
        double inch = 0.0254;
        double psi = 4.4482216152605 / (inch * inch); // NIST SP 811: 1 lbf = 4.448 221 615 260 5 N
        Material steel = material(30.0e6 * psi, 12.0e6 * psi);
        double rate = ClosedFormBar.linkRate(steel, new SolidSection(inch), dimensions(40 * inch, 40 * inch, 10 * inch),
                10 * inch);
        double poundsPerInch = rate * inch / 4.4482216152605;
        assertThat(poundsPerInch).isCloseTo(500_000.0 / (0.4244 * 100 * 40 + 0.2264 * 1000), withinPercentage(0.01));
    }

    @ParameterizedTest
    @ValueSource(longs = {1, 2, 3, 4, 5, 6, 7, 8})
    void overhangTermsAgreeWithAnEnergyIntegrationOfTheMomentDiagram(long seed) {
        // An independent derivation: equal and opposite link forces F at the arm tips; the bushings at +-s/2 react
        // the couple F L (statics: R = F L / s). Bending moments follow by statics along the arms, the overhangs
        // and the span; the tube carries the torque F a over its whole length. The strain energy
        // U = sum integral M^2 / (2 E I) + T^2 L / (2 G J) is integrated numerically (Simpson, exact for these
        // quadratics up to rounding), and Castigliano / Clapeyron give F Delta / 2 = U, so k_link = F^2 / (2 U).
        Random random = new Random(seed);
        double length = 0.6 + 0.6 * random.nextDouble();
        double span = length * (0.5 + 0.5 * random.nextDouble());
        double arm = 0.12 + 0.15 * random.nextDouble();
        double diameter = 0.015 + 0.015 * random.nextDouble();
        boolean tube = random.nextBoolean();
        var section = tube ? new TubeSection(diameter, diameter * 0.15) : new SolidSection(diameter);
        Material steel = material(205e9, 80e9);
        double e = steel.youngsModulus();
        double g = steel.shearModulus();
        double i = section.bendingMoment();
        double j = section.polarMoment();

        double force = 1000;
        double overhang = (length - span) / 2;
        double reaction = force * length / span;
        // moment along the tube from its left end y = 0: F y to the first bushing, less R (y - c) past it, plus
        // R (y - (L - c)) past the second (its reaction acts the other way)
        DoubleUnaryOperator tubeMoment = y -> force * y - reaction * Math.max(0, y - overhang)
                + reaction * Math.max(0, y - (length - overhang));
        // statics say the moment vanishes at the far end: a check of the test's own diagram
        assertThat(tubeMoment.applyAsDouble(length)).isCloseTo(0, within(1e-9 * force));
        double armEnergy = 2 * simpson(x -> square(force * x) / (2 * e * i), 0, arm);
        double bendingEnergy = simpson(y -> square(tubeMoment.applyAsDouble(y)) / (2 * e * i), 0, overhang)
                + simpson(y -> square(tubeMoment.applyAsDouble(y)) / (2 * e * i), overhang, length - overhang)
                + simpson(y -> square(tubeMoment.applyAsDouble(y)) / (2 * e * i), length - overhang, length);
        double torsionEnergy = square(force * arm) * length / (2 * g * j);
        double expected = force * force / (2 * (armEnergy + bendingEnergy + torsionEnergy));

        double rate = ClosedFormBar.linkRate(steel, section, dimensions(length, span, arm), arm);
        // 1e-9 relative: both sides are exact formulas; only rounding differs
        assertThat(rate).isCloseTo(expected, withinPercentage(1e-7));
    }

    @Test
    void stressesFollowTheHandbookFormulas() {
        // tau = T r / J with T = F a (Shigley ch. 3); sigma = M r / I at the arm root (M = F a) and at a bushing
        // (M = F c); von Mises of sigma and tau: sqrt(sigma^2 + 3 tau^2) (Shigley ch. 5); safety factor yield / it.
        Material steel = material(205e9, 80e9);
        SolidSection section = new SolidSection(CHECKS_D);
        AntiRollBar bar = new AntiRollBar(steel, section, dimensions(1.0, 0.6, 0.25), null, 0, 0.8);
        double linkRate = ClosedFormBar.linkRate(bar);
        // travel that puts T = F a = 500 N m on the tube: docs/validation.md, "Sections and torsion", tau = 155.396 MPa
        double force = 500 / 0.25;
        BarResult result = ClosedFormBar.analyse(bar, force / linkRate);
        assertThat(result.linkForce()).isCloseTo(force, withinPercentage(1e-10));
        assertThat(result.torsionalShearStress() / 1e6).isCloseTo(155.396, within(0.0005));

        double radius = CHECKS_D / 2;
        double tau = 500 * radius / section.polarMoment();
        double armRoot = 500 * radius / section.bendingMoment();
        double overhang = 0.2;
        double atBushing = Math.sqrt(square(force * overhang * radius / section.bendingMoment()) + 3 * tau * tau);
        double expectedMax = Math.max(armRoot, atBushing);
        assertThat(result.maxVonMisesStress()).isCloseTo(expectedMax, withinPercentage(1e-10));
        assertThat(result.safetyFactor()).isCloseTo(1000e6 / expectedMax, withinPercentage(1e-10));
        // here c = 0.2 > a / 2 = 0.125, so the bushing governs (sigma_b^2 + 3 tau^2 > (2 tau)^2)
        assertThat(atBushing).isGreaterThan(armRoot);
        assertThat(result.maxStressAt()).isCloseTo(0.25 + 0.2, within(1e-12));
    }

    @Test
    void armRootGovernsWhenTheOverhangIsShort() {
        // With I = J / 2, sigma_a = 2 tau; the bushing's von Mises tau sqrt(4 c^2/a^2 + 3) passes it only for
        // c > a / 2 (algebra on Shigley's formulas): with c = 0.05 and a = 0.25 the arm root governs.
        AntiRollBar bar = new AntiRollBar(material(205e9, 80e9), new SolidSection(0.02), dimensions(0.9, 0.8, 0.25),
                null, 0, 0.8);
        BarResult result = ClosedFormBar.analyse(bar, 0.03);
        assertThat(result.maxVonMisesStress()).isCloseTo(2 * result.torsionalShearStress(), withinPercentage(1e-10));
        assertThat(result.maxStressAt()).isCloseTo(0.25, within(1e-12));
    }

    @Test
    void bushingLoadsBalanceTheLinkCouple() {
        // statics: the link forces +-F at +-L/2 form a couple F L about the car's x axis; the bushings at +-s/2
        // hold it with +-R, so R s = F L. Vertical forces balance by symmetry.
        AntiRollBar bar = new AntiRollBar(material(205e9, 80e9), new SolidSection(0.02), dimensions(0.9, 0.7, 0.2),
                null, 0, 0.8);
        BarResult result = ClosedFormBar.analyse(bar, 0.04);
        assertThat(result.bushingLoads()).hasSize(2);
        for (double load : result.bushingLoads()) {
            assertThat(load * 0.7).isCloseTo(result.linkForce() * 0.9, withinPercentage(1e-10));
        }
        assertThat(result.relativeLinkTravel()).isEqualTo(0.04);
        assertThat(result.linkForce()).isCloseTo(result.linkRate() * 0.04, withinPercentage(1e-12));
    }

    @Test
    void massIsDensityTimesAreaTimesDevelopedLength() {
        // model.md 1: density * area * (L + 2 * longest arm); a 22 mm solid steel bar, L = 0.88, arms up to 0.23
        AntiRollBar bar = new AntiRollBar(material(205e9, 80e9), new SolidSection(0.022),
                new UBarDimensions(0.88, 0.72, List.of(0.19, 0.23, 0.21)), null, 0, 0.8);
        double expected = 7850 * Math.PI * 0.022 * 0.022 / 4 * (0.88 + 2 * 0.23);
        assertThat(ClosedFormBar.mass(bar)).isCloseTo(expected, withinPercentage(1e-10));
        assertThat(ClosedFormBar.analyse(bar, 0.05).mass()).isEqualTo(ClosedFormBar.mass(bar));
    }

    @Test
    void longerArmSoftensTheBar() {
        // k_link falls as the arm grows (every term of Delta grows with a or stays): the reason for several holes
        UBarDimensions dims = new UBarDimensions(0.9, 0.75, List.of(0.18, 0.20, 0.22));
        AntiRollBar bar = new AntiRollBar(material(205e9, 80e9), new SolidSection(0.022), dims, null, 0, 0.8);
        double shortArm = ClosedFormBar.linkRate(bar);
        double middle = ClosedFormBar.linkRate(bar.withSelectedArm(1));
        double longArm = ClosedFormBar.linkRate(bar.withSelectedArm(2));
        assertThat(shortArm).isGreaterThan(middle);
        assertThat(middle).isGreaterThan(longArm);
    }

    private static double simpson(DoubleUnaryOperator f, double from, double to) {
        int intervals = 64;
        double h = (to - from) / intervals;
        double sum = f.applyAsDouble(from) + f.applyAsDouble(to);
        for (int k = 1; k < intervals; k++) {
            sum += (k % 2 == 1 ? 4 : 2) * f.applyAsDouble(from + k * h);
        }
        return sum * h / 3;
    }

    private static double square(double value) {
        return value * value;
    }
}
