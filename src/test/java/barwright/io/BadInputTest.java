package barwright.io;

import com.fasterxml.jackson.databind.node.ObjectNode;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.Arguments;
import org.junit.jupiter.params.provider.MethodSource;

import java.io.IOException;
import java.io.RandomAccessFile;
import java.nio.file.Path;
import java.util.stream.Stream;

import static org.assertj.core.api.Assertions.assertThat;
import static org.junit.jupiter.params.provider.Arguments.arguments;

/**
 * Broken vehicle files through the command line ({@code analyze FILE --json}): each is refused with exit code
 * 2, nothing on standard output, and a message on standard error naming the key path and what is allowed
 * (files.md: "Every bad value is refused with a message naming the key path, the value and the allowed range").
 */
class BadInputTest {
    @TempDir
    Path directory;

    /** label, key path changed, new value as JSON (null: key removed), message fragment expected. */
    static Stream<Arguments> brokenKeys() {
        return Stream.of(
                // out of range
                arguments("mass too small", "vehicle.massKg", "10", "vehicle.massKg = 10 kg: must be between"),
                arguments("front fraction above 1", "vehicle.frontMassFraction", "1.2", "vehicle.frontMassFraction = 1.2"),
                arguments("negative CG height", "vehicle.cgHeightMm", "-5", "vehicle.cgHeightMm = -5 mm"),
                arguments("wheelbase of 100 m", "vehicle.wheelbaseMm", "100000", "vehicle.wheelbaseMm = 100000 mm"),
                arguments("zero chassis stiffness", "vehicle.chassisTorsionalStiffnessNmPerDeg", "0",
                        "vehicle.chassisTorsionalStiffnessNmPerDeg = 0"),
                arguments("narrow track", "front.trackMm", "100", "front.trackMm = 100 mm"),
                arguments("roll centre 5 m up", "front.rollCentreHeightMm", "5000", "front.rollCentreHeightMm = 5000 mm"),
                arguments("negative unsprung mass", "front.unsprungMassKg", "-1", "front.unsprungMassKg = -1 kg"),
                arguments("negative unsprung height", "rear.unsprungCgHeightMm", "-10", "rear.unsprungCgHeightMm = -10 mm"),
                arguments("zero spring rate", "front.springRateNPerMm", "0", "front.springRateNPerMm = 0 N/mm"),
                arguments("spring ratio 5", "rear.springMotionRatio", "5", "rear.springMotionRatio = 5: must be between"),
                arguments("soft tyre", "rear.tyreVerticalRateNPerMm", "1", "rear.tyreVerticalRateNPerMm = 1 N/mm"),
                arguments("tyre nominal load", "front.tyre.nominalLoadN", "10", "front.tyre.nominalLoadN = 10 N"),
                arguments("zero friction", "front.tyre.frictionAtNominalLoad", "0", "front.tyre.frictionAtNominalLoad = 0"),
                arguments("positive sensitivity 2", "front.tyre.frictionLoadSensitivity", "2",
                        "front.tyre.frictionLoadSensitivity = 2"),
                arguments("cornering stiffness", "rear.tyre.corneringStiffnessPerLoad", "0.5",
                        "rear.tyre.corneringStiffnessPerLoad = 0.5"),
                arguments("peak load ratio", "rear.tyre.corneringStiffnessPeakLoadRatio", "0",
                        "rear.tyre.corneringStiffnessPeakLoadRatio = 0"),
                arguments("shape factor 2.5", "front.tyre.shapeFactor", "2.5", "front.tyre.shapeFactor = 2.5: must be between 1 and 2"),
                arguments("curvature 1.5", "front.tyre.curvatureFactor", "1.5", "front.tyre.curvatureFactor = 1.5"),
                arguments("bar 1 mm thick", "rear.bar.section.outerDiameterMm", "1", "rear.bar.section.outerDiameterMm = 1 mm"),
                arguments("zero wall", "front.bar.section.wallMm", "0", "front.bar.section.wallMm = 0 mm: must be more than 0"),
                arguments("short torsion length", "front.bar.torsionLengthMm", "10", "front.bar.torsionLengthMm = 10 mm"),
                arguments("bushings outside the bends", "front.bar.bushingSpanMm", "2000",
                        "front.bar.bushingSpanMm = 2000 mm: must not exceed torsionLengthMm (900 mm)"),
                arguments("arm of 5 mm", "front.bar.armLengthsMm[1]", "5", "front.bar.armLengthsMm[1] = 5 mm"),
                arguments("hole 3 of 3", "front.bar.selectedArm", "3", "front.bar.selectedArm = 3: must be a whole number from 0 to 2"),
                arguments("link ratio 0", "rear.bar.linkMotionRatio", "0", "rear.bar.linkMotionRatio = 0"),
                arguments("modulus 0", "front.bar.material.youngsModulusGPa", "0", "front.bar.material.youngsModulusGPa = 0 GPa"),
                arguments("yield 1e6 MPa", "front.bar.material.yieldStrengthMPa", "1e6",
                        "front.bar.material.yieldStrengthMPa = 1000000 MPa"),
                arguments("negative check travel", "analysis.differentialWheelTravelMm", "-1",
                        "analysis.differentialWheelTravelMm = -1 mm"),
                // a check at no travel has no stress: its safety factor would print as "Infinity"
                arguments("zero check travel", "analysis.differentialWheelTravelMm", "0",
                        "analysis.differentialWheelTravelMm = 0 mm: must be more than 0 and at most 500 mm"),
                arguments("corner mass 0", "vehicle.cornerMassesKg",
                        "{\"leftFront\": 0, \"rightFront\": 330, \"leftRear\": 190, \"rightRear\": 210}",
                        "vehicle.cornerMassesKg.leftFront = 0 kg"),
                arguments("corner masses disagree with massKg", "vehicle.cornerMassesKg",
                        "{\"leftFront\": 300, \"rightFront\": 330, \"leftRear\": 190, \"rightRear\": 210}",
                        "vehicle.massKg = 1050: must agree within 0.5 % with the corner masses, which give 1030"),
                // wrong type
                arguments("mass as text", "vehicle.massKg", "\"1050\"", "vehicle.massKg = \"1050\": must be a number"),
                arguments("arms not a list", "front.bar.armLengthsMm", "200", "front.bar.armLengthsMm = 200: must be a list"),
                arguments("empty arm list", "front.bar.armLengthsMm", "[]", "front.bar.armLengthsMm has 0 entries"),
                arguments("tyre a number", "front.tyre", "5", "front.tyre = 5: must be an object"),
                arguments("square section", "front.bar.section.shape", "\"square\"",
                        "front.bar.section.shape = \"square\": must be \"solid\" or \"tube\""),
                arguments("half a hole", "front.bar.selectedArm", "1.5", "front.bar.selectedArm = 1.5: must be a whole number"),
                arguments("name a number", "name", "42", "name = 42: must be a text"),
                arguments("unknown library material", "rear.bar.material", "{\"name\": \"unobtainium\"}",
                        "rear.bar.material.name = \"unobtainium\": not a built-in material"),
                arguments("front a list", "front", "[]", "front = []: must be an object"),
                arguments("wall on a solid bar", "rear.bar.section", "{\"shape\": \"solid\", \"outerDiameterMm\": 18, \"wallMm\": 2}",
                        "rear.bar.section.wallMm is given for a solid bar"),
                arguments("null arm", "front.bar.armLengthsMm[0]", "null", "front.bar.armLengthsMm[0] is missing"),
                // missing
                arguments("no CG height", "vehicle.cgHeightMm", null, "vehicle.cgHeightMm is missing"),
                arguments("no rear tyre", "rear.tyre", null, "rear.tyre is missing"),
                arguments("no front bar key", "front.bar", null, "front.bar is missing: give the bar object, or null"),
                arguments("no diameter", "front.bar.section.outerDiameterMm", null, "front.bar.section.outerDiameterMm is missing"),
                arguments("no vehicle", "vehicle", null, "vehicle is missing"),
                arguments("no format", "format", null, "format is missing"),
                arguments("no version", "version", null, "version is missing"),
                // version and format
                arguments("newer version", "version", "3", "version = 3: this file was written by a newer Barwright"),
                arguments("version 0", "version", "0", "version = 0: must be a whole number from 1 to 2"),
                arguments("version as text", "version", "\"1\"", "version = \"1\": must be a whole number"),
                arguments("another format", "format", "\"some.other.format\"",
                        "format = \"some.other.format\": must be \"barwright.vehicle\""));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("brokenKeys")
    void brokenKeyIsRefusedWithItsKeyPath(String label, String path, String json, String expected) {
        ObjectNode broken = Fixtures.with(Fixtures.testVehicleTree(), path, json);
        Path file = Fixtures.write(directory, "broken.json", Fixtures.text(broken));
        Fixtures.Run run = Fixtures.cli("analyze", file.toString(), "--json");
        assertThat(run.exitCode()).as(run.err()).isEqualTo(2);
        assertThat(run.out()).isEmpty();
        assertThat(run.err()).contains("the vehicle file was refused").contains(expected);
    }

    /** label, the whole file's text, message fragment expected. */
    static Stream<Arguments> brokenTexts() {
        String good = Fixtures.testVehicleText();
        return Stream.of(
                arguments("empty file", "", "the file is empty"),
                arguments("only white space", "  \n\t ", "the file is empty"),
                arguments("not JSON at all", "hello, I am a car", "not valid JSON at line 1"),
                arguments("cut short", good.substring(0, good.length() / 2), "not valid JSON at line"),
                arguments("trailing comma", good.replace("\"version\": 2,", "\"version\": 2,,"), "not valid JSON at line 3"),
                arguments("duplicate key", good.replace("\"version\": 2,", "\"version\": 2, \"version\": 2,"),
                        "not valid JSON at line 3"),
                arguments("single quotes", good.replace("\"name\":", "'name':"), "not valid JSON at line 4"),
                arguments("a list, not an object", "[1, 2, 3]", "must hold one JSON object"),
                arguments("a bare number", "42", "must hold one JSON object"),
                arguments("garbage after the object", good + "\n{\"another\": 1}\n",
                        "not valid JSON at line 71, column 1: there is more text after the end of the object"),
                arguments("a word after the object", good + "trailing", "not valid JSON at line 70"),
                arguments("NaN mass", good.replace("\"massKg\": 1050", "\"massKg\": NaN"),
                        "vehicle.massKg = NaN: must be a finite number"),
                arguments("Infinity track", good.replace("\"trackMm\": 1460", "\"trackMm\": Infinity"),
                        "front.trackMm = Infinity: must be a finite number"),
                arguments("minus Infinity spring", good.replace("\"springRateNPerMm\": 45", "\"springRateNPerMm\": -Infinity"),
                        "rear.springRateNPerMm = -Infinity: must be a finite number"),
                arguments("number too large for a double", good.replace("\"cgHeightMm\": 500", "\"cgHeightMm\": 1e999"),
                        "vehicle.cgHeightMm = Infinity: must be a finite number"),
                arguments("deeply nested", "{\"a\":".repeat(50_000) + "1" + "}".repeat(50_000),
                        "nested too deeply"));
    }

    @ParameterizedTest(name = "{0}")
    @MethodSource("brokenTexts")
    void brokenTextIsRefused(String label, String text, String expected) {
        Path file = Fixtures.write(directory, "broken.json", text);
        Fixtures.Run run = Fixtures.cli("analyze", file.toString(), "--json");
        assertThat(run.exitCode()).as(run.err()).isEqualTo(2);
        assertThat(run.out()).isEmpty();
        assertThat(run.err()).contains(expected);
    }

    @Test
    void wallOfHalfTheDiameterOrMoreIsRefusedWithTheRequiredMessage() {
        // the message form the issue gives, verbatim
        ObjectNode broken = Fixtures.with(Fixtures.testVehicleTree(), "front.bar.section",
                "{\"shape\": \"tube\", \"outerDiameterMm\": 25.4, \"wallMm\": 14}");
        Fixtures.Run run = Fixtures.cli("analyze", Fixtures.write(directory, "wall.json", Fixtures.text(broken)).toString(),
                "--json");
        assertThat(run.exitCode()).isEqualTo(2);
        assertThat(run.err()).contains("front.bar.section.wallMm = 14 mm: must be less than half of outerDiameterMm (12.7 mm)");
        // exactly half is refused too: no bore is left
        broken = Fixtures.with(broken, "front.bar.section.wallMm", "12.7");
        run = Fixtures.cli("analyze", Fixtures.write(directory, "wall.json", Fixtures.text(broken)).toString(), "--json");
        assertThat(run.exitCode()).isEqualTo(2);
        assertThat(run.err()).contains("front.bar.section.wallMm = 12.7 mm: must be less than half of outerDiameterMm (12.7 mm)");
    }

    @Test
    void aBadDiameterDoesNotAlsoBlameTheWall() {
        // the wall can only be judged against a diameter that was accepted: one problem, the diameter's
        ObjectNode broken = Fixtures.with(Fixtures.testVehicleTree(), "front.bar.section.outerDiameterMm", "1");
        Fixtures.Run run = Fixtures.cli("analyze", Fixtures.write(directory, "d.json", Fixtures.text(broken)).toString(),
                "--json");
        assertThat(run.exitCode()).isEqualTo(2);
        assertThat(run.err()).contains("front.bar.section.outerDiameterMm = 1 mm: must be between 3 and 200 mm")
                .doesNotContain("wallMm");
    }

    @Test
    void everyProblemIsListedAtOnce() {
        ObjectNode broken = Fixtures.with(Fixtures.testVehicleTree(), "vehicle.cgHeightMm", "-5");
        broken = Fixtures.with(broken, "front.tyre.shapeFactor", "3");
        broken = Fixtures.with(broken, "rear.bar.linkMotionRatio", "\"high\"");
        Fixtures.Run run = Fixtures.cli("analyze", Fixtures.write(directory, "three.json", Fixtures.text(broken)).toString(),
                "--json");
        assertThat(run.exitCode()).isEqualTo(2);
        assertThat(run.err()).contains("vehicle.cgHeightMm = -5 mm").contains("front.tyre.shapeFactor = 3")
                .contains("rear.bar.linkMotionRatio = \"high\"");
        assertThat(run.err().lines().filter(line -> line.startsWith("  ")).count()).isEqualTo(3);
    }

    @Test
    void cornerMassDisagreementIsListedWithTheOtherProblems() {
        // a disagreement between massKg and the corner masses is a problem like any other: it must not hide
        // behind a bad key elsewhere in the file
        ObjectNode broken = Fixtures.with(Fixtures.testVehicleTree(), "vehicle.cornerMassesKg",
                "{\"leftFront\": 300, \"rightFront\": 330, \"leftRear\": 190, \"rightRear\": 210}");
        broken = Fixtures.with(broken, "front.trackMm", "100");
        Fixtures.Run run = Fixtures.cli("analyze", Fixtures.write(directory, "two.json", Fixtures.text(broken)).toString(),
                "--json");
        assertThat(run.exitCode()).isEqualTo(2);
        assertThat(run.err()).contains("front.trackMm = 100 mm").contains("vehicle.massKg = 1050: must agree");
    }

    @Test
    void aNewerVersionIsRefusedAloneAndClearly() {
        // a file from a newer program is refused by its version only: its other keys may mean something else
        ObjectNode newer = Fixtures.with(Fixtures.testVehicleTree(), "version", "3");
        newer = Fixtures.with(newer, "front.someNewThing", "{\"x\": 1}");
        newer = Fixtures.with(newer, "front.trackMm", "\"wide\"");
        Fixtures.Run run = Fixtures.cli("analyze", Fixtures.write(directory, "v3.json", Fixtures.text(newer)).toString(),
                "--json");
        assertThat(run.exitCode()).isEqualTo(2);
        assertThat(run.err()).contains("version = 3: this file was written by a newer Barwright (file version 3)")
                .contains("Update Barwright").doesNotContain("trackMm");
    }

    @Test
    void aFileOverFourMegabytesIsRefusedBeforeItIsRead(@TempDir Path big) throws IOException {
        // a sparse file of 5 MB of zero bytes: refused on its size alone (a parse would say "not valid JSON")
        Path file = big.resolve("huge.json");
        try (RandomAccessFile raf = new RandomAccessFile(file.toFile(), "rw")) {
            raf.setLength(5L * 1024 * 1024);
        }
        Fixtures.Run run = Fixtures.cli("analyze", file.toString(), "--json");
        assertThat(run.exitCode()).isEqualTo(2);
        assertThat(run.err()).contains("the file is 5.0 MB: a vehicle file must be under 4 MB");
        // and through the byte-array entry point too
        assertThat(VehicleFileReader.MAX_BYTES).isEqualTo(4L * 1024 * 1024);
    }

    @Test
    void aMissingFileIsRefused() {
        Fixtures.Run run = Fixtures.cli("analyze", directory.resolve("no-such.json").toString(), "--json");
        assertThat(run.exitCode()).isEqualTo(2);
        assertThat(run.err()).contains("file not found");
    }
}
