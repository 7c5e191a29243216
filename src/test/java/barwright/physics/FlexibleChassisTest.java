package barwright.physics;

import barwright.model.Axle;
import barwright.model.Vehicle;
import org.junit.jupiter.api.Test;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;
import static org.assertj.core.api.Assertions.withinPercentage;

/**
 * The flexible chassis of model.md 6 (its subject: Deakin et al., SAE 2000-01-3554, title page read; Milliken &
 * Milliken ch. 16, from memory): the value of docs/validation.md (section "Flexible chassis"), Cramer's rule on
 * the two roll equations, and the rigid limit.
 */
class FlexibleChassisTest {
    private static final double G = 9.80665;
    private static final double DEG = Math.PI / 180;

    /** Masses for the two-equation roll model alone: m_sf = m_sr = 1 kg on a 1 mm roll arm. */
    private static MassProperties evenSplitNoGravity() {
        // m_s g h' = 0.0196 N m/rad against axle stiffnesses of 3e4-6e4 N m/rad: the gravity term is 7e-7 of
        // them, which is how "no gravity term" of docs/validation.md is met in a model that always has one
        MassProperties.StaticWheelLoads loads = new MassProperties.StaticWheelLoads(5, 5, 5, 5);
        return new MassProperties(2, 0.5, 1, 1, 2, 0.3, 1, 1, 1, 0.299, 0.001, loads);
    }

    private static double elasticFrontShare(MassProperties masses, double front, double rear, Double chassis) {
        RollResponse roll = RollResponse.of(masses, front, rear, chassis);
        double frontElastic = front * roll.frontRollPerAccel();
        double rearElastic = rear * roll.rearRollPerAccel();
        return frontElastic / (frontElastic + rearElastic);
    }

    @Test
    void checksValueForAnEvenMomentSplit() {
        // docs/validation.md, section "Flexible chassis" (arithmetic): K_f = 1000, K_r = 500, K_c = 3000 N m/deg, roll moment split 0.5/0.5, no gravity term:
        // elastic front share 0.6500 (rigid 0.6667; K_c -> 0 gives 0.5000). Tolerance 1e-5: the print's
        // 4 decimals are exact fractions here (13/20, 2/3, 1/2), and the leftover gravity term moves them 1e-6.
        MassProperties masses = evenSplitNoGravity();
        double front = 1000 / DEG;
        double rear = 500 / DEG;
        assertThat(elasticFrontShare(masses, front, rear, 3000 / DEG)).isCloseTo(0.6500, within(1e-5));
        assertThat(elasticFrontShare(masses, front, rear, null)).isCloseTo(2.0 / 3, within(1e-5));
        assertThat(elasticFrontShare(masses, front, rear, 1e-6)).isCloseTo(0.5000, within(1e-5));
    }

    @Test
    void rollAnglesSolveTheTwoEquationsByCramersRule() {
        // model.md 6: (K_f + K_c - m_sf g h') phi_f - K_c phi_r = m_sf h' a_y and its twin; solved here by
        // Cramer's rule, independently of the program's LU decomposition (1e-12: rounding only)
        Vehicle car = TestCars.clubCar().withChassisTorsionalStiffness(7500 / DEG);
        AnalysisResult result = VehicleAnalysis.analyse(car);
        MassProperties m = result.masses();
        double kf = result.front().stiffness().rollStiffness();
        double kr = result.rear().stiffness().rollStiffness();
        double kc = 7500 / DEG;
        double a11 = kf + kc - m.frontSprungMass() * G * m.rollArm();
        double a22 = kr + kc - m.rearSprungMass() * G * m.rollArm();
        double b1 = m.frontSprungMass() * m.rollArm();
        double b2 = m.rearSprungMass() * m.rollArm();
        double det = a11 * a22 - kc * kc;
        double phiFront = (b1 * a22 + kc * b2) / det;
        double phiRear = (a11 * b2 + kc * b1) / det;
        assertThat(result.roll().frontRollPerAccel()).isCloseTo(phiFront, withinPercentage(1e-10));
        assertThat(result.roll().rearRollPerAccel()).isCloseTo(phiRear, withinPercentage(1e-10));
        // the reported body roll is the sprung-mass-weighted mean (model.md 6)
        assertThat(result.rollGradient()).isCloseTo(
                (m.frontSprungMass() * phiFront + m.rearSprungMass() * phiRear) / m.sprungMass(), withinPercentage(1e-10));
        // elastic transfer K_f phi_f / t_f (model.md 6)
        assertThat(result.front().loadTransfer().elastic()).isCloseTo(kf * phiFront / car.front().track(),
                withinPercentage(1e-10));
        assertThat(result.rear().loadTransfer().elastic()).isCloseTo(kr * phiRear / car.rear().track(),
                withinPercentage(1e-10));
    }

