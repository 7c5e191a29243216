package barwright.cli;

import barwright.io.Fixtures;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ObjectNode;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.ByteArrayOutputStream;
import java.io.OutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.Locale;
import java.util.Set;
import java.util.TreeSet;

import static org.assertj.core.api.Assertions.assertThat;

/** The command line: the report's keys (files.md), the null rules, exit codes 0 / 2 / 1, and US units. */
class CliTest {
    private static final ObjectMapper MAPPER = new ObjectMapper();
    /** files.md, analysis report: the keys of an axle, plus barModel, barMaxStressAtMm, barBushingLoadsN. */
    private static final Set<String> AXLE_KEYS = Set.of("springRollStiffnessNmPerDeg", "barRollStiffnessNmPerDeg",
            "tyreRollStiffnessNmPerDeg", "suspensionRollStiffnessNmPerDeg", "rollStiffnessNmPerDeg",
            "heaveRateNPerMm", "singleWheelBumpRateNPerMm", "rideRateNPerMm", "rideFrequencyHz",
            "barLinkRateNPerMm", "barMassKg", "barTorsionalShearStressMPa", "barMaxVonMisesStressMPa",
            "barSafetyFactor", "loadTransferNPerG", "corneringStiffnessNPerDeg",
            "barModel", "barMaxStressAtMm", "barBushingLoadsN",
            // the suspension-linkage figures (file-format.md, analysis report)
            "rollCentreHeightMm", "rollCentreHeightAtLimitMm", "rollCentreMigrationMmPerDeg",
            "outsideCamberAtLimitDeg", "insideCamberAtLimitDeg", "camberChangePerDegRollDeg");
    private static final Set<String> LINKAGE_AT_LIMIT = Set.of("rollCentreHeightAtLimitMm",
            "rollCentreMigrationMmPerDeg", "outsideCamberAtLimitDeg", "insideCamberAtLimitDeg", "camberChangePerDegRollDeg");
    private static final Set<String> TOP_KEYS = Set.of("format", "version", "vehicle", "front", "rear",
            "rollGradientDegPerG", "suspensionRollGradientDegPerG", "frontLoadTransferShare",
            "frontRollStiffnessShare", "understeerGradientDegPerG", "leftTurn", "rightTurn", "warnings");
    private static final Set<String> VEHICLE_KEYS = Set.of("massKg", "frontMassFraction", "sprungMassKg",
            "sprungCgHeightMm", "rollAxisHeightAtCgMm", "rollArmMm");
    private static final Set<String> TURN_KEYS = Set.of("frontInsideLiftG", "rearInsideLiftG", "frontLimitG",
            "rearLimitG", "limitG", "limitBalance");
    private static final Set<String> TRANSFER_KEYS = Set.of("unsprung", "geometric", "elastic", "total");

    @TempDir
    Path directory;

    private Path fixture(ObjectNode tree) {
        return Fixtures.write(directory, "car.json", Fixtures.text(tree));
    }

    private static Set<String> keys(JsonNode node) {
        Set<String> keys = new TreeSet<>();
        node.fieldNames().forEachRemaining(keys::add);
        return keys;
    }

    @Test
    void jsonReportHasExactlyTheKeysOfFilesMd() throws Exception {
        Fixtures.Run run = Fixtures.cli("analyze", fixture(Fixtures.testVehicleTree()).toString(), "--json");
        assertThat(run.exitCode()).as(run.err()).isZero();
        assertThat(run.err()).isEmpty();
        JsonNode report = MAPPER.readTree(run.out());
        assertThat(keys(report)).isEqualTo(new TreeSet<>(TOP_KEYS));
        assertThat(keys(report.get("vehicle"))).isEqualTo(new TreeSet<>(VEHICLE_KEYS));
        for (String axle : new String[]{"front", "rear"}) {
            assertThat(keys(report.get(axle))).as(axle).isEqualTo(new TreeSet<>(AXLE_KEYS));
            assertThat(keys(report.get(axle).get("loadTransferNPerG"))).isEqualTo(new TreeSet<>(TRANSFER_KEYS));
        }
        for (String turn : new String[]{"leftTurn", "rightTurn"}) {
            assertThat(keys(report.get(turn))).as(turn).isEqualTo(new TreeSet<>(TURN_KEYS));
            assertThat(report.get(turn).get("limitBalance").asText()).isIn("understeer", "oversteer", "neutral");
        }
        assertThat(report.get("warnings").isArray()).isTrue();
        report.get("warnings").forEach(warning -> assertThat(keys(warning)).containsExactly("code", "message"));
        assertThat(run.out()).doesNotContain("NaN").doesNotContain("Infinity");
    }

    @Test
    void noRearBarGivesNullBarValuesInTheReport() throws Exception {
        ObjectNode tree = Fixtures.with(Fixtures.testVehicleTree(), "rear.bar", "null");
        Fixtures.Run run = Fixtures.cli("analyze", fixture(tree).toString(), "--json");
        assertThat(run.exitCode()).isZero();
        JsonNode rear = MAPPER.readTree(run.out()).get("rear");
        assertThat(keys(rear)).isEqualTo(new TreeSet<>(AXLE_KEYS)); // the keys stay, their values are null
        for (String key : AXLE_KEYS) {
            // and with no linkage, the linkage's figures at the limit are null as well
            assertThat(rear.get(key).isNull()).as(key).isEqualTo(key.startsWith("bar") || LINKAGE_AT_LIMIT.contains(key));
        }
    }

