package barwright.ui.action;

import java.nio.file.Path;

/** The questions the commands ask a person; a test answers them without a window. */
public interface Dialogs {
    enum UnsavedChoice { SAVE, DISCARD, CANCEL }

    /** @return the vehicle file to open, or null when the person cancels */
    Path chooseFileToOpen();

    /**
     * @param title       what the chooser asks for, e.g. "Open tyre test data"
     * @param description the files' kind, e.g. "Tyre test data (*.csv)"
     * @param extension   e.g. "csv"
     * @return a data file to open, or null when the person cancels; by default answered as
     *     {@link #chooseFileToOpen()} (scripted dialogs answer both from one list)
     */
    default Path chooseDataFileToOpen(String title, String description, String extension) {
        return chooseFileToOpen();
    }

    /**
     * @param suggested a file name to start from
     * @param extension "json", "png" or "svg"
     * @return where to save, or null when the person cancels
     */
    Path chooseFileToSave(String suggested, String extension);

    /** @return what to do with unsaved changes to the named document */
    UnsavedChoice askAboutUnsavedChanges(String documentName);

    /** Tells the person something went wrong, and why. */
    void showError(String title, String message);

    /** Tells the person something that needs no answer, e.g. the program's version in About. */
    void showInformation(String title, String message);
}
