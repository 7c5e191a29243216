package barwright.insight;

import barwright.model.AxlePosition;
import barwright.model.TurnDirection;
import barwright.model.Vehicle;
import barwright.physics.AnalysisResult;
import barwright.physics.MassProperties;
import barwright.physics.VehicleAnalysis;
import barwright.physics.WheelLoads;
import barwright.report.ReportJson;
import com.fasterxml.jackson.databind.JsonNode;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

import java.util.List;

import static barwright.units.Constants.STANDARD_GRAVITY;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * The lift envelope against model.md 7 with a longitudinal acceleration, re-analysed point by point with the
 * core (never read off the drawn boundary).
 */
class LiftEnvelopeTest {
    /** "Just inside" and "just outside" a boundary: a_y one part in a million below and above it. */
    private static final double NEAR = 1e-6;
    /** Relative agreement of two evaluations of the same linear relation: round-off only. */
    private static final double LINEAR = 1e-9;
    /**
     * Relative gap allowed between a drawn line and the lift half-way along it where the roll centres migrate:
     * 1 %, a chord of a gently curved boundary (the transfer's curvature comes from a few mm of roll-centre
     * movement per degree).
     */
    private static final double CHORD = 0.01;

    static List<String> samples() {
        return Samples.NAMES;
    }

    private static LiftEnvelopeResult envelope(String sample) {
        return LiftEnvelope.of(VehicleAnalysis.analyse(Samples.vehicle(sample)));
    }

    /** A wheel's load from a fresh analysis of the car, with a_x and a_y (N). */
    private static double reanalysedLoad(Vehicle vehicle, Wheel wheel, double ax, double ay) {
        WheelLoads loads = VehicleAnalysis.cornering(VehicleAnalysis.analyse(vehicle), wheel.insideIn(), ax)
                .wheelLoads(ay);
        return wheel.axle() == AxlePosition.FRONT ? loads.frontInside() : loads.rearInside();
    }

    @ParameterizedTest
    @MethodSource("samples")
    void at_zero_longitudinal_acceleration_each_boundary_meets_the_lift_of_the_report(String sample) {
        AnalysisResult analysis = VehicleAnalysis.analyse(Samples.vehicle(sample));
        JsonNode report = ReportJson.of(analysis);
        LiftEnvelopeResult envelope = LiftEnvelope.of(analysis);
        for (Wheel wheel : Wheel.values()) {
            JsonNode turn = report.get(wheel.insideIn().key());
            JsonNode reported = turn.get(wheel.axle() == AxlePosition.FRONT ? "frontInsideLiftG" : "rearInsideLiftG");
            double atZero = envelope.boundary(wheel).straightCornering().lateralAcceleration();
            EnvelopePoint drawn = envelope.boundary(wheel).points().stream()
                    .filter(point -> point.longitudinalAcceleration() == 0).findFirst().orElseThrow();
            assertThat(drawn.lateralAcceleration()).isEqualTo(atZero);
            if (reported.isNull()) {
                assertThat(ReportJson.liftInG(atZero)).isNull();
            } else {
                // the same computation in g: equal to the last bit but for the division by g
                assertThat(atZero / STANDARD_GRAVITY).isCloseTo(reported.asDouble(), within(1e-12));
            }
        }
    }

    @ParameterizedTest
    @MethodSource("samples")
    void just_inside_a_boundary_the_wheel_is_loaded_and_just_outside_it_has_lifted(String sample) {
        Vehicle vehicle = Samples.vehicle(sample);
        LiftEnvelopeResult envelope = envelope(sample);
        int checked = 0;
        for (Wheel wheel : Wheel.values()) {
            for (EnvelopePoint point : envelope.boundary(wheel).points()) {
                double lift = point.lateralAcceleration();
                if (!Double.isFinite(lift)) {
                    continue;
                }
                double ax = point.longitudinalAcceleration();
                assertThat(reanalysedLoad(vehicle, wheel, ax, lift * (1 - NEAR)))
                        .as("%s at a_x %.3f g just inside", wheel, ax / STANDARD_GRAVITY).isPositive();
                assertThat(reanalysedLoad(vehicle, wheel, ax, lift * (1 + NEAR)))
                        .as("%s at a_x %.3f g just outside", wheel, ax / STANDARD_GRAVITY).isZero();
                checked++;
            }
        }
        assertThat(checked).isGreaterThan(100);
    }

