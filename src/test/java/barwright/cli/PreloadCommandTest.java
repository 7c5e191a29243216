package barwright.cli;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import org.junit.jupiter.api.Test;

import static barwright.cli.SizeCommandTest.HATCHBACK;
import static barwright.cli.SizeCommandTest.run;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/** {@code preload}: per-mm figures, the diagonal in words, and the advice (model.md 9, common practice). */
class PreloadCommandTest {
    @Test
    void theJsonIsLinearInTheLinkChangeAndSaysTheDiagonal() throws Exception {
        ObjectMapper mapper = new ObjectMapper();
        JsonNode one = mapper.readTree(run(0, "preload", HATCHBACK, "--axle", "front", "--longer-loads", "lf-rr",
                "--json")[0]);
        JsonNode three = mapper.readTree(run(0, "preload", HATCHBACK, "--axle", "front", "--longer-loads", "lf-rr",
                "--link-change-mm", "3", "--json")[0]);
        // model.md 9 is linear in delta: three times the link change locks three times the moment
        assertThat(three.path("lockedMomentNm").asDouble()).isCloseTo(3 * one.path("lockedMomentNm").asDouble(),
                within(1e-9));
        assertThat(one.path("gainingDiagonal").asText()).isEqualTo("left front and right rear");
        assertThat(one.path("cornerLoadChangeNPerMm").path("leftFront").asDouble()).isPositive();
        assertThat(one.path("crossWeightAfter").asDouble()).isGreaterThan(one.path("crossWeightBefore").asDouble());
        assertThat(one.path("advice").asText()).contains("ride height", "driver");
        assertThat(run(0, "preload", HATCHBACK, "--axle", "rear", "--longer-loads", "rf-lr")[0])
                .contains("right front and left rear", "ride height");
    }

    @Test
    void theDiagonalMustBeSaid() {
        assertThat(run(2, "preload", HATCHBACK, "--axle", "front")[1]).contains("--longer-loads");
        assertThat(run(2, "preload", "sample-vehicles/road-saloon.json", "--axle", "rear", "--longer-loads",
                "lf-rr")[1]).contains("rear axle has no bar");
    }
}
