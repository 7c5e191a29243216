package barwright.physics;

import barwright.model.AntiRollBar;
import barwright.model.Axle;
import barwright.physics.bar.BarResult;
import barwright.physics.bar.ClosedFormBar;
import org.junit.jupiter.api.Test;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;
import static org.assertj.core.api.Assertions.withinPercentage;

/**
 * Axle roll stiffness and ride rates (model.md 3) against docs/validation.md, section "Roll stiffness of springs
 * and tyres" (arithmetic) and derivations in the tests. Springs in series add compliances (any statics text).
 */
class AxleStiffnessTest {
    private static final double DEG = Math.PI / 180;

    @Test
    void springsOfThirtyNewtonsPerMillimetreOnATrackOfOnePointFourMetres() {
        // docs/validation.md, "Roll stiffness of springs and tyres": wheel rate 30 N/mm per side, track 1.40 m: K = k_w t^2 / 2 = 29 400 N m/rad = 513.127 N m/deg
        // (a roll angle phi moves each wheel t phi / 2, each spring pushes back k_w t phi / 2 on a lever t / 2)
        Axle axle = TestCars.axle(1.40, 0.05, 60, 0.3, 30e3, 1.0, 200e3, null);
        AxleStiffness stiffness = AxleStiffness.of(axle, null, 200);
        assertThat(stiffness.springRollStiffness()).isCloseTo(29_400, withinPercentage(1e-12));
        assertThat(stiffness.springRollStiffness() * DEG).isCloseTo(513.127, within(0.0005));
        assertThat(stiffness.barRollStiffness()).isZero();
        assertThat(stiffness.suspensionRollStiffness()).isEqualTo(stiffness.springRollStiffness());
    }

    @Test
    void motionRatioEntersSquared() {
        // model.md conventions: a component rate becomes a wheel rate times the motion ratio squared
        // (virtual work: force ratio r and travel ratio r); 40 N/mm at ratio 0.8 is 25.6 N/mm at the wheel
        Axle axle = TestCars.axle(1.50, 0.05, 60, 0.3, 40e3, 0.8, 200e3, null);
        AxleStiffness stiffness = AxleStiffness.of(axle, null, 200);
        assertThat(stiffness.wheelRate()).isCloseTo(25.6e3, withinPercentage(1e-12));
        assertThat(stiffness.heaveRate()).isEqualTo(stiffness.wheelRate());
    }

    @Test
    void suspensionInSeriesWithTyresMatchesChecksValue() {
        // docs/validation.md, "Roll stiffness of springs and tyres": suspension 800 N m/deg in series with tyres of 200 N/mm each on a 1.40 m track
        // (K_tyre = 3 420.85 N m/deg): 648.372 N m/deg
        double suspension = 800 / DEG;
        double wheelRate = 2 * suspension / (1.40 * 1.40);
        Axle axle = TestCars.axle(1.40, 0.05, 60, 0.3, wheelRate, 1.0, 200e3, null);
        AxleStiffness stiffness = AxleStiffness.of(axle, null, 200);
        assertThat(stiffness.suspensionRollStiffness() * DEG).isCloseTo(800, within(1e-9));
        assertThat(stiffness.tyreRollStiffness() * DEG).isCloseTo(3_420.85, within(0.005));
        assertThat(stiffness.rollStiffness() * DEG).isCloseTo(648.372, within(0.0005));
    }

    @Test
    void barAddsItsRollStiffnessAndItsBumpRate() {
        // K_bar = k_link r^2 t^2 (model.md 2): a roll angle phi moves the wheels +-t phi / 2, the link ends
        // +-r t phi / 2, a relative travel r t phi; the link force k_link r t phi acts at the wheel as r times
        // that on a lever of t / 2 at each side. Single-wheel bump (other wheel held): the relative link travel
        // is r z, the wheel feels r * k_link r z, so k_w + k_link r^2.
        AntiRollBar bar = TestCars.solidBar(0.022, 0.90, 0.76, 0.20, 0.85);
        BarResult barResult = ClosedFormBar.analyse(bar, 0.05);
        Axle axle = TestCars.axle(1.46, 0.06, 80, 0.29, 55e3, 0.95, 230e3, bar);
        AxleStiffness stiffness = AxleStiffness.of(axle, barResult, 250);
        double linkRate = ClosedFormBar.linkRate(bar);
        assertThat(stiffness.barRollStiffness()).isCloseTo(linkRate * 0.85 * 0.85 * 1.46 * 1.46,
                withinPercentage(1e-12));
        assertThat(stiffness.suspensionRollStiffness()).isCloseTo(
                stiffness.springRollStiffness() + stiffness.barRollStiffness(), withinPercentage(1e-12));
        assertThat(stiffness.singleWheelBumpRate()).isCloseTo(stiffness.wheelRate() + linkRate * 0.85 * 0.85,
                withinPercentage(1e-12));
        // the bar does not work when both wheels rise together
        assertThat(stiffness.heaveRate()).isEqualTo(stiffness.wheelRate());
    }

    @Test
    void rideRateAndFrequency() {
        // ride rate: wheel rate in series with the tyre, 1 / (1/k_w + 1/k_t); natural frequency of a mass on a
        // spring sqrt(k / m) / (2 pi) (any vibration text). 30 N/mm with a 200 N/mm tyre: 26.0870 N/mm; on
        // 250 kg: 1.6258 Hz (arithmetic, also in docs/validation.md; checked below to rounding).
        Axle axle = TestCars.axle(1.40, 0.05, 60, 0.3, 30e3, 1.0, 200e3, null);
        AxleStiffness stiffness = AxleStiffness.of(axle, null, 250);
        assertThat(stiffness.rideRate()).isCloseTo(1 / (1 / 30e3 + 1 / 200e3), withinPercentage(1e-12));
        assertThat(stiffness.rideRate() / 1e3).isCloseTo(26.0870, within(0.00005));
        assertThat(stiffness.rideFrequency()).isCloseTo(Math.sqrt(stiffness.rideRate() / 250) / (2 * Math.PI),
                withinPercentage(1e-12));
        assertThat(stiffness.rideFrequency()).isCloseTo(1.6258, within(0.00005));
    }

    @Test
    void cornerSprungMassIsHalfTheAxleMassLessUnsprung() {
        // model.md 3: half of (static axle load / g - unsprung axle mass); club car: 1050 kg, 60 % front, 80 kg
        // unsprung at the front: (630 - 80) / 2 = 275 kg
        AnalysisResult result = VehicleAnalysis.analyse(TestCars.clubCar());
        assertThat(result.front().cornerSprungMass()).isCloseTo(275, withinPercentage(1e-10));
        assertThat(result.rear().cornerSprungMass()).isCloseTo((420 - 70) / 2.0, withinPercentage(1e-10));
        assertThat(result.front().stiffness().rideFrequency()).isCloseTo(
                Math.sqrt(result.front().stiffness().rideRate() / 275) / (2 * Math.PI), withinPercentage(1e-10));
    }
}
