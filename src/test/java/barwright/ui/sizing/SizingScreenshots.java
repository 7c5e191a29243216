package barwright.ui.sizing;

import barwright.ui.app.MainWindow;
import barwright.ui.tools.ShotWindow;

import javax.swing.AbstractButton;
import javax.swing.JComboBox;
import javax.swing.JTextField;
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
        MainWindow window = ShotWindow.open("light", 0, 1280, 880);
        SizingScreens.analysed(window);
        SizingWindow views = SizingScreens.open(window, SizingWindow.Tab.SEARCH, 1260, 840);

        // the rear bar sized for a front share of 52 %, its inside wheel to stay down up to the limit
        SizingScreens.onEdt(() -> {
            SizingScreens.<JComboBox<?>>find(views, "search.axle").setSelectedIndex(1);
            SizingScreens.<AbstractButton>find(views, "search.shareItself").setSelected(true);
            SizingScreens.<JTextField>find(views, "search.share").setText("52");
            SizingScreens.<AbstractButton>find(views, "search.rearStaysDown").setSelected(true);
            views.search().search();
            return null;
        });
        SizingScreens.until("the search", () -> views.search().work().isIdle());
        ShotWindow.capture(views, folder.resolve("sizing-search.png"));

        // tubes of the front bar's rate, in its own steel and in 4130
        SizingScreens.onEdt(() -> {
            views.open(SizingWindow.Tab.TUBES);
            SizingScreens.<AbstractButton>find(views, "tubes.material.4130 chromoly").setSelected(true);
            views.tubes().find();
            return null;
        });
        SizingScreens.until("the tubes", () -> views.tubes().work().isIdle());
        ShotWindow.capture(views, folder.resolve("sizing-tubes.png"));

        SizingScreens.onEdt(() -> {
            views.open(SizingWindow.Tab.MAP);
            return null;
        });
        SizingScreens.until("the map", () -> views.map().work().isIdle() && !views.map().cells().isEmpty());
        ShotWindow.capture(views, folder.resolve("sizing-map.png"));

        // the open car against two variants
        SizingScreens.onEdt(() -> {
            views.open(SizingWindow.Tab.COMPARE);
            CompareScreenshots.fill(views);
            return null;
        });
        SizingScreens.until("the comparison", () -> views.compare().work().isIdle() && views.compare().shown() != null);
        ShotWindow.capture(views, folder.resolve("sizing-compare.png"));

        SizingScreens.onEdt(() -> {
            views.open(SizingWindow.Tab.PRELOAD);
            return null;
        });
        SizingScreens.until("the preload", () -> views.preload().work().isIdle() && views.preload().shown() != null);
        ShotWindow.capture(views, folder.resolve("sizing-preload.png"));

        SizingScreens.onEdt(() -> {
            views.dispose();
            window.dispose();
            return null;
        });
        System.exit(0);
    }
}
