package barwright.report;

import barwright.model.TurnDirection;
import barwright.model.Tyre;
import barwright.model.Vehicle;
import barwright.physics.AnalysisResult;
import barwright.physics.TestCars;
import barwright.physics.TurnResult;
import barwright.physics.VehicleAnalysis;
import barwright.physics.WheelLoads;
import barwright.units.UnitSystem;
import com.fasterxml.jackson.databind.JsonNode;
import org.junit.jupiter.api.Test;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * The grip each axle loses to load transfer at the limit, in the report (model.md 8.1). Against a closed form
 * derived here for the linear friction law mu = a + b F_z: with F_o = F + d and F_i = F - d, the capacity
 * a (F_o + F_i) + b (F_o^2 + F_i^2) exceeds the even one by 2 b d^2, so the share lost is
 * -b d^2 / (F mu(F)).
 */
class GripLostReportTest {
    private static double closedForm(Tyre tyre, double outside, double inside) {
        double b = tyre.frictionAtNominalLoad() * tyre.frictionLoadSensitivity() / tyre.nominalLoad();
        double a = tyre.frictionAtNominalLoad() * (1 - tyre.frictionLoadSensitivity());
        double even = 0.5 * (outside + inside);
        double d = 0.5 * (outside - inside);
        return -b * d * d / (even * (a + b * even));
    }

    @Test
    void theReportGivesTheClosedFormForEachAxleAndTurn() {
        Vehicle car = TestCars.asymmetricClubCar();
        AnalysisResult result = VehicleAnalysis.analyse(car);
        JsonNode report = ReportJson.of(result);
        for (TurnDirection direction : TurnDirection.values()) {
            TurnResult turn = result.turn(direction);
            WheelLoads loads = turn.cornering().wheelLoads(turn.limit());
            JsonNode node = report.get(direction.key());
            // 1e-9 percentage points: the same arithmetic by two routes, rounding only
            assertThat(node.get("frontGripLostToTransferPercent").asDouble()).isCloseTo(
                    100 * closedForm(car.front().tyre(), loads.frontOutside(), loads.frontInside()), within(1e-9));
            assertThat(node.get("rearGripLostToTransferPercent").asDouble()).isCloseTo(
                    100 * closedForm(car.rear().tyre(), loads.rearOutside(), loads.rearInside()), within(1e-9));
            assertThat(node.get("frontGripLostToTransferPercent").asDouble()).isBetween(0.5, 20.0);
        }
        assertThat(TextSummary.of(result, UnitSystem.SI)).contains("grip lost to load transfer");
    }
}
