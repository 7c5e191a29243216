package barwright.io;

import barwright.loading.VehicleLoader;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

import java.io.IOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.AccessDeniedException;
import java.nio.file.FileSystemException;
import java.nio.file.Files;
import java.nio.file.NoSuchFileException;
import java.nio.file.Path;
import java.nio.file.attribute.FileTime;
import java.nio.file.attribute.PosixFilePermissions;
import java.time.Instant;
import java.util.List;
import java.util.stream.Stream;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;

/**
 * The atomic writer every export goes through: the person's path and a reason in words on every failure
 * (exit 2 on the command line), permissions and symbolic links kept, names within the 255-byte limit, stale
 * temporary files of ours cleaned, and every vehicle file written read back.
 */
class AtomicFileWriterTest {
    private static final String VEHICLE = "sample-vehicles/club-hatchback.json";

    @TempDir
    Path directory;

    private Fixtures.Run mapCsvTo(Path target) {
        return Fixtures.cli("map", VEHICLE, "--csv", target.toString());
    }

    @Test
    void aMissingFolderIsNamedAndExitsTwo() {
        Path target = directory.resolve("no-such-folder").resolve("map.csv");
        Fixtures.Run run = mapCsvTo(target);
        assertThat(run.exitCode()).isEqualTo(2);
        assertThat(run.err()).contains("cannot write " + target + ": the folder " + target.getParent()
                + " does not exist").doesNotContain(".barwright-save").doesNotContain("internal failure");
    }

    @Test
    void aFolderAsTheTargetIsNamedAndExitsTwo() {
        for (Path target : List.of(directory, Path.of("/"))) {
            Fixtures.Run run = mapCsvTo(target);
            assertThat(run.exitCode()).as(target.toString()).isEqualTo(2);
            assertThat(run.err()).contains("cannot write " + target + ": it is a folder, not a file");
        }
    }

    @Test
    void aReadOnlyFolderIsNamedAndExitsTwo() throws Exception {
        // as root, permissions do not bind: DirectoryLock then uses the immutable flag, which does
        Path locked = Files.createDirectory(directory.resolve("locked"));
        Path target = locked.resolve("map.csv");
        DirectoryLock lock = DirectoryLock.lock(locked);
        Fixtures.Run run;
        try {
            run = mapCsvTo(target);
        } finally {
            lock.release();
        }
        assertThat(run.exitCode()).as(run.err()).isEqualTo(2);
        assertThat(run.err()).contains("cannot write " + target + ": permission denied");
        assertThat(filesIn(locked)).isEmpty();
    }

    @Test
    void aNameOfTheMostBytesAllowedIsWrittenAndOneMoreIsRefused() throws Exception {
        // 255 bytes is the name limit of ext4, XFS, APFS and NTFS (common practice); the temporary name must not
        // push a valid name past it. Two-byte letters check the cut falls between characters.
        String longest = "\u00e9".repeat(125) + "x.csv"; // 250 + 5 = 255 bytes
        assertThat(longest.getBytes(StandardCharsets.UTF_8)).hasSize(255);
        Fixtures.Run run = mapCsvTo(directory.resolve(longest));
        assertThat(run.exitCode()).as(run.err()).isEqualTo(0);
        assertThat(Files.readString(directory.resolve(longest))).startsWith("frontBar");
        assertThat(filesIn(directory)).containsExactly(longest);

        String tooLong = "a".repeat(252) + ".csv";
        run = mapCsvTo(directory.resolve(tooLong));
        assertThat(run.exitCode()).isEqualTo(2);
        assertThat(run.err()).contains("the file name is 256 bytes long; a file name may have at most 255");
    }

    @Test
    void theTemporaryStemFitsWhateverTheName() {
        for (String name : List.of("a", "x".repeat(255), "\u00e9".repeat(127), "\uD83D\uDE97".repeat(63))) {
            String stem = AtomicFileWriter.temporaryStem(name);
            int bytes = (stem + "0123abcd" + AtomicFileWriter.TEMPORARY_SUFFIX).getBytes(StandardCharsets.UTF_8).length;
            assertThat(bytes).as(name).isLessThanOrEqualTo(255);
            assertThat(new String(stem.getBytes(StandardCharsets.UTF_8), StandardCharsets.UTF_8)).isEqualTo(stem);
        }
    }

    @Test
    void anExistingFileKeepsItsPermissionsAndANewOneGetsTheSystemDefault() throws Exception {
        Path kept = Files.writeString(directory.resolve("kept.csv"), "old\n");
        Files.setPosixFilePermissions(kept, PosixFilePermissions.fromString("rw-r-----"));
        AtomicFileWriter.writeText(kept, "new\n");
        assertThat(Files.readString(kept)).isEqualTo("new\n");
        assertThat(PosixFilePermissions.toString(Files.getPosixFilePermissions(kept))).isEqualTo("rw-r-----");

        // the system's default for a new file (0666 less the umask), as Files.createFile makes it: not 0600
        Path reference = Files.createFile(directory.resolve("reference"));
        Path fresh = directory.resolve("fresh.csv");
        AtomicFileWriter.writeText(fresh, "x\n");
        assertThat(Files.getPosixFilePermissions(fresh)).isEqualTo(Files.getPosixFilePermissions(reference));
    }

