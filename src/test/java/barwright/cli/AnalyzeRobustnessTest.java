package barwright.cli;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.function.Consumer;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * Files that used to get through the reader and then fail in the analysis, or give figures with no warning,
 * each run through {@code analyze} as a user would (the reproducers found by fuzzing; docs/model.md, "When
 * the answer leaves the model").
 */
class AnalyzeRobustnessTest {
    private static final ObjectMapper MAPPER = new ObjectMapper();
    private static final Path ESTATE = Path.of("sample-vehicles/estate-dropped-rear-bar.json");
    private static final Path SALOON = Path.of("sample-vehicles/road-saloon.json");
    private static final Path HATCHBACK = Path.of("sample-vehicles/club-hatchback.json");

    @TempDir
    Path work;

    @Test
    void aShapedBarWithArmsFarApartIsRefusedWhenReadNamingBothLeverArms() {
        CommandRun run = analyze(ESTATE, tree -> ((ArrayNode) centreline(tree).get(7)).set(0, -300), "--json");
        assertThat(run.exitCode()).isEqualTo(Cli.REFUSED);
        assertThat(run.err()).contains("rear.bar.geometry").contains("left 230.0 mm, right 300.0 mm");
    }

    @Test
    void aShapedBarWithArmsTwoMillimetresApartIsAnalysed() {
        CommandRun run = analyze(ESTATE, tree -> ((ArrayNode) centreline(tree).get(7)).set(0, -232), "--json");
        assertThat(run.exitCode()).as(run.err()).isEqualTo(Cli.OK);
        assertThat(run.json().get("rear").get("barModel").asText()).isEqualTo("beam");
    }

    @Test
    void aZShapedBarIsRefusedAsNoAntiRollBarNotAsUnequalArms() {
        // the right arm mirrored forwards: both lever arms are 230 mm, on opposite sides of the axis
        CommandRun run = analyze(ESTATE, tree -> ((ArrayNode) centreline(tree).get(7)).set(0, 230));
        assertThat(run.exitCode()).isEqualTo(Cli.REFUSED);
        assertThat(run.err()).contains("rear.bar.geometry").contains("point opposite ways")
                .contains("left link 230.0 mm").contains("right link 230.0 mm").doesNotContain("unequal");
    }

    @Test
    void aHoleSetBackByATenThousandthOfAMillimetreIsAnalysedNotAnInternalFailure() {
        // used to leave a sliver element of 1e-7 m whose stiffness broke the factorisation
        CommandRun run = analyze(ESTATE, tree -> {
            ArrayNode setbacks = (ArrayNode) tree.at("/rear/bar/geometry/holeSetbacksMm");
            setbacks.set(1, 1e-4);
            ((ObjectNode) tree.at("/rear/bar")).put("selectedArm", 1);
        }, "--json");
        assertThat(run.exitCode()).as(run.err()).isEqualTo(Cli.OK);
    }

    @ParameterizedTest(name = "{0} = {1}")
    @CsvSource({
            "/front/bar/bushingSpanMm, 4.9e-324, front.bar.bushingSpanMm, at least 20 mm",
            "/front/bar/bushingSpanMm, 1e-300, front.bar.bushingSpanMm, at least 20 mm",
            "/rear/bar/section/wallMm, 1e-300, rear.bar.section.wallMm, at least 0.5 mm",
            "/analysis/differentialWheelTravelMm, 1e-300, analysis.differentialWheelTravelMm, at least 1 mm"})
    void valuesJustAboveZeroAreRefusedWithTheKeyAndTheSmallestValueAllowed(String pointer, double value,
                                                                            String keyPath, String allowed) {
        Path sample = pointer.contains("wallMm") ? ESTATE : HATCHBACK;
        CommandRun run = analyze(sample, tree -> set(tree, pointer, value));
        assertThat(run.exitCode()).as(run.err()).isEqualTo(Cli.REFUSED);
        assertThat(run.err()).contains(keyPath).contains(allowed).doesNotContain("internal failure");
    }

    @Test
    void aBendRadiusOfAMillionthOfAMillimetreIsRefusedButZeroIsASharpCorner() {
        CommandRun tiny = analyze(ESTATE, tree -> set(tree, "/rear/bar/geometry/bendRadiusMm", 1e-6));
        assertThat(tiny.exitCode()).isEqualTo(Cli.REFUSED);
        assertThat(tiny.err()).contains("rear.bar.geometry.bendRadiusMm").contains("at least 1 mm or 0");
        CommandRun sharp = analyze(ESTATE, tree -> set(tree, "/rear/bar/geometry/bendRadiusMm", 0));
        assertThat(sharp.exitCode()).as(sharp.err()).isEqualTo(Cli.OK);
    }

    @Test
    void aRollCentreFarBelowTheGroundIsWarnedOfInTheReportAndTheSummary() {
        // the reproducer of the fuzzing: a 400 mm front track, roll centres at -500 and 1000 mm
        Consumer<ObjectNode> edit = tree -> {
            typedRollCentres(tree);
            set(tree, "/front/trackMm", 400);
            set(tree, "/front/rollCentreHeightMm", -500);
            set(tree, "/rear/rollCentreHeightMm", 1000);
        };
        CommandRun json = analyze(SALOON, edit, "--json");
        assertThat(json.exitCode()).isEqualTo(Cli.OK);
        JsonNode report = json.json();
        assertThat(report.get("frontLoadTransferShare").asDouble()).isNegative();
        assertThat(codes(report)).contains("FRONT_LOAD_TRANSFER_REVERSED");
        CommandRun text = analyze(SALOON, edit);
        assertThat(text.out()).doesNotContain("Warnings: none").contains("[FRONT_LOAD_TRANSFER_REVERSED]")
                .contains("load moves onto the inside front wheel");
    }

    @Test
    void aBodyHangingBelowItsRollAxisAndATyreWithNoGripAreWarnedOf() {
        CommandRun pendulum = analyze(SALOON, tree -> {
            typedRollCentres(tree);
            set(tree, "/front/rollCentreHeightMm", 1500);
            set(tree, "/rear/rollCentreHeightMm", 1500);
        }, "--json");
        assertThat(pendulum.exitCode()).as(pendulum.err()).isEqualTo(Cli.OK);
        assertThat(pendulum.json().get("rollGradientDegPerG").asDouble()).isNegative();
        assertThat(codes(pendulum.json())).contains("BODY_LEANS_INTO_TURN");
        // the friction law falls to nothing at twice the nominal load when the load sensitivity is -1
        // (model.md 8): a 100 N nominal load puts every static load far past that. Since tyres from data
        // (model.md 8.1) the law is held at a floor of half its mu_0 there, with a warning, so the limit
        // stays well above zero and the racer is told the tyre is outside its law
        CommandRun slick = analyze(SALOON, tree -> {
            for (String axle : List.of("front", "rear")) {
                set(tree, "/" + axle + "/tyre/nominalLoadN", 100);
                set(tree, "/" + axle + "/tyre/frictionLoadSensitivity", -1);
            }
        }, "--json");
        assertThat(slick.exitCode()).as(slick.err()).isEqualTo(Cli.OK);
        assertThat(slick.json().get("leftTurn").get("limitG").asDouble()).isGreaterThan(0.05);
        assertThat(codes(slick.json())).contains("TYRE_FRICTION_AT_FLOOR").doesNotContain("GRIP_LIMIT_VERY_LOW");
    }

    private CommandRun analyze(Path sample, Consumer<ObjectNode> edit, String... options) {
        try {
            ObjectNode tree = (ObjectNode) MAPPER.readTree(sample.toFile());
            edit.accept(tree);
            Path file = work.resolve("edited.json");
            Files.writeString(file, MAPPER.writeValueAsString(tree));
            List<String> args = new ArrayList<>(List.of("analyze", file.toString()));
            args.addAll(List.of(options));
            return CommandRun.of(args.toArray(String[]::new));
        } catch (IOException e) {
            throw new java.io.UncheckedIOException(e);
        }
    }

    private static ArrayNode centreline(ObjectNode tree) {
        return (ArrayNode) tree.at("/rear/bar/geometry/centrelineMm");
    }

    /**
     * The sample saloon has suspension linkages, whose computed roll centres replace the typed heights
     * (model.md 11): take them off so that the typed heights these reproducers set are the ones analysed.
     */
    private static void typedRollCentres(ObjectNode tree) {
        for (String axle : List.of("front", "rear")) {
            ObjectNode node = (ObjectNode) tree.get(axle);
            node.remove(List.of("linkage", "staticCamberDeg", "rideHeightChangeMm"));
        }
    }

    private static void set(ObjectNode tree, String pointer, double value) {
        int slash = pointer.lastIndexOf('/');
        ((ObjectNode) tree.at(pointer.substring(0, slash))).put(pointer.substring(slash + 1), value);
    }

    private static List<String> codes(JsonNode report) {
        List<String> codes = new ArrayList<>();
        report.get("warnings").forEach(warning -> codes.add(warning.get("code").asText()));
        return codes;
    }
}
