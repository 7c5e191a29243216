package barwright.io;

import barwright.loading.VehicleLoader;
import barwright.model.Tyre;
import com.fasterxml.jackson.databind.node.ObjectNode;
import org.junit.jupiter.api.Test;

import java.util.List;

import static barwright.units.Constants.RADIANS_PER_DEGREE;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

/** The tyre keys of file version 2 (file-format.md, "The tyre"): read in SI, or refused with key paths. */
class TyrePointsFileTest {
    private static final String FRICTION_POINTS = "[{\"loadN\": 2000, \"peakFriction\": 1.30}, "
            + "{\"loadN\": 4000, \"peakFriction\": 1.20}, {\"loadN\": 6000, \"peakFriction\": 1.05}]";
    private static final String STIFFNESS_POINTS = "[{\"loadN\": 2000, \"corneringStiffnessNPerDeg\": 700}, "
            + "{\"loadN\": 4000, \"corneringStiffnessNPerDeg\": 1150}, "
            + "{\"loadN\": 6000, \"corneringStiffnessNPerDeg\": 1300}]";

    /** The test vehicle as version 2 with the front tyre's laws replaced by points. */
    private static ObjectNode withPoints() {
        ObjectNode tree = Fixtures.with(Fixtures.testVehicleTree(), "version", "2");
        for (String key : List.of("frictionAtNominalLoad", "frictionLoadSensitivity", "corneringStiffnessPerLoad",
                "corneringStiffnessPeakLoadRatio")) {
            tree = Fixtures.with(tree, "front.tyre." + key, null);
        }
        tree = Fixtures.with(tree, "front.tyre.peakFrictionByLoad", FRICTION_POINTS);
        return Fixtures.with(tree, "front.tyre.corneringStiffnessByLoad", STIFFNESS_POINTS);
    }

    @Test
    void pointsAndCamberAreReadInSi() throws VehicleFileException {
        ObjectNode tree = Fixtures.with(withPoints(), "front.tyre.camberForPeakGripDeg", "-2");
        tree = Fixtures.with(tree, "front.tyre.peakFrictionLossPerDegSquared", "0.004");
        tree = Fixtures.with(tree, "front.tyre.camberStiffnessPerLoad", "0.015");
        Tyre tyre = VehicleLoader.fromTree(tree).vehicle().front().tyre();
        assertThat(tyre.frictionByLoad().points()).hasSize(3);
        assertThat(tyre.frictionByLoad().points().get(1).value()).isEqualTo(1.20);
        // N/deg to N/rad: times 180/pi (NIST SP 811's degree)
        assertThat(tyre.corneringStiffnessByLoad().points().get(2).value())
                .isCloseTo(1300 / RADIANS_PER_DEGREE, within(1e-9));
        assertThat(tyre.camber().camberForPeakGrip()).isCloseTo(-2 * RADIANS_PER_DEGREE, within(1e-15));
        assertThat(tyre.camber().peakFrictionLossPerRadSquared())
                .isCloseTo(0.004 / (RADIANS_PER_DEGREE * RADIANS_PER_DEGREE), within(1e-9));
        assertThat(tyre.camber().camberStiffnessPerLoad()).isCloseTo(0.015 / RADIANS_PER_DEGREE, within(1e-12));
    }

    @Test
    void aVersionOneFileReadsAsBeforeWithNoPointsAndNoCamber() throws VehicleFileException {
        Tyre tyre = VehicleLoader.fromTree(Fixtures.testVehicleTree()).vehicle().front().tyre();
        assertThat(tyre.hasFrictionPoints()).isFalse();
        assertThat(tyre.hasStiffnessPoints()).isFalse();
        assertThat(tyre.camber().isNone()).isTrue();
    }

    @Test
    void aLawAndPointsTogetherAreRefusedAtTheLawKey() {
        ObjectNode tree = Fixtures.with(Fixtures.with(withPoints(), "front.tyre.frictionAtNominalLoad", "1.2"),
                "front.tyre.corneringStiffnessPeakLoadRatio", "2");
        assertThatThrownBy(() -> VehicleLoader.fromTree(tree)).isInstanceOf(VehicleFileException.class)
                .hasMessageContaining("front.tyre.frictionAtNominalLoad cannot be given together with "
                        + "peakFrictionByLoad")
                .hasMessageContaining("front.tyre.corneringStiffnessPeakLoadRatio cannot be given together with "
                        + "corneringStiffnessByLoad");
    }

    @Test
    void pointsThatCannotMakeACurveAreRefusedPointByPoint() {
        ObjectNode twoPoints = Fixtures.with(withPoints(), "front.tyre.peakFrictionByLoad[2]", null);
        assertThatThrownBy(() -> VehicleLoader.fromTree(twoPoints))
                .hasMessageContaining("front.tyre.peakFrictionByLoad has 2 entries: must have 3 to 50");
        ObjectNode backwards = Fixtures.with(withPoints(), "front.tyre.peakFrictionByLoad[2]",
                "{\"loadN\": 3000, \"peakFriction\": 1.1}");
        assertThatThrownBy(() -> VehicleLoader.fromTree(backwards))
                .hasMessageContaining("front.tyre.peakFrictionByLoad[2].loadN = 3000 N: loads must increase");
        ObjectNode negative = Fixtures.with(withPoints(), "front.tyre.corneringStiffnessByLoad[1]",
                "{\"loadN\": 4000, \"corneringStiffnessNPerDeg\": -5}");
        assertThatThrownBy(() -> VehicleLoader.fromTree(negative))
                .hasMessageContaining("front.tyre.corneringStiffnessByLoad[1].corneringStiffnessNPerDeg = -5 N/deg");
        ObjectNode notANumber = Fixtures.with(withPoints(), "front.tyre.peakFrictionByLoad[0]",
                "{\"loadN\": 2000, \"peakFriction\": \"high\"}");
        assertThatThrownBy(() -> VehicleLoader.fromTree(notANumber))
                .hasMessageContaining("front.tyre.peakFrictionByLoad[0].peakFriction = \"high\": must be a number");
    }

    @Test
    void theNewKeysInAVersionOneFileAreRefusedAskingForVersionTwo() {
        ObjectNode tree = Fixtures.with(withPoints(), "version", "1");
        assertThatThrownBy(() -> VehicleLoader.fromTree(tree))
                .hasMessageContaining("front.tyre.peakFrictionByLoad needs file version 2");
    }

    @Test
    void camberOutOfRangeIsRefusedWithItsRange() {
        ObjectNode tree = Fixtures.with(Fixtures.with(Fixtures.testVehicleTree(), "version", "2"),
                "rear.tyre.camberForPeakGripDeg", "-25");
        assertThatThrownBy(() -> VehicleLoader.fromTree(tree))
                .hasMessageContaining("rear.tyre.camberForPeakGripDeg = -25 deg: must be between -10 and 10 deg");
    }
}