    @Test
    void aSymbolicLinkIsWrittenThrough() throws Exception {
        Path real = Files.writeString(Files.createDirectory(directory.resolve("real")).resolve("car.json"), "old\n");
        Path link = Files.createSymbolicLink(directory.resolve("link.json"), Path.of("real", "car.json"));
        AtomicFileWriter.writeText(link, "new\n");
        assertThat(Files.isSymbolicLink(link)).isTrue();
        assertThat(Files.readString(real)).isEqualTo("new\n");
        assertThat(filesIn(directory)).containsExactly("link.json", "real");
    }

    @Test
    void staleTemporaryFilesOfOursAreCleanedAndNothingElse() throws Exception {
        Path target = directory.resolve("car.json");
        String stem = AtomicFileWriter.temporaryStem("car.json");
        Path stale = Files.writeString(directory.resolve(stem + "0123abcd" + AtomicFileWriter.TEMPORARY_SUFFIX), "x");
        Path fresh = Files.writeString(directory.resolve(stem + "4567cdef" + AtomicFileWriter.TEMPORARY_SUFFIX), "x");
        Path another = Files.writeString(directory.resolve(".other.json.0123abcd" + AtomicFileWriter.TEMPORARY_SUFFIX), "x");
        Path notOurs = Files.writeString(directory.resolve(stem + "0123abcd.tmp"), "x");
        FileTime anHourAgo = FileTime.from(Instant.now().minusSeconds(3600));
        for (Path old : List.of(stale, another, notOurs)) {
            Files.setLastModifiedTime(old, anHourAgo);
        }
        AtomicFileWriter.writeText(target, "{}\n");
        assertThat(stale).doesNotExist();
        assertThat(fresh).exists(); // may be a save still running
        assertThat(another).exists(); // another target's
        assertThat(notOurs).exists(); // not our pattern
    }

    @ParameterizedTest(name = "{0}")
    @CsvSource(delimiter = '|', value = {
            "No space left on device | the disk is full",
            "Read-only file system | the disk is mounted read-only",
            "Operation not permitted | permission denied",
            "File name too long | the file name is too long",
            "Disk quota exceeded | the disk quota is used up",
            "Is a directory | it is a folder, not a file"})
    void systemReasonsAreSaidInWords(String system, String words) {
        // the reasons as Linux's strerror words them (common practice); a full disk cannot be made in a test
        assertThat(FileWriteException.reason(new FileSystemException("/x/.car.json.0123abcd.barwright-save", null,
                system))).startsWith(words).doesNotContain("barwright-save");
        assertThat(FileWriteException.reason(new AccessDeniedException("/x/tmp"))).startsWith("permission denied");
        assertThat(FileWriteException.reason(new NoSuchFileException("/x/tmp"))).isEqualTo("the folder does not exist");
    }

    @Test
    void aCompactTwoMegabyteVehicleFileIsWrittenSoItReadsBack() throws Exception {
        // a file the reader accepts (2 MB compact) must open again after a save: pretty-printed, a long list of
        // the person's own numbers would grow past the 4 MB limit (each entry on its own indented line)
        ObjectNode tree = Fixtures.testVehicleTree();
        ArrayNode log = tree.putArray("workshopLog");
        for (int i = 0; i < 1_000_000; i++) {
            log.add(i % 10); // "d," is 2 bytes compact; pretty, each entry is an indented line of 8
        }
        byte[] compact = tree.toString().getBytes(StandardCharsets.UTF_8);
        assertThat(compact.length).isBetween(2_000_000, 2_100_000);
        assertThat(VehicleFileWriter.toJson(tree).length()).isGreaterThan((int) JsonInput.MAX_BYTES);
        Path source = Files.write(directory.resolve("big.json"), compact);

        Path output = directory.resolve("sized.json");
        Fixtures.Run run = Fixtures.cli("size", source.toString(), "--axle", "front", "--target-share", "0.6",
                "--apply", "1", "--output", output.toString());
        assertThat(run.exitCode()).as(run.err()).isEqualTo(0);
        assertThat(Files.size(output)).isLessThanOrEqualTo(JsonInput.MAX_BYTES);
        VehicleDocument reread = VehicleLoader.read(output);
        assertThat(reread.tree().get("workshopLog")).isEqualTo(log);
    }

    @Test
    void everyExportIsReadBack() throws Exception {
        // what the commands write opens again with the reader they would be given back to
        Path sizing = directory.resolve("sizing.json");
        Fixtures.Run run = Fixtures.cli("size", VEHICLE, "--axle", "front", "--target-share", "0.5", "--count", "2",
                "--json");
        assertThat(run.exitCode()).as(run.err()).isEqualTo(0);
        AtomicFileWriter.writeText(sizing, run.out());
        assertThat(JsonInput.read(sizing, "a sizing result").path("candidates").size()).isEqualTo(2);
        Path csv = directory.resolve("map.csv");
        assertThat(Fixtures.cli("map", VEHICLE, "--candidates", sizing.toString(), "--csv", csv.toString())
                .exitCode()).isEqualTo(0);
        assertThat(Files.readAllLines(csv)).hasSizeGreaterThan(1);
    }

    private static List<String> filesIn(Path folder) throws IOException {
        try (Stream<Path> files = Files.list(folder)) {
            return files.map(path -> path.getFileName().toString()).sorted().toList();
        }
    }
}
