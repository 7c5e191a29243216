package barwright.ui.workshop;

import barwright.io.VehicleFileException;
import barwright.loading.VehicleLoader;
import barwright.ui.document.OpenDocument;
import com.fasterxml.jackson.databind.node.ObjectNode;

import java.util.Optional;
import java.util.function.Consumer;

/** A measurement put into the open car as one undoable edit, only where the changed file reads as a whole car. */
final class CheckedEdit {
    private CheckedEdit() {
    }

    /** @return why the edit was not made (the file's own refusals), or empty where it was */
    static Optional<String> apply(OpenDocument document, Consumer<ObjectNode> change, Object source) {
        ObjectNode next = (ObjectNode) document.tree().deepCopy();
        change.accept(next);
        try {
            VehicleLoader.fromTree(next);
        } catch (VehicleFileException refused) {
            return Optional.of("Not put into the car: " + String.join("; ", refused.problems().stream()
                    .map(Object::toString).toList()));
        }
        document.editAll(change, source);
        document.closeEditStep();
        return Optional.empty();
    }
}
