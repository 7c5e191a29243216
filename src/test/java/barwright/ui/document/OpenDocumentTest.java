package barwright.ui.document;

import barwright.io.KeyPath;
import barwright.loading.VehicleLoader;
import com.fasterxml.jackson.databind.node.DoubleNode;
import com.fasterxml.jackson.databind.node.IntNode;
import com.fasterxml.jackson.databind.node.TextNode;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

class OpenDocumentTest {
    private static final KeyPath DIAMETER = KeyPath.of("front.bar.section.outerDiameterMm");
    private static final KeyPath WALL = KeyPath.of("rear.bar.section.wallMm");
    private final OpenDocument document = Samples.open(Samples.CLUB_HATCHBACK);

    @Test
    void anAcceptedEditChangesTheCarAndMarksTheDocumentDirty() {
        List<DocumentEvent> events = new ArrayList<>();
        document.addListener(events::add);
        document.edit(DIAMETER, IntNode.valueOf(24), null, "field");
        assertThat(document.isValid()).isTrue();
        assertThat(document.isDirty()).isTrue();
        // 24 mm in the file is 0.024 m in the core (files.md: units in the key names)
        assertThat(document.lastValid().vehicle().front().bar().section().outerDiameter()).isEqualTo(0.024);
        assertThat(events).containsExactly(new DocumentEvent(DocumentEvent.Kind.EDIT, "field"));
    }

    @Test
    void aRefusedEditKeepsTheLastAcceptedCarAndNamesTheProblemByKeyPath() {
        double before = document.lastValid().vehicle().rear().bar().section().outerDiameter();
        document.edit(WALL, IntNode.valueOf(14), null, null);
        assertThat(document.isValid()).isFalse();
        assertThat(document.problemAt(WALL)).hasValueSatisfying(problem ->
                assertThat(problem.toString()).isEqualTo("rear.bar.section.wallMm = 14 mm: must be less than half "
                        + "of outerDiameterMm (12.7 mm)"));
        assertThat(document.lastValid().vehicle().rear().bar().section().outerDiameter()).isEqualTo(before);
        assertThat(((barwright.model.TubeSection) document.lastValid().vehicle().rear().bar().section()).wall())
                .isEqualTo(0.003);
    }

    @Test
    void textThatIsNotANumberIsRefusedByTheCoreWithItsRange() {
        document.edit(DIAMETER, TextNode.valueOf("abc"), null, null);
        assertThat(document.problemAt(DIAMETER)).hasValueSatisfying(problem ->
                assertThat(problem.message()).contains("\"abc\"").contains("must be between 3 and 200 mm"));
    }

    @Test
    void oneTypingSessionIsOneUndoStepAndRedoGoesForwardAgain() {
        Object session = new Object();
        document.edit(DIAMETER, IntNode.valueOf(2), session, null);
        document.edit(DIAMETER, IntNode.valueOf(25), session, null);
        document.closeEditStep();
        document.edit(DIAMETER, DoubleNode.valueOf(25.5), new Object(), null);
        document.undo();
        assertThat(document.value(DIAMETER).doubleValue()).isEqualTo(25);
        document.undo();
        assertThat(document.value(DIAMETER).doubleValue()).isEqualTo(22);
        assertThat(document.canUndo()).isFalse();
        assertThat(document.isDirty()).isFalse();
        document.redo();
        assertThat(document.value(DIAMETER).doubleValue()).isEqualTo(25);
        assertThat(document.isDirty()).isTrue();
    }

    @Test
    void savingWritesAFileThatReadsBackToTheSameTreeAndClearsDirty(@TempDir Path folder) throws Exception {
        document.edit(DIAMETER, DoubleNode.valueOf(23.5), null, null);
        Path file = folder.resolve("car.json");
        document.saveTo(file);
        assertThat(document.isDirty()).isFalse();
        assertThat(document.file()).isEqualTo(file);
        assertThat(document.displayName()).isEqualTo("car.json");
        assertThat(VehicleLoader.read(file).tree()).isEqualTo(document.tree());
        try (var leftovers = Files.list(folder)) {
            assertThat(leftovers).containsExactly(file); // the temporary file of the atomic save is gone
        }
    }

    @Test
    void aDocumentWithARefusedValueIsNotSaved(@TempDir Path folder) {
        document.edit(WALL, IntNode.valueOf(14), null, null);
        assertThatThrownBy(() -> document.saveTo(folder.resolve("car.json")))
                .isInstanceOf(IllegalStateException.class).hasMessageContaining("rear.bar.section.wallMm");
        assertThat(folder.resolve("car.json")).doesNotExist();
    }

    @Test
    void unknownKeysStayThroughEdits() {
        document.editAll(tree -> tree.put("workshopNote", "kept"), null);
        document.edit(DIAMETER, IntNode.valueOf(24), null, null);
        assertThat(document.tree().get("workshopNote").asText()).isEqualTo("kept");
        assertThat(document.isValid()).isTrue();
    }
}
