package barwright.io;

import barwright.loading.VehicleLoader;
import com.fasterxml.jackson.databind.node.ObjectNode;
import org.junit.jupiter.api.Test;

import java.nio.file.Path;
import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

/** Edits go through the JSON tree and the file's own validation (files.md): unknown keys stay. */
class VehicleEditsTest {
    @Test
    void aVariantKeepsUnknownKeysAndChangesWhatItNames() throws Exception {
        VehicleDocument document = VehicleLoader.read(Path.of("sample-vehicles/club-hatchback.json"));
        var tree = document.editableTree();
        tree.put("myOwnKey", "kept");
        VehicleDocument withKey = VehicleLoader.fromTree(tree);
        VehicleDocument changed = VehicleLoader.withEdits(withKey, List.of("rear.bar.selectedArm=3",
                "front.bar.armLengthsMm[0]=185", "rear.bar.material={\"name\": \"spring steel\"}"));
        assertThat(changed.tree().path("myOwnKey").asText()).isEqualTo("kept");
        assertThat(changed.vehicle().rear().bar().selectedArm()).isEqualTo(3);
        assertThat(changed.vehicle().front().bar().dimensions().armLengths().get(0)).isEqualTo(0.185);
        assertThat(changed.vehicle().rear().bar().material().name()).isEqualTo("spring steel");
    }

    @Test
    void aBadValueIsRefusedWithItsKeyPath() throws Exception {
        VehicleDocument document = VehicleLoader.read(Path.of("sample-vehicles/club-hatchback.json"));
        assertThatThrownBy(() -> VehicleLoader.withEdits(document, List.of("front.bar.section.outerDiameterMm=500")))
                .isInstanceOfSatisfying(VehicleFileException.class, refused -> assertThat(refused.problems())
                        .extracting(Problem::path).contains("front.bar.section.outerDiameterMm"));
        assertThatThrownBy(() -> VehicleLoader.withEdits(document, List.of("front.bar.armLengthsMm[7]=200")))
                .hasMessageContaining("names no entry");
        assertThatThrownBy(() -> VehicleLoader.withEdits(document, List.of("no equals sign")))
                .hasMessageContaining("key.path=value");
    }

    @Test
    void aKeyThatChangesNothingIsRefusedWithTheNearestKey() throws Exception {
        VehicleDocument document = VehicleLoader.read(Path.of("sample-vehicles/club-hatchback.json"));
        assertThatThrownBy(() -> VehicleLoader.withEdits(document, List.of("front.trakMm=2000")))
                .isInstanceOfSatisfying(VehicleFileException.class, refused -> assertThat(refused.problems())
                        .extracting(Problem::path).containsExactly("front.trakMm"))
                .hasMessageContaining("did you mean front.trackMm?");
        Fixtures.Run run = Fixtures.cli("compare", "sample-vehicles/club-hatchback.json", "--variant",
                "x: front.trakMm=2000");
        assertThat(run.exitCode()).isEqualTo(2);
        assertThat(run.err()).contains("front.trakMm is not a key the program knows", "did you mean front.trackMm?");
    }

    @Test
    void anOptionalKeyTheFileLeftOutIsAccepted() throws Exception {
        // a key the file does not have but the program reads changes the car: not a typo
        var tree = VehicleLoader.read(Path.of("sample-vehicles/club-hatchback.json")).editableTree();
        ((ObjectNode) tree.get("vehicle")).remove("chassisTorsionalStiffnessNmPerDeg");
        VehicleDocument without = VehicleLoader.fromTree(tree);
        VehicleDocument with = VehicleLoader.withEdits(without, List.of("vehicle.chassisTorsionalStiffnessNmPerDeg=20000"));
        assertThat(with.vehicle().chassisTorsionalStiffness()).isNotNull();
    }

    @Test
    void aMalformedKeyPathIsRefusedInWords() throws Exception {
        VehicleDocument document = VehicleLoader.read(Path.of("sample-vehicles/club-hatchback.json"));
        assertThatThrownBy(() -> VehicleLoader.withEdits(document, List.of("front..trackMm=1")))
                .hasMessageContaining("front..trackMm is not a key path: keys joined by dots");
    }

    @Test
    void theNearestKeyIsTheFewestLettersAway() {
        // Levenshtein distances worked by hand: kitten -> sitting is 3 (the classic example), flaw -> lawn is 2
        assertThat(VehicleEdits.editDistance("kitten", "sitting")).isEqualTo(3);
        assertThat(VehicleEdits.editDistance("flaw", "lawn")).isEqualTo(2);
        assertThat(VehicleEdits.editDistance("", "abc")).isEqualTo(3);
    }
}
