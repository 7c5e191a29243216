package barwright.ui.document;

import barwright.io.FileWriteException;
import barwright.io.KeyPath;
import barwright.io.Problem;
import barwright.io.VehicleDocument;
import barwright.io.VehicleFileException;
import barwright.io.VehicleFileWriter;
import barwright.loading.VehicleLoader;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ObjectNode;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Optional;
import java.util.function.Consumer;

/**
 * The vehicle file a person has open: its JSON tree (which may hold a value the core refuses while they
 * type), the last tree the core accepted, the undo history, the file it came from and whether it has
 * unsaved changes. Edits go by key path; every edit is validated with {@link VehicleLoader#fromTree}.
 * Lives on the event thread.
 */
public final class OpenDocument {
    private final List<Consumer<DocumentEvent>> listeners = new ArrayList<>();
    private final EditHistory history = new EditHistory();
    private ObjectNode tree;
    private ObjectNode savedTree;
    private VehicleDocument lastValid;
    private List<Problem> problems = List.of();
    private Path file;
    private String origin;

    /**
     * @param document a validated document to start from
     * @param file     where it was read from, or null for a sample not yet saved
     * @param origin   how to name it while it has no file, e.g. "sample: Club hatchback"
     */
    public OpenDocument(VehicleDocument document, Path file, String origin) {
        load(document, file, origin);
    }

    public void addListener(Consumer<DocumentEvent> listener) {
        listeners.add(listener);
    }

    public void removeListener(Consumer<DocumentEvent> listener) {
        listeners.remove(listener);
    }

    /** Replaces the whole document (open, new from sample); the history starts again. */
    public void replace(VehicleDocument document, Path newFile, String newOrigin) {
        load(document, newFile, newOrigin);
        fire(DocumentEvent.Kind.REPLACED, null);
    }

    private void load(VehicleDocument document, Path newFile, String newOrigin) {
        tree = document.editableTree();
        savedTree = tree.deepCopy();
        lastValid = document;
        problems = List.of();
        file = newFile;
        origin = newOrigin;
        history.clear();
    }

    /**
     * Puts a value at a key path and validates the result.
     *
     * @param mergeKey edits with the same non-null key in a row make one undo step (one typing session)
     * @param source   the view making the edit, passed on in the event
     */
    public void edit(KeyPath path, JsonNode value, Object mergeKey, Object source) {
        ObjectNode next = tree.deepCopy();
        path.set(next, value);
        change(next, mergeKey, source);
    }

    /** Takes an optional key away (for example the chassis stiffness of a rigid chassis). */
    public void remove(KeyPath path, Object source) {
        ObjectNode next = tree.deepCopy();
        path.remove(next);
        change(next, null, source);
    }

    /** Several changes made as one undo step, e.g. switching from total mass to corner masses. */
    public void editAll(Consumer<ObjectNode> changes, Object source) {
        ObjectNode next = tree.deepCopy();
        changes.accept(next);
        change(next, null, source);
    }

    private void change(ObjectNode next, Object mergeKey, Object source) {
        if (next.equals(tree)) {
            return;
        }
        history.record(tree, mergeKey);
        setTree(next);
        fire(DocumentEvent.Kind.EDIT, source);
    }

    /** Ends the current typing session: the next edit is a new undo step. */
    public void closeEditStep() {
        history.closeStep();
    }

    public boolean canUndo() {
        return history.canUndo();
    }

    public boolean canRedo() {
        return history.canRedo();
    }

    public void undo() {
        if (history.canUndo()) {
            setTree(history.undo(tree));
            fire(DocumentEvent.Kind.HISTORY, null);
        }
    }

    public void redo() {
        if (history.canRedo()) {
            setTree(history.redo(tree));
            fire(DocumentEvent.Kind.HISTORY, null);
        }
    }

    private void setTree(ObjectNode next) {
        tree = next;
        try {
            lastValid = VehicleLoader.fromTree(next);
            problems = List.of();
        } catch (VehicleFileException refused) {
            problems = refused.problems();
        }
    }

    /**
     * Writes the document to a file atomically (the old file stays whole if this fails).
     *
     * @throws IllegalStateException where the core refuses a value: a saved file must always open again
     */
    public void saveTo(Path target) throws FileWriteException {
        if (!isValid()) {
            throw new IllegalStateException("Fix the marked values before saving: " + problems.get(0));
        }
        VehicleFileWriter.save(tree, target);
        savedTree = tree.deepCopy();
        file = target;
        fire(DocumentEvent.Kind.SAVED, null);
    }

    /** @return the tree as it stands (read-only: edit through this class) */
    public JsonNode tree() {
        return tree;
    }

    /** @return the value at a path, or null */
    public JsonNode value(KeyPath path) {
        return path.get(tree);
    }

    /** @return the last document the core accepted: what the results show */
    public VehicleDocument lastValid() {
        return lastValid;
    }

    /** @return true where the tree as it stands is accepted, so the results are for it */
    public boolean isValid() {
        return problems.isEmpty();
    }

    /** @return what the core refuses in the tree as it stands */
    public List<Problem> problems() {
        return problems;
    }

    /** @return the core's problem at exactly this key path, if any */
    public Optional<Problem> problemAt(KeyPath path) {
        String wanted = path.toString();
        return problems.stream().filter(p -> p.path().equals(wanted)).findFirst();
    }

    /** @return true where the tree differs from what was last opened or saved */
    public boolean isDirty() {
        return !tree.equals(savedTree);
    }

    /** @return the file, or null while the document has never been saved */
    public Path file() {
        return file;
    }

    /** @return the name to show: the file name, or the origin for an unsaved sample */
    public String displayName() {
        return file != null ? String.valueOf(file.getFileName()) : "Untitled (" + origin + ")";
    }

    private void fire(DocumentEvent.Kind kind, Object source) {
        DocumentEvent event = new DocumentEvent(kind, source);
        for (Consumer<DocumentEvent> listener : List.copyOf(listeners)) {
            listener.accept(event);
        }
    }
}
