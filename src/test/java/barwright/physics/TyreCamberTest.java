package barwright.physics;

import barwright.model.Tyre;
import barwright.model.TyreCamber;
import org.junit.jupiter.api.Test;

import static barwright.units.Constants.RADIANS_PER_DEGREE;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * Camber (model.md 8.2): no loss at the best camber and the same loss either side of it; no thrust at zero
 * camber; J670's sense of the thrust (from memory: docs/validation.md, "Suspension linkages, camber and tyres
 * from data"); the curve's peak unchanged by the thrust. Checked against the definitions
 * and small-angle limits, not by restating the code.
 */
class TyreCamberTest {
    private static final double DEG = RADIANS_PER_DEGREE;
    // invented: best camber -2 deg, 0.004 of friction per deg^2 away from it, thrust 0.015 per deg per N
    private static final Tyre TYRE = TestCars.tyre().withCamber(new TyreCamber(-2 * DEG,
            0.004 / (DEG * DEG), 0.015 / DEG));

    @Test
    void noLossAtTheBestCamberAndTheSameLossEitherSideOfIt() {
        TyreModel tyre = new TyreModel(TYRE);
        for (double load : new double[]{1500, 3500, 6000}) {
            assertThat(tyre.friction(load, -2 * DEG)).isEqualTo(tyre.friction(load));
            for (double away : new double[]{0.5, 1, 3}) {
                double above = tyre.friction(load, (-2 + away) * DEG);
                double below = tyre.friction(load, (-2 - away) * DEG);
                assertThat(above).isCloseTo(below, within(1e-12));
                // 0.004 per deg^2 as given in the file's unit
                assertThat(tyre.friction(load) - above).isCloseTo(0.004 * away * away, within(1e-12));
            }
        }
    }

    @Test
    void noThrustAtZeroCamberAndANegativeOutsideCamberPushesTowardsTheTurn() {
        TyreModel tyre = new TyreModel(TYRE);
        assertThat(tyre.camberThrust(3500, 0)).isZero();
        // J670: the thrust acts towards the side the top leans to; the outside wheel's top leaning in (negative)
        // leans towards the turn's centre, so the thrust is positive here: 0.015 x 3500 N x 2 deg = 105 N
        assertThat(tyre.camberThrust(3500, -2 * DEG)).isCloseTo(105, within(1e-9));
        assertThat(tyre.camberThrust(3500, 2 * DEG)).isCloseTo(-105, within(1e-9));
    }

    @Test
    void theShiftedCurveGivesTheThrustAtZeroSlipAndKeepsItsPeak() {
        TyreModel tyre = new TyreModel(TYRE);
        TyreModel.LoadedCurve curve = tyre.atLoad(3500, -2 * DEG);
        // small-slip limit: F(0) = D sin(C atan(B S_H ...)) ~ B C D S_H = thrust, to second order in the shift
        // (105 N against a 4200 N peak: the cubic term is below 1 %)
        assertThat(curve.lateralForce(0)).isCloseTo(105, within(1.05));
        // the peak is the cambered D = mu(F_z, gamma) F_z, reached at the shifted peak slip angle
        assertThat(curve.lateralForce(curve.peakSlipAngle())).isCloseTo(tyre.peakForce(3500, -2 * DEG),
                within(1e-6));
        assertThat(curve.peak()).isEqualTo(tyre.peakForce(3500, -2 * DEG));
    }

    @Test
    void aTyreWithoutCamberTermsIsUntouchedByCamber() {
        TyreModel tyre = new TyreModel(TestCars.tyre());
        assertThat(tyre.atLoad(3500, -3 * DEG)).isEqualTo(tyre.atLoad(3500));
        assertThat(tyre.peakForce(3500, -3 * DEG)).isEqualTo(tyre.peakForce(3500));
    }

    @Test
    void anAxleOnCamberedWheelsFindsItsSlipAngleWhereTheThrustAloneIsEnough() {
        // outside wheel at -2 deg, inside at +2 deg (J670: top leaning out): both lean towards the turn's centre,
        // about 105 + 105 x (2000 / 3500) N of thrust at zero slip; ask for less than that
        AxleGrip grip = new AxleGrip(new TyreModel(TYRE), -2 * DEG, 2 * DEG);
        double slip = grip.slipAngleFor(50, 3500, 2000);
        assertThat(slip).isNegative();
        TyreModel tyre = new TyreModel(TYRE);
        double force = tyre.atLoad(3500, -2 * DEG).lateralForce(slip) + tyre.atLoad(2000, -2 * DEG).lateralForce(slip);
        assertThat(force).isCloseTo(50, within(1e-6));
    }
}
