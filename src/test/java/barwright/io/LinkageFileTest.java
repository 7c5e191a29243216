package barwright.io;

import barwright.loading.VehicleLoader;
import barwright.model.DoubleWishbone;
import barwright.model.LiveAxlePanhard;
import barwright.model.LiveAxleWatts;
import barwright.model.SemiTrailingArm;
import barwright.model.Strut;
import barwright.model.TrailingArm;
import com.fasterxml.jackson.databind.node.ObjectNode;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

import java.nio.charset.StandardCharsets;
import java.util.stream.Stream;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;
import static org.junit.jupiter.params.provider.Arguments.arguments;

/**
 * Suspension linkages in the vehicle file (docs/file-format.md, "Suspension linkages"; file version 2): each
 * type read, version-1 files upgraded with their meaning kept, and bad linkages refused with the key path and
 * the reason. The points are invented.
 */
class LinkageFileTest {
    static final String WISHBONES = "{\"type\": \"double-wishbone\", \"upperInnerMm\": [400, 500], "
            + "\"upperOuterMm\": [680, 480], \"lowerInnerMm\": [300, 200], \"lowerOuterMm\": [720, 160]}";

    private static VehicleDocument read(ObjectNode tree) throws VehicleFileException {
        return VehicleLoader.parse(Fixtures.text(tree).getBytes(StandardCharsets.UTF_8));
    }

    @Test
    void aVersionOneFileIsReadWithItsMeaningAndUpgraded() throws Exception {
        ObjectNode versionOne = Fixtures.with(Fixtures.testVehicleTree(), "version", "1");
        VehicleDocument old = read(versionOne);
        VehicleDocument current = read(Fixtures.testVehicleTree());
        assertThat(old.vehicle()).isEqualTo(current.vehicle());
        assertThat(old.tree().get("version").asInt()).isEqualTo(FileVersion.CURRENT);
        assertThat(old.tree()).isEqualTo(current.tree());
        assertThat(old.vehicle().front().hasLinkage()).isFalse();
    }

    @Test
    void aVersionTwoKeyInAVersionOneFileIsRefusedByName() {
        ObjectNode tree = Fixtures.with(Fixtures.testVehicleTree(), "version", "1");
        ObjectNode withLinkage = Fixtures.with(tree, "front.linkage", WISHBONES);
        assertThatThrownBy(() -> read(withLinkage)).isInstanceOf(VehicleFileException.class)
                .hasMessageContaining("front.linkage is a key of file version 2");
    }

    @Test
    void eachTypeIsRead() throws Exception {
        ObjectNode tree = Fixtures.with(Fixtures.testVehicleTree(), "front.linkage", WISHBONES);
        tree = Fixtures.with(tree, "front.staticCamberDeg", "-1.5");
        tree = Fixtures.with(tree, "front.rideHeightChangeMm", "-15");
        VehicleDocument document = read(tree);
        var front = document.vehicle().front().suspension();
        assertThat(front.linkage()).isInstanceOf(DoubleWishbone.class);
        assertThat(((DoubleWishbone) front.linkage()).upperOuter().y()).isCloseTo(0.680, within(1e-15));
        assertThat(front.staticCamber()).isCloseTo(Math.toRadians(-1.5), within(1e-15));
        assertThat(front.rideHeightChange()).isCloseTo(-0.015, within(1e-15));
        assertThat(linkageOf("{\"type\": \"strut\", \"strutTopMm\": [600, 650], \"strutLowerMm\": [660, 300], "
                + "\"lowerInnerMm\": [300, 180], \"lowerOuterMm\": [720, 140]}")).isInstanceOf(Strut.class);
        assertThat(linkageOf("{\"type\": \"live-axle-panhard\", \"panhardBodyMm\": [-550, 360], "
                + "\"panhardAxleMm\": [500, 300]}")).isInstanceOf(LiveAxlePanhard.class);
        assertThat(linkageOf("{\"type\": \"live-axle-watts\", \"centrePivotHeightMm\": 320, \"centrePivotOn\": \"body\"}"))
                .isEqualTo(new LiveAxleWatts(0.32, LiveAxleWatts.Mount.BODY));
        assertThat(linkageOf("{\"type\": \"trailing-arm\", \"pivotInnerMm\": [400, 300, 300], "
                + "\"pivotOuterMm\": [400, 700, 300]}")).isInstanceOf(TrailingArm.class);
        assertThat(linkageOf("{\"type\": \"semi-trailing-arm\", \"pivotInnerMm\": [120, 150, 260], "
                + "\"pivotOuterMm\": [300, 600, 300]}")).isInstanceOf(SemiTrailingArm.class);
    }

