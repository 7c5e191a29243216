package barwright.physics;

import barwright.model.Axle;
import barwright.model.Vehicle;
import org.junit.jupiter.api.Test;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

/** A car with no stable roll position is an error with its cause, never a number (model.md 5; brief). */
class ImpossibleVehicleTest {
    private static final double G = 9.80665;

    /** The club car on springs so soft and without bars that K_f + K_r < m_s g h' (invented). */
    static Vehicle floppyCar() {
        Vehicle car = TestCars.clubCar();
        Axle front = TestCars.axle(1.46, 0.06, 80, 0.29, 500, 0.5, 230e3, null);
        Axle rear = TestCars.axle(1.44, 0.11, 70, 0.29, 500, 0.5, 230e3, null);
        return car.withFront(front).withRear(rear);
    }

    @Test
    void noStableRollPositionIsRefusedWithItsCause() {
        Vehicle car = floppyCar();
        MassProperties masses = MassProperties.of(car);
        // the instability is real by the formula (model.md 3 and 5), so the refusal is no accident of the code
        double wheelRate = 500 * 0.5 * 0.5;
        double frontRoll = 1 / (1 / (wheelRate * 1.46 * 1.46 / 2) + 1 / (230e3 * 1.46 * 1.46 / 2));
        double rearRoll = 1 / (1 / (wheelRate * 1.44 * 1.44 / 2) + 1 / (230e3 * 1.44 * 1.44 / 2));
        assertThat(frontRoll + rearRoll).isLessThan(masses.sprungMass() * G * masses.rollArm());
        assertThatThrownBy(() -> VehicleAnalysis.analyse(car)).isInstanceOf(ImpossibleVehicleException.class)
                .hasMessageContaining("No stable roll position")
                .hasMessageContaining("must exceed m_s g h'")
                .hasMessageNotContaining("NaN").hasMessageNotContaining("Infinity");
    }

    @Test
    void exactlyAtTheGravityTermIsAlsoRefused() {
        // K_f + K_r = m_s g h' makes the denominator of phi zero (model.md 5: "<=" is an error)
        MassProperties masses = MassProperties.of(TestCars.clubCar());
        double half = masses.gravityRollMoment() / 2;
        assertThatThrownBy(() -> RollResponse.of(masses, half, half, null))
                .isInstanceOf(ImpossibleVehicleException.class);
        assertThat(RollResponse.of(masses, half * 1.01, half * 1.01, null).rollPerAccel()).isPositive();
    }

}
