package barwright.physics;

import barwright.model.CornerMasses;
import barwright.model.TurnDirection;
import barwright.model.Vehicle;
import org.junit.jupiter.api.Test;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

/** Masses and the roll axis (model.md 4), against hand arithmetic written out in each test. */
class MassPropertiesTest {
    private static final double G = 9.80665; // standard gravity, the CGPM value (NIST SP 811)

    @Test
    void sprungMassItsCentreAndTheRollArm() {
        // club car: m = 1050, f = 0.60, l = 2.45, h = 0.50; unsprung 80 kg at 0.29 (front), 70 kg at 0.29 (rear);
        // roll centres 0.06 and 0.11 m. By hand (moments about the ground and the front axle):
        // a = l (1 - f) = 0.98; m_s = 900; h_s = (1050 * 0.5 - 150 * 0.29) / 900 = 0.535;
        // a_s = (1050 * 0.98 - 70 * 2.45) / 900 = 0.952777...; m_sr = 900 a_s / l = 350; m_sf = 550;
        // z_a = 0.06 + 0.05 a_s / l = 0.0794444...; h' = h_s - z_a = 0.4555555...
        MassProperties masses = MassProperties.of(TestCars.clubCar());
        double tolerance = 1e-12; // exact arithmetic, rounding only
        assertThat(masses.cgToFrontAxle()).isCloseTo(0.98, within(tolerance));
        assertThat(masses.cgToRearAxle()).isCloseTo(1.47, within(tolerance));
        assertThat(masses.sprungMass()).isCloseTo(900, within(tolerance));
        assertThat(masses.sprungCgHeight()).isCloseTo(0.535, within(tolerance));
        assertThat(masses.sprungCgToFrontAxle()).isCloseTo(857.5 / 900, within(tolerance));
        assertThat(masses.rearSprungMass()).isCloseTo(350, within(1e-9));
        assertThat(masses.frontSprungMass()).isCloseTo(550, within(1e-9));
        assertThat(masses.rollAxisHeightAtCg()).isCloseTo(0.06 + 0.05 * 350.0 / 900, within(tolerance));
        assertThat(masses.rollArm()).isCloseTo(0.535 - 0.06 - 0.05 * 350.0 / 900, within(tolerance));
        assertThat(masses.gravityRollMoment()).isCloseTo(900 * G * masses.rollArm(), within(1e-9));
        // symmetric car: half the axle load on each wheel
        assertThat(masses.staticLoads().leftFront()).isCloseTo(1050 * 0.6 * G / 2, within(1e-9));
        assertThat(masses.staticLoads().rightRear()).isCloseTo(1050 * 0.4 * G / 2, within(1e-9));
    }

    @Test
    void cornerMassesSetTheTotalTheSplitAndEachWheel() {
        // files.md: corner masses replace massKg and frontMassFraction. 300 + 330 + 200 + 220 = 1050 kg,
        // front 630 / 1050 = 0.6; in a left turn the left wheels are inside (model.md 7)
        Vehicle car = TestCars.asymmetricClubCar();
        MassProperties masses = MassProperties.of(car);
        assertThat(masses.mass()).isCloseTo(1050, within(1e-12));
        assertThat(masses.frontMassFraction()).isCloseTo(0.6, within(1e-15));
        MassProperties.StaticWheelLoads loads = masses.staticLoads();
        assertThat(loads.frontInside(TurnDirection.LEFT)).isCloseTo(300 * G, within(1e-9));
        assertThat(loads.frontInside(TurnDirection.RIGHT)).isCloseTo(330 * G, within(1e-9));
        assertThat(loads.rearOutside(TurnDirection.LEFT)).isCloseTo(220 * G, within(1e-9));
        assertThat(loads.rearInside(TurnDirection.RIGHT)).isCloseTo(220 * G, within(1e-9));
        assertThat(loads.frontAxle() + loads.rearAxle()).isCloseTo(1050 * G, within(1e-9));
        // corner masses win over a massKg that disagrees with them
        Vehicle other = new Vehicle("x", 900, 0.5, new CornerMasses(300, 330, 200, 220), 0.5, 2.45, null,
                car.front(), car.rear(), 0.06);
        assertThat(MassProperties.of(other).mass()).isCloseTo(1050, within(1e-12));
    }

    @Test
    void aSprungCentreBelowTheGroundIsRefused() {
        // h_s = (m h - m_uf h_uf - m_ur h_ur) / m_s (model.md 4): a 1050 kg car with its CG at 0.1 m and 300 kg
        // of unsprung mass at 0.9 m gives h_s = (105 - 270) / 750 < 0, a body under the road: impossible, and
        // before this check it gave a negative roll gradient and a negative share of load transfer
        Vehicle car = TestCars.clubCar();
        Vehicle impossible = car.withCgHeight(0.1)
                .withFront(TestCars.axle(1.46, 0.06, 150, 0.9, 55e3, 0.95, 230e3, null))
                .withRear(TestCars.axle(1.44, 0.11, 150, 0.9, 45e3, 0.9, 230e3, null));
        assertThatThrownBy(() -> MassProperties.of(impossible)).isInstanceOf(ImpossibleVehicleException.class)
                .hasMessageContaining("sprung mass's centre comes out -220 mm above the ground");
    }

    @Test
    void unsprungMassesThatLeaveNoSprungMassAreRefused() {
        Vehicle car = TestCars.clubCar().withMassDistribution(150, 0.5);
        assertThatThrownBy(() -> MassProperties.of(car)).isInstanceOf(ImpossibleVehicleException.class)
                .hasMessageContaining("no sprung mass");
    }
}
