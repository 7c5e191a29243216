package barwright.ui.app;

import barwright.ui.action.Settings;
import barwright.ui.document.OpenDocument;
import barwright.ui.document.Samples;

import javax.swing.SwingUtilities;
import java.awt.GraphicsEnvironment;

/** Starts the desktop program on the built-in sample car. */
public final class DesktopApp {
    private DesktopApp() {
    }

    /**
     * Opens the window on the event thread.
     *
     * @return 0 when the window opened, 2 where there is no display to open it on
     */
    public static int launch() {
        if (GraphicsEnvironment.isHeadless()) {
            System.err.println("barwright: there is no display to open the window on. The command line works "
                    + "without one: java -jar target/barwright.jar help");
            return 2;
        }
        SwingUtilities.invokeLater(() -> open(Settings.preferences(), () -> System.exit(0)));
        return 0;
    }

    /** Builds and shows the window; on the event thread. */
    public static MainWindow open(Settings settings, Runnable onClosed) {
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
