package barwright.io;

import barwright.loading.VehicleLoader;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.attribute.PosixFilePermissions;
import java.util.List;
import java.util.stream.Stream;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

/** Saving (files.md): unknown keys kept, a round trip unchanged, and saves that are atomic. */
class VehicleFileWriterTest {
    @TempDir
    Path directory;

    @Test
    void unknownKeysAreKeptOnSave() throws Exception {
        // files.md: "Unknown keys are kept when the file is saved again"
        ObjectNode tree = Fixtures.with(Fixtures.testVehicleTree(), "workshopNote", "\"re-check links after the race\"");
        tree = Fixtures.with(tree, "front.tyre.supplierCode", "{\"compound\": \"R7\", \"batch\": [3, 4]}");
        Path original = Fixtures.write(directory, "car.json", Fixtures.text(tree));
        VehicleDocument document = VehicleLoader.read(original);
        Path saved = directory.resolve("saved.json");
        VehicleFileWriter.save(document, saved);
        JsonNode reread = VehicleLoader.read(saved).tree();
        assertThat(reread.get("workshopNote").asText()).isEqualTo("re-check links after the race");
        assertThat(reread.at("/front/tyre/supplierCode/compound").asText()).isEqualTo("R7");
        assertThat(reread.at("/front/tyre/supplierCode/batch/1").asInt()).isEqualTo(4);
        assertThat(reread).isEqualTo(tree);
    }

    @Test
    void savedTextIsTheTreePrettyPrinted() throws Exception {
        String text = VehicleFileWriter.toJson(Fixtures.testVehicleTree());
        assertThat(text).endsWith("\n").contains("\n  \"format\" : \"barwright.vehicle\"");
        assertThat(VehicleLoader.parse(text.getBytes(StandardCharsets.UTF_8)).tree())
                .isEqualTo(Fixtures.testVehicleTree());
    }

    @Test
    void aSaveIntoADirectoryThatCannotBeWrittenLeavesTheOldFileIntact() throws Exception {
        Path locked = Files.createDirectory(directory.resolve("locked"));
        Path target = Fixtures.write(locked, "car.json", "the old file\n");
        VehicleDocument document = VehicleLoader.parse(Fixtures.testVehicleText().getBytes(StandardCharsets.UTF_8));
        DirectoryLock lock = DirectoryLock.lock(locked);
        try {
            assertThatThrownBy(() -> VehicleFileWriter.save(document, target)).isInstanceOf(IOException.class);
        } finally {
            lock.release();
        }
        assertThat(Files.readString(target)).isEqualTo("the old file\n");
        assertThat(filesIn(locked)).containsExactly("car.json");
    }

    @Test
    void aSaveThatFailsAtTheLastStepLeavesNoTemporaryFile() throws Exception {
        // the target is a directory with something in it: the temporary file is written, the move fails
        Path target = Files.createDirectory(directory.resolve("car.json"));
        Fixtures.write(target, "inside.txt", "keep me");
        VehicleDocument document = VehicleLoader.parse(Fixtures.testVehicleText().getBytes(StandardCharsets.UTF_8));
        assertThatThrownBy(() -> VehicleFileWriter.save(document, target)).isInstanceOf(IOException.class);
        assertThat(Files.readString(target.resolve("inside.txt"))).isEqualTo("keep me");
        assertThat(filesIn(directory)).containsExactly("car.json");
    }

    @Test
    void aSaveReplacesTheOldFileWhole() throws Exception {
        Path target = Fixtures.write(directory, "car.json", "x".repeat(100_000));
        VehicleDocument document = VehicleLoader.parse(Fixtures.testVehicleText().getBytes(StandardCharsets.UTF_8));
        VehicleFileWriter.save(document, target);
        assertThat(VehicleLoader.read(target).tree()).isEqualTo(document.tree());
        assertThat(filesIn(directory)).containsExactly("car.json");
    }

    private static List<String> filesIn(Path folder) throws IOException {
        try (Stream<Path> files = Files.list(folder)) {
            return files.map(path -> path.getFileName().toString()).sorted().toList();
        }
    }
}
