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
 * -Dexec.classpathScope=test -Dexec.mainClass=barwright.ui.tools.Screenshots}. Arguments, all optional: the
 * folder, the theme (light or dark), the text size in points, the window size (e.g. 1024x768).
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
        if (args.length > 2) {
            settings.put("textSize", args[2]);
        }
        AtomicReference<MainWindow> holder = new AtomicReference<>();
        SwingUtilities.invokeAndWait(() -> {
            MainWindow window = DesktopApp.open(settings, () -> { });
            window.setLocation(0, 0);
            window.setSize(size(args, 0), size(args, 1));
            holder.set(window);
        });
        MainWindow window = holder.get();
        settle(window);
        String suffix = (args.length > 1 ? "-" + args[1] : "") + (args.length > 2 ? "-text" + args[2] : "")
                + (args.length > 3 ? "-" + args[3] : "");
        String[] names = {"car-from-behind", "wheel-loads", "body-roll", "load-transfer-parts", "handling", "bar-sweep"};
        for (int tab = 0; tab < names.length; tab++) {
            int index = tab;
            SwingUtilities.invokeAndWait(() -> window.tabs().setSelectedIndex(index));
            settle(window);
            write(window.getRootPane(), folder.resolve("main-" + names[tab] + suffix + ".png"));
        }
        // the linkage page on the built-in sample's strut front (ui.linkage)
        SwingUtilities.invokeAndWait(() -> window.tabs().setSelectedComponent(
                window.contribution(barwright.ui.linkage.LinkageViews.class).page()));
        settle(window);
        write(window.getRootPane(), folder.resolve("main-linkage" + suffix + ".png"));
        SwingUtilities.invokeAndWait(() -> {
            window.tabs().setSelectedIndex(0);
            window.editor().setSelectedIndex(2);
        });
        settle(window);
        write(window.getRootPane(), folder.resolve("main-front-bar" + suffix + ".png"));

        // the front bar's fatigue life on the default lap, scrolled into view (worked out off the event thread)
        SwingUtilities.invokeAndWait(() -> {
            JComponent life = (JComponent) find(window, "front.bar.life");
            life.scrollRectToVisible(new java.awt.Rectangle(0, life.getHeight() - 1, life.getWidth(), 1));
        });
        Thread.sleep(2000);
        settle(window);
        write(window.getRootPane(), folder.resolve("bar-fatigue-life" + suffix + ".png"));

        // the working behind the front share, as an instructor opens it
        SwingUtilities.invokeAndWait(() -> ((javax.swing.AbstractButton) find(window, "figure.frontShare")).doClick());
        settle(window);
        write(dialog("work.dialog"), folder.resolve("show-the-work" + suffix + ".png"));
        SwingUtilities.invokeAndWait(() -> javax.swing.SwingUtilities.getWindowAncestor(dialog("work.dialog")).dispose());

        // a refused tube wall: the field is marked, the results are out of date
        SwingUtilities.invokeAndWait(() -> window.editor().setSelectedIndex(4));
        settle(window);
        SwingUtilities.invokeAndWait(() -> ((javax.swing.JTextField) find(window, "rear.bar.section.wallMm")).setText("14"));
        settle(window);
        write(window.getRootPane(), folder.resolve("refused-value" + suffix + ".png"));
        SwingUtilities.invokeAndWait(() -> window.document().undo());
        settle(window);

        // tube or solid: each tube's fatigue life beside its mass and stress
        SwingUtilities.invokeAndWait(() -> menuItem(window.getJMenuBar(), "Tube or solid bar of the same rate…").doClick());
        settle(window);
        SwingUtilities.invokeAndWait(() -> ((javax.swing.AbstractButton) find(dialog("sizing.window"), "tubes.find")).doClick());
        for (int i = 0; i < 300; i++) {
            boolean[] found = new boolean[1];
            SwingUtilities.invokeAndWait(() -> found[0] = ((javax.swing.JTable) find(dialog("sizing.window"),
                    "tubes.results")).getRowCount() > 0);
            if (found[0]) {
                break;
            }
            Thread.sleep(100);
        }
        Thread.sleep(300);
        write(dialog("sizing.window"), folder.resolve("tube-or-solid-life" + suffix + ".png"));
        SwingUtilities.invokeAndWait(() -> SwingUtilities.getWindowAncestor(dialog("sizing.window")).setVisible(false));

        // US customary units and a larger text for a projector
        SwingUtilities.invokeAndWait(() -> {
            window.setUnits(barwright.units.UnitSystem.US);
            window.editor().setSelectedIndex(1);
            window.tabs().setSelectedIndex(1);
        });
        settle(window);
        write(window.getRootPane(), folder.resolve("us-units" + suffix + ".png"));
        SwingUtilities.invokeAndWait(() -> window.setUnits(barwright.units.UnitSystem.SI));
        settle(window);

        // the tyre page (law tyre, then the fitted tyre on both axles) and the fit dialog on the shipped data
        barwright.ui.tyre.TyreScreens.shoot(window, folder, suffix, Screenshots::write);

        // the roll in motion: dampers, turn-in and lap on the dampers sample (this replaces the open car, so last)
        SwingUtilities.invokeAndWait(() -> window.setUnits(barwright.units.UnitSystem.SI));
        barwright.ui.dynamics.DynamicsScreenshots.capture(window, folder, suffix);
        SwingUtilities.invokeAndWait(window::dispose);
        System.exit(0);
    }

    /** @return the window's width (part 0) or height (part 1) from a fourth argument such as "1024x768" */
    private static int size(String[] args, int part) {
        String[] given = (args.length > 3 ? args[3] : "1280x880").split("x");
        return Integer.parseInt(given[part]);
    }

    private static java.awt.Component find(java.awt.Container root, String name) {
        for (java.awt.Component child : root.getComponents()) {
            if (name.equals(child.getName())) {
                return child;
            }
            if (child instanceof java.awt.Container container) {
                java.awt.Component found = find(container, name);
                if (found != null) {
                    return found;
                }
            }
        }
        return null;
    }

    private static javax.swing.JMenuItem menuItem(javax.swing.JMenuBar bar, String text) {
        for (int i = 0; i < bar.getMenuCount(); i++) {
            javax.swing.JMenu menu = bar.getMenu(i);
            for (int j = 0; j < menu.getItemCount(); j++) {
                if (menu.getItem(j) != null && text.equals(menu.getItem(j).getText())) {
                    return menu.getItem(j);
                }
            }
        }
        throw new IllegalStateException("no menu item " + text);
    }

    private static JComponent dialog(String name) {
        for (java.awt.Window open : java.awt.Window.getWindows()) {
            if (open.isShowing() && name.equals(open.getName()) && open instanceof javax.swing.RootPaneContainer pane) {
                return pane.getRootPane();
            }
        }
        throw new IllegalStateException("no open window " + name);
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

    public static void write(JComponent component, Path file) throws Exception {
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
