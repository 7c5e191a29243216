package barwright.ui.sizing;

import barwright.ui.app.MainWindow;
import barwright.ui.tools.ShotWindow;

import javax.swing.AbstractButton;
import java.nio.file.Files;
import java.nio.file.Path;

/**
 * Writes screenshots of the tube, map, comparison and preload views at a given window and text size on the club
 * hatchback sample (invented data), each after its work has run, to judge them on a small screen with large text.
 * Run under a display: {@code xvfb-run -a -s "-screen 0 1280x1024x24" mvn -B -o -q test-compile exec:java
 * -Dexec.classpathScope=test -Dexec.mainClass=barwright.ui.sizing.SizingViewsAtSizeScreenshots
 * -Dexec.args="FOLDER WIDTHxHEIGHT TEXT_SIZE"} (text size in points, 0 for the system's); the files are named
 * sizing-VIEW-WIDTHxHEIGHT-TEXT.png.
 */
public final class SizingViewsAtSizeScreenshots {
    private SizingViewsAtSizeScreenshots() {
    }

    public static void main(String[] args) throws Exception {
        Path folder = Path.of(args.length > 0 ? args[0] : "target/screens");
        String wanted = args.length > 1 ? args[1] : "1024x768";
        String[] size = wanted.split("x");
        String textSize = args.length > 2 ? args[2] : "0";
        String suffix = "-" + wanted + "-" + textSize + ".png";
        Files.createDirectories(folder);
        int width = Integer.parseInt(size[0]);
        int height = Integer.parseInt(size[1]);
        MainWindow window = ShotWindow.open("light", Integer.parseInt(textSize), width, height);
        SizingScreens.analysed(window);
        SizingWindow views = SizingScreens.open(window, SizingWindow.Tab.TUBES, width, height);
        SizingScreens.onEdt(() -> {
            SizingScreens.<AbstractButton>find(views, "tubes.material.4130 chromoly").setSelected(true);
            views.tubes().find();
            return null;
        });
        SizingScreens.until("the tubes", () -> views.tubes().work().isIdle());
        ShotWindow.capture(views, folder.resolve("sizing-tubes" + suffix));

        SizingScreens.onEdt(() -> {
            views.open(SizingWindow.Tab.MAP);
            return null;
        });
        SizingScreens.until("the map", () -> views.map().work().isIdle() && !views.map().cells().isEmpty());
        ShotWindow.capture(views, folder.resolve("sizing-map" + suffix));

        SizingScreens.onEdt(() -> {
            views.open(SizingWindow.Tab.COMPARE);
            CompareScreenshots.fill(views);
            return null;
        });
        SizingScreens.until("the comparison", () -> views.compare().work().isIdle() && views.compare().shown() != null);
        ShotWindow.capture(views, folder.resolve("sizing-compare" + suffix));

        SizingScreens.onEdt(() -> {
            views.open(SizingWindow.Tab.PRELOAD);
            return null;
        });
        SizingScreens.until("the preload", () -> views.preload().work().isIdle() && views.preload().shown() != null);
        ShotWindow.capture(views, folder.resolve("sizing-preload" + suffix));

        SizingScreens.onEdt(() -> {
            views.dispose();
            window.dispose();
            return null;
        });
        System.exit(0);
    }
}
