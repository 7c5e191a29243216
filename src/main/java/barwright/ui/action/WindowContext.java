package barwright.ui.action;

import barwright.ui.document.OpenDocument;
import barwright.ui.field.ViewSettings;
import barwright.ui.task.ResultsModel;

import javax.swing.JFrame;
import java.util.Objects;

/**
 * What the main window shares with the views that contribute to it.
 *
 * @param owner    the main window, owner of the views' own windows and dialogs
 * @param document the open vehicle document
 * @param view     the unit system and locale
 * @param dialogs  file choosers and error messages (scripted in tests)
 * @param results  the live analysis's results
 */
public record WindowContext(JFrame owner, OpenDocument document, ViewSettings view, Dialogs dialogs,
                            ResultsModel results) {
    public WindowContext {
        Objects.requireNonNull(document, "document");
        Objects.requireNonNull(view, "view");
        Objects.requireNonNull(dialogs, "dialogs");
        Objects.requireNonNull(results, "results");
    }
}
