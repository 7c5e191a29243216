package barwright.cli;

import barwright.io.VehicleDocument;
import barwright.loading.VehicleLoader;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import javax.imageio.ImageIO;
import java.awt.image.BufferedImage;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;

/** {@code tyre-fit} (README, file-format.md "Tyre fit"): outputs, files, and refusals naming the row. */
class TyreFitCommandTest {
    static final String DATA = "sample-vehicles/tyre-data/invented-club-tyre.csv";

    @Test
    void theJsonTyrePastesIntoAVehicleFileAsItIs() throws Exception {
        CommandRun run = CommandRun.of("tyre-fit", DATA, "--json");
        assertThat(run.exitCode()).as(run.err()).isZero();
        JsonNode root = run.json();
        assertThat(root.get("format").asText()).isEqualTo("barwright.tyre");
        assertThat(root.get("version").asInt()).isEqualTo(1);
        assertThat(root.get("fit").get("curves")).hasSize(7);
        assertThat(root.get("fit").get("curves").get(0).get("rmsResidualShareOfPeak").asDouble()).isBetween(0.0, 0.01);
        // paste it over the club hatchback's front tyre, as a person would, and read the file
        ObjectNode car = (ObjectNode) new ObjectMapper().readTree(
                Files.readString(Path.of("sample-vehicles/club-hatchback.json")));
        car.put("version", 2);
        ((ObjectNode) car.get("front")).set("tyre", root.get("tyre"));
        VehicleDocument document = VehicleLoader.fromTree(car);
        assertThat(document.vehicle().front().tyre().frictionByLoad().points()).hasSize(4);
        assertThat(document.vehicle().front().tyre().camber().isNone()).isFalse();
    }

    @Test
    void theTextNamesTheCoefficientsResidualsAndTheCaution(@TempDir Path folder) throws Exception {
        Path output = folder.resolve("tyre.json");
        Path plot = folder.resolve("fit.png");
        CommandRun run = CommandRun.of("tyre-fit", DATA, "--output", output.toString(), "--plot", plot.toString());
        assertThat(run.exitCode()).as(run.err()).isZero();
        assertThat(run.out()).contains("load N", "RMS N", "worst N", "peak friction", "camber: best", "Caution");
        assertThat(new ObjectMapper().readTree(Files.readString(output)).get("tyre").has("peakFrictionByLoad"))
                .isTrue();
        BufferedImage image = ImageIO.read(plot.toFile());
        assertThat(image.getWidth()).isEqualTo(1200);
    }

    @Test
    void aRowOfNaNIsRefusedWithItsLine(@TempDir Path folder) throws Exception {
        List<String> lines = Files.readAllLines(Path.of(DATA), StandardCharsets.UTF_8);
        lines.set(19, "2000,-8,NaN,0"); // line 20 of the file
        Path bad = folder.resolve("bad.csv");
        Files.write(bad, lines, StandardCharsets.UTF_8);
        CommandRun run = CommandRun.of("tyre-fit", bad.toString());
        assertThat(run.exitCode()).isEqualTo(2);
        assertThat(run.err()).contains("line 20, column lateralForceN = \"NaN\": must be a finite number");
    }

    @Test
    void aSingleLoadIsRefusedNamingTheLines(@TempDir Path folder) throws Exception {
        List<String> lines = Files.readAllLines(Path.of(DATA), StandardCharsets.UTF_8).subList(0, 42);
        Path one = folder.resolve("one.csv");
        Files.write(one, lines, StandardCharsets.UTF_8);
        CommandRun run = CommandRun.of("tyre-fit", one.toString());
        assertThat(run.exitCode()).isEqualTo(2);
        assertThat(run.err()).contains("every row (lines 12 to 42) is at one load, 2000 N");
    }
}
