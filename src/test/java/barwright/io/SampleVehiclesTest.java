package barwright.io;

import barwright.loading.VehicleLoader;
import barwright.model.Vehicle;
import barwright.physics.AnalysisResult;
import barwright.physics.VehicleAnalysis;
import barwright.report.ReportJson;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.MethodSource;

import java.io.IOException;
import java.io.InputStream;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Map;
import java.util.stream.Stream;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * Every shipped sample vehicle (sample-vehicles/*.json) loads, analyses, survives a save and a reload
 * unchanged, and gives figures in the ranges the trade expects (docs/validation.md, section "Facts of the
 * trade": common practice, no single source).
 */
class SampleVehiclesTest {
    private static final Path SAMPLES = Path.of("sample-vehicles");
    private static final double G = 9.80665;
    private static final double DEG = Math.PI / 180;

    /** What each known sample is meant to be; a sample not listed here gets the general checks only. */
    private static final Map<String, String> KIND = Map.of(
            "road-saloon.json", "road car",
            "club-hatchback.json", "club racer",
            "sprint-roadster.json", "club racer");

    @TempDir
    Path directory;

    static Stream<Path> samples() throws IOException {
        try (Stream<Path> files = Files.list(SAMPLES)) {
            return files.filter(path -> path.toString().endsWith(".json")).sorted().toList().stream();
        }
    }

    @Test
    void theKnownSamplesAreThere() throws IOException {
        assertThat(samples().map(path -> path.getFileName().toString())).containsAll(KIND.keySet());
    }

    @ParameterizedTest
    @MethodSource("samples")
    void sampleLoadsAnalysesAndRoundTrips(Path sample) throws Exception {
        VehicleDocument document = VehicleLoader.read(sample);
        AnalysisResult result = VehicleAnalysis.analyse(document.vehicle());
        Path saved = directory.resolve(sample.getFileName());
        VehicleFileWriter.save(document, saved);
        VehicleDocument again = VehicleLoader.read(saved);
        assertThat(again.tree()).isEqualTo(document.tree());
        Vehicle reloaded = again.vehicle();
        assertThat(reloaded).isEqualTo(document.vehicle());
        assertThat(ReportJson.of(VehicleAnalysis.analyse(reloaded))).isEqualTo(ReportJson.of(result));
        // the built-in copy in the jar is the same file
        try (InputStream in = SampleVehiclesTest.class.getResourceAsStream("/barwright/samples/" + sample.getFileName())) {
            assertThat(in).as("built into the jar").isNotNull();
            assertThat(VehicleLoader.parse(in.readAllBytes()).tree()).isEqualTo(document.tree());
        }
    }

    @ParameterizedTest
    @MethodSource("samples")
    void sampleGivesFiguresTheTradeExpects(Path sample) throws Exception {
        AnalysisResult result = VehicleAnalysis.analyse(VehicleLoader.read(sample).vehicle());
        double rollGradient = result.rollGradient() * G / DEG;
        // general bounds for any car on tyres (common practice): 0.3-8 deg/g, limit 0.6-1.8 g, front share
        // of load transfer 0.3-0.8, ride frequencies 0.8-3.5 Hz, no bar past yield at its check travel
        assertThat(rollGradient).isBetween(0.3, 8.0);
        assertThat(result.frontLoadTransferShare()).isBetween(0.3, 0.8);
        for (var turn : new barwright.physics.TurnResult[]{result.leftTurn(), result.rightTurn()}) {
            assertThat(turn.limit() / G).isBetween(0.6, 1.8);
            assertThat(turn.rollsOverBeforeSliding()).isFalse();
        }
        for (var axle : new barwright.physics.AxleResult[]{result.front(), result.rear()}) {
            assertThat(axle.stiffness().rideFrequency()).isBetween(0.8, 3.5);
            if (axle.bar() != null) {
                assertThat(axle.bar().safetyFactor()).isGreaterThan(1);
            }
        }
        String kind = KIND.get(sample.getFileName().toString());
        if ("road car".equals(kind)) {
            // road cars roll a few degrees per g (roughly 3-7 deg/g); road tyres hold 0.7-1.0 g; ride 1-1.6 Hz;
            // they understeer (docs/validation.md, "Facts of the trade": common practice)
            assertThat(rollGradient).isBetween(3.0, 7.0);
            assertThat(result.leftTurn().limit() / G).isBetween(0.7, 1.0);
            assertThat(result.front().stiffness().rideFrequency()).isBetween(1.0, 1.6);
            assertThat(result.understeerGradient()).isPositive();
        } else if ("club racer".equals(kind)) {
            // club racers about 1-2 deg/g, on sticky tyres 1.0-1.5 g, ride 1.5-3 Hz (common practice)
            assertThat(rollGradient).isBetween(1.0, 2.0);
            assertThat(result.leftTurn().limit() / G).isBetween(1.0, 1.5);
            assertThat(result.front().stiffness().rideFrequency()).isBetween(1.5, 3.0);
        }
    }
}
