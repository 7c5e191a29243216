package barwright.ui.sizing;

import barwright.ui.action.Settings;
import barwright.ui.app.DesktopApp;
import barwright.ui.app.MainWindow;

import java.nio.file.Files;
import java.nio.file.Path;

/**
 * Writes screenshots of the sizing views to docs/images/sizing-*.png, on the club hatchback sample (invented).
 * Run under a display: {@code xvfb-run -a -s "-screen 0 1280x1024x24" mvn -B -q test-compile exec:java
 * -Dexec.classpathScope=test -Dexec.mainClass=barwright.ui.sizing.SizingScreenshots} (argument: the folder).
 */
public final class SizingScreenshots {
    private SizingScreenshots() {
    }

    public static void main(String[] args) throws Exception {
        Path folder = Path.of(args.length > 0 ? args[0] : "docs/images");
        Files.createDirectories(folder);
        MainWindow window = SizingScreens.onEdt(() -> {
            MainWindow opened = DesktopApp.open(Settings.inMemory(), () -> { });
            opened.setLocation(0, 0);
            opened.setSize(1280, 880);
            return opened;
        });
        SizingScreens.analysed(window);
        SizingWindow views = SizingScreens.open(window, SizingWindow.Tab.SEARCH);
        SizingScreens.onEdt(() -> {
            views.setLocation(0, 0);
            views.setSize(1260, 820);
            views.search().form().axleChoice().setSelectedIndex(0);
            views.search().search();
            return null;
        });
        SizingScreens.until("the search", () -> views.search().work().isIdle());
        SizingScreens.capture(views, folder.resolve("sizing-search.png"));
        SizingScreens.onEdt(() -> {
            views.dispose();
            window.dispose();
            return null;
        });
        System.exit(0);
    }
}
