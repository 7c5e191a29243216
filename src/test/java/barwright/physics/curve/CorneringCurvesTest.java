package barwright.physics.curve;

import barwright.loading.VehicleLoader;
import barwright.physics.AnalysisResult;
import barwright.physics.HandlingPoint;
import barwright.physics.TurnResult;
import barwright.physics.VehicleAnalysis;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

import java.nio.file.Path;
import java.util.List;

import static barwright.units.Constants.STANDARD_GRAVITY;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/** The one producer of the cornering lines, checked against laws that hold whatever the model's details. */
class CorneringCurvesTest {
    private static final int POINTS = 60;

    private static TurnResult leftTurn(String sample) throws Exception {
        AnalysisResult result = VehicleAnalysis.analyse(
                VehicleLoader.read(Path.of("sample-vehicles", sample + ".json")).vehicle());
        return result.leftTurn();
    }

    /**
     * Vertical equilibrium (Newton's second law, no aerodynamic load in the model): the four wheel loads add up
     * to the car's weight at every lateral acceleration; lateral load transfer only moves load across. The
     * weight is the analysis's own mass times standard gravity. Tolerance 1e-9 relative: rounding of a sum of
     * four loads of order 1e3 N.
     */
    @ParameterizedTest
    @ValueSource(strings = {"club-hatchback", "road-saloon", "sprint-roadster"})
    void the_wheel_loads_add_up_to_the_weight_at_every_point(String sample) throws Exception {
        AnalysisResult result = VehicleAnalysis.analyse(
                VehicleLoader.read(Path.of("sample-vehicles", sample + ".json")).vehicle());
        CorneringCurves curves = CorneringCurves.sample(result.leftTurn(), POINTS);
        double weight = result.masses().mass() * STANDARD_GRAVITY;
        for (int p = 0; p < POINTS; p++) {
            double total = curves.frontOutside()[p] + curves.frontInside()[p] + curves.rearOutside()[p]
                    + curves.rearInside()[p];
            assertThat(total).isCloseTo(weight, within(weight * 1e-9));
        }
    }

    /** Limit case: at rest there is no roll, and the lines run evenly from rest to the grip limit. */
    @ParameterizedTest
    @ValueSource(strings = {"club-hatchback", "road-saloon", "sprint-roadster"})
    void the_lines_start_at_rest_with_no_roll_and_end_at_the_limit(String sample) throws Exception {
        TurnResult turn = leftTurn(sample);
        CorneringCurves curves = CorneringCurves.sample(turn, POINTS);
        assertThat(curves.accel()).hasSize(POINTS);
        assertThat(curves.accel()[0]).isZero();
        assertThat(curves.roll()[0]).isCloseTo(0.0, within(1e-12));
        assertThat(curves.accel()[POINTS - 1]).isCloseTo(turn.limit(), within(turn.limit() * 1e-12));
        // body roll grows with lateral acceleration (a car rolls outwards, more the harder it corners)
        for (int p = 1; p < POINTS; p++) {
            assertThat(Math.abs(curves.roll()[p])).isGreaterThan(Math.abs(curves.roll()[p - 1]));
        }
        Series roll = curves.roll("roll");
        assertThat(roll.name()).isEqualTo("roll");
        assertThat(roll.x()).containsExactly(curves.accel());
        assertThat(roll.y()).containsExactly(curves.roll());
    }

    /** The handling line carries the turn's own points, unchanged. */
    @ParameterizedTest
    @ValueSource(strings = {"club-hatchback", "sprint-roadster"})
    void the_handling_line_is_the_turns_handling_curve(String sample) throws Exception {
        TurnResult turn = leftTurn(sample);
        Series line = CorneringCurves.handling(turn, "handling");
        List<HandlingPoint> curve = turn.handlingCurve();
        assertThat(line.size()).isEqualTo(curve.size());
        for (int i = 0; i < curve.size(); i++) {
            assertThat(line.x()[i]).isEqualTo(curve.get(i).lateralAcceleration());
            assertThat(line.y()[i]).isEqualTo(curve.get(i).slipAngleDifference());
        }
    }
}
