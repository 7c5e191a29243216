package barwright.io;

import barwright.cli.Cli;
import barwright.loading.VehicleLoader;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * A shaped bar that passes the polyline checks but cannot be built into the beam model is refused when read,
 * by key path and with exit code 2 (files.md: a refused file), never as an internal failure at analysis.
 */
class ShapedBarValidationTest {
    @TempDir
    Path folder;

    private ObjectNode estate() throws Exception {
        return VehicleLoader.read(Path.of("sample-vehicles/estate-dropped-rear-bar.json")).editableTree();
    }

    private int analyze(ObjectNode tree, ByteArrayOutputStream err) throws Exception {
        Path file = folder.resolve("car.json");
        Files.writeString(file, VehicleFileWriter.toJson(tree));
        return Cli.run(new String[]{"analyze", file.toString(), "--json"}, new PrintStream(new ByteArrayOutputStream()),
                new PrintStream(err, true, StandardCharsets.UTF_8));
    }

    @Test
    void bushingsOnThePolylineButOffTheRoundedBendAreRefusedByKeyPath() throws Exception {
        ObjectNode tree = estate();
        // the outer bends sit at y = +-560 mm with a 45 mm radius: y = +-555 mm is on the polyline's corner
        // segment within the reader's 1 mm, but off the rounded arc that replaces the corner
        ArrayNode bushings = (ArrayNode) tree.at("/rear/bar/geometry/bushingsMm");
        bushings.set(0, bushings.arrayNode().add(0).add(555).add(0));
        bushings.set(1, bushings.arrayNode().add(0).add(-555).add(0));
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        assertThat(analyze(tree, err)).isEqualTo(Cli.REFUSED);
        assertThat(err.toString(StandardCharsets.UTF_8)).contains("rear.bar.geometry").contains("beam model");
    }

    @Test
    void aHoleSetBackIntoTheBendIsRefusedByKeyPath() throws Exception {
        ObjectNode tree = estate();
        // the end segments are 230 mm long and start with a 45 mm bend: 200 mm back reaches into it
        ((ArrayNode) tree.at("/rear/bar/geometry/holeSetbacksMm")).set(1, tree.numberNode(200));
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        assertThat(analyze(tree, err)).isEqualTo(Cli.REFUSED);
        assertThat(err.toString(StandardCharsets.UTF_8)).contains("rear.bar.geometry").contains("hole 1");
    }

    @Test
    void theShippedShapedSamplesStillRead() throws Exception {
        assertThat(analyze(estate(), new ByteArrayOutputStream())).isEqualTo(Cli.OK);
    }
}
