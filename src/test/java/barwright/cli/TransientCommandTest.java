package barwright.cli;

import barwright.io.LapLogReader;
import com.fasterxml.jackson.databind.JsonNode;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/** The {@code transient} command: the JSON keys, the CSV written, bad input refused by name. */
class TransientCommandTest {
    private static final String CAR = "sample-vehicles/club-hatchback-dampers.json";
    private static final String LAP = "sample-vehicles/laps/invented-circuit-lap.csv";

    @Test
    void step_json_has_every_key_of_the_format_and_the_steady_roll_of_the_analysis() {
        CommandRun run = CommandRun.of("transient", CAR, "--step-g", "0.6", "--rise-s", "0.1", "--json");
        assertThat(run.exitCode()).as(run.err()).isZero();
        JsonNode json = run.json();
        assertThat(json.get("format").asText()).isEqualTo("barwright.transient");
        assertThat(json.get("version").asInt()).isEqualTo(1);
        for (String key : List.of("rollNaturalFrequencyHz", "rollDampingRatio", "steadyRollDeg", "peakRollDeg",
                "overshootPercent", "timeTo90PercentS")) {
            assertThat(json.get(key).isNumber()).as(key).isTrue();
        }
        assertThat(json.get("front").get("peakLoadTransferN").asDouble()).isPositive();
        assertThat(json.get("rear").get("peakLoadTransferTimeS").asDouble()).isPositive();
        assertThat(json.get("leastWheelLoadN").get("leftFront").asDouble()).isPositive();
        assertThat(json.get("firstLiftTimeS").isNull()).as("no lift at 0.6 g").isTrue();
        JsonNode first = json.get("series").get(0);
        assertThat(first.get("timeS").asDouble()).isZero();
        for (String key : List.of("rollDeg", "leftFrontN", "rightFrontN", "leftRearN", "rightRearN")) {
            assertThat(first.has(key)).as(key).isTrue();
        }
        // the series ends (3 s, a damped car) on the steady roll within 0.1 %: the held-a_y tests check 1e-6
        JsonNode series = json.get("series");
        assertThat(series.get(series.size() - 1).get("rollDeg").asDouble())
                .isCloseTo(json.get("steadyRollDeg").asDouble(), within(1e-3 * json.get("steadyRollDeg").asDouble()));
    }

    @Test
    void sine_has_no_steady_figures_and_a_lap_writes_its_csv(@TempDir Path folder) throws Exception {
        CommandRun sine = CommandRun.of("transient", CAR, "--sine-g", "0.5", "--frequency-hz", "1", "--json");
        assertThat(sine.exitCode()).as(sine.err()).isZero();
        assertThat(sine.json().get("overshootPercent").isNull()).isTrue();

        Path csv = folder.resolve("lap-out.csv");
        CommandRun lap = CommandRun.of("transient", CAR, "--log", LAP, "--csv", csv.toString(), "--units", "us");
        assertThat(lap.exitCode()).as(lap.err()).isZero();
        assertThat(lap.out()).contains("Time lifted").contains("lbf").contains("Caution");
        List<String> lines = Files.readAllLines(csv);
        assertThat(lines.get(0)).startsWith("timeS,lateralAccelerationG,rollDeg").contains("frontGripUsedPercent");
        assertThat(lines).hasSize(LapLogReader.read(Path.of(LAP)).times().length + 1);
        assertThat(String.join("\n", lines)).doesNotContain("NaN").doesNotContain("Infinity");
    }

    @Test
    void bad_input_is_refused_with_its_name() {
        CommandRun none = CommandRun.of("transient", CAR);
        assertThat(none.exitCode()).isEqualTo(2);
        assertThat(none.err()).contains("exactly one input");
        CommandRun far = CommandRun.of("transient", CAR, "--step-g", "7");
        assertThat(far.exitCode()).isEqualTo(2);
        assertThat(far.err()).contains("--step-g = 7").contains("between -3 and 3 g");
        CommandRun noInertia = CommandRun.of("transient", "sample-vehicles/club-hatchback.json", "--step-g", "0.5");
        assertThat(noInertia.exitCode()).isEqualTo(2);
        assertThat(noInertia.err()).contains("vehicle.rollInertiaKgM2");
    }

    @Test
    void a_log_whose_time_goes_backwards_is_refused_with_its_line(@TempDir Path folder) throws Exception {
        Path log = folder.resolve("bad.csv");
        Files.writeString(log, "timeS,lateralAccelerationG\n0,0.1\n0.02,0.2\n0.01,0.3\n");
        CommandRun run = CommandRun.of("transient", CAR, "--log", log.toString());
        assertThat(run.exitCode()).isEqualTo(2);
        assertThat(run.err()).contains("line 4, column timeS = 0.01: time must increase");
    }
}
