package barwright.ui.sizing;

import barwright.io.KeyPath;
import barwright.io.VehicleEdits;
import barwright.io.VehicleFileException;
import barwright.model.AntiRollBar;
import barwright.model.AxlePosition;
import barwright.sizing.BarChoice;
import barwright.ui.document.OpenDocument;
import com.fasterxml.jackson.databind.node.IntNode;

import java.util.List;
import java.util.Map;

import static barwright.io.VehicleKeys.BAR;
import static barwright.io.VehicleKeys.SELECTED_ARM;

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
                AntiRollBar own = vehicle.axle(choice.axle()).bar();
                try {
                    // the bar's own material stays written as the file had it (by name, or in full)
                    VehicleEdits.putBar(tree, choice.setting(), own == null ? null : own.material());
                } catch (VehicleFileException noBar) {
                    throw new IllegalStateException("the views size only bars the car has: " + noBar.getMessage());
                }
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
                KeyPath.of(axle.key()).child(BAR).child(SELECTED_ARM).set(tree, IntNode.valueOf(hole))), source);
    }
}
