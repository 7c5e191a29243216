package barwright.ui.linkage;

import barwright.io.VehicleDocument;
import barwright.loading.VehicleLoader;
import barwright.model.AxlePosition;
import barwright.ui.action.Settings;
import barwright.ui.app.DesktopApp;
import barwright.ui.app.MainWindow;

import javax.imageio.ImageIO;
import javax.swing.SwingUtilities;
import java.awt.image.BufferedImage;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.atomic.AtomicReference;

/**
 * Writes screenshots of the linkage page to a folder (docs/images by default) on the invented samples: the road
 * saloon's struts and semi-trailing arms, the sprint roadster's double wishbones, the estate's Panhard rod and
 * its front axle with no linkage, at 80 % of the grip limit in a left turn. Run under a display:
 * {@code xvfb-run -a -s "-screen 0 1280x1024x24" mvn -B -q test-compile exec:java -Dexec.classpathScope=test
 * -Dexec.mainClass=barwright.ui.linkage.LinkageScreenshots -Dexec.args="docs/images light 0 1280x880"}.
 * Arguments, all optional: folder, theme (light or dark), text size in points (0: the system's), window size.
 */
public final class LinkageScreenshots {
    private LinkageScreenshots() {
    }

    public static void main(String[] args) throws Exception {
        Path folder = Path.of(args.length > 0 ? args[0] : "docs/images");
        String theme = args.length > 1 ? args[1] : "light";
        String textSize = args.length > 2 ? args[2] : "0";
        String[] size = (args.length > 3 ? args[3] : "1280x880").split("x");
        Files.createDirectories(folder);
        Settings settings = Settings.inMemory();
        settings.put("theme", theme);
        settings.put("textSize", textSize);
        AtomicReference<MainWindow> holder = new AtomicReference<>();
        SwingUtilities.invokeAndWait(() -> {
            MainWindow window = DesktopApp.open(settings, () -> { });
            window.setLocation(0, 0);
            window.setSize(Integer.parseInt(size[0]), Integer.parseInt(size[1]));
            holder.set(window);
        });
        MainWindow window = holder.get();
        LinkagePage page = window.contribution(LinkageViews.class).page();
        boolean projector = Integer.parseInt(size[0]) <= 1024;
        SwingUtilities.invokeAndWait(() -> {
            window.tabs().setSelectedComponent(page);
            window.probe().setFractionOfLimit(0.8);
            if (projector) {
                // on a projector the editor is folded away (the arrows on the divider), as docs/desktop.md says
                ((javax.swing.JSplitPane) SwingUtilities.getAncestorOfClass(javax.swing.JSplitPane.class,
                        window.editor())).setDividerLocation(0);
            }
        });
        String suffix = "-" + theme + (textSize.equals("0") ? "" : "-text" + textSize) + "-" + size[0] + "x" + size[1];
        shoot(window, page, "road-saloon", AxlePosition.FRONT, folder.resolve("linkage-strut" + suffix + ".png"));
        shoot(window, page, "road-saloon", AxlePosition.REAR, folder.resolve("linkage-semi-trailing" + suffix + ".png"));
        shoot(window, page, "sprint-roadster", AxlePosition.FRONT, folder.resolve("linkage-wishbones" + suffix + ".png"));
        // the drawing as File > Export writes it (1200x800)
        Path exported = folder.resolve("linkage-export-wishbones-" + theme + ".png");
        SwingUtilities.invokeAndWait(() -> {
            try {
                page.exportTo(exported);
            } catch (barwright.io.FileWriteException failed) {
                throw new IllegalStateException(failed);
            }
        });
        System.out.println("wrote " + exported);
        shoot(window, page, "estate-dropped-rear-bar", AxlePosition.REAR, folder.resolve("linkage-panhard" + suffix + ".png"));
        shoot(window, page, "estate-dropped-rear-bar", AxlePosition.FRONT, folder.resolve("linkage-none" + suffix + ".png"));
        SwingUtilities.invokeAndWait(window::dispose);
        System.exit(0);
    }

    private static void shoot(MainWindow window, LinkagePage page, String sample, AxlePosition axle, Path file)
            throws Exception {
        VehicleDocument car = VehicleLoader.read(Path.of("sample-vehicles", sample + ".json"));
        SwingUtilities.invokeAndWait(() -> {
            window.document().replace(car, null, "sample: " + sample);
            page.showAxle(axle);
        });
        LinkageWindows.settle(window, page);
        AtomicReference<java.awt.Rectangle> bounds = new AtomicReference<>();
        SwingUtilities.invokeAndWait(() -> bounds.set(new java.awt.Rectangle(window.getRootPane().getLocationOnScreen(),
                window.getRootPane().getSize())));
        BufferedImage picture = new java.awt.Robot().createScreenCapture(bounds.get());
        ImageIO.write(picture, "png", file.toFile());
        System.out.println("wrote " + file);
    }
}
