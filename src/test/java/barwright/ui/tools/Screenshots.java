package barwright.ui.tools;

import barwright.ui.app.MainWindow;
import barwright.ui.app.Themes;
import barwright.ui.present.PresentationFrame;
import barwright.ui.present.PresentationViews;
import barwright.units.UnitSystem;

import javax.imageio.ImageIO;
import javax.swing.AbstractButton;
import javax.swing.JComponent;
import javax.swing.JTabbedPane;
import javax.swing.SwingUtilities;
import java.awt.Component;
import java.awt.Container;
import java.awt.Rectangle;
import java.awt.image.BufferedImage;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;
import java.util.concurrent.atomic.AtomicReference;

/**
 * Writes a screenshot of every view, in the light and the dark theme, to one folder: the six results tabs,
 * each page the other parts of the program add to them (each of a page's own tabs), the editor's pages, the
 * show-the-work dialog, presentation mode and each view of the sizing window. Files are named
 * {@code <set>-<view>-<theme>.png}, e.g. {@code small-wheel-loads-dark.png}. Run under a display, from the
 * test classpath:
 * <pre>
 * xvfb-run -a -s "-screen 0 1280x1024x24" mvn -B -q test-compile exec:java -Dexec.classpathScope=test \
 *     -Dexec.mainClass=barwright.ui.tools.Screenshots -Dexec.args="docs/images small 1024x768 28"
 * </pre>
 * Arguments, all optional: the folder (docs/images), the set's name (small), the window size (1024x768; the
 * sizing window and presentation mode take the same size, as on a screen of that size), the text size in
 * points (the largest offered; 0 for the system's).
 */
public final class Screenshots {
    private Screenshots() {
    }

    public static void main(String[] args) throws Exception {
        Path folder = Path.of(args.length > 0 ? args[0] : "docs/images");
        String set = args.length > 1 ? args[1] : "small";
        String[] size = (args.length > 2 ? args[2] : "1024x768").split("x");
        int textSize = args.length > 3 ? Integer.parseInt(args[3]) : Themes.largestTextSize();
        Files.createDirectories(folder);
        for (String theme : new String[]{"light", "dark"}) {
            new Shooter(folder, set, theme, Integer.parseInt(size[0]), Integer.parseInt(size[1]), textSize).all();
        }
        System.exit(0);
    }

    /** One theme's screenshots, from a window of its own. */
    private static final class Shooter {
        private final Path folder;
        private final String set;
        private final String theme;
        private final int width;
        private final int height;
        private final int textSize;
        private MainWindow window;

        Shooter(Path folder, String set, String theme, int width, int height, int textSize) {
            this.folder = folder;
            this.set = set;
            this.theme = theme;
            this.width = width;
            this.height = height;
            this.textSize = textSize;
        }

        void all() throws Exception {
            window = ShotWindow.open(theme, textSize, width, height);
            settle(1000);
            resultsTabs();
            editorPages();
            workDialogs();
            refusedValue();
            usUnits();
            presentation();
            sizingViews();
            // the tyre page on the law tyre and on the fitted tyre, and the fit dialog on the shipped data
            barwright.ui.tyre.TyreScreens.shoot(window, folder, "", (component, file) -> write(component,
                    file.getFileName().toString().replace(".png", "")));
            settle(500);
            dynamicsPages();
            SwingUtilities.invokeAndWait(window::dispose);
        }

