package barwright.cli;

import barwright.insight.Sensitivity;
import barwright.insight.SensitivityResult;
import barwright.loading.VehicleLoader;
import com.fasterxml.jackson.databind.JsonNode;
import org.junit.jupiter.api.Test;

import java.nio.file.Path;

import static org.assertj.core.api.Assertions.assertThat;

class SensitivityCommandTest {
    private static final String ROADSTER = "sample-vehicles/sprint-roadster.json";

    @Test
    void json_lists_every_change_with_its_step_and_effect_sorted_as_computed() throws Exception {
        CommandRun run = CommandRun.of("sensitivity", ROADSTER, "--json");
        assertThat(run.exitCode()).isZero();
        JsonNode json = run.json();
        assertThat(json.get("format").asText()).isEqualTo("barwright.sensitivity");
        SensitivityResult expected = Sensitivity.of(VehicleLoader.read(Path.of(ROADSTER)).vehicle());
        JsonNode changes = json.get("changes");
        assertThat(changes).hasSize(expected.rows().size());
        for (int i = 0; i < changes.size(); i++) {
            assertThat(changes.get(i).get("input").asText()).isEqualTo(expected.rows().get(i).change().key());
            assertThat(changes.get(i).get("frontLoadTransferShareChange").asDouble())
                    .isEqualTo(expected.rows().get(i).frontShareChange());
        }
        JsonNode rearBar = changes.findParents("input").stream()
                .filter(node -> node.get("input").asText().equals("rearBarArmHole")).findFirst().orElseThrow();
        assertThat(rearBar.get("unit").asText()).isEqualTo("mm");
        assertThat(rearBar.get("summary").asText()).isEqualTo("stiffer rear bar (shorter arm): towards oversteer");
        assertThat(rearBar.get("to").asDouble()).isLessThan(rearBar.get("from").asDouble());
    }

    @Test
    void the_readable_output_states_each_step_in_the_chosen_units() {
        CommandRun si = CommandRun.of("sensitivity", ROADSTER);
        assertThat(si.exitCode()).isZero();
        assertThat(si.out()).contains("step: front spring rate").contains("N/mm").contains("towards oversteer");
        CommandRun us = CommandRun.of("sensitivity", ROADSTER, "--units", "us");
        assertThat(us.out()).contains("lbf/in").contains(" in → ").doesNotContain("N/mm");
        assertThat(CommandRun.of("sensitivity", ROADSTER, "--units", "cubits").exitCode()).isEqualTo(Cli.REFUSED);
    }
}
