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

/** {@code map}: one entry per hole pair in JSON, the same in CSV (parsed back with Commons CSV). */
class MapCommandTest {
    private static final ObjectMapper MAPPER = new ObjectMapper();

    @Test
    void jsonHasOneEntryPerHolePairAndTheCsvAgrees(@TempDir Path folder) throws Exception {
        Path csv = folder.resolve("map.csv");
        JsonNode root = MAPPER.readTree(run(0, "map", HATCHBACK, "--json", "--csv", csv.toString())[0]);
        assertThat(root.path("format").asText()).isEqualTo("barwright.map");
        JsonNode entries = root.path("entries");
        assertThat(entries.size()).isEqualTo(3 * 4); // 3 front holes x 4 rear holes in the sample file
        int current = 0;
        for (JsonNode entry : entries) {
            current += entry.path("current").asBoolean() ? 1 : 0;
            assertThat(entry.path("frontLoadTransferShare").isNumber()).isTrue();
            assertThat(entry.path("rollGradientDegPerG").isNumber()).isTrue();
            assertThat(entry.path("limitBalance").asText()).isIn("understeer", "oversteer", "neutral");
        }
        assertThat(current).isEqualTo(1);
        List<CSVRecord> records = CSVFormat.RFC4180.builder().setHeader().setSkipHeaderRecord(true).get()
                .parse(new StringReader(Files.readString(csv))).getRecords();
        assertThat(records).hasSize(12);
        for (int i = 0; i < 12; i++) {
            assertThat(Double.parseDouble(records.get(i).get("frontLoadTransferShare")))
                    .isCloseTo(entries.get(i).path("frontLoadTransferShare").asDouble(), within(1e-15));
            assertThat(Integer.parseInt(records.get(i).get("rearSelectedArm")))
                    .isEqualTo(entries.get(i).path("rearSelectedArm").asInt());
        }
    }

    @Test
    void candidatesOfASizingResultAreMapped(@TempDir Path folder) throws Exception {
        Path sizing = folder.resolve("sizing.json");
        Files.writeString(sizing, run(0, "size", HATCHBACK, "--axle", "front", "--target-share", "0.5", "--count", "2",
                "--json")[0]);
        JsonNode root = MAPPER.readTree(run(0, "map", HATCHBACK, "--candidates", sizing.toString(), "--json")[0]);
        assertThat(root.path("rows").asInt()).isEqualTo(3 * 3); // current + 2 candidates, 3 holes each
        assertThat(root.path("entries").size()).isEqualTo(9 * 4);
        assertThat(run(0, "map", HATCHBACK)[0]).contains("[", "current, hole 2");
    }
}
