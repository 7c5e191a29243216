package barwright.physics;

import barwright.model.Tyre;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;
import static org.assertj.core.api.Assertions.withinPercentage;

/**
 * The tyre of model.md 8: load-sensitive friction, load-dependent cornering stiffness and the Magic Formula
 * (Pacejka, Tyre and Vehicle Dynamics: F_y = D sin(C atan(B x - E (B x - atan B x))), peak D, slope at the
 * origin B C D; from memory: docs/validation.md, "Formulas named beside tests"). Expected values from those
 * formulas and trigonometric identities worked in the tests.
 */
class TyreModelTest {
    private static final Tyre TYRE = TestCars.tyre(); // F_z0 3500 N, mu0 1.2, s -0.15, k_c 16, p 2, C 1.3, E -0.5

    @Test
    void frictionFallsLinearlyWithLoad() {
        // mu = mu0 (1 + s (F_z/F_z0 - 1)): at F_z0, mu0; at 2 F_z0, 1.2 * 0.85 = 1.02; never below the floor of
        // half mu0 (model.md 8.1: the clamp at zero this test once checked gave cars a 0 g limit)
        TyreModel tyre = new TyreModel(TYRE);
        assertThat(tyre.friction(3500)).isCloseTo(1.2, within(1e-15));
        assertThat(tyre.friction(7000)).isCloseTo(1.02, within(1e-15));
        assertThat(tyre.peakForce(7000)).isCloseTo(1.02 * 7000, within(1e-9));
        assertThat(tyre.friction(1e6)).isEqualTo(0.6);
        assertThat(tyre.unfloredFriction(1e6)).isNegative(); // what the law says there, for the warning
        assertThat(tyre.peakForce(0)).isZero();
        assertThat(tyre.peakForce(-100)).isZero();
    }

    @Test
    void corneringStiffnessIsKcFz0AtNominalLoadAndPeaksAtPTimesIt() {
        // sin(2 atan u) = 2u / (1 + u^2) (double-angle identity), so C(F_z) = k_c F_z0 * [2u/(1+u^2)] /
        // [2v/(1+v^2)] with u = F_z/(p F_z0), v = 1/p: C(F_z0) = k_c F_z0 exactly, largest at u = 1
        TyreModel tyre = new TyreModel(TYRE);
        assertThat(tyre.corneringStiffness(3500)).isCloseTo(16.0 * 3500, withinPercentage(1e-12));
        for (double load : new double[]{500, 2000, 5000, 9000}) {
            double u = load / (2 * 3500);
            double v = 0.5;
            double expected = 16.0 * 3500 * (2 * u / (1 + u * u)) / (2 * v / (1 + v * v));
            assertThat(tyre.corneringStiffness(load)).isCloseTo(expected, withinPercentage(1e-10));
        }
        double peak = tyre.corneringStiffness(7000);
        assertThat(tyre.corneringStiffness(6900)).isLessThan(peak);
        assertThat(tyre.corneringStiffness(7100)).isLessThan(peak);
        assertThat(tyre.corneringStiffness(0)).isZero();
    }

    @ParameterizedTest
    @CsvSource({"1.3, -0.5", "1.6, 0.3", "1.9, -2", "1.2, 0.9", "1.8, 1.0"})
    void magicFormulaPeaksAtDAndStartsWithTheCorneringStiffness(double shape, double curvature) {
        // With 1 < C <= 2 the curve peaks at exactly D where C atan(...) = pi/2 (model.md 8; Pacejka). Its slope
        // at the origin is B C D = the cornering stiffness (Pacejka's definition of B). Checked for several E.
        Tyre tyreData = new Tyre(3500, 1.2, -0.15, 16.0, 2.0, shape, curvature);
        TyreModel tyre = new TyreModel(tyreData);
        for (double load : new double[]{1500, 3500, 6000}) {
            double peakSlip = tyre.peakSlipAngle(load);
            double d = tyre.peakForce(load);
            if (peakSlip < TyreModel.MAX_SLIP) {
                assertThat(tyre.lateralForce(peakSlip, load)).isCloseTo(d, withinPercentage(1e-9));
                assertThat(tyre.lateralForce(peakSlip * 0.98, load)).isLessThan(d);
                assertThat(tyre.lateralForce(peakSlip * 1.02, load)).isLessThan(d);
            }
            // central difference over +-1e-6 rad: truncation error of order (B h)^2 ~ 1e-10, rounding ~1e-8
            double h = 1e-6;
            double slope = (tyre.lateralForce(h, load) - tyre.lateralForce(-h, load)) / (2 * h);
            assertThat(slope).isCloseTo(tyre.corneringStiffness(load), withinPercentage(1e-5));
        }
    }

