package barwright.report;

import barwright.model.Axle;
import barwright.model.AxlePosition;
import barwright.model.TurnDirection;
import barwright.model.Vehicle;
import barwright.physics.AnalysisResult;
import barwright.physics.AxleResult;
import barwright.physics.TestCars;
import barwright.physics.TurnResult;
import barwright.physics.VehicleAnalysis;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import org.junit.jupiter.api.Test;

import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;
import static org.assertj.core.api.Assertions.withinPercentage;

/**
 * The analysis report of files.md: each figure in the unit its key names, converted with factors worked out
 * here (1 deg = pi/180 rad; 1 g = 9.806 65 m/s^2, NIST SP 811), and the null rules.
 */
class ReportJsonTest {
    private static final double G = 9.80665;
    private static final double DEG = Math.PI / 180;
    private static final List<String> BAR_KEYS = List.of("barRollStiffnessNmPerDeg", "barLinkRateNPerMm", "barMassKg",
            "barTorsionalShearStressMPa", "barMaxVonMisesStressMPa", "barSafetyFactor", "barModel",
            "barMaxStressAtMm", "barBushingLoadsN");

    @Test
    void figuresAreInTheUnitsOfTheirKeys() {
        AnalysisResult result = VehicleAnalysis.analyse(TestCars.clubCar());
        ObjectNode report = ReportJson.of(result);
        assertThat(report.get("format").asText()).isEqualTo("barwright.report");
        assertThat(report.get("version").asInt()).isEqualTo(1);
        double relative = 1e-10; // one multiplication each: rounding only
        JsonNode vehicle = report.get("vehicle");
        assertThat(vehicle.get("sprungMassKg").asDouble()).isCloseTo(result.masses().sprungMass(), withinPercentage(relative));
        assertThat(vehicle.get("rollArmMm").asDouble()).isCloseTo(result.masses().rollArm() * 1000, withinPercentage(relative));
        for (AxlePosition position : AxlePosition.values()) {
            JsonNode axle = report.get(position.key());
            AxleResult expected = result.axle(position);
            assertThat(axle.get("rollStiffnessNmPerDeg").asDouble())
                    .isCloseTo(expected.stiffness().rollStiffness() * DEG, withinPercentage(relative));
            assertThat(axle.get("barRollStiffnessNmPerDeg").asDouble())
                    .isCloseTo(expected.stiffness().barRollStiffness() * DEG, withinPercentage(relative));
            assertThat(axle.get("rideRateNPerMm").asDouble())
                    .isCloseTo(expected.stiffness().rideRate() / 1000, withinPercentage(relative));
            assertThat(axle.get("barLinkRateNPerMm").asDouble())
                    .isCloseTo(expected.bar().linkRate() / 1000, withinPercentage(relative));
            assertThat(axle.get("barMaxVonMisesStressMPa").asDouble())
                    .isCloseTo(expected.bar().maxVonMisesStress() / 1e6, withinPercentage(relative));
            assertThat(axle.get("barMaxStressAtMm").asDouble())
                    .isCloseTo(expected.bar().maxStressAt() * 1000, withinPercentage(relative));
            assertThat(axle.get("barModel").asText()).isEqualTo("closed-form");
            assertThat(axle.get("barBushingLoadsN")).hasSize(2);
            JsonNode transfer = axle.get("loadTransferNPerG");
            assertThat(transfer.get("total").asDouble())
                    .isCloseTo(expected.loadTransfer().total() * G, withinPercentage(relative));
            assertThat(transfer.get("unsprung").asDouble() + transfer.get("geometric").asDouble()
                    + transfer.get("elastic").asDouble()).isCloseTo(transfer.get("total").asDouble(), withinPercentage(relative));
            assertThat(axle.get("corneringStiffnessNPerDeg").asDouble())
                    .isCloseTo(expected.corneringStiffness() * DEG, withinPercentage(relative));
        }
        assertThat(report.get("rollGradientDegPerG").asDouble())
                .isCloseTo(result.rollGradient() * G / DEG, withinPercentage(relative));
        assertThat(report.get("understeerGradientDegPerG").asDouble())
                .isCloseTo(result.understeerGradient() * G / DEG, withinPercentage(relative));
        for (TurnDirection direction : TurnDirection.values()) {
            JsonNode turn = report.get(direction.key());
            TurnResult expected = result.turn(direction);
            assertThat(turn.get("limitG").asDouble()).isCloseTo(expected.limit() / G, withinPercentage(relative));
            assertThat(turn.get("limitBalance").asText()).isEqualTo(expected.balance().key());
        }
    }

