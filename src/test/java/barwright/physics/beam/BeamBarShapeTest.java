package barwright.physics.beam;

import barwright.model.AntiRollBar;
import barwright.model.BarSection;
import barwright.model.SolidSection;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

import static barwright.physics.beam.BarShapes.STEEL;
import static barwright.physics.beam.BarShapes.droppedCentreBar;
import static barwright.physics.beam.BarShapes.sweptBar;
import static barwright.physics.beam.BarShapes.uBar;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * Shaped bars against the plain U-bar of the same torsion length and arm reach. Castigliano's theorem says
 * a shape can only add strain energy for the same link forces where it adds length or carries a moment in
 * a more compliant way, so both shapes here must be softer; the sizes come from hand derivations below.
 */
class BeamBarShapeTest {
    private static final BarSection SECTION = new SolidSection(0.0254);
    private static final double TORSION_LENGTH = 1.0;
    private static final double SPAN = 0.8;
    private static final double REACH = 0.25;
    private static final double TRAVEL = 0.02;

    @ParameterizedTest
    @ValueSource(doubles = {10, 20, 30})
    void sweptArmsAreSofterByTheirExtraLength(double sweepDegrees) {
        // Expected sign: lower. An arm swept by beta for the same reach a is a / cos(beta) long, and its
        // bending compliance grows with the cube of its length; the link point also sits e = a tan(beta)
        // outboard of the bend, so the link couple bends the tube's overhangs and span harder. Rough size at
        // 20 degrees for this bar (terms below, per unit of the straight bar's compliance): arm +2 %,
        // overhangs +4 %, span +7 %, so about 13 % more compliance and a rate some 12 % lower: 8 to 16 %.
        // Exact value by hand (Castigliano, sharp corners, the loads of model.md 2): with l = a / cos(beta),
        // c = (L - s) / 2, Delta / F = 2 [l^3/(3EI) + ((c+e)^3 - e^3)/(3EI) + (c+e)^2 s/(6EI) + a^2 L/(2GJ)],
        // which reduces to model.md 2 at beta = 0.
        double sweep = Math.toRadians(sweepDegrees);
        AntiRollBar swept = sweptBar(SECTION, TORSION_LENGTH, SPAN, REACH, sweep, 0);
        AntiRollBar straight = uBar(SECTION, TORSION_LENGTH, SPAN, REACH, 0);

        double sweptRate = BeamBar.analyse(swept, TRAVEL).linkRate();
        double straightRate = BeamBar.analyse(straight, TRAVEL).linkRate();

        double e = REACH * Math.tan(sweep);
        double arm = REACH / Math.cos(sweep);
        double overhang = (TORSION_LENGTH - SPAN) / 2;
        double ei = STEEL.youngsModulus() * SECTION.bendingMoment();
        double gj = STEEL.shearModulus() * SECTION.polarMoment();
        double compliance = 2 * (Math.pow(arm, 3) / (3 * ei)
                + (Math.pow(overhang + e, 3) - Math.pow(e, 3)) / (3 * ei)
                + Math.pow(overhang + e, 2) * SPAN / (6 * ei)
                + REACH * REACH * TORSION_LENGTH / (2 * gj));
        assertThat(sweptRate).isLessThan(straightRate);
        // same structure and loads as the hand integration, cubic elements exact: round-off only
        assertThat(sweptRate * compliance).isCloseTo(1, within(1e-8));
        if (sweepDegrees == 20) {
            assertThat(1 - sweptRate / straightRate).isBetween(0.08, 0.16);
        }
    }

    @ParameterizedTest
    @ValueSource(doubles = {0.03, 0.06})
    void aDroppedCentreIsSofterByItsDoglegs(double drop) {
        // Expected sign: lower. The tube's torque T = F a must pass through two 45-degree doglegs, each
        // sqrt(2) times longer than the width it spans, where half the moment vector is torsion and half
        // bending. Per unit of width the compliance is sqrt(2) (1/(2GJ) + 1/(2EI)) = 1.26 / GJ for steel
        // (EI / GJ = E / (2G) = 1.28), against 1 / GJ straight: each dogleg adds 0.26 drop of torsion
        // length. Torsion is about 88 % of this bar's compliance (model.md 2 terms), so the rate falls by
        // about 0.88 * 2 * 0.26 * drop / L = 0.45 drop / L: 1.4 % at 30 mm, 2.7 % at 60 mm. The estimate
        // leaves out the doglegs' share of the small tube bending, so allow 15 % of it either way.
        double radius = 0;
        AntiRollBar dropped = droppedCentreBar(SECTION, TORSION_LENGTH, 0.9, REACH, 0.3, drop, radius);
        AntiRollBar straight = droppedCentreBar(SECTION, TORSION_LENGTH, 0.9, REACH, 0.3, 0, radius);

        double droppedRate = BeamBar.analyse(dropped, TRAVEL).linkRate();
        double straightRate = BeamBar.analyse(straight, TRAVEL).linkRate();

        double ei = STEEL.youngsModulus() * SECTION.bendingMoment();
        double gj = STEEL.shearModulus() * SECTION.polarMoment();
        double perDogleg = Math.sqrt(2) * (0.5 + 0.5 * gj / ei) - 1;
        double torsionShare = straightRate * REACH * REACH * TORSION_LENGTH / gj;
        double expectedDrop = torsionShare * 2 * perDogleg * drop / TORSION_LENGTH;
        assertThat(droppedRate).isLessThan(straightRate);
        assertThat(1 - droppedRate / straightRate).isCloseTo(expectedDrop, within(0.15 * expectedDrop));
    }

    @ParameterizedTest
    @ValueSource(doubles = {0.03, 0.05})
    void roundedDoglegsAreStillSofter(double bendRadius) {
        // the same physics with realistic bend radii (1.2 and 2 bar diameters): still lower than the
        // straight bar with the same bends at its arms
        AntiRollBar dropped = droppedCentreBar(SECTION, TORSION_LENGTH, 0.9, REACH, 0.3, 0.06, bendRadius);
        AntiRollBar straight = droppedCentreBar(SECTION, TORSION_LENGTH, 0.9, REACH, 0.3, 0, bendRadius);
        assertThat(BeamBar.analyse(dropped, TRAVEL).linkRate())
                .isLessThan(BeamBar.analyse(straight, TRAVEL).linkRate());
    }
}
