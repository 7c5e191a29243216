package barwright.ui.action;

import barwright.io.VehicleFileWriter;
import barwright.ui.ScriptedDialogs;
import barwright.io.KeyPath;
import barwright.ui.document.OpenDocument;
import barwright.ui.document.Samples;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.IntNode;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.file.Files;
import java.nio.file.Path;

import static org.assertj.core.api.Assertions.assertThat;

/** The file commands, called without a window. */
class FileCommandsTest {
    private final OpenDocument document = Samples.open(Samples.CLUB_HATCHBACK);
    private final ScriptedDialogs dialogs = new ScriptedDialogs();
    private final Settings settings = Settings.inMemory();
    private final FileCommands files = new FileCommands(document, dialogs, new RecentFiles(settings));

    @Test
    void closingWithUnsavedChangesAsksAndCancelKeepsEverything() {
        document.edit(KeyPath.of("front.bar.section.outerDiameterMm"), IntNode.valueOf(24), null, null);
        dialogs.unsavedAnswers.add(Dialogs.UnsavedChoice.CANCEL);
        assertThat(files.mayDiscard()).isFalse();
        assertThat(dialogs.unsavedQuestions).isEqualTo(1);
        dialogs.filesToOpen.add(Path.of("never-asked.json"));
        dialogs.unsavedAnswers.add(Dialogs.UnsavedChoice.CANCEL);
        files.open();
        assertThat(dialogs.filesToOpen).hasSize(1); // cancelled before the file was asked for
        assertThat(document.isDirty()).isTrue();
    }

    @Test
    void aCleanDocumentClosesWithoutAQuestion() {
        assertThat(files.mayDiscard()).isTrue();
        assertThat(dialogs.unsavedQuestions).isZero();
    }

    @Test
    void answeringSaveSavesFirst(@TempDir Path folder) {
        document.edit(KeyPath.of("front.bar.section.outerDiameterMm"), IntNode.valueOf(24), null, null);
        dialogs.unsavedAnswers.add(Dialogs.UnsavedChoice.SAVE);
        dialogs.filesToSave.add(folder.resolve("kept"));
        assertThat(files.mayDiscard()).isTrue();
        assertThat(folder.resolve("kept.json")).exists(); // the extension is added
        assertThat(document.isDirty()).isFalse();
        assertThat(new RecentFiles(settings).list()).containsExactly(folder.resolve("kept.json").toAbsolutePath());
    }

    @Test
    void aFileThatFailsToLoadLeavesTheDocumentAndSaysWhy(@TempDir Path folder) throws Exception {
        JsonNode before = document.tree().deepCopy();
        Path bad = folder.resolve("bad.json");
        Files.writeString(bad, "{ \"format\": \"barwright.vehicle\", \"version\": 1,");
        assertThat(files.load(bad)).isFalse();
        Path missing = folder.resolve("missing.json");
        assertThat(files.load(missing)).isFalse();
        assertThat(document.tree()).isEqualTo(before);
        assertThat(dialogs.errors).hasSize(2);
        assertThat(dialogs.errors.get(0)).contains("not valid JSON").contains("unchanged");
        assertThat(dialogs.errors.get(1)).contains("file not found");
    }

    @Test
    void aRefusedValueIsNotSavedAndTheMessageNamesIt(@TempDir Path folder) {
        document.edit(KeyPath.of("rear.bar.section.wallMm"), IntNode.valueOf(14), null, null);
        dialogs.filesToSave.add(folder.resolve("car.json"));
        assertThat(files.save()).isFalse();
        assertThat(folder.resolve("car.json")).doesNotExist();
        assertThat(dialogs.errors).singleElement().asString().contains("rear.bar.section.wallMm");
    }

    @Test
    void openingPutsTheFileOnTheRecentList(@TempDir Path folder) throws Exception {
        Path file = folder.resolve("roadster.json");
        Files.writeString(file, VehicleFileWriter.toJson(Samples.load(Samples.ALL.get(2)).tree()));
        dialogs.filesToOpen.add(file);
        files.open();
        assertThat(document.file()).isEqualTo(file);
        assertThat(document.isDirty()).isFalse();
        assertThat(document.lastValid().vehicle().name()).startsWith("Sprint roadster");
        assertThat(new RecentFiles(settings).list()).containsExactly(file.toAbsolutePath());
    }
}