        /** The car picture, the five charts and each contributed page (each of its own tabs, if it has any). */
        private void resultsTabs() throws Exception {
            int count = onEdt(() -> window.tabs().getTabCount());
            for (int tab = 0; tab < count; tab++) {
                int index = tab;
                SwingUtilities.invokeAndWait(() -> window.tabs().setSelectedIndex(index));
                settle(index > 5 ? 1500 : 300); // a contributed page may work its figures out off the event thread
                String name = slug(onEdt(() -> window.tabs().getTitleAt(index)));
                JTabbedPane inner = onEdt(() -> innerTabs((Container) window.tabs().getSelectedComponent()));
                int pages = inner == null ? 0 : onEdt(inner::getTabCount);
                if (pages == 0) { // no tabs of its own, or an empty pair kept for a narrow layout
                    write(window.getRootPane(), name);
                    continue;
                }
                // a page may turn a pair of tabs back into one view as it settles: look again each time
                for (int page = 0; page < pages && onEdt(inner::getTabCount) > page; page++) {
                    int innerIndex = page;
                    SwingUtilities.invokeAndWait(() -> {
                        if (inner.getTabCount() > innerIndex) {
                            inner.setSelectedIndex(innerIndex);
                        }
                    });
                    settle(800);
                    String title = onEdt(() -> inner.getTabCount() > innerIndex ? inner.getTitleAt(innerIndex) : "");
                    write(window.getRootPane(), title.isEmpty() ? name : name + "-" + slug(title));
                }
                SwingUtilities.invokeAndWait(() -> {
                    if (inner.getTabCount() > 0) {
                        inner.setSelectedIndex(0);
                    }
                });
            }
            SwingUtilities.invokeAndWait(() -> window.tabs().setSelectedIndex(0));
            settle(300);
        }

        /** Each page of the editor, and the front bar's fatigue life scrolled into view. */
        private void editorPages() throws Exception {
            int count = onEdt(() -> window.editor().getTabCount());
            for (int page = 0; page < count; page++) {
                int index = page;
                SwingUtilities.invokeAndWait(() -> window.editor().setSelectedIndex(index));
                settle(300);
                write(window.getRootPane(), "editor-" + slug(onEdt(() -> window.editor().getTitleAt(index))));
            }
            SwingUtilities.invokeAndWait(() -> window.editor().setSelectedIndex(2));
            settle(300);
            SwingUtilities.invokeAndWait(() -> {
                JComponent life = (JComponent) find(window, "front.bar.life");
                life.scrollRectToVisible(new Rectangle(0, 0, life.getWidth(), life.getHeight()));
            });
            settle(2000); // the life on the default lap is worked out off the event thread
            write(window.getRootPane(), "editor-front-bar-life");
            SwingUtilities.invokeAndWait(() -> window.editor().setSelectedIndex(0));
        }

        /** The working behind the front share and behind the front roll stiffness, as an instructor opens it. */
        private void workDialogs() throws Exception {
            for (String[] figure : new String[][]{{"figure.frontShare", "front-share"},
                    {"figure.rollStiffness.axle.front", "front-roll-stiffness"}}) {
                SwingUtilities.invokeAndWait(() -> ((AbstractButton) find(window, figure[0])).doClick());
                settle(300);
                write(dialog("work.dialog"), "show-the-work-" + figure[1]);
                SwingUtilities.invokeAndWait(() -> SwingUtilities.getWindowAncestor(dialog("work.dialog")).dispose());
            }
        }

        /** A refused tube wall: the field is marked, the results are out of date. */
        private void refusedValue() throws Exception {
            SwingUtilities.invokeAndWait(() -> window.editor().setSelectedIndex(4));
            settle(300);
            javax.swing.JTextField wall = (javax.swing.JTextField) find(window, "rear.bar.section.wallMm");
            String kept = onEdt(wall::getText);
            SwingUtilities.invokeAndWait(() -> wall.setText("14"));
            settle(500);
            write(window.getRootPane(), "refused-value");
            SwingUtilities.invokeAndWait(() -> wall.setText(kept));
            settle(500);
        }

        /** US customary units on the front axle page and the wheel loads. */
        private void usUnits() throws Exception {
            SwingUtilities.invokeAndWait(() -> {
                window.setUnits(UnitSystem.US);
                window.editor().setSelectedIndex(1);
                window.tabs().setSelectedIndex(1);
            });
            settle(500);
            write(window.getRootPane(), "us-units");
            SwingUtilities.invokeAndWait(() -> {
                window.setUnits(UnitSystem.SI);
                window.editor().setSelectedIndex(0);
                window.tabs().setSelectedIndex(0);
            });
            settle(300);
        }

