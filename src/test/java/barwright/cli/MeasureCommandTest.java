package barwright.cli;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/** The measure command's four sub-commands, their JSON keys, --apply and refusals naming the row or value. */
class MeasureCommandTest {
    private static final String CAR = "sample-vehicles/road-saloon.json";
    private static final String BAR_READINGS = "sample-vehicles/workshop/front-bar-readings.csv";
    @TempDir
    Path directory;

    private record Run(int code, String out, String err) {
        JsonNode json() throws Exception {
            return new ObjectMapper().readTree(out);
        }
    }

    private static Run run(String... args) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        int code = Cli.run(args, new PrintStream(out, true, StandardCharsets.UTF_8),
                new PrintStream(err, true, StandardCharsets.UTF_8));
        return new Run(code, out.toString(StandardCharsets.UTF_8), err.toString(StandardCharsets.UTF_8));
    }

    @Test
    void barWithACarGivesTheRateTheModelsRateAndTheFactor() throws Exception {
        Run run = run("measure", "bar", BAR_READINGS, "--vehicle", CAR, "--axle", "front", "--json");
        assertThat(run.code()).isEqualTo(0);
        JsonNode json = run.json();
        assertThat(json.path("format").asText()).isEqualTo("barwright.measure");
        assertThat(json.path("version").asInt()).isEqualTo(1);
        // the sample's readings step 49.05 N (5 kg) per about 1.5 mm: about 32.8 N/mm, crossing zero near 1.1 mm
        assertThat(json.path("rateNPerMm").asDouble()).isCloseTo(32.8, within(0.2));
        assertThat(json.path("lashMm").asDouble()).isCloseTo(1.1, within(0.1));
        assertThat(json.path("residualsN")).hasSize(11);
        assertThat(json.path("effectiveRateFactor").asDouble()).isCloseTo(
                json.path("rateNPerMm").asDouble() / json.path("modelRateNPerMm").asDouble(), within(1e-12));
    }

    @Test
    void barApplyWritesTheFactorIntoACopyThatReadsBack() throws Exception {
        Path output = directory.resolve("calibrated.json");
        Run run = run("measure", "bar", BAR_READINGS, "--vehicle", CAR, "--axle", "front", "--apply",
                "--output", output.toString());
        assertThat(run.code()).as(run.err()).isEqualTo(0);
        Run analysis = run("analyze", output.toString(), "--json");
        assertThat(analysis.json().path("front").path("barEffectiveRateFactor").asDouble())
                .isCloseTo(0.807, within(0.001));
    }

    @Test
    void motionRatioAndCornersGiveTheirKeys() throws Exception {
        Run ratio = run("measure", "motion-ratio", "sample-vehicles/workshop/front-motion-ratio-readings.csv",
                "--json");
        assertThat(ratio.code()).isEqualTo(0);
        assertThat(ratio.json().has("ratio")).isTrue();
        assertThat(ratio.json().has("ratioChangePer100Mm")).isTrue();
        Run corners = run("measure", "corners", CAR, "--kg", "400,380,340,360", "--target-cross", "0.5", "--json");
        assertThat(corners.code()).as(corners.err()).isEqualTo(0);
        // by hand: (400 + 360) / 1480 = 0.513514
        assertThat(corners.json().path("crossWeight").asDouble()).isCloseTo(0.513514, within(1e-6));
        assertThat(corners.json().path("linkChangeMmForTarget").isNumber()).isTrue();
    }

    @Test
    void cornersAndCentreOfMassApplyWriteTheirKeysIntoACopy() throws Exception {
        Path weighed = directory.resolve("weighed.json");
        Run corners = run("measure", "corners", CAR, "--kg", "400,380,340,360", "--apply", "--output",
                weighed.toString());
        assertThat(corners.code()).as(corners.err()).isEqualTo(0);
        JsonNode body = new ObjectMapper().readTree(weighed.toFile()).path("vehicle");
        assertThat(body.path("cornerMassesKg").path("rightFront").asDouble()).isEqualTo(380);
        // the mass and front share now follow from the corners (file-format.md): the copy gives neither
        assertThat(body.has("massKg")).isFalse();
        assertThat(body.has("frontMassFraction")).isFalse();
        Run analysis = run("analyze", weighed.toString(), "--json");
        assertThat(analysis.code()).as(analysis.err()).isEqualTo(0);
        // by hand: 400 + 380 + 340 + 360 = 1480 kg
        assertThat(analysis.json().path("vehicle").path("massKg").asDouble()).isCloseTo(1480, within(1e-9));

        Path tilted = directory.resolve("tilted.json");
        Run height = run("measure", "cg", CAR, "--raised-axle", "rear", "--raise-mm", "300",
                "--raised-front-axle-kg", "800", "--apply", "--output", tilted.toString(), "--json");
        assertThat(height.code()).as(height.err()).isEqualTo(0);
        // the copy holds the height the command printed, in mm to 0.1 mm
        assertThat(new ObjectMapper().readTree(tilted.toFile()).path("vehicle").path("cgHeightMm").asDouble())
                .isCloseTo(height.json().path("cgHeightMm").asDouble(), within(0.05));
    }

    @Test
    void badReadingsAreRefusedWithTheirLineOrValue() throws Exception {
        Path bad = directory.resolve("bad.csv");
        Files.writeString(bad, "loadN,deflectionMm\n10,1\nabc,2\n30,3\n");
        Run text = run("measure", "bar", bad.toString());
        assertThat(text.code()).isEqualTo(2);
        assertThat(text.err()).contains("line 3").contains("loadN").contains("abc");
        Run zero = run("measure", "cg", CAR, "--raised-axle", "rear", "--raise-mm", "0", "--raised-front-axle-kg", "860");
        assertThat(zero.code()).isEqualTo(2);
        assertThat(zero.err()).contains("raise 0 mm");
        Run corners = run("measure", "corners", CAR, "--kg", "400,x,340,360");
        assertThat(corners.code()).isEqualTo(2);
        assertThat(corners.err()).contains("right front").contains("'x'");
    }
}