    @Test
    void curvatureFactorOfOneWithAMildShapeNeverReachesD() {
        // files.md allows curvatureFactor up to 1. With E = 1 the argument is C atan(atan(B x)), bounded by
        // C atan(pi/2) = 1.3 * 1.0039 < pi/2 for C = 1.3: the curve rises towards D sin(1.305) but never peaks.
        // The program must still analyse such a tyre (it did fail with an internal error before): the peak
        // slip is capped at MAX_SLIP and the force stays below D.
        TyreModel tyre = new TyreModel(new Tyre(3500, 1.2, -0.15, 16.0, 2.0, 1.3, 1.0));
        assertThat(tyre.peakSlipAngle(3500)).isEqualTo(TyreModel.MAX_SLIP);
        double d = tyre.peakForce(3500);
        assertThat(tyre.lateralForce(TyreModel.MAX_SLIP, 3500)).isLessThan(d)
                .isGreaterThan(0.9 * d * Math.sin(1.3 * Math.atan(Math.PI / 2)));
    }

    @Test
    void axleCapacityIsTheSumOfMuTimesLoad() {
        // model.md 8: capacity = sum of D = mu(F_z) F_z over the axle's two tyres
        AxleGrip grip = new AxleGrip(new TyreModel(TYRE));
        double outside = 5000;
        double inside = 2000;
        double expected = 1.2 * (1 - 0.15 * (5000 / 3500.0 - 1)) * 5000 + 1.2 * (1 - 0.15 * (2000 / 3500.0 - 1)) * 2000;
        assertThat(grip.capacity(outside, inside)).isCloseTo(expected, withinPercentage(1e-12));
        assertThat(grip.capacity(7000, 0)).isCloseTo(1.02 * 7000, withinPercentage(1e-12));
        assertThat(grip.corneringStiffness(outside, inside)).isCloseTo(
                new TyreModel(TYRE).corneringStiffness(5000) + new TyreModel(TYRE).corneringStiffness(2000),
                withinPercentage(1e-12));
    }

    @Test
    void commonSlipAngleGivesTheRequiredForce() {
        // model.md 8: the smallest common slip angle at which both tyres together give the force
        AxleGrip grip = new AxleGrip(new TyreModel(TYRE));
        TyreModel tyre = grip.tyre();
        double outside = 5200;
        double inside = 1800;
        double capacity = grip.capacity(outside, inside);
        for (double share : new double[]{0.01, 0.3, 0.7, 0.95}) {
            double required = share * capacity;
            double slip = grip.slipAngleFor(required, outside, inside);
            assertThat(slip).isPositive();
            assertThat(tyre.lateralForce(slip, outside) + tyre.lateralForce(slip, inside))
                    .isCloseTo(required, withinPercentage(1e-6));
            // the smallest: a slightly smaller angle gives less
            assertThat(tyre.lateralForce(slip * 0.99, outside) + tyre.lateralForce(slip * 0.99, inside))
                    .isLessThan(required);
        }
        assertThat(grip.slipAngleFor(0, outside, inside)).isZero();
        assertThat(grip.slipAngleFor(1.01 * capacity, outside, inside)).isNaN();
    }
}