        /** Presentation mode over a screen of the window's size, the setup pinned. */
        private void presentation() throws Exception {
            AtomicReference<PresentationFrame> frame = new AtomicReference<>();
            SwingUtilities.invokeAndWait(() -> {
                PresentationFrame shown = window.contribution(PresentationViews.class).toggle();
                shown.setBounds(0, 0, width, height);
                shown.togglePin();
                frame.set(shown);
            });
            settle(1500);
            write(frame.get().getRootPane(), "presentation");
            SwingUtilities.invokeAndWait(() -> frame.get().close());
        }

        /**
         * The roll-in-motion pages again on the sample with dampers (invented; the club hatchback has none, so
         * they show only why there is no run): this replaces the open car, so it comes last.
         */
        private void dynamicsPages() throws Exception {
            SwingUtilities.invokeAndWait(() -> window.document().replace(barwright.ui.document.Samples.load(
                    barwright.ui.document.Samples.ALL.get(barwright.ui.document.Samples.ALL.size() - 1)), null,
                    "sample"));
            settle(2000);
            int count = onEdt(() -> window.tabs().getTabCount());
            for (int tab = 0; tab < count; tab++) {
                int index = tab;
                String name = slug(onEdt(() -> window.tabs().getTitleAt(index)));
                if (name.equals("dampers") || name.equals("turn-in") || name.equals("lap-replay")) {
                    SwingUtilities.invokeAndWait(() -> window.tabs().setSelectedIndex(index));
                    settle(3000); // the run is worked out off the event thread
                    write(window.getRootPane(), name);
                }
            }
        }

        /** Each view of the sizing window, at the window's size (on a screen of that size it can be no larger). */
        private void sizingViews() throws Exception {
            SwingUtilities.invokeAndWait(() -> menuItem(window.getJMenuBar(), "Size a bar to a target…").doClick());
            settle(500);
            SwingUtilities.invokeAndWait(() -> {
                java.awt.Window sizing = SwingUtilities.getWindowAncestor(dialog("sizing.window"));
                sizing.setBounds(0, 0, width, height);
                sizing.validate();
            });
            JTabbedPane tabs = (JTabbedPane) find(dialog("sizing.window"), "sizing.tabs");
            int count = onEdt(tabs::getTabCount);
            for (int tab = 0; tab < count; tab++) {
                int index = tab;
                SwingUtilities.invokeAndWait(() -> tabs.setSelectedIndex(index));
                settle(800);
                Component found = find(dialog("sizing.window"), "tubes.find");
                if (found instanceof AbstractButton button && button.isShowing()) {
                    SwingUtilities.invokeAndWait(button::doClick);
                    waitForRows("tubes.results");
                }
                String view = "sizing-" + slug(onEdt(() -> tabs.getTitleAt(index)));
                if (find(dialog("sizing.window"), "compare.addOpen") instanceof AbstractButton add && add.isShowing()) {
                    compareThreeSetups(view);
                }
                write(dialog("sizing.window"), view);
            }
            SwingUtilities.invokeAndWait(() -> SwingUtilities.getWindowAncestor(dialog("sizing.window"))
                    .setVisible(false));
        }

