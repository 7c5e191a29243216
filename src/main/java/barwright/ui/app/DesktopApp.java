package barwright.ui.app;

import barwright.ui.action.RecentFiles;
import barwright.ui.action.Settings;
import barwright.ui.document.OpenDocument;
import barwright.ui.document.Samples;

import javax.swing.SwingUtilities;
import java.awt.GraphicsEnvironment;
import java.nio.file.Files;
import java.nio.file.Path;

/** Starts the desktop program on a file named on the command line, the last file, or the built-in sample car. */
public final class DesktopApp {
    private DesktopApp() {
    }

    /**
     * Opens the window on the event thread.
     *
     * @param file the vehicle file named on the command line, or null
     * @return 0 when the window opened, 2 where there is no display to open it on
     */
    public static int launch(Path file) {
        if (GraphicsEnvironment.isHeadless()) {
            System.err.println("barwright: there is no display to open the window on. The command line works "
                    + "without one: java -jar target/barwright.jar help");
            return 2;
        }
        SwingUtilities.invokeLater(() -> open(Settings.preferences(), () -> System.exit(0), file));
        return 0;
    }

    /** Builds and shows the window on the built-in sample; on the event thread. */
    public static MainWindow open(Settings settings, Runnable onClosed) {
        return show(settings, onClosed);
    }

    /**
     * Builds and shows the window, then opens {@code file}; with no file, the file last opened or saved where it
     * still exists (the built-in sample otherwise). A file that is refused leaves the sample open and says why.
     */
    public static MainWindow open(Settings settings, Runnable onClosed, Path file) {
        MainWindow window = show(settings, onClosed);
        Path start = file != null ? file : lastFile(settings);
        if (start != null) {
            window.files().load(start);
        }
        return window;
    }

    private static Path lastFile(Settings settings) {
        return new RecentFiles(settings).list().stream().filter(Files::isRegularFile).findFirst().orElse(null);
    }

    private static MainWindow show(Settings settings, Runnable onClosed) {
        OpenDocument document = Samples.open(Samples.CLUB_HATCHBACK);
        Themes.apply("dark".equals(settings.get("theme", "light")) ? Themes.Theme.DARK : Themes.Theme.LIGHT,
                parse(settings.get("textSize", "0")));
        MainWindow window = new MainWindow(document, settings, null, onClosed);
        window.setLocationByPlatform(true);
        window.setVisible(true);
        return window;
    }

    private static int parse(String text) {
        try {
            return Integer.parseInt(text);
        } catch (NumberFormatException notANumber) {
            return 0;
        }
    }
}