    @Test
    void stifferChassisTendsToTheRigidResult() {
        // model.md 6: as K_c grows the result tends to the rigid one; the gap shrinks about as K/K_c, so each
        // tenfold stiffer chassis must close it, and at K_c = 1e6 K it is below 1e-6. (Past about 1e7 K the
        // determinant a11 a22 - K_c^2 cancels away the digits and rounding takes over; real bodies are 1-50 K.)
        Vehicle rigidCar = TestCars.clubCar();
        AnalysisResult rigid = VehicleAnalysis.analyse(rigidCar);
        double axles = rigid.front().stiffness().rollStiffness() + rigid.rear().stiffness().rollStiffness();
        double previousGap = Double.POSITIVE_INFINITY;
        for (int power = 0; power <= 6; power++) {
            AnalysisResult flexible = VehicleAnalysis.analyse(
                    rigidCar.withChassisTorsionalStiffness(axles * Math.pow(10, power)));
            double gap = Math.abs(flexible.frontLoadTransferShare() - rigid.frontLoadTransferShare())
                    + Math.abs(flexible.rollGradient() / rigid.rollGradient() - 1);
            assertThat(gap).as("K_c = 1e%d K", power).isLessThan(previousGap);
            previousGap = gap;
        }
        assertThat(previousGap).isLessThan(1e-6);
    }

    @Test
    void flexibleChassisMovesTransferTowardsTheSofterEnd() {
        // A soft body cannot pass roll moment from one end to the other: each end's share moves towards its
        // own sprung-mass share (docs/validation.md, "Flexible chassis": 0.6667 rigid -> 0.65 -> 0.5); common practice says the same.
        Vehicle car = TestCars.clubCar();
        AnalysisResult rigid = VehicleAnalysis.analyse(car);
        AnalysisResult soft = VehicleAnalysis.analyse(car.withChassisTorsionalStiffness(2000 / DEG));
        double frontElasticRigid = rigid.front().loadTransfer().elastic()
                / (rigid.front().loadTransfer().elastic() + rigid.rear().loadTransfer().elastic());
        double frontElasticSoft = soft.front().loadTransfer().elastic()
                / (soft.front().loadTransfer().elastic() + soft.rear().loadTransfer().elastic());
        double frontSprungShare = rigid.masses().frontSprungMass() / rigid.masses().sprungMass();
        assertThat(Math.abs(frontElasticSoft - frontSprungShare))
                .isLessThan(Math.abs(frontElasticRigid - frontSprungShare));
    }

    @Test
    void aChassisTooSoftToHoldTheBodyIsRefused() {
        // A rear axle with almost no roll stiffness and a near-zero chassis stiffness: the rear body end has no
        // stable position (model.md 6: the system matrix is not positive definite), though the total is enough.
        Vehicle base = TestCars.clubCar();
        Axle weakRear = TestCars.axle(1.44, 0.11, 70, 0.29, 500, 0.5, 230e3, null);
        Vehicle car = base.withRear(weakRear).withChassisTorsionalStiffness(50.0);
        assertThat(VehicleAnalysis.analyse(base.withRear(weakRear)).rollGradient()).isPositive(); // rigid: fine
        assertThatThrownBy(() -> VehicleAnalysis.analyse(car)).isInstanceOf(ImpossibleVehicleException.class)
                .hasMessageContaining("No stable roll position with this chassis")
                .hasMessageNotContaining("NaN");
    }
}