        /**
         * Compares the open car with two variants built in the variant builder, as a person would; writes the
         * setups and a chart where they have tabs of their own, and leaves the figures in view.
         */
        private void compareThreeSetups(String view) throws Exception {
            JComponent sizing = dialog("sizing.window");
            SwingUtilities.invokeAndWait(() -> {
                text(sizing, "compare.name", "as it is");
                ((AbstractButton) find(sizing, "compare.addOpen")).doClick();
                choose(sizing, "compare.what", "Rear bar — Arm hole in use");
                ((javax.swing.JComboBox<?>) find(sizing, "compare.hole")).setSelectedIndex(0);
                ((AbstractButton) find(sizing, "compare.addChange")).doClick();
                text(sizing, "compare.name", "rear bar hole 1");
                ((AbstractButton) find(sizing, "compare.addVariant")).doClick();
                choose(sizing, "compare.what", "Front bar — Outside diameter");
                text(sizing, "compare.value", "25");
                ((AbstractButton) find(sizing, "compare.addChange")).doClick();
                choose(sizing, "compare.what", "Front axle — Spring rate");
                text(sizing, "compare.value", "80");
                ((AbstractButton) find(sizing, "compare.addChange")).doClick();
                text(sizing, "compare.name", "front bar 25 mm, springs 80");
                ((AbstractButton) find(sizing, "compare.addVariant")).doClick();
            });
            for (int i = 0; i < 300 && onEdt(() -> ((javax.swing.JTable) find(sizing, "compare.figures"))
                    .getColumnCount() < 4); i++) {
                Thread.sleep(100);
            }
            settle(800);
            if (find(sizing, "compare.settingsOrResults") instanceof JTabbedPane pair && pair.isShowing()) {
                SwingUtilities.invokeAndWait(() -> pair.setSelectedIndex(0));
                settle(300);
                write(sizing, view + "-setups");
                SwingUtilities.invokeAndWait(() -> pair.setSelectedIndex(1));
            }
            JTabbedPane charts = (JTabbedPane) find(sizing, "compare.charts");
            int figures = onEdt(charts::getSelectedIndex);
            SwingUtilities.invokeAndWait(() -> charts.setSelectedIndex(charts.indexOfTab("Inside wheel loads")));
            settle(500);
            write(sizing, view + "-chart");
            SwingUtilities.invokeAndWait(() -> charts.setSelectedIndex(figures));
            settle(300);
        }

        private static void text(JComponent root, String name, String text) {
            ((javax.swing.text.JTextComponent) find(root, name)).setText(text);
        }

        private static void choose(JComponent root, String name, String item) {
            javax.swing.JComboBox<?> box = (javax.swing.JComboBox<?>) find(root, name);
            for (int i = 0; i < box.getItemCount(); i++) {
                if (item.equals(String.valueOf(box.getItemAt(i)))) {
                    box.setSelectedIndex(i);
                    return;
                }
            }
            throw new IllegalStateException("no " + item + " in " + name);
        }

        private void waitForRows(String table) throws Exception {
            for (int i = 0; i < 300; i++) {
                boolean found = onEdt(() -> ((javax.swing.JTable) find(dialog("sizing.window"), table))
                        .getRowCount() > 0);
                if (found) {
                    break;
                }
                Thread.sleep(100);
            }
            Thread.sleep(300);
        }

        private void settle(long extra) throws Exception {
            for (int i = 0; i < 300; i++) {
                if (onEdt(() -> window.analysis().isIdle() && window.results().shown() != null)) {
                    break;
                }
                Thread.sleep(20);
            }
            SwingUtilities.invokeAndWait(() -> { });
            Thread.sleep(extra);
            SwingUtilities.invokeAndWait(() -> { });
        }

        private void write(JComponent component, String view) throws Exception {
            Screenshots.write(component, folder.resolve(set + "-" + view + "-" + theme + ".png"));
        }
    }

    /** @return the first tabbed pane inside the page, or null where it has none */
    private static JTabbedPane innerTabs(Container page) {
        if (page instanceof JTabbedPane tabs) {
            return tabs;
        }
        for (Component child : page.getComponents()) {
            if (child instanceof JTabbedPane tabs) {
                return tabs;
            }
            if (child instanceof Container container) {
                JTabbedPane found = innerTabs(container);
                if (found != null) {
                    return found;
                }
            }
        }
        return null;
    }

    /** @return the title in lower case with hyphens: "Lift, balance, chassis" gives "lift-balance-chassis" */
    static String slug(String title) {
        return title.toLowerCase(Locale.ROOT).replaceAll("[^a-z0-9]+", "-").replaceAll("^-|-$", "");
    }

    private static <T> T onEdt(java.util.concurrent.Callable<T> task) throws Exception {
        AtomicReference<T> value = new AtomicReference<>();
        AtomicReference<Exception> failed = new AtomicReference<>();
        SwingUtilities.invokeAndWait(() -> {
            try {
                value.set(task.call());
            } catch (Exception e) {
                failed.set(e);
            }
        });
        if (failed.get() != null) {
            throw failed.get();
        }
        return value.get();
    }

    static Component find(Container root, String name) {
        for (Component child : root.getComponents()) {
            if (name.equals(child.getName())) {
                return child;
            }
            if (child instanceof Container container) {
                Component found = find(container, name);
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
