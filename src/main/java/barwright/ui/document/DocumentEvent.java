package barwright.ui.document;

/**
 * The open document changed.
 *
 * @param kind   what happened
 * @param source the view that made an edit (it need not reload itself), or null
 */
public record DocumentEvent(Kind kind, Object source) {
    public enum Kind {
        /** one value was edited */
        EDIT,
        /** undo or redo put a whole earlier or later tree back */
        HISTORY,
        /** another file or sample was opened */
        REPLACED,
        /** the file was saved, or its path changed */
        SAVED
    }
}
