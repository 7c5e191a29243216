package barwright.measure;

import barwright.io.RateCalibrationKeys;
import barwright.io.VehicleDocument;
import barwright.io.VehicleFileException;
import barwright.loading.VehicleLoader;
import barwright.model.AntiRollBar;
import barwright.model.AxlePosition;
import barwright.model.RateCalibration;
import barwright.model.Vehicle;
import barwright.physics.AnalysisResult;
import barwright.physics.BarAnalysis;
import barwright.physics.VehicleAnalysis;
import barwright.physics.bar.BarResult;
import barwright.report.ReportJson;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import org.junit.jupiter.api.Test;

import java.io.InputStream;
import java.time.LocalDate;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

/** A measured rate factor on a bar (model.md 12.1): in the file, in the models and in the report. */
class RateCalibrationTest {
    private static final RateCalibration MEASURED = new RateCalibration(0.8, LocalDate.of(2026, 11, 30),
            "hanging weights, invented");

    private static VehicleDocument fixture() throws Exception {
        try (InputStream in = RateCalibrationTest.class.getResourceAsStream("/barwright/io/test-vehicle.json")) {
            return VehicleLoader.parse(in.readAllBytes());
        }
    }

    @Test
    void aBarWithoutAFactorAnalysesExactlyAsBefore() throws Exception {
        AntiRollBar bar = fixture().vehicle().front().bar();
        assertThat(bar.effectiveRateFactor()).isEqualTo(1);
        assertThat(BarAnalysis.analyse(bar, 0.06)).isEqualTo(BarAnalysis.model(bar, 0.06));
    }

    @Test
    void theFactorScalesTheLinkRateAndTheBarsShareOfTheRollStiffness() throws Exception {
        Vehicle car = fixture().vehicle();
        AntiRollBar bar = car.front().bar();
        BarResult model = BarAnalysis.model(bar, 0.06);
        BarResult measured = BarAnalysis.analyse(bar.withRateCalibration(MEASURED), 0.06);
        assertThat(measured.linkRate()).isCloseTo(0.8 * model.linkRate(), within(1e-9 * model.linkRate()));
        // at the same link travel the force, so the stress, scales with the rate (stress linear in force)
        assertThat(measured.maxVonMisesStress()).isCloseTo(0.8 * model.maxVonMisesStress(),
                within(1e-6 * model.maxVonMisesStress()));
        // the bar's roll stiffness is its link rate times (motion ratio x track)^2 / 2 in any model: linear
        Vehicle calibrated = car.withFront(car.front().withBar(bar.withRateCalibration(MEASURED)));
        double before = VehicleAnalysis.analyse(car).axle(AxlePosition.FRONT).stiffness().barRollStiffness();
        double after = VehicleAnalysis.analyse(calibrated).axle(AxlePosition.FRONT).stiffness().barRollStiffness();
        assertThat(after).isCloseTo(0.8 * before, within(1e-9 * before));
    }

    @Test
    void theFactorRoundTripsThroughTheFileAndShowsInTheReport() throws Exception {
        VehicleDocument document = fixture();
        ObjectNode tree = document.editableTree();
        RateCalibrationKeys.put((ObjectNode) tree.path("front").path("bar"), MEASURED);
        VehicleDocument again = VehicleLoader.fromTree(tree);
        assertThat(again.vehicle().front().bar().rateCalibration()).isEqualTo(MEASURED);
        AnalysisResult result = VehicleAnalysis.analyse(again.vehicle());
        JsonNode report = ReportJson.of(result);
        assertThat(report.path("front").path("barEffectiveRateFactor").asDouble()).isEqualTo(0.8);
        assertThat(report.path("front").path("barRateMeasuredOn").asText()).isEqualTo("2026-11-30");
        assertThat(report.path("rear").path("barEffectiveRateFactor").asDouble()).isEqualTo(1.0);
    }

    @Test
    void aBadDateOrFactorIsRefusedByKeyPath() throws Exception {
        ObjectNode tree = fixture().editableTree();
        ObjectNode calibration = ((ObjectNode) tree.path("front").path("bar")).putObject("rateCalibration");
        calibration.put("effectiveRateFactor", 3.5);
        calibration.put("measuredOn", "30/11/2026");
        assertThatThrownBy(() -> VehicleLoader.fromTree(tree)).isInstanceOf(VehicleFileException.class)
                .satisfies(e -> assertThat(((VehicleFileException) e).problems().toString())
                        .contains("front.bar.rateCalibration.effectiveRateFactor")
                        .contains("front.bar.rateCalibration.measuredOn"));
    }
}
