package barwright.ui.action;

import barwright.io.FileWriteException;
import barwright.io.Problem;
import barwright.io.VehicleDocument;
import barwright.io.VehicleFileException;
import barwright.loading.VehicleLoader;
import barwright.ui.chart.ChartExport;
import barwright.ui.chart.ResultChart;
import barwright.ui.document.OpenDocument;
import barwright.ui.document.Samples;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.stream.Collectors;

/**
 * New, open, save, save as, recent files and chart export, as a person expects them: unsaved changes are
 * asked about, a file that fails to load leaves the open document as it was and says why, saves are atomic.
 */
public final class FileCommands {
    private final OpenDocument document;
    private final Dialogs dialogs;
    private final RecentFiles recent;

    public FileCommands(OpenDocument document, Dialogs dialogs, RecentFiles recent) {
        this.document = document;
        this.dialogs = dialogs;
        this.recent = recent;
    }

    /** @return how the commands ask a person (scripted in tests); other views choose their files through it */
    public Dialogs dialogs() {
        return dialogs;
    }

    /** Opens a sample as a new, unsaved document. */
    public void newFromSample(Samples.Sample sample) {
        if (mayDiscard()) {
            document.replace(Samples.load(sample), null, "sample: " + sample.label());
        }
    }

    /** Asks for a file and opens it. */
    public void open() {
        if (!mayDiscard()) {
            return;
        }
        Path file = dialogs.chooseFileToOpen();
        if (file != null) {
            load(file);
        }
    }

    /** Opens a file from the recent list. */
    public void openRecent(Path file) {
        if (mayDiscard()) {
            load(file);
        }
    }

    /**
     * Reads and validates the file first; only a good file replaces the open document.
     *
     * @return true where it was opened
     */
    public boolean load(Path file) {
        VehicleDocument read;
        try {
            read = VehicleLoader.read(file);
        } catch (VehicleFileException refused) {
            if (!Files.exists(file)) {
                recent.remove(file);
            }
            dialogs.showError("Cannot open " + file.getFileName(), "The file was not opened; the car you had open "
                    + "is unchanged.\n\n" + refused.problems().stream().map(Problem::toString)
                    .collect(Collectors.joining("\n")));
            return false;
        }
        document.replace(read, file, file.getFileName().toString());
        recent.add(file);
        return true;
    }

    /** Saves to the document's file, or asks where when it has none. @return true where it was saved */
    public boolean save() {
        return document.file() == null ? saveAs() : saveTo(document.file());
    }

    /** @return true where it was saved */
    public boolean saveAs() {
        String suggested = document.file() != null ? document.file().getFileName().toString()
                : slug(document.tree().path("name").asText("vehicle")) + ".json";
        Path target = dialogs.chooseFileToSave(suggested, "json");
        return target != null && saveTo(withExtension(target, "json"));
    }

    private boolean saveTo(Path target) {
        if (!document.isValid()) {
            dialogs.showError("Not saved", "A value is refused, and a saved file must open again. Fix the marked "
                    + "field first:\n\n" + document.problems().stream().map(Problem::toString)
                    .collect(Collectors.joining("\n")));
            return false;
        }
        try {
            document.saveTo(target);
            recent.add(target);
            return true;
        } catch (FileWriteException failed) {
            dialogs.showError("Not saved", "The file could not be written: " + failed.getMessage() + ". Any file "
                    + "that was there is unchanged.");
            return false;
        }
    }

    /** Writes a chart as PNG or SVG. */
    public void exportChart(ResultChart chart, String type) {
        Path target = dialogs.chooseFileToSave(chart.fileStem() + "." + type, type);
        if (target == null) {
            return;
        }
        try {
            ChartExport.write(chart, withExtension(target, type));
        } catch (FileWriteException failed) {
            dialogs.showError("Chart not exported", "The chart could not be written: " + failed.getMessage() + ".");
        }
    }

    /**
     * Asks where to write a picture of the program's own (the car from behind) and writes it.
     *
     * @param stem the file name offered, without its ending
     * @param type "png" or "svg"
     */
    public void exportPicture(String stem, ChartExport.Picture picture, String type) {
        Path target = dialogs.chooseFileToSave(stem + "." + type, type);
        if (target == null) {
            return;
        }
        try {
            ChartExport.write(picture, withExtension(target, type));
        } catch (FileWriteException failed) {
            dialogs.showError("Picture not exported", "The picture could not be written: " + failed.getMessage()
                    + ".");
        }
    }

    /**
     * Asks about unsaved changes before they would be lost.
     *
     * @return true where it is fine to go on (saved, discarded, or nothing to lose)
     */
    public boolean mayDiscard() {
        if (!document.isDirty()) {
            return true;
        }
        return switch (dialogs.askAboutUnsavedChanges(document.displayName())) {
            case SAVE -> save();
            case DISCARD -> true;
            case CANCEL -> false;
        };
    }

    static Path withExtension(Path file, String extension) {
        String name = file.getFileName().toString();
        return name.toLowerCase(Locale.ROOT).endsWith("." + extension) ? file
                : file.resolveSibling(name + "." + extension);
    }

    private static String slug(String name) {
        String slug = name.toLowerCase(Locale.ROOT).replaceAll("[^a-z0-9]+", "-").replaceAll("(^-|-$)", "");
        return slug.isEmpty() ? "vehicle" : slug;
    }
}