    /**
     * The static inside loads are linear in a_x and the transfer per a_y does not depend on it, so each
     * boundary is linear between its corners (model.md 7): re-analysed at the middle of every drawn segment it
     * must equal the segment's mid-point. A missed corner fails here.
     */
    @ParameterizedTest
    @MethodSource("samples")
    void the_drawn_boundary_is_exact_between_its_points(String sample) {
        AnalysisResult analysis = VehicleAnalysis.analyse(Samples.vehicle(sample));
        // with roll centres that migrate the transfer is no longer linear in a_y, so neither is the boundary
        // between its corners: the lines drawn are chords there (model.md 11), held to 1 % of the lift
        double tolerance = analysis.migration() == null ? LINEAR : CHORD;
        LiftEnvelope calculator = new LiftEnvelope(analysis);
        LiftEnvelopeResult envelope = calculator.compute();
        for (Wheel wheel : Wheel.values()) {
            List<EnvelopePoint> points = envelope.boundary(wheel).points();
            for (int i = 1; i < points.size(); i++) {
                EnvelopePoint low = points.get(i - 1);
                EnvelopePoint high = points.get(i);
                if (!Double.isFinite(low.lateralAcceleration()) || !Double.isFinite(high.lateralAcceleration())) {
                    continue;
                }
                double middle = (low.longitudinalAcceleration() + high.longitudinalAcceleration()) / 2;
                double drawn = (low.lateralAcceleration() + high.lateralAcceleration()) / 2;
                assertThat(calculator.lift(wheel, middle)).isCloseTo(drawn, within(tolerance * drawn));
            }
        }
    }

    /**
     * Physics: braking moves m |a_x| h / l of static load off the rear axle while the lateral transfer per a_y
     * stays, so an inside rear wheel that lifts first reaches zero load at a lower a_y the harder the car brakes;
     * its lift is the closed form (W_ri + m a_x h / (2 l)) / (dF_r per a_y) (model.md 7). (Where the rear wheel
     * only lifts second, its boundary is the rollover line, which braking may raise: not part of this check.)
     */
    @ParameterizedTest
    @MethodSource("samples")
    void braking_moves_the_inside_rear_boundary_to_lower_lateral_acceleration(String sample) {
        Vehicle vehicle = Samples.vehicle(sample);
        AnalysisResult analysis = VehicleAnalysis.analyse(vehicle);
        LiftEnvelopeResult envelope = LiftEnvelope.of(analysis);
        MassProperties masses = analysis.masses();
        int checked = 0;
        for (Wheel wheel : List.of(Wheel.LEFT_REAR, Wheel.RIGHT_REAR)) {
            EnvelopePoint harder = null;
            for (EnvelopePoint point : envelope.boundary(wheel).points()) {
                if (point.rollover() || !Double.isFinite(point.lateralAcceleration())
                        || point.longitudinalAcceleration() > 0) {
                    harder = null;
                    continue;
                }
                double ax = point.longitudinalAcceleration();
                double staticInside = wheel.staticLoad(masses.staticLoads())
                        + masses.mass() * ax * vehicle.cgHeight() / (2 * vehicle.wheelbase());
                if (analysis.migration() == null) {
                    double closedForm = staticInside / analysis.rear().loadTransfer().total();
                    assertThat(point.lateralAcceleration()).isCloseTo(closedForm, within(LINEAR * closedForm));
                } else {
                    // migrating roll centres: no closed form; the boundary is where the rear transfer at that
                    // a_y (the analysis's own, at the shifted loads) reaches the inside wheel's load (model.md 7)
                    double transfer = VehicleAnalysis.cornering(analysis, wheel.insideIn(), ax)
                            .loadTransfer(barwright.model.AxlePosition.REAR, point.lateralAcceleration());
                    assertThat(transfer).isCloseTo(staticInside, within(1e-6 * staticInside));
                }
                if (harder != null) {
                    assertThat(harder.lateralAcceleration()).as("%s: more braking lifts sooner", wheel)
                            .isLessThan(point.lateralAcceleration());
                    checked++;
                }
                harder = point;
            }
        }
        if (sample.equals("club-hatchback")) {
            // the front-drive car lifts its inside rear first over the whole braking range
            assertThat(checked).isEqualTo(2 * 24);
        }
    }

    /** Physics: power moves static load to the rear, so a rear-drive car's inside front lifts earlier. */
    @Test
    void power_moves_the_inside_front_boundary_of_the_rear_drive_saloon_to_lower_lateral_acceleration() {
        LiftEnvelope calculator = new LiftEnvelope(VehicleAnalysis.analyse(Samples.vehicle("road-saloon")));
        assertThat(calculator.lift(Wheel.LEFT_FRONT, 0.3 * STANDARD_GRAVITY))
                .isLessThan(calculator.lift(Wheel.LEFT_FRONT, 0));
        assertThat(calculator.lift(Wheel.RIGHT_FRONT, 0.6 * STANDARD_GRAVITY))
                .isLessThan(calculator.lift(Wheel.RIGHT_FRONT, 0.3 * STANDARD_GRAVITY));
    }

