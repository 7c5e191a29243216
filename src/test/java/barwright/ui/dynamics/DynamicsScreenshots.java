package barwright.ui.dynamics;

import barwright.ui.app.MainWindow;
import barwright.ui.document.Samples;
import barwright.ui.tools.ShotWindow;

import javax.swing.JComponent;
import javax.swing.SwingUtilities;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.atomic.AtomicBoolean;

/**
 * Writes screenshots of the damper page, the turn-in view and the lap view on the invented "club hatchback with
 * dampers" sample and the invented lap. Run under a display: {@code xvfb-run -a -s "-screen 0 1280x1024x24" mvn
 * -B -q test-compile exec:java -Dexec.classpathScope=test -Dexec.mainClass=barwright.ui.dynamics.DynamicsScreenshots
 * -Dexec.args="docs/images light 0 1280x880"} (folder, theme, text size in points or 0, window size); the
 * project's screenshot tool ({@code barwright.ui.tools.Screenshots}) calls {@link #capture} too.
 */
public final class DynamicsScreenshots {
    private DynamicsScreenshots() {
    }

    public static void main(String[] args) throws Exception {
        Path folder = Path.of(args.length > 0 ? args[0] : "docs/images");
        Files.createDirectories(folder);
        String theme = args.length > 1 ? args[1] : "light";
        int textSize = args.length > 2 ? Integer.parseInt(args[2]) : 0;
        String[] size = (args.length > 3 ? args[3] : "1280x880").split("x");
        MainWindow window = ShotWindow.open(theme, textSize, Integer.parseInt(size[0]), Integer.parseInt(size[1]));
        String suffix = "-" + theme + (textSize != 0 ? "-text" + textSize : "") + "-" + size[0] + "x" + size[1];
        capture(window, folder, suffix);
        SwingUtilities.invokeAndWait(window::dispose);
        System.exit(0);
    }

    /** Opens the dampers sample in the window and writes dynamics-dampers, -turn-in and -lap with the suffix. */
    public static void capture(MainWindow window, Path folder, String suffix) throws Exception {
        DynamicsViews views = window.contribution(DynamicsViews.class);
        SwingUtilities.invokeAndWait(() -> {
            window.document().replace(Samples.load(Samples.ALL.get(Samples.ALL.size() - 1)), null, "sample");
            window.tabs().setSelectedComponent(views.dampers());
        });
        pause(600);
        write(window.getRootPane(), folder.resolve("dynamics-dampers" + suffix + ".png"));

        SwingUtilities.invokeAndWait(() -> window.tabs().setSelectedComponent(views.turnIn()));
        waitFor(() -> !Double.isNaN(views.turnIn().shownTarget()));
        SwingUtilities.invokeAndWait(() -> {
            var result = views.turnIn().playback();
            result.set(0.25); // during the overshoot of the sample's roll
        });
        pause(400);
        write(window.getRootPane(), folder.resolve("dynamics-turn-in" + suffix + ".png"));

        SwingUtilities.invokeAndWait(() -> {
            window.tabs().setSelectedComponent(views.lap());
            views.lap().open(null);
        });
        waitFor(() -> views.lap().shownReplay() != null && !views.lap().isWorking());
        SwingUtilities.invokeAndWait(() -> {
            var states = views.lap().shownReplay().result().run().states();
            int least = 0;
            for (int i = 0; i < states.size(); i++) {
                if (states.get(i).leastLoad() < states.get(least).leastLoad()) {
                    least = i;
                }
            }
            views.lap().moveCursor(least); // the instant a wheel comes nearest to lifting
        });
        pause(400);
        write(window.getRootPane(), folder.resolve("dynamics-lap" + suffix + ".png"));
    }

    private static void waitFor(java.util.function.BooleanSupplier condition) throws Exception {
        for (int i = 0; i < 1500; i++) {
            AtomicBoolean met = new AtomicBoolean();
            SwingUtilities.invokeAndWait(() -> met.set(condition.getAsBoolean()));
            if (met.get()) {
                return;
            }
            Thread.sleep(20);
        }
        throw new IllegalStateException("the view never showed its result");
    }

    private static void pause(long millis) throws Exception {
        SwingUtilities.invokeAndWait(() -> { });
        Thread.sleep(millis);
    }

    private static void write(JComponent component, Path file) throws Exception {
        barwright.ui.tools.Screenshots.write(component, file);
    }
}
