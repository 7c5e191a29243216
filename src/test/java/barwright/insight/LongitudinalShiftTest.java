package barwright.insight;

import barwright.model.AxlePosition;
import barwright.model.TurnDirection;
import barwright.model.Vehicle;
import barwright.physics.AnalysisResult;
import barwright.physics.MassProperties;
import barwright.physics.SteadyCornering;
import barwright.physics.VehicleAnalysis;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

import java.util.List;

import static barwright.units.Constants.STANDARD_GRAVITY;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/** The core hook of the lift envelope: static loads shifted by a_x (model.md 7). */
class LongitudinalShiftTest {
    /** Loads of a thousand newtons or so, summed: 1e-9 N is round-off, far below anything measured. */
    private static final double LOAD_TOLERANCE = 1e-9;

    static List<String> samples() {
        return Samples.NAMES;
    }

    @ParameterizedTest
    @MethodSource("samples")
    void braking_moves_m_ax_h_over_l_from_the_rear_axle_to_the_front(String sample) {
        Vehicle vehicle = Samples.vehicle(sample);
        MassProperties masses = MassProperties.of(vehicle);
        double braking = -0.7 * STANDARD_GRAVITY;
        MassProperties shifted = masses.withLongitudinalAcceleration(braking, vehicle.cgHeight());
        // model.md 7: a_x moves m a_x h / l from the front axle to the rear (a negative a_x the other way)
        double moved = masses.mass() * braking * vehicle.cgHeight() / vehicle.wheelbase();
        assertThat(shifted.staticLoads().frontAxle())
                .isCloseTo(masses.staticLoads().frontAxle() - moved, within(LOAD_TOLERANCE));
        assertThat(shifted.staticLoads().rearAxle())
                .isCloseTo(masses.staticLoads().rearAxle() + moved, within(LOAD_TOLERANCE));
        // half from each wheel: the left-right difference stays
        assertThat(shifted.staticLoads().leftFront() - shifted.staticLoads().rightFront())
                .isCloseTo(masses.staticLoads().leftFront() - masses.staticLoads().rightFront(), within(LOAD_TOLERANCE));
        // the masses and roll axis, and so the lateral calculation per a_y, do not move
        assertThat(shifted.frontSprungMass()).isEqualTo(masses.frontSprungMass());
        assertThat(shifted.rollArm()).isEqualTo(masses.rollArm());
        assertThat(shifted.frontMassFraction()).isEqualTo(masses.frontMassFraction());
    }

    @ParameterizedTest
    @MethodSource("samples")
    void with_no_longitudinal_acceleration_the_turn_is_the_analysis_own(String sample) {
        AnalysisResult analysis = VehicleAnalysis.analyse(Samples.vehicle(sample));
        for (TurnDirection turn : TurnDirection.values()) {
            SteadyCornering hooked = VehicleAnalysis.cornering(analysis, turn, 0.0);
            SteadyCornering own = analysis.turn(turn).cornering();
            for (AxlePosition axle : AxlePosition.values()) {
                assertThat(hooked.insideLift(axle)).isEqualTo(own.insideLift(axle));
            }
            for (double g = 0; g <= 2.0; g += 0.25) {
                assertThat(hooked.wheelLoads(g * STANDARD_GRAVITY)).isEqualTo(own.wheelLoads(g * STANDARD_GRAVITY));
            }
        }
    }
}
