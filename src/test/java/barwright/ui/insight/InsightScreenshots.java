package barwright.ui.insight;

import barwright.io.KeyPath;
import barwright.ui.app.MainWindow;
import barwright.ui.tools.ShotWindow;
import com.fasterxml.jackson.databind.node.IntNode;

import javax.swing.SwingUtilities;
import java.nio.file.Files;
import java.nio.file.Path;

/**
 * Writes screenshots of the three insight views to docs/images/insight-*.png, on the club hatchback sample after
 * moving its rear bar one hole stiffer (so the envelope shows the previous setting dashed). Run under a display:
 * {@code xvfb-run -a -s "-screen 0 1280x1024x24" mvn -B -q test-compile exec:java -Dexec.classpathScope=test
 * -Dexec.mainClass=barwright.ui.insight.InsightScreenshots}
 */
public final class InsightScreenshots {
    private InsightScreenshots() {
    }

    public static void main(String[] args) throws Exception {
        Path folder = Path.of(args.length > 0 ? args[0] : "docs/images");
        Files.createDirectories(folder);
        MainWindow window = ShotWindow.open("light", 0, 1400, 950);
        InsightPanel panel = InsightWindows.panel(window);
        // the views compute only while on screen: shown first, so that the edit leaves the setting before dashed
        SwingUtilities.invokeAndWait(() -> window.tabs().setSelectedComponent(panel));
        InsightWindows.settle(window, panel);
        SwingUtilities.invokeAndWait(() -> {
            window.document().edit(KeyPath.of("rear.bar.selectedArm"), IntNode.valueOf(0), null, null);
        });
        InsightWindows.settle(window, panel);
        String[] names = {"insight-envelope", "insight-sensitivity", "insight-chassis"};
        for (int tab = 0; tab < names.length; tab++) {
            int index = tab;
            SwingUtilities.invokeAndWait(() -> panel.tabs().setSelectedIndex(index));
            InsightWindows.settle(window, panel);
            ShotWindow.capture(window.getRootPane(), folder.resolve(names[tab] + ".png"));
        }
        SwingUtilities.invokeAndWait(window::dispose);
        System.exit(0);
    }
}
