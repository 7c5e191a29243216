package barwright.ui.sizing;

import barwright.ui.app.MainWindow;
import barwright.ui.tools.ShotWindow;

import java.nio.file.Files;
import java.nio.file.Path;

/**
 * Writes a screenshot of the search view as it opens and is run with its default target on the club hatchback
 * sample (invented data): the target moved inside the front bar's reach, and the flagged proposals. Run under a
 * display: {@code xvfb-run -a -s "-screen 0 1280x1024x24" mvn -B -q test-compile exec:java
 * -Dexec.classpathScope=test -Dexec.mainClass=barwright.ui.sizing.SizingSearchScreenshots
 * -Dexec.args="FOLDER NAME WIDTHxHEIGHT TEXT_SIZE"} (text size in points, 0 for the system's).
 */
public final class SizingSearchScreenshots {
    private SizingSearchScreenshots() {
    }

    public static void main(String[] args) throws Exception {
        Path folder = Path.of(args.length > 0 ? args[0] : "docs/images");
        String name = args.length > 1 ? args[1] : "sizing-search.png";
        String[] size = (args.length > 2 ? args[2] : "1180x800").split("x");
        String textSize = args.length > 3 ? args[3] : "0";
        Files.createDirectories(folder);
        int width = Integer.parseInt(size[0]);
        int height = Integer.parseInt(size[1]);
        MainWindow window = ShotWindow.open("light", Integer.parseInt(textSize), width, height);
        SizingScreens.analysed(window);
        SizingWindow views = SizingScreens.open(window, SizingWindow.Tab.SEARCH, width, height);
        SearchForm form = views.search().form();
        SizingScreens.until("the reach", () -> form.reachSettled() && !form.reachText().isBlank());
        SizingScreens.onEdt(() -> {
            views.search().search();
            return null;
        });
        SizingScreens.until("the search", () -> views.search().work().isIdle());
        ShotWindow.capture(views, folder.resolve(name));
        SizingScreens.onEdt(() -> {
            views.dispose();
            window.dispose();
            return null;
        });
        System.exit(0);
    }
}
