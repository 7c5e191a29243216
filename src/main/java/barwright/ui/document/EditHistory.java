package barwright.ui.document;

import com.fasterxml.jackson.databind.node.ObjectNode;

import java.util.ArrayDeque;
import java.util.Deque;
import java.util.Objects;

/**
 * Undo and redo as whole-tree snapshots: a vehicle file is a few kilobytes, so a copy per edit is cheaper
 * and safer than inverse operations. Successive edits with the same merge key (one typing session in one
 * field) make a single undo step.
 */
final class EditHistory {
    /** The oldest steps are forgotten past this many. */
    static final int DEPTH = 200;

    private record Step(ObjectNode before, Object mergeKey) {
    }

    private final Deque<Step> undo = new ArrayDeque<>();
    private final Deque<ObjectNode> redo = new ArrayDeque<>();

    /** Records the tree as it was before an edit. */
    void record(ObjectNode before, Object mergeKey) {
        redo.clear();
        Step last = undo.peek();
        if (mergeKey != null && last != null && Objects.equals(last.mergeKey(), mergeKey)) {
            return; // the same typing session: keep the state before its first keystroke
        }
        undo.push(new Step(before, mergeKey));
        if (undo.size() > DEPTH) {
            undo.removeLast();
        }
    }

    boolean canUndo() {
        return !undo.isEmpty();
    }

    boolean canRedo() {
        return !redo.isEmpty();
    }

    /** @return the tree to go back to; the current one is kept for redo */
    ObjectNode undo(ObjectNode current) {
        Step step = undo.pop();
        redo.push(current);
        return step.before();
    }

    /** @return the tree to go forward to; the current one is kept for undo */
    ObjectNode redo(ObjectNode current) {
        ObjectNode next = redo.pop();
        undo.push(new Step(current, null));
        return next;
    }

    /** Ends any typing session so that the next edit starts a new undo step. */
    void closeStep() {
        Step last = undo.peek();
        if (last != null && last.mergeKey() != null) {
            undo.pop();
            undo.push(new Step(last.before(), null));
        }
    }

    void clear() {
        undo.clear();
        redo.clear();
    }
}
