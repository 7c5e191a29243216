package barwright.io;

import barwright.loading.VehicleLoader;
import barwright.model.DynamicsInputs;
import com.fasterxml.jackson.databind.node.ObjectNode;
import org.junit.jupiter.api.Test;

import java.nio.file.Path;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

/** The roll-dynamics keys (file-format.md, "Roll dynamics"): optional, read in SI, refused by key path. */
class DynamicsInputReaderTest {
    private static final Path SAMPLE = Path.of("sample-vehicles/club-hatchback-dampers.json");

    @Test
    void sampleReadsInSiAndAFileWithoutTheKeysMeansWhatItDid() throws Exception {
        DynamicsInputs inputs = DynamicsInputReader.read(VehicleLoader.read(SAMPLE).tree());
        assertThat(inputs.rollInertia()).isEqualTo(280.0);
        assertThat(inputs.frontDamper().velocities()).contains(-0.3, 0.0, 0.3); // mm/s to m/s
        DynamicsInputs none = DynamicsInputReader.read(
                VehicleLoader.read(Path.of("sample-vehicles/club-hatchback.json")).tree());
        assertThat(none.rollInertia()).isNull();
        assertThat(none.frontDamper()).isNull();
    }

    @Test
    void aCurveWithoutZeroGetsItAndABadCurveIsRefusedByKeyPath() throws Exception {
        ObjectNode tree = VehicleLoader.read(SAMPLE).editableTree();
        ObjectNode damper = (ObjectNode) tree.get("rear").get("damper");
        damper.putArray("forceByVelocity").add(pair(-100, -900)).add(pair(100, 600));
        assertThat(DynamicsInputReader.read(tree).rearDamper().velocities()).containsExactly(-0.1, 0.0, 0.1);

        damper.putArray("forceByVelocity").add(pair(-100, -900)).add(pair(100, -1000));
        assertThatThrownBy(() -> VehicleLoader.fromTree(tree))
                .isInstanceOf(VehicleFileException.class)
                .hasMessageContaining("rear.damper.forceByVelocity[1] = [100, -1000]: the force must rise");
        damper.putArray("forceByVelocity").add(pair(-100, -900)).add(pair(0, 50)).add(pair(100, 600));
        assertThatThrownBy(() -> VehicleLoader.fromTree(tree))
                .hasMessageContaining("rear.damper.forceByVelocity[1] = [0, 50]: the curve passes through zero");
        damper.put("motionRatio", 7);
        assertThatThrownBy(() -> VehicleLoader.fromTree(tree))
                .hasMessageContaining("rear.damper.motionRatio = 7: must be between 0.1 and 3");
    }

    @Test
    void rollInertiaOutOfRangeIsRefusedByKeyPath() throws Exception {
        ObjectNode tree = VehicleLoader.read(SAMPLE).editableTree();
        ((ObjectNode) tree.get("vehicle")).put("rollInertiaKgM2", -5);
        assertThatThrownBy(() -> VehicleLoader.fromTree(tree))
                .hasMessageContaining("vehicle.rollInertiaKgM2 = -5 kg·m²: must be between 1 and 100000 kg·m²");
    }

    private static com.fasterxml.jackson.databind.node.ArrayNode pair(double velocity, double force) {
        return com.fasterxml.jackson.databind.node.JsonNodeFactory.instance.arrayNode().add(velocity).add(force);
    }
}
