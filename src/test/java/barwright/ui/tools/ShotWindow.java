package barwright.ui.tools;

import barwright.ui.action.Settings;
import barwright.ui.app.DesktopApp;
import barwright.ui.app.MainWindow;

import javax.imageio.ImageIO;
import javax.swing.SwingUtilities;
import java.awt.Component;
import java.awt.Rectangle;
import java.awt.image.BufferedImage;
import java.nio.file.Path;
import java.util.concurrent.atomic.AtomicReference;

/**
 * What the screenshot mains share: the main window opened as a person starts the program (on the club hatchback
 * sample, invented data), with in-memory settings, at the screen's top left at a size, a theme and a text size;
 * and a window or a part of it captured from the screen as a person sees it (toolchain.md:
 * Robot.createScreenCapture). Run under a display.
 */
public final class ShotWindow {
    private ShotWindow() {
    }

    /**
     * @param theme    "light" or "dark"
     * @param textSize points, or 0 for the system's size
     * @return the main window, shown; its analysis may still be running
     */
    public static MainWindow open(String theme, int textSize, int width, int height) throws Exception {
        Settings settings = Settings.inMemory();
        settings.put("theme", theme);
        settings.put("textSize", Integer.toString(textSize));
        AtomicReference<MainWindow> opened = new AtomicReference<>();
        SwingUtilities.invokeAndWait(() -> {
            MainWindow window = DesktopApp.open(settings, () -> { });
            window.setLocation(0, 0);
            window.setSize(width, height);
            opened.set(window);
        });
        return opened.get();
    }

    /** Writes what the component covers on the screen to a PNG file, and says so. */
    public static void capture(Component shown, Path file) throws Exception {
        AtomicReference<Rectangle> bounds = new AtomicReference<>();
        SwingUtilities.invokeAndWait(() -> bounds.set(new Rectangle(shown.getLocationOnScreen(), shown.getSize())));
        BufferedImage picture = new java.awt.Robot().createScreenCapture(bounds.get());
        ImageIO.write(picture, "png", file.toFile());
        System.out.println("wrote " + file);
    }
}
