package barwright.ui.insight;

import barwright.ui.action.Settings;
import barwright.ui.app.DesktopApp;
import barwright.ui.app.MainWindow;
import barwright.io.KeyPath;
import com.fasterxml.jackson.databind.node.IntNode;

import javax.imageio.ImageIO;
import javax.swing.SwingUtilities;
import java.awt.image.BufferedImage;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.atomic.AtomicReference;

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
        AtomicReference<MainWindow> holder = new AtomicReference<>();
        SwingUtilities.invokeAndWait(() -> {
            MainWindow window = DesktopApp.open(Settings.inMemory(), () -> { });
            window.setLocation(0, 0);
            window.setSize(1400, 950);
            holder.set(window);
        });
        MainWindow window = holder.get();
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
            write(window, folder.resolve(names[tab] + ".png"));
        }
        SwingUtilities.invokeAndWait(window::dispose);
        System.exit(0);
    }

    /** Captures the window from the screen, as a person sees it (toolchain.md: Robot.createScreenCapture). */
    static void write(MainWindow window, Path file) throws Exception {
        AtomicReference<java.awt.Rectangle> bounds = new AtomicReference<>();
        SwingUtilities.invokeAndWait(() -> {
            java.awt.Point corner = window.getRootPane().getLocationOnScreen();
            bounds.set(new java.awt.Rectangle(corner, window.getRootPane().getSize()));
        });
        BufferedImage picture = new java.awt.Robot().createScreenCapture(bounds.get());
        ImageIO.write(picture, "png", file.toFile());
        System.out.println("wrote " + file);
    }
}
