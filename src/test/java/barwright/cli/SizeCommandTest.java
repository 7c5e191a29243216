package barwright.cli;

import barwright.loading.VehicleLoader;
import barwright.physics.AnalysisResult;
import barwright.physics.VehicleAnalysis;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVRecord;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.io.StringReader;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;

import static barwright.units.Constants.RADIANS_PER_DEGREE;
import static barwright.units.Constants.STANDARD_GRAVITY;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/** {@code size}: the JSON a script puts straight into a vehicle file, checked by doing exactly that. */
class SizeCommandTest {
    static final String HATCHBACK = "sample-vehicles/club-hatchback.json";
    private static final ObjectMapper MAPPER = new ObjectMapper();

    static String[] run(int expectedExit, String... args) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        int exit = Cli.run(args, new PrintStream(out, true, StandardCharsets.UTF_8),
                new PrintStream(err, true, StandardCharsets.UTF_8));
        String[] texts = {out.toString(StandardCharsets.UTF_8), err.toString(StandardCharsets.UTF_8)};
        assertThat(exit).as("exit code; stderr: %s", texts[1]).isEqualTo(expectedExit);
        return texts;
    }

    @Test
    void eachJsonCandidatePutIntoTheVehicleFileGivesItsFigures() throws Exception {
        String json = run(0, "size", HATCHBACK, "--axle", "front", "--target-share", "0.52", "--json")[0];
        JsonNode root = MAPPER.readTree(json);
        assertThat(root.path("format").asText()).isEqualTo("barwright.sizing");
        assertThat(root.path("version").asInt()).isEqualTo(1);
        assertThat(root.path("exactSolidDiameterMm").isNumber()).isTrue();
        JsonNode candidates = root.path("candidates");
        assertThat(candidates.size()).isEqualTo(10);
        JsonNode vehicleTree = MAPPER.readTree(Files.readAllBytes(Path.of(HATCHBACK)));
        for (JsonNode candidate : candidates) {
            assertThat(candidate.path("material").size()).isEqualTo(5); // the complete material object of files.md
            ObjectNode tree = vehicleTree.deepCopy();
            ObjectNode bar = (ObjectNode) tree.path("front").path("bar");
            bar.set("material", candidate.path("material"));
            bar.set("section", candidate.path("section"));
            bar.set("selectedArm", candidate.path("selectedArm"));
            AnalysisResult analysed = VehicleAnalysis.analyse(VehicleLoader.fromTree(tree).vehicle());
            // the JSON prints doubles in full (Jackson round-trips them): 1e-12 relative
            assertThat(candidate.path("frontLoadTransferShare").asDouble())
                    .isCloseTo(analysed.frontLoadTransferShare(), within(1e-12));
            double gradient = analysed.rollGradient() * STANDARD_GRAVITY / RADIANS_PER_DEGREE;
            assertThat(candidate.path("rollGradientDegPerG").asDouble()).isCloseTo(gradient, within(gradient * 1e-12));
            assertThat(candidate.path("barMassKg").asDouble()).isCloseTo(analysed.front().bar().mass(), within(1e-12));
            assertThat(candidate.path("barSafetyFactor").asDouble())
                    .isCloseTo(analysed.front().bar().safetyFactor(), within(1e-9));
            assertThat(candidate.path("barSafetyFactor").asDouble()).isGreaterThanOrEqualTo(1.5);
        }
    }

    @Test
    void theExactDiameterPrintedMeetsTheTarget() throws Exception {
        JsonNode root = MAPPER.readTree(run(0, "size", HATCHBACK, "--axle", "front", "--target-share", "0.47",
                "--json")[0]);
        ObjectNode tree = (ObjectNode) MAPPER.readTree(Files.readAllBytes(Path.of(HATCHBACK)));
        ObjectNode section = (ObjectNode) tree.path("front").path("bar").path("section");
        section.put("outerDiameterMm", root.path("exactSolidDiameterMm").asDouble());
        assertThat(VehicleAnalysis.analyse(VehicleLoader.fromTree(tree).vehicle()).frontLoadTransferShare())
                .isCloseTo(0.47, within(1e-6));
    }

    @Test
    void applyWritesAVehicleFileAndTheSweepCsvParses(@TempDir Path folder) throws Exception {
        Path vehicle = folder.resolve("sized.json");
        Path sweep = folder.resolve("sweep.csv");
        String text = run(0, "size", HATCHBACK, "--axle", "rear", "--target-offset", "-0.12", "--no-lift", "rear",
                "--materials", "current,spring steel", "--catalogues", "solid-metric,tube-inch", "--apply", "1",
                "--output", vehicle.toString(), "--sweep-csv", sweep.toString())[0];
        assertThat(text).contains("Sizing the rear bar", "inside rear wheel stays down", "Caution");
        var sized = VehicleLoader.read(vehicle);
        assertThat(sized.tree().path("notes").asText()).contains("Invented"); // the rest of the file kept
        List<CSVRecord> records = CSVFormat.RFC4180.builder().setHeader().setSkipHeaderRecord(true).get()
                .parse(new StringReader(Files.readString(sweep))).getRecords();
        assertThat(records).hasSize(61);
        assertThat(Double.parseDouble(records.get(0).get("diameterMm"))).isEqualTo(10.0);
        assertThat(Double.parseDouble(records.get(60).get("diameterMm"))).isCloseTo(40.0, within(1e-9));
        assertThat(Double.parseDouble(records.get(30).get("frontLoadTransferShare"))).isBetween(0.0, 1.0);
    }

    @Test
    void tubesLikeASolidBarAreListed() throws Exception {
        JsonNode root = MAPPER.readTree(run(0, "size", HATCHBACK, "--axle", "front", "--tubes-like-solid", "current",
                "--json")[0]);
        assertThat(root.path("format").asText()).isEqualTo("barwright.tubes");
        assertThat(root.path("tubes").size()).isPositive();
        for (JsonNode tube : root.path("tubes")) {
            assertThat(Math.abs(tube.path("rateDifference").asDouble())).isLessThanOrEqualTo(0.02);
            assertThat(tube.path("massSavedKg").asDouble()).isPositive();
        }
    }

    @Test
    void badOptionsAreRefusedWithExitTwo() {
        assertThat(run(2, "size", HATCHBACK, "--target-share", "0.5")[1]).contains("--axle");
        assertThat(run(2, "size", HATCHBACK, "--axle", "front")[1]).contains("give a target");
        assertThat(run(2, "size", HATCHBACK, "--axle", "front", "--target-share", "0.5", "--catalogues", "nope")[1])
                .contains("no catalogue 'nope'");
        assertThat(run(2, "size", HATCHBACK, "--axle", "front", "--target-share", "0.5", "--materials", "wood")[1])
                .contains("not a built-in material");
    }

    @Test
    void aTargetOutOfReachIsSaidAndTheFlaggedBestProposalCautioned() throws Exception {
        // the case: the club hatchback's static front weight + 5 points, sized with the front bar
        String text = run(0, "size", HATCHBACK, "--axle", "front", "--target-offset", "0.05")[0];
        assertThat(text).contains("Out of reach: static front weight 63.0 % + 5.0 points = 68.0 % is out of reach "
                + "for the front bar on this car (reachable ").contains("--target-share 0.6");
        assertThat(text).contains("Caution: the best proposal is outside what the trade usually fits (heavy: 13.22 kg");
        assertThat(text.lines().filter(line -> line.startsWith("  1 ")).findFirst().orElseThrow())
                .endsWith("heavy, thick, stressed");

        JsonNode root = MAPPER.readTree(run(0, "size", HATCHBACK, "--axle", "front", "--target-offset", "0.05",
                "--json")[0]);
        assertThat(root.path("targetOutOfReach").asBoolean()).isTrue();
        double highest = root.path("frontShareReach").path("highest").asDouble();
        assertThat(root.path("targetFrontLoadTransferShare").asDouble()).isGreaterThan(highest);
        JsonNode best = root.path("candidates").get(0);
        // the best proposal is the stiffest allowed: it sits at the top of the reach
        assertThat(best.path("frontLoadTransferShare").asDouble()).isCloseTo(highest, within(1e-12));
        JsonNode flags = best.path("tradeFlags");
        assertThat(flags.size()).isEqualTo(3);
        assertThat(flags.get(0).path("flag").asText()).isEqualTo("BAR_MASS");
        assertThat(flags.get(0).path("barMassKg").asDouble()).isEqualTo(best.path("barMassKg").asDouble());
        assertThat(flags.get(0).path("limitKg").asDouble()).isEqualTo(root.path("tradeLimits").path("maxBarMassKg")
                .asDouble());
        assertThat(flags.get(1).path("outerDiameterMm").asDouble()).isEqualTo(40.0);

        // a target in reach: said as a range, no "out of reach", a light bar without flags
        String inReach = run(0, "size", HATCHBACK, "--axle", "front", "--target-share", "0.55")[0];
        assertThat(inReach).contains("Front share reachable with the front bar tried: ").doesNotContain("Out of reach");
    }
}
