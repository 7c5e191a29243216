package barwright.ui.sizing;

import barwright.io.VehicleDocument;
import barwright.ui.action.Dialogs;
import barwright.ui.document.OpenDocument;
import barwright.ui.field.ViewSettings;

import java.awt.Component;
import java.util.Objects;

/**
 * What the sizing views share with the main window: the open document, how figures are shown, the dialogs
 * that choose files (scripted in tests), and the window that owns the views' own dialogs.
 *
 * @param document the open vehicle document
 * @param view     the unit system and locale
 * @param dialogs  file choosers and error messages
 * @param owner    the component the views' dialogs belong to
 */
record SizingContext(OpenDocument document, ViewSettings view, Dialogs dialogs, Component owner) {
    SizingContext {
        Objects.requireNonNull(document, "document");
        Objects.requireNonNull(view, "view");
        Objects.requireNonNull(dialogs, "dialogs");
    }

    /**
     * @return the car as it stands, validated
     * @throws IllegalStateException where a value of the open document is refused: the views work on the car as
     *                               it stands, never on an older one
     */
    VehicleDocument currentCar() {
        if (!document.isValid()) {
            throw new IllegalStateException("the open car has a refused value (" + document.problems().get(0)
                    + "): fix it in the main window first");
        }
        return document.lastValid();
    }
}
