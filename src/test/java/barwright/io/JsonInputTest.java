package barwright.io;

import barwright.loading.VehicleLoader;
import com.fasterxml.jackson.databind.node.ObjectNode;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

import java.io.ByteArrayOutputStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.stream.Stream;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.junit.jupiter.params.provider.Arguments.arguments;

/**
 * The one JSON reader: its limits and its messages. Each refusal must say what is wrong in the program's
 * words (line and column, key path where known), never another limit's words and never the JSON library's
 * hints to developers.
 */
class JsonInputTest {
    @TempDir
    Path directory;

    private static String refusal(String text) {
        try {
            VehicleLoader.parse(text.getBytes(StandardCharsets.UTF_8));
        } catch (VehicleFileException refused) {
            return refused.getMessage();
        }
        throw new AssertionError("accepted: " + text.substring(0, Math.min(60, text.length())));
    }

    @Test
    void aNumberOfFifteenHundredDigitsIsCalledALongNumberWithItsKeyPath() {
        String text = Fixtures.testVehicleText().replace("\"massKg\": 1050", "\"massKg\": 1" + "0".repeat(1499));
        assertThat(refusal(text)).contains("a number of 1500 characters", "at most 100", "(near vehicle.massKg)")
                .doesNotContain("nested");
    }

    @Test
    void aKeyOfFiftyThousandCharactersIsCalledALongKey() {
        String text = Fixtures.testVehicleText().replace("\"name\":", "\"" + "k".repeat(50_000) + "\": 1, \"name\":");
        assertThat(refusal(text)).contains("a key of 50000 characters", "at most 200").doesNotContain("nested")
                .hasSizeLessThan(300);
    }

    @Test
    void aKeyGivenTwiceIsNamedWithItsObject() {
        String text = Fixtures.testVehicleText().replace("\"trackMm\": 1460", "\"trackMm\": 1460, \"trackMm\": 1470");
        assertThat(refusal(text)).contains("the key \"trackMm\" appears twice", "(near front.trackMm)");
    }

    @Test
    void aByteOrderMarkIsAccepted() throws Exception {
        byte[] text = Fixtures.testVehicleText().getBytes(StandardCharsets.UTF_8);
        ByteArrayOutputStream withMark = new ByteArrayOutputStream();
        withMark.write(new byte[]{(byte) 0xEF, (byte) 0xBB, (byte) 0xBF});
        withMark.write(text);
        assertThat(VehicleLoader.parse(withMark.toByteArray()).tree()).isEqualTo(Fixtures.testVehicleTree());
    }

    @Test
    void aByteThatIsNotUtf8IsNamedWithItsLineAndColumn() {
        String text = Fixtures.testVehicleText();
        byte[] bytes = text.getBytes(StandardCharsets.UTF_8);
        int at = text.indexOf("\"name\"") + 1; // line 4 of the test vehicle: {, format, version, name
        bytes[at] = (byte) 0xC3; // a lead byte followed by an ASCII letter: not UTF-8
        assertThatThrownBy(() -> VehicleLoader.parse(bytes)).hasMessageContaining("not UTF-8")
                .hasMessageContaining("0xC3").hasMessageContaining("line 4, column 4");
    }

    @Test
    void utf16IsNamed() {
        byte[] bytes = ("\uFEFF" + Fixtures.testVehicleText()).getBytes(StandardCharsets.UTF_16BE);
        assertThatThrownBy(() -> VehicleLoader.parse(bytes)).hasMessageContaining("UTF-16")
                .hasMessageContaining("save it as UTF-8");
    }