    @ParameterizedTest
    @MethodSource("samples")
    void the_spans_of_lift_before_the_limit_end_where_the_lift_meets_the_limit(String sample) {
        AnalysisResult analysis = VehicleAnalysis.analyse(Samples.vehicle(sample));
        LiftEnvelope calculator = new LiftEnvelope(analysis);
        LiftEnvelopeResult envelope = calculator.compute();
        for (Wheel wheel : Wheel.values()) {
            double limit = analysis.turn(wheel.insideIn()).limit();
            for (LongitudinalRange span : envelope.boundary(wheel).liftsBeforeLimit()) {
                double middle = (span.from() + span.to()) / 2;
                assertThat(calculator.lift(wheel, middle)).isLessThan(limit);
                for (double end : new double[]{span.from(), span.to()}) {
                    if (end > envelope.mostBraking() && end < envelope.mostAcceleration()) {
                        // a crossing solved to 1e-9 m/s^2 of a_x on a boundary of slope about one
                        assertThat(calculator.lift(wheel, end)).isCloseTo(limit, within(1e-6));
                    }
                }
            }
        }
    }

    @Test
    void the_club_hatchback_inside_rear_lifts_before_the_limit_under_braking_and_not_under_hard_power() {
        LiftEnvelopeResult envelope = envelope("club-hatchback");
        List<LongitudinalRange> spans = envelope.boundary(Wheel.LEFT_REAR).liftsBeforeLimit();
        assertThat(spans).hasSize(1);
        assertThat(spans.get(0).contains(-0.5 * STANDARD_GRAVITY)).isTrue();
        assertThat(spans.get(0).contains(0.5 * STANDARD_GRAVITY)).isFalse();
    }

    /** The second inside wheel to lift is where the car rolls over (model.md 7): marked as such. */
    @ParameterizedTest
    @MethodSource("samples")
    void the_second_wheel_to_lift_is_marked_as_the_rollover(String sample) {
        AnalysisResult analysis = VehicleAnalysis.analyse(Samples.vehicle(sample));
        LiftEnvelopeResult envelope = LiftEnvelope.of(analysis);
        for (Wheel wheel : Wheel.values()) {
            for (EnvelopePoint point : envelope.boundary(wheel).points()) {
                var cornering = VehicleAnalysis.cornering(analysis, wheel.insideIn(), point.longitudinalAcceleration());
                if (point.rollover()) {
                    assertThat(point.lateralAcceleration()).isEqualTo(cornering.rollover());
                } else if (Double.isFinite(point.lateralAcceleration())) {
                    assertThat(cornering.firstLiftAxle()).isEqualTo(wheel.axle());
                }
            }
        }
    }

    /**
     * A car so tall that 1.2 g of braking takes all static load off its rear wheels (W_r,wheel = m |a_x| h / (2 l))
     * has its envelope end there, with the rear wheels lifting at a_y = 0.
     */
    @Test
    void the_envelope_stops_where_a_wheel_has_no_load_in_a_straight_line() {
        Vehicle tall = Samples.vehicle("club-hatchback").withCgHeight(0.85);
        AnalysisResult analysis = VehicleAnalysis.analyse(tall);
        LiftEnvelopeResult envelope = LiftEnvelope.of(analysis);
        MassProperties masses = analysis.masses();
        double rearWheel = masses.staticLoads().leftRear();
        double expected = -rearWheel * 2 * tall.wheelbase() / (masses.mass() * tall.cgHeight());
        assertThat(expected).isGreaterThan(-1.2 * STANDARD_GRAVITY);
        assertThat(envelope.mostBraking()).isCloseTo(expected, within(1e-12));
        assertThat(envelope.notes()).anyMatch(note -> note.contains("rear wheel carries no load"));
        EnvelopePoint first = envelope.boundary(Wheel.LEFT_REAR).points().get(0);
        assertThat(first.lateralAcceleration()).isCloseTo(0, within(1e-9));
    }

    @Test
    void every_wheel_is_inside_in_the_turn_to_its_own_side() {
        for (Wheel wheel : Wheel.values()) {
            assertThat(wheel.key().startsWith(wheel.insideIn() == TurnDirection.LEFT ? "left" : "right")).isTrue();
        }
    }
}
