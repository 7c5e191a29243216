package barwright.cli;

import barwright.insight.LiftEnvelope;
import barwright.insight.LiftEnvelopeResult;
import barwright.insight.Wheel;
import barwright.loading.VehicleLoader;
import barwright.physics.VehicleAnalysis;
import com.fasterxml.jackson.databind.JsonNode;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.file.Files;
import java.nio.file.Path;

import static barwright.units.Constants.STANDARD_GRAVITY;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

class EnvelopeCommandTest {
    private static final String HATCHBACK = "sample-vehicles/club-hatchback.json";

    @Test
    void json_holds_one_boundary_per_wheel_as_points_in_g() throws Exception {
        CommandRun run = CommandRun.of("envelope", HATCHBACK, "--json");
        assertThat(run.exitCode()).isZero();
        JsonNode json = run.json();
        assertThat(json.get("format").asText()).isEqualTo("barwright.envelope");
        assertThat(json.get("boundaries")).hasSize(4);
        LiftEnvelopeResult expected = LiftEnvelope.of(VehicleAnalysis.analyse(
                VehicleLoader.read(Path.of(HATCHBACK)).vehicle()));
        for (int i = 0; i < 4; i++) {
            Wheel wheel = Wheel.values()[i];
            JsonNode boundary = json.get("boundaries").get(i);
            assertThat(boundary.get("wheel").asText()).isEqualTo(wheel.key());
            JsonNode first = boundary.get("points").get(0);
            // the printed JSON is the computed value in g (Jackson prints doubles round-trip exact)
            assertThat(first.get("aXG").asDouble()).isEqualTo(-1.2);
            assertThat(first.get("aYG").asDouble()).isEqualTo(
                    expected.boundary(wheel).points().get(0).lateralAcceleration() / STANDARD_GRAVITY);
            assertThat(boundary.get("points")).hasSize(expected.boundary(wheel).points().size());
        }
        assertThat(json.get("lateralLimitG").get("leftTurn").asDouble())
                .isCloseTo(expected.leftTurnLimit() / STANDARD_GRAVITY, within(1e-15));
        assertThat(json.has("compared")).isFalse();
    }

    @Test
    void a_compared_file_is_printed_beside() {
        CommandRun run = CommandRun.of("envelope", HATCHBACK, "--compare", "sample-vehicles/road-saloon.json", "--json");
        assertThat(run.exitCode()).isZero();
        assertThat(run.json().get("compared").get("vehicle").asText()).startsWith("Road saloon");
        CommandRun text = CommandRun.of("envelope", HATCHBACK, "--compare=sample-vehicles/road-saloon.json");
        assertThat(text.out()).contains("Compared with: Road saloon").contains(" / ");
    }

    @Test
    void the_readable_output_says_where_the_inside_rear_lifts_under_braking() {
        CommandRun run = CommandRun.of("envelope", HATCHBACK);
        assertThat(run.exitCode()).isZero();
        assertThat(run.out())
                .containsPattern("The inside rear \\(left rear\\) lifts at 0\\.\\d\\d g lateral with 0\\.30 g braking")
                .contains("It lifts below the lateral limit")
                .contains("Caution:");
    }

    @Test
    void a_refused_file_exits_2_naming_the_key(@TempDir Path folder) throws Exception {
        String text = Files.readString(Path.of(HATCHBACK)).replace("\"cgHeightMm\": 470", "\"cgHeightMm\": -470");
        Path bad = folder.resolve("bad.json");
        Files.writeString(bad, text);
        CommandRun run = CommandRun.of("envelope", bad.toString());
        assertThat(run.exitCode()).isEqualTo(Cli.REFUSED);
        assertThat(run.err()).contains("vehicle.cgHeightMm");
        assertThat(CommandRun.of("envelope", HATCHBACK, "--sideways").exitCode()).isEqualTo(Cli.REFUSED);
        assertThat(CommandRun.of("envelope", "no-such-file.json").exitCode()).isEqualTo(Cli.REFUSED);
    }
}