    @Test
    void noBarMeansNullBarValues() {
        // files.md: "bar values null where there is no bar"; the axle's other figures stay numbers
        Vehicle car = TestCars.clubCar();
        ObjectNode report = ReportJson.of(VehicleAnalysis.analyse(car.withRear(car.rear().withBar(null))));
        JsonNode rear = report.get("rear");
        for (String key : BAR_KEYS) {
            assertThat(rear.has(key)).as(key).isTrue();
            assertThat(rear.get(key).isNull()).as(key).isTrue();
        }
        assertThat(rear.get("rollStiffnessNmPerDeg").isNumber()).isTrue();
        assertThat(rear.get("singleWheelBumpRateNPerMm").asDouble()).isEqualTo(rear.get("heaveRateNPerMm").asDouble());
        for (String key : BAR_KEYS) {
            assertThat(report.get("front").get(key).isNull()).as(key).isFalse();
        }
    }

    @Test
    void aLiftPastThreeGIsNull() {
        // files.md: a lift value is null where the wheel stays loaded up to 3 g. A low car (CG 0.2 m,
        // invented): m h / t ~ 0.14 of its weight per g, so each inside wheel holds past 3.5 g
        Vehicle low = TestCars.clubCar().withCgHeight(0.20);
        AnalysisResult result = VehicleAnalysis.analyse(low);
        for (TurnDirection direction : TurnDirection.values()) {
            assertThat(result.turn(direction).frontInsideLift()).isGreaterThan(3 * G);
            assertThat(result.turn(direction).rearInsideLift()).isGreaterThan(3 * G);
            JsonNode turn = ReportJson.of(result).get(direction.key());
            assertThat(turn.get("frontInsideLiftG").isNull()).isTrue();
            assertThat(turn.get("rearInsideLiftG").isNull()).isTrue();
            assertThat(turn.get("limitG").isNumber()).isTrue();
        }
        assertThat(ReportJson.liftInG(3 * G)).isCloseTo(3.0, within(1e-12));
        assertThat(ReportJson.liftInG(3.0001 * G)).isNull();
        assertThat(ReportJson.liftInG(Double.POSITIVE_INFINITY)).isNull();
        assertThat(ReportJson.liftInG(1.2 * G)).isCloseTo(1.2, within(1e-12));
    }

    @Test
    void aLiftBeforeTheLimitIsWarnedOf() {
        // files.md: a lift below limitG also raises a warning. A very stiff rear bar on the club car lifts
        // the inside rear before the tyres let go (common practice: front-drive racers do this on purpose)
        Vehicle car = TestCars.clubCar();
        Axle rear = car.rear().withBar(TestCars.solidBar(0.030, 1.0, 0.9, 0.15, 0.95));
        AnalysisResult result = VehicleAnalysis.analyse(car.withRear(rear).withCgHeight(0.60));
        assertThat(result.leftTurn().rearInsideLift()).isLessThan(result.leftTurn().limit());
        JsonNode warnings = ReportJson.of(result).get("warnings");
        assertThat(warnings).anySatisfy(warning -> {
            assertThat(warning.get("code").asText()).isEqualTo("REAR_INSIDE_LIFT_BEFORE_LIMIT");
            assertThat(warning.get("message").asText()).contains("inside rear wheel lifts").contains(" g");
        });
    }
}
