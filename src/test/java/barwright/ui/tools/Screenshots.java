package barwright.ui.tools;

import barwright.ui.action.Settings;
import barwright.ui.app.DesktopApp;
import barwright.ui.app.MainWindow;

import javax.imageio.ImageIO;
import javax.swing.JComponent;
import javax.swing.SwingUtilities;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.atomic.AtomicReference;

/**
 * Writes screenshots of the main views to docs/images/ (used in the README). Run under a display, e.g.
 * {@code xvfb-run -a -s "-screen 0 1280x1024x24" mvn -B -q test-compile exec:java
 * -Dexec.classpathScope=test -Dexec.mainClass=barwright.ui.tools.Screenshots}.
 */
public final class Screenshots {
    private Screenshots() {
    }

    public static void main(String[] args) throws Exception {
        Path folder = Path.of(args.length > 0 ? args[0] : "docs/images");
        Files.createDirectories(folder);
        Settings settings = Settings.inMemory();
        if (args.length > 1) {
            settings.put("theme", args[1]);
        }
        AtomicReference<MainWindow> holder = new AtomicReference<>();
        SwingUtilities.invokeAndWait(() -> {
            MainWindow window = DesktopApp.open(settings, () -> { });
            window.setLocation(0, 0);
            window.setSize(1280, 880);
            holder.set(window);
        });
        MainWindow window = holder.get();
        settle(window);
        String suffix = args.length > 1 ? "-" + args[1] : "";
        String[] names = {"car-from-behind", "wheel-loads", "body-roll", "load-transfer-parts", "handling", "bar-sweep"};
        for (int tab = 0; tab < names.length; tab++) {
            int index = tab;
            SwingUtilities.invokeAndWait(() -> window.tabs().setSelectedIndex(index));
            settle(window);
            write(window.getRootPane(), folder.resolve("main-" + names[tab] + suffix + ".png"));
        }
        SwingUtilities.invokeAndWait(() -> {
            window.tabs().setSelectedIndex(0);
            window.editor().setSelectedIndex(2);
        });
        settle(window);
        write(window.getRootPane(), folder.resolve("main-front-bar" + suffix + ".png"));
        SwingUtilities.invokeAndWait(window::dispose);
        System.exit(0);
    }

    private static void settle(MainWindow window) throws Exception {
        for (int i = 0; i < 200; i++) {
            boolean[] idle = new boolean[1];
            SwingUtilities.invokeAndWait(() -> idle[0] = window.analysis().isIdle() && window.results().shown() != null);
            if (idle[0]) {
                break;
            }
            Thread.sleep(20);
        }
        SwingUtilities.invokeAndWait(() -> { });
        Thread.sleep(200);
    }

    static void write(JComponent component, Path file) throws Exception {
        AtomicReference<BufferedImage> image = new AtomicReference<>();
        SwingUtilities.invokeAndWait(() -> {
            BufferedImage picture = new BufferedImage(component.getWidth(), component.getHeight(),
                    BufferedImage.TYPE_INT_RGB);
            var graphics = picture.createGraphics();
            component.printAll(graphics);
            graphics.dispose();
            image.set(picture);
        });
        try {
            ImageIO.write(image.get(), "png", file.toFile());
        } catch (IOException failed) {
            throw new IOException("could not write " + file, failed);
        }
        System.out.println("wrote " + file);
    }
}
