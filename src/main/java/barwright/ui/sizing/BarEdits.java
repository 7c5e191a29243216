package barwright.ui.sizing;

import barwright.model.AxlePosition;
import barwright.model.Material;
import barwright.sizing.BarChoice;
import barwright.sizing.BarNodes;
import barwright.ui.document.KeyPath;
import barwright.ui.document.OpenDocument;
import com.fasterxml.jackson.databind.node.IntNode;

import java.util.List;
import java.util.Map;

/**
 * Puts bars the views found into the open document through its key paths, each call one undo step, so that
 * Edit > Undo takes the whole change back. Every other key of the file stays as it was.
 */
final class BarEdits {
    private BarEdits() {
    }

    /**
     * Puts each chosen bar's material, section and arm hole in place (the rest of the bar stays).
     *
     * @param source the view making the change, passed on in the document's event
     */
    static void putBars(OpenDocument document, List<BarChoice> choices, Object source) {
        var vehicle = document.lastValid().vehicle();
        document.editAll(tree -> {
            for (BarChoice choice : choices) {
                KeyPath bar = KeyPath.of(choice.axle().key() + ".bar");
                Material own = vehicle.axle(choice.axle()).bar() == null ? null
                        : vehicle.axle(choice.axle()).bar().material();
                if (!choice.material().equals(own)) {
                    // the bar's own material stays written as the file had it (by name, or in full)
                    bar.child("material").set(tree, BarNodes.material(choice.material()));
                }
                bar.child("section").set(tree, BarNodes.section(choice.size().section()));
                bar.child("selectedArm").set(tree, IntNode.valueOf(choice.selectedArm()));
            }
        }, source);
    }

    /**
     * Moves the bars' links to other arm holes, both in one undo step.
     *
     * @param holes the 0-based hole for each axle to change
     */
    static void putHoles(OpenDocument document, Map<AxlePosition, Integer> holes, Object source) {
        document.editAll(tree -> holes.forEach((axle, hole) ->
                KeyPath.of(axle.key() + ".bar.selectedArm").set(tree, IntNode.valueOf(hole))), source);
    }
}
