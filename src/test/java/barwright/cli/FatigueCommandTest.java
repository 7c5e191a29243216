package barwright.cli;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.file.Files;
import java.nio.file.Path;

import static barwright.cli.SizeCommandTest.HATCHBACK;
import static barwright.cli.SizeCommandTest.run;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/** {@code fatigue}: the JSON shape of docs/file-format.md, and bad input refused with its line or key path. */
class FatigueCommandTest {
    @TempDir
    Path dir;

    private String file(String name, String text) throws Exception {
        Path path = dir.resolve(name);
        Files.writeString(path, text);
        return path.toString();
    }

    @Test
    void spectrumGivesBothBarsInTheDocumentedShape() throws Exception {
        // an invented lap of a club circuit: hard corners both ways
        String spectrum = file("lap.csv", "# invented lap\nlateralAccelerationG,countPerLap\n1.4,4\n-1.3,3\n0.7,5\n");
        String[] outcome = run(0, "fatigue", HATCHBACK, "--spectrum", spectrum, "--json");
        JsonNode json = new ObjectMapper().readTree(outcome[0]);
        assertThat(json.path("format").asText()).isEqualTo("barwright.fatigue");
        assertThat(json.path("version").asInt()).isEqualTo(1);
        for (String axle : new String[]{"front", "rear"}) {
            JsonNode bar = json.path(axle);
            assertThat(bar.has("damagePerLap")).as(axle).isTrue();
            assertThat(bar.has("lapsToFailure") && bar.has("hoursToFailure") && bar.has("fatigueSafetyFactor")).isTrue();
            JsonNode cycle = bar.path("cycles").get(0);
            assertThat(cycle.has("rangeMPa") && cycle.has("meanMPa") && cycle.has("count")).isTrue();
            double damage = bar.path("damagePerLap").asDouble();
            if (damage > 0) {
                // laps = 1 / damage; hours = laps x 90 s (the default lap time)
                assertThat(bar.path("lapsToFailure").asDouble()).isCloseTo(1 / damage, within(1e-9 / damage));
                assertThat(bar.path("hoursToFailure").asDouble()).isCloseTo(90 / damage / 3600,
                        within(1e-9 / damage));
            } else {
                assertThat(bar.path("lapsToFailure").isNull()).isTrue();
            }
        }
        assertThat(outcome[0]).doesNotContain("Infinity", "NaN");
        assertThat(run(0, "fatigue", HATCHBACK, "--spectrum", spectrum, "--laps-per-season", "300")[0])
                .contains("Front bar", "Rear bar", "Caution");
    }

    @Test
    void aStressHistoryIsCountedDirectly() throws Exception {
        String history = file("stress.csv", "stressMPa\n-2\n1\n-3\n5\n-1\n3\n-4\n4\n-2\n");
        JsonNode json = new ObjectMapper().readTree(run(0, "fatigue", HATCHBACK, "--stress-history", history,
                "--json")[0]);
        double total = 0;
        for (JsonNode cycle : json.path("history").path("cycles")) {
            total += cycle.path("count").asDouble();
        }
        // the hand count of RainflowTest: 0.5 + 1.5 + 0.5 + 1 + 0.5 cycles; stresses far below any endurance limit
        assertThat(total).isEqualTo(4.0);
        assertThat(json.path("history").path("damagePerLap").asDouble()).isZero();
    }

    @Test
    void badInputIsRefusedWithItsLineOrKeyPath() throws Exception {
        String negative = file("neg.csv", "lateralAccelerationG,countPerLap\n1.0,3\n0.5,-2\n");
        assertThat(run(2, "fatigue", HATCHBACK, "--spectrum", negative)[1]).contains("line 3", "countPerLap", "-2");
        String text = file("text.csv", "lateralAccelerationG,countPerLap\n1.0,x\n");
        assertThat(run(2, "fatigue", HATCHBACK, "--spectrum", text)[1]).contains("line 2", "countPerLap");
        String one = file("one.csv", "stressMPa\n12\n");
        assertThat(run(2, "fatigue", HATCHBACK, "--stress-history", one)[1]).contains("1 row", "two");
        String spectrum = file("ok.csv", "lateralAccelerationG,countPerLap\n1.0,3\n");
        String car = Files.readString(Path.of(HATCHBACK));
        String custom = file("car.json", car.replaceFirst("\"material\"\\s*:\\s*\\{[^}]*\\}",
                "\"material\": {\"name\": \"my steel\", \"youngsModulusGPa\": 207, \"shearModulusGPa\": 79.3, "
                        + "\"densityKgPerM3\": 7850, \"yieldStrengthMPa\": 1100, \"ultimateStrengthMPa\": 600, "
                        + "\"enduranceLimitMPa\": 700}"));
        assertThat(run(2, "fatigue", custom, "--spectrum", spectrum)[1])
                .contains("front.bar.material.enduranceLimitMPa", "700", "ultimate strength 600");
        String lap = Path.of("sample-vehicles", "laps", "invented-circuit-lap.csv").toString();
        assertThat(run(2, "fatigue", HATCHBACK, "--log", lap)[1]).contains("front.damper", "--spectrum");
        assertThat(run(2, "fatigue", HATCHBACK, "--log", lap, "--spectrum", spectrum)[1]).contains("exactly one");
    }

    /** The invented lap replayed on the invented damped hatchback: both bars, the lap's own duration for hours. */
    @Test
    void aLoggedLapIsReplayedForBothBars() throws Exception {
        String car = Path.of("sample-vehicles", "club-hatchback-dampers.json").toString();
        String lap = Path.of("sample-vehicles", "laps", "invented-circuit-lap.csv").toString();
        String[] outcome = run(0, "fatigue", car, "--log", lap, "--json");
        JsonNode json = new ObjectMapper().readTree(outcome[0]);
        for (String axle : new String[]{"front", "rear"}) {
            JsonNode bar = json.path(axle);
            assertThat(bar.path("cycles").size()).as(axle).isGreaterThan(10);
            double damage = bar.path("damagePerLap").asDouble();
            if (damage > 0) {
                // the log runs from 0.00 s to 60.28 s: that is the lap time of the hours
                assertThat(bar.path("hoursToFailure").asDouble() / bar.path("lapsToFailure").asDouble())
                        .isCloseTo(60.28 / 3600, within(1e-6));
            }
        }
        assertThat(outcome[0]).doesNotContain("Infinity", "NaN");
    }
}