    /** label, text: broken JSON of the kinds people write by hand. */
    static Stream<Arguments> handWrittenMistakes() {
        String good = Fixtures.testVehicleText();
        return Stream.of(
                arguments("a comment", good.replace("\"version\": 2,", "\"version\": 2, // first")),
                arguments("single quotes", good.replace("\"name\":", "'name':")),
                arguments("a leading zero", good.replace("\"massKg\": 1050", "\"massKg\": 01050")),
                arguments("a plus sign", good.replace("\"massKg\": 1050", "\"massKg\": +1050")),
                arguments("a word", good.replace("\"massKg\": 1050", "\"massKg\": heavy")),
                arguments("a tab inside a text", good.replace("\"name\": \"", "\"name\": \"\t")),
                arguments("a doubled comma", good.replace("\"version\": 2,", "\"version\": 2,,")),
                arguments("cut short", good.substring(0, good.length() / 2)),
                arguments("a word after the object", good + "trailing"));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("handWrittenMistakes")
    void mistakesAreWordedWithoutTheLibrarysHints(String label, String text) {
        String message = refusal(text);
        assertThat(message).startsWith("not valid JSON at line").contains(", column ");
        // the library's own wording: feature names, character codes, source descriptions, stack hints
        assertThat(message).doesNotContain("Feature", "enable", "(code ", "Source", "[line:", "JsonToken",
                "Unexpected character", "Unrecognized token", "was expecting");
    }

    @Test
    void aHugeVersionIsNotCalledAFileVersion() {
        String message = refusal(Fixtures.testVehicleText().replace("\"version\": 2,", "\"version\": 1e400,"));
        assertThat(message).contains("version = Infinity: must be a whole number from 1 to 2")
                .doesNotContain("file version");
    }

    @Test
    void anUnknownKeyInsideANamedMaterialIsKept() throws Exception {
        // the test vehicle's rear bar names a built-in material; a key of the person's own beside the name must
        // not make the reader ask for the four properties (unknown keys are kept, files.md)
        ObjectNode tree = Fixtures.with(Fixtures.testVehicleTree(), "rear.bar.material.supplier", "\"Acme\"");
        VehicleDocument document = VehicleLoader.fromTree(tree);
        assertThat(document.tree().at("/rear/bar/material/supplier").asText()).isEqualTo("Acme");
        assertThat(document.vehicle().rear().bar().material().name())
                .isEqualTo(Fixtures.testVehicleTree().at("/rear/bar/material/name").asText());
    }

    @Test
    void aDirectoryIsRefusedInWords() {
        assertThatThrownBy(() -> JsonInput.read(directory, "a vehicle file"))
                .hasMessage(directory + " is a directory: give the path of a vehicle file");
        Fixtures.Run run = Fixtures.cli("analyze", directory.toString());
        assertThat(run.exitCode()).isEqualTo(2);
        assertThat(run.err()).contains("is a directory").doesNotContain("IOException");
    }

    @Test
    void aDeviceThatNeverEndsIsReadNoFurtherThanTheLimit() {
        // /dev/zero reports a size of 0 and never ends: the reader stops one byte past the limit
        assertThatThrownBy(() -> JsonInput.readBytes(Path.of("/dev/zero"), "a catalogue file"))
                .hasMessageContaining("larger than 4 MB");
    }

    @Test
    void theSameLimitsHoldForCatalogues() throws Exception {
        Path deep = Files.writeString(directory.resolve("deep.json"), "[".repeat(40) + "]".repeat(40));
        Fixtures.Run run = Fixtures.cli("size", "sample-vehicles/club-hatchback.json", "--axle", "front",
                "--target-share", "0.5", "--catalogues", deep.toString());
        assertThat(run.exitCode()).as(run.err()).isEqualTo(2);
        assertThat(run.err()).contains("nested too deeply", "more than 32 levels");
        run = Fixtures.cli("size", "sample-vehicles/club-hatchback.json", "--axle", "front", "--target-share", "0.5",
                "--catalogues", "/dev/zero");
        assertThat(run.exitCode()).as(run.err()).isEqualTo(2);
        assertThat(run.err()).contains("larger than 4 MB");
    }

    @Test
    void theSameLimitsHoldForSizingCandidates() {
        Fixtures.Run run = Fixtures.cli("map", "sample-vehicles/club-hatchback.json", "--candidates", "/dev/zero");
        assertThat(run.exitCode()).as(run.err()).isEqualTo(2);
        assertThat(run.err()).contains("--candidates /dev/zero: the file is larger than 4 MB");
    }
}
