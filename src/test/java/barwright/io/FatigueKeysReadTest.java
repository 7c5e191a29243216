package barwright.io;

import barwright.loading.VehicleLoader;
import com.fasterxml.jackson.databind.node.ObjectNode;
import org.junit.jupiter.api.Test;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatCode;
import static org.junit.jupiter.api.Assertions.assertThrows;

/**
 * The bar's fatigue keys are checked when the vehicle file is read (file-format.md, bar keys), not only by the
 * fatigue command: an endurance limit at or above the ultimate strength cannot be (the endurance limit is a
 * fraction of the ultimate strength, about half for steels: common practice), so the file is refused with the key
 * path; a custom material without fatigue data is still read.
 */
class FatigueKeysReadTest {
    private static ObjectNode customMaterial(String fatigueKeys) {
        return Fixtures.with(Fixtures.testVehicleTree(), "front.bar.material",
                "{\"name\": \"my steel\", \"youngsModulusGPa\": 207, \"shearModulusGPa\": 79.3, "
                        + "\"densityKgPerM3\": 7850, \"yieldStrengthMPa\": 1100" + fatigueKeys + "}");
    }

    @Test
    void anEnduranceLimitAboveTheUltimateStrengthRefusesTheFile() {
        ObjectNode tree = customMaterial(", \"ultimateStrengthMPa\": 600, \"enduranceLimitMPa\": 700");
        VehicleFileException refused = assertThrows(VehicleFileException.class,
                () -> VehicleLoader.fromTree(tree));
        assertThat(refused.getMessage()).contains("front.bar.material.enduranceLimitMPa", "700",
                "ultimate strength 600");
    }

    @Test
    void oneStrengthWithoutTheOtherAndABadSurfaceAreRefused() {
        ObjectNode tree = Fixtures.with(customMaterial(", \"ultimateStrengthMPa\": 1200"), "rear.bar.fatigue",
                "{\"surface\": \"polished\", \"stressConcentration\": 0.5}");
        VehicleFileException refused = assertThrows(VehicleFileException.class,
                () -> VehicleLoader.fromTree(tree));
        assertThat(refused.getMessage()).contains("front.bar.material.enduranceLimitMPa", "rear.bar.fatigue.surface",
                "polished", "rear.bar.fatigue.stressConcentration");
    }

    @Test
    void aCustomMaterialWithoutFatigueDataOrWithGoodDataIsRead() {
        assertThatCode(() -> VehicleLoader.fromTree(customMaterial(""))).doesNotThrowAnyException();
        assertThatCode(() -> VehicleLoader.fromTree(
                customMaterial(", \"ultimateStrengthMPa\": 1300, \"enduranceLimitMPa\": 600")))
                .doesNotThrowAnyException();
    }
}
