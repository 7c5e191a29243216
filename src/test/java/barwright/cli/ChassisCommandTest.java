package barwright.cli;

import com.fasterxml.jackson.databind.JsonNode;
import org.junit.jupiter.api.Test;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

class ChassisCommandTest {
    private static final String ROADSTER = "sample-vehicles/sprint-roadster.json";

    @Test
    void json_holds_the_sweep_the_limits_the_current_car_and_the_eighty_percent_stiffness() {
        CommandRun run = CommandRun.of("chassis", ROADSTER, "--json");
        assertThat(run.exitCode()).isZero();
        JsonNode json = run.json();
        assertThat(json.get("format").asText()).isEqualTo("barwright.chassis");
        JsonNode sweep = json.get("sweep");
        assertThat(sweep).hasSize(61);
        assertThat(sweep.get(0).get("perTotalRollStiffness").asDouble()).isCloseTo(0.1, within(1e-12));
        assertThat(sweep.get(60).get("perTotalRollStiffness").asDouble()).isCloseTo(10, within(1e-12));
        assertThat(json.get("rigid").get("chassisStiffnessNmPerDeg").isNull()).isTrue();
        // the roadster's file gives 7500 N m/deg
        assertThat(json.get("current").get("chassisStiffnessNmPerDeg").asDouble()).isCloseTo(7500, within(1e-9));
        assertThat(json.get("stiffnessFor80PercentNmPerDeg").asDouble()).isPositive();
    }

    @Test
    void the_readable_output_states_the_eighty_percent_rule_with_its_source() {
        CommandRun run = CommandRun.of("chassis", "sample-vehicles/club-hatchback.json", "--units", "us");
        assertThat(run.exitCode()).isZero();
        assertThat(run.out())
                .contains("to deliver 80 % of its rigid-chassis effect")
                .contains("lbf·ft/deg")
                .contains("Deakin et al., SAE 2000-01-3554")
                .contains("no chassis stiffness in its file");
    }
}
