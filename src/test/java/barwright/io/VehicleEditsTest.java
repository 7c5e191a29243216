package barwright.io;

import org.junit.jupiter.api.Test;

import java.nio.file.Path;
import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

/** Edits go through the JSON tree and the file's own validation (files.md): unknown keys stay. */
class VehicleEditsTest {
    @Test
    void aVariantKeepsUnknownKeysAndChangesWhatItNames() throws Exception {
        VehicleDocument document = VehicleFileReader.read(Path.of("sample-vehicles/club-hatchback.json"));
        var tree = document.editableTree();
        tree.put("myOwnKey", "kept");
        VehicleDocument withKey = VehicleFileReader.fromTree(tree);
        VehicleDocument changed = VehicleEdits.withEdits(withKey, List.of("rear.bar.selectedArm=3",
                "front.bar.armLengthsMm[0]=185", "rear.bar.material={\"name\": \"spring steel\"}"));
        assertThat(changed.tree().path("myOwnKey").asText()).isEqualTo("kept");
        assertThat(changed.vehicle().rear().bar().selectedArm()).isEqualTo(3);
        assertThat(changed.vehicle().front().bar().dimensions().armLengths().get(0)).isEqualTo(0.185);
        assertThat(changed.vehicle().rear().bar().material().name()).isEqualTo("spring steel");
    }

    @Test
    void aBadValueIsRefusedWithItsKeyPath() throws Exception {
        VehicleDocument document = VehicleFileReader.read(Path.of("sample-vehicles/club-hatchback.json"));
        assertThatThrownBy(() -> VehicleEdits.withEdits(document, List.of("front.bar.section.outerDiameterMm=500")))
                .isInstanceOfSatisfying(VehicleFileException.class, refused -> assertThat(refused.problems())
                        .extracting(Problem::path).contains("front.bar.section.outerDiameterMm"));
        assertThatThrownBy(() -> VehicleEdits.withEdits(document, List.of("front.bar.armLengthsMm[7]=200")))
                .hasMessageContaining("names no entry");
        assertThatThrownBy(() -> VehicleEdits.withEdits(document, List.of("no equals sign")))
                .hasMessageContaining("key.path=value");
    }
}