    @Test
    void aLiftPastThreeGIsNullInTheReport() throws Exception {
        // a low car (CG 200 mm, invented) whose inside wheels hold past 3 g (files.md: null)
        ObjectNode tree = Fixtures.with(Fixtures.testVehicleTree(), "vehicle.cgHeightMm", "200");
        Fixtures.Run run = Fixtures.cli("analyze", fixture(tree).toString(), "--json");
        assertThat(run.exitCode()).isZero();
        JsonNode left = MAPPER.readTree(run.out()).get("leftTurn");
        assertThat(left.get("frontInsideLiftG").isNull()).isTrue();
        assertThat(left.get("rearInsideLiftG").isNull()).isTrue();
        assertThat(left.get("limitG").isNumber()).isTrue();
    }

    @Test
    void aCarWithNoStableRollPositionExitsTwoNamingTheCause() {
        ObjectNode tree = Fixtures.with(Fixtures.testVehicleTree(), "front.springRateNPerMm", "0.5");
        tree = Fixtures.with(tree, "rear.springRateNPerMm", "0.5");
        tree = Fixtures.with(tree, "front.bar", "null");
        tree = Fixtures.with(tree, "rear.bar", "null");
        for (String[] args : new String[][]{{"analyze", fixture(tree).toString(), "--json"},
                {"analyze", fixture(tree).toString()}}) {
            Fixtures.Run run = Fixtures.cli(args);
            assertThat(run.exitCode()).isEqualTo(2);
            assertThat(run.out()).isEmpty();
            assertThat(run.err()).contains("this car cannot be analysed: No stable roll position")
                    .doesNotContain("NaN").doesNotContain("Infinity");
        }
    }

    @Test
    void anInternalFailureExitsOne() {
        // a failure nobody planned for (here the output itself breaks) is reported as internal: exit 1
        PrintStream broken = new PrintStream(OutputStream.nullOutputStream()) {
            @Override
            public void print(String text) {
                throw new IllegalStateException("output closed");
            }
        };
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        int code = Cli.run(new String[]{"analyze", fixture(Fixtures.testVehicleTree()).toString(), "--json"}, broken,
                new PrintStream(err, true, StandardCharsets.UTF_8));
        assertThat(code).isEqualTo(1);
        assertThat(err.toString(StandardCharsets.UTF_8)).contains("internal failure").contains("output closed");
    }

    @Test
    void usUnitsArePrintedWhenAsked() {
        // NIST SP 811: 1 lbf = 4.448 221 615 260 5 N, 1 in = 25.4 mm, 1 lb = 0.453 592 37 kg. The fixture's
        // front wheel rate is 55 N/mm * 0.95^2 = 49.6375 N/mm = 283.44 lbf/in; its mass 1050 kg = 2314.85 lb.
        Path file = fixture(Fixtures.testVehicleTree());
        Fixtures.Run us = Fixtures.cli("analyze", file.toString(), "--units", "us");
        assertThat(us.exitCode()).isZero();
        double lbfPerIn = 4.4482216152605 / 25.4; // N/mm
        assertThat(us.out()).contains("US customary")
                .contains(String.format(Locale.ROOT, "%.1f lbf/in", 49.6375 / lbfPerIn))
                .contains(String.format(Locale.ROOT, "%.1f lb", 1050 / 0.45359237))
                .contains("lbf·ft/deg").contains(" in").doesNotContain("N/mm").doesNotContain("N·m/deg");
        Fixtures.Run si = Fixtures.cli("analyze", file.toString());
        assertThat(si.out()).contains("49.6 N/mm").contains("1050.0 kg").doesNotContain("lbf");
        assertThat(Fixtures.cli("analyze", file.toString(), "--units=us").out()).isEqualTo(us.out());
        // the caution is printed where the results are
        assertThat(us.out()).contains("qualified mechanic");
    }

    @Test
    void badArgumentsExitTwoWithTheUsage() {
        Path file = fixture(Fixtures.testVehicleTree());
        for (String[] args : new String[][]{{"analyse-this"}, {"analyze"}, {"analyze", file.toString(), file.toString()},
                {"analyze", file.toString(), "--units", "furlongs"}, {"analyze", file.toString(), "--colour"},
                {"analyze", file.toString(), "--units"}}) {
            Fixtures.Run run = Fixtures.cli(args);
            assertThat(run.exitCode()).as(String.join(" ", args)).isEqualTo(2);
            assertThat(run.out()).isEmpty();
            assertThat(run.err()).contains("usage");
        }
        assertThat(Fixtures.cli("analyze", file.toString(), "--units", "furlongs").err()).contains("use si or us");
    }

    @Test
    void helpExitsZero() {
        for (String[] args : new String[][]{{}, {"help"}, {"--help"}, {"-h"}}) {
            Fixtures.Run run = Fixtures.cli(args);
            assertThat(run.exitCode()).isZero();
            assertThat(run.out()).contains("analyze FILE").contains("Exit codes");
        }
    }
}
