package barwright.cli;

import barwright.io.Fixtures;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import org.junit.jupiter.api.Test;

import java.util.ArrayList;
import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * {@code geometry FILE}: the JSON format of the suspension-linkage issue exactly, readable text in both unit
 * systems, bad options refused. The samples are invented cars.
 */
class GeometryCommandTest {
    private static final ObjectMapper MAPPER = new ObjectMapper();

    @Test
    void jsonHasExactlyTheKeysOfTheFormat() throws Exception {
        Fixtures.Run run = Fixtures.cli("geometry", "sample-vehicles/road-saloon.json", "--json", "--roll-deg", "0,1.5",
                "--travel-mm", "-30,0,30");
        assertThat(run.exitCode()).as(run.err()).isZero();
        JsonNode root = MAPPER.readTree(run.out());
        assertThat(fields(root)).containsExactly("format", "version", "front", "rear");
        assertThat(root.get("format").asText()).isEqualTo("barwright.geometry");
        assertThat(root.get("version").asInt()).isEqualTo(1);
        for (String axle : List.of("front", "rear")) {
            JsonNode node = root.get(axle);
            assertThat(fields(node)).containsExactly("staticRollCentreHeightMm", "roll", "travel");
            assertThat(node.get("roll")).hasSize(2);
            assertThat(fields(node.get("roll").get(0))).containsExactly("rollDeg", "rollCentreHeightMm",
                    "rollCentreOffsetMm", "leftCamberDeg", "rightCamberDeg");
            assertThat(node.get("travel")).hasSize(3);
            assertThat(fields(node.get("travel").get(0))).containsExactly("travelMm", "camberDeg", "instantCentreMm");
            // at rest the roll row's roll centre is the static one, and sits on the centreline
            assertThat(node.at("/roll/0/rollCentreHeightMm").asDouble())
                    .isCloseTo(node.get("staticRollCentreHeightMm").asDouble(), within(1e-9));
            assertThat(node.at("/roll/0/rollCentreOffsetMm").asDouble()).isCloseTo(0, within(1e-9));
        }
        assertThat(run.out()).doesNotContain("NaN", "Infinity");
    }

    @Test
    void parallelLinesAndInfiniteInstantCentresAreNullNotNumbers() throws Exception {
        // the invented Panhard-rod estate has a typed front roll centre (no linkage): empty tables
        Fixtures.Run run = Fixtures.cli("geometry", "sample-vehicles/estate-dropped-rear-bar.json", "--json");
        JsonNode root = MAPPER.readTree(run.out());
        assertThat(root.at("/front/roll")).isEmpty();
        assertThat(root.at("/front/staticRollCentreHeightMm").asDouble()).isEqualTo(60);
        // the beam axle keeps its camber to the road in roll
        assertThat(root.at("/rear/roll/3/leftCamberDeg").asDouble()).isZero();
        assertThat(root.at("/rear/travel/0/instantCentreMm/0").asDouble()).isEqualTo(-750);
    }

    @Test
    void textInUsUnitsSaysWhatEverythingIs() {
        Fixtures.Run run = Fixtures.cli("geometry", "sample-vehicles/sprint-roadster.json", "--units", "us");
        assertThat(run.exitCode()).as(run.err()).isZero();
        assertThat(run.out()).contains("Front axle: double wishbone", "roll-centre height", " in", "deg",
                "SAE J670", "Caution");
        assertThat(run.out()).doesNotContain("NaN", "Infinity", " mm");
    }

    @Test
    void theLoweredRoadsterShowsItsRollCentresDropping() throws Exception {
        JsonNode standard = MAPPER.readTree(Fixtures.cli("geometry", "sample-vehicles/sprint-roadster.json", "--json").out());
        JsonNode lowered = MAPPER.readTree(Fixtures.cli("geometry", "sample-vehicles/sprint-roadster-lowered.json",
                "--json").out());
        for (String axle : List.of("/front", "/rear")) {
            // lowered 25 mm, each roll centre falls by more than the body does (common practice: lowering a car on
            // double wishbones drops its roll centres faster than its ride height; docs/validation.md, "Suspension
            // linkages, camber and tyres from data")
            assertThat(lowered.at(axle + "/staticRollCentreHeightMm").asDouble())
                    .isLessThan(standard.at(axle + "/staticRollCentreHeightMm").asDouble() - 25);
        }
    }

    @Test
    void aBadRollListIsRefusedByName() {
        Fixtures.Run run = Fixtures.cli("geometry", "sample-vehicles/road-saloon.json", "--roll-deg", "1,two");
        assertThat(run.exitCode()).isEqualTo(2);
        assertThat(run.err()).contains("--roll-deg", "\"two\" is not a number");
        Fixtures.Run tooMuch = Fixtures.cli("geometry", "sample-vehicles/road-saloon.json", "--travel-mm", "500");
        assertThat(tooMuch.err()).contains("--travel-mm = 500: each value must be between -300");
    }

    private static List<String> fields(JsonNode node) {
        List<String> names = new ArrayList<>();
        node.fieldNames().forEachRemaining(names::add);
        return names;
    }
}
