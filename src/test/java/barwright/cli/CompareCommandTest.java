package barwright.cli;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.StringReader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import static barwright.cli.SizeCommandTest.HATCHBACK;
import static barwright.cli.SizeCommandTest.run;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/** {@code compare}: files and variants side by side; differences from the first; chart lines as CSV. */
class CompareCommandTest {
    @Test
    void aVariantIsComparedWithItsDifferences(@TempDir Path folder) throws Exception {
        Path csv = folder.resolve("charts.csv");
        JsonNode root = new ObjectMapper().readTree(run(0, "compare", HATCHBACK, "sample-vehicles/sprint-roadster.json",
                "--variant", "softer rear: rear.bar.selectedArm=3", "--json", "--csv", csv.toString())[0]);
        assertThat(root.path("configurations")).hasSize(3);
        for (JsonNode figure : root.path("figures")) {
            JsonNode values = figure.path("values");
            JsonNode differences = figure.path("differences");
            for (int i = 0; i < values.size(); i++) {
                if (!values.get(i).isNull() && !values.get(0).isNull()) {
                    assertThat(differences.get(i).asDouble()).as(figure.path("key").asText())
                            .isCloseTo(values.get(i).asDouble() - values.get(0).asDouble(), within(1e-9));
                }
            }
        }
        List<CSVRecord> records = CSVFormat.RFC4180.builder().setHeader().setSkipHeaderRecord(true).get()
                .parse(new StringReader(Files.readString(csv))).getRecords();
        assertThat(records).isNotEmpty();
        assertThat(records.stream().map(r -> r.get("series")).distinct()).contains("softer rear");
        assertThat(records.stream().map(r -> r.get("yUnit")).distinct()).contains("deg", "N");
    }

    @Test
    void oneSetupAloneIsRefused() {
        assertThat(run(2, "compare", HATCHBACK)[1]).contains("2 to 4");
    }
}
