package barwright.ui.sizing;

import barwright.loading.VehicleLoader;
import barwright.model.AntiRollBar;
import barwright.model.AxlePosition;
import barwright.model.MaterialLibrary;
import barwright.model.SolidSection;
import barwright.model.TubeSection;
import barwright.model.Vehicle;
import barwright.sizing.BarChoice;
import barwright.sizing.catalogue.StockSize;
import barwright.ui.document.OpenDocument;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import org.junit.jupiter.api.Test;

import java.nio.file.Path;
import java.util.List;
import java.util.Map;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * Bars and holes put into the open document (no window needed): the vehicle the core reads back has exactly the
 * chosen material, section and hole and nothing else changed; one undo takes the whole change back; keys the
 * program does not know stay. Input: the club hatchback demo file (invented data).
 */
class BarEditsTest {
    private static OpenDocument hatchback() throws Exception {
        ObjectNode tree = VehicleLoader.read(Path.of("sample-vehicles/club-hatchback.json")).editableTree();
        tree.put("workshopNote", "kept by every edit"); // a key the program does not know
        return new OpenDocument(VehicleLoader.fromTree(tree), null, "test");
    }

    @Test
    void a_candidate_changes_only_its_bars_material_section_and_hole_and_one_undo_takes_it_back() throws Exception {
        OpenDocument document = hatchback();
        JsonNode before = document.tree().deepCopy();
        Vehicle old = document.lastValid().vehicle();
        BarChoice front = new BarChoice(AxlePosition.FRONT, MaterialLibrary.CHROMOLY_4130,
                new StockSize("24 x 3 mm", new TubeSection(24e-3, 3e-3)), 0);
        BarChoice rear = new BarChoice(AxlePosition.REAR, MaterialLibrary.SPRING_STEEL,
                new StockSize("20 mm", new SolidSection(20e-3)), 3);
        BarEdits.putBars(document, List.of(front, rear), this);

        assertThat(document.isValid()).isTrue();
        Vehicle changed = document.lastValid().vehicle();
        assertThat(changed.front().bar()).isEqualTo(front.applyTo(old.front().bar()));
        assertThat(changed.rear().bar()).isEqualTo(rear.applyTo(old.rear().bar()));
        Vehicle restored = changed.withAxle(AxlePosition.FRONT, changed.front().withBar(old.front().bar()))
                .withAxle(AxlePosition.REAR, changed.rear().withBar(old.rear().bar()));
        assertThat(restored).isEqualTo(old);
        assertThat(document.tree().path("workshopNote").asText()).isEqualTo("kept by every edit");

        assertThat(document.canUndo()).isTrue();
        document.undo();
        assertThat(document.tree()).isEqualTo(before);
        assertThat(document.canUndo()).isFalse();
    }

    @Test
    void a_bar_in_its_own_material_keeps_the_material_as_the_file_wrote_it() throws Exception {
        OpenDocument document = hatchback();
        JsonNode material = document.tree().path("front").path("bar").path("material").deepCopy();
        AntiRollBar own = document.lastValid().vehicle().front().bar();
        BarEdits.putBars(document, List.of(new BarChoice(AxlePosition.FRONT, own.material(),
                new StockSize("25 mm", new SolidSection(25e-3)), 2)), this);
        // the file names it {"name": "spring steel"}, the library's values: it stays so
        assertThat(document.tree().path("front").path("bar").path("material")).isEqualTo(material);
        assertThat(document.tree().path("front").path("bar").path("section").path("outerDiameterMm").asDouble())
                .isEqualTo(25.0);
        assertThat(document.tree().path("front").path("bar").path("selectedArm").asInt()).isEqualTo(2);
    }

    @Test
    void both_holes_move_in_one_undo_step() throws Exception {
        OpenDocument document = hatchback();
        JsonNode before = document.tree().deepCopy();
        BarEdits.putHoles(document, Map.of(AxlePosition.FRONT, 0, AxlePosition.REAR, 3), this);
        assertThat(document.lastValid().vehicle().front().bar().selectedArm()).isEqualTo(0);
        assertThat(document.lastValid().vehicle().rear().bar().selectedArm()).isEqualTo(3);
        document.undo();
        assertThat(document.tree()).isEqualTo(before);
    }
}
