package barwright.loading;

import barwright.io.Problem;
import barwright.io.VehicleFileException;
import barwright.io.VehicleFileWriter;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import org.junit.jupiter.api.Test;

import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.catchThrowableOfType;

/**
 * The one loader: every way in (a file, bytes, a tree, an edit) refuses a car the physics side cannot build with
 * the same key-path problem, and those problems stand among the file reader's own in the file's order.
 */
class VehicleLoaderTest {
    private static final Path ESTATE = Path.of("sample-vehicles/estate-dropped-rear-bar.json");

    /** The estate's rear bar with a hole set back into its bend: reads point by point, cannot be built. */
    private static ObjectNode unbuildable() throws Exception {
        ObjectNode tree = VehicleLoader.read(ESTATE).editableTree();
        // the end segments are 230 mm long and start with a 45 mm bend: 200 mm back reaches into it
        ((ArrayNode) tree.at("/rear/bar/geometry/holeSetbacksMm")).set(1, tree.numberNode(200));
        return tree;
    }

    @Test
    void everyWayInRefusesAnUnbuildableBarWithTheSameProblem() throws Exception {
        ObjectNode tree = unbuildable();
        List<Problem> fromTree = problems(() -> VehicleLoader.fromTree(tree));
        assertThat(fromTree).hasSize(1);
        assertThat(fromTree.get(0).path()).isEqualTo("rear.bar.geometry");
        assertThat(fromTree.get(0).message()).startsWith("cannot be built into a beam model (with hole 1, "
                + "holeSetbacksMm[1]): ");
        byte[] bytes = VehicleFileWriter.toJson(tree).getBytes(StandardCharsets.UTF_8);
        assertThat(problems(() -> VehicleLoader.parse(bytes))).isEqualTo(fromTree);
        assertThat(problems(() -> VehicleLoader.withEdits(VehicleLoader.read(ESTATE),
                List.of("rear.bar.geometry.holeSetbacksMm[1]=200")))).isEqualTo(fromTree);
    }

    @Test
    void theBuildProblemStandsAmongTheReadersProblemsInFileOrder() throws Exception {
        ObjectNode tree = unbuildable();
        ((ObjectNode) tree.get("front")).put("trackMm", 5);
        ((ObjectNode) tree.get("vehicle")).put("cgHeightMm", 1);
        List<Problem> problems = problems(() -> VehicleLoader.fromTree(tree));
        // front is read before rear, and the axles before the body (VehicleFileReader.readVehicle)
        assertThat(problems).extracting(Problem::path)
                .containsExactly("front.trackMm", "rear.bar.geometry", "vehicle.cgHeightMm");
    }

    @Test
    void aSoundCarLoadsTheSameEveryWay() throws Exception {
        var read = VehicleLoader.read(ESTATE);
        assertThat(VehicleLoader.fromTree(read.tree()).vehicle()).isEqualTo(read.vehicle());
        assertThatThrownBy(() -> VehicleLoader.withEdits(read, List.of("rear.bar.selectedArm=9")))
                .isInstanceOf(VehicleFileException.class).hasMessageContaining("rear.bar.selectedArm");
    }

    private interface Load {
        Object run() throws Exception;
    }

    private static List<Problem> problems(Load load) {
        VehicleFileException refused = catchThrowableOfType(VehicleFileException.class, load::run);
        assertThat(refused).as("the car is refused").isNotNull();
        return refused.problems();
    }
}