    private static Object linkageOf(String json) throws VehicleFileException {
        return read(Fixtures.with(Fixtures.testVehicleTree(), "rear.linkage", json)).vehicle().rear().suspension()
                .linkage();
    }

    /** label, key path to set, JSON value, message fragment expected. */
    static Stream<Arguments> badLinkages() {
        return Stream.of(
                arguments("unknown type", "front.linkage", "{\"type\": \"swing-axle\"}",
                        "front.linkage.type = \"swing-axle\": must be one of \"double-wishbone\""),
                arguments("missing point", "front.linkage", "{\"type\": \"double-wishbone\", \"upperInnerMm\": [400, 500], "
                        + "\"upperOuterMm\": [680, 480], \"lowerInnerMm\": [300, 200]}", "front.linkage.lowerOuterMm is missing"),
                arguments("point below the ground", "front.linkage", WISHBONES.replace("[720, 160]", "[720, -10]"),
                        "front.linkage.lowerOuterMm[1] = -10 mm: must be between 0 and 2000 mm"),
                arguments("inner point across the centreline", "front.linkage", WISHBONES.replace("[300, 200]", "[-300, 200]"),
                        "front.linkage.lowerInnerMm = [-300 mm, 200 mm]: must lie on the car's left side"),
                arguments("ball joint inboard of its pivot", "front.linkage", WISHBONES.replace("[680, 480]", "[380, 480]"),
                        "front.linkage.upperOuterMm y = 380 mm is not outboard of upperInnerMm"),
                arguments("crossed arms", "front.linkage", WISHBONES.replace("[400, 500]", "[400, 120]"),
                        "front.linkage has its upper and lower arms crossing each other"),
                arguments("locks near the ride height", "front.linkage", WISHBONES.replace("[400, 500]", "[600, 495]")
                        .replace("[680, 480]", "[640, 480]"), "front.linkage locks after"),
                arguments("ride height without a linkage", "rear.rideHeightChangeMm", "-20",
                        "rear.rideHeightChangeMm = -20 mm: a ride-height change needs this axle's linkage"),
                arguments("steep Panhard rod", "rear.linkage", "{\"type\": \"live-axle-panhard\", "
                        + "\"panhardBodyMm\": [-100, 200], \"panhardAxleMm\": [100, 600]}",
                        "front.linkage".replace("front", "rear") + ".panhardAxleMm makes the rod steeper than 45 degrees"),
                arguments("Watt's pivot on neither", "rear.linkage", "{\"type\": \"live-axle-watts\", "
                        + "\"centrePivotHeightMm\": 320, \"centrePivotOn\": \"frame\"}",
                        "rear.linkage.centrePivotOn = \"frame\": must be \"axle\" or \"body\""),
                arguments("swept trailing arm", "rear.linkage", "{\"type\": \"trailing-arm\", "
                        + "\"pivotInnerMm\": [300, 300, 300], \"pivotOuterMm\": [400, 700, 300]}",
                        "rear.linkage.pivotOuterMm is not square to the car"),
                arguments("camber out of range", "front.staticCamberDeg", "25",
                        "front.staticCamberDeg = 25 deg: must be between -10 and 10 deg"));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("badLinkages")
    void aBadLinkageIsRefusedWithItsKeyPath(String label, String path, String json, String expected) {
        ObjectNode tree = Fixtures.with(Fixtures.testVehicleTree(), "front.linkage", WISHBONES);
        ObjectNode broken = Fixtures.with(tree, path, json);
        assertThatThrownBy(() -> read(broken)).isInstanceOf(VehicleFileException.class)
                .hasMessageContaining(expected);
    }

    @Test
    void aRideHeightTheLinkageCannotReachIsRefusedAtTheRideHeightKey() {
        // this short upper arm comes into line with the upright after about 73 mm of droop (found by the solve):
        // raising the body 100 mm asks for more
        String shortUpperArm = WISHBONES.replace("[400, 500]", "[520, 480]").replace("[680, 480]", "[640, 470]");
        ObjectNode tree = Fixtures.with(Fixtures.testVehicleTree(), "front.linkage", shortUpperArm);
        ObjectNode raised = Fixtures.with(tree, "front.rideHeightChangeMm", "100");
        assertThatThrownBy(() -> read(raised)).isInstanceOf(VehicleFileException.class)
                .hasMessageContaining("front.rideHeightChangeMm = 100 mm: the linkage cannot be put together at this "
                        + "ride height").hasMessageContaining("droop");
    }
}
