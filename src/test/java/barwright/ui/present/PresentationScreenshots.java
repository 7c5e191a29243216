package barwright.ui.present;

import barwright.io.KeyPath;
import barwright.ui.app.MainWindow;
import barwright.ui.tools.ShotWindow;
import com.fasterxml.jackson.databind.node.DoubleNode;

import javax.swing.SwingUtilities;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.concurrent.atomic.AtomicReference;

/**
 * Writes docs/images/presentation*.png: the club hatchback sample (invented) pinned, then its front bar made
 * 2 mm thicker, before and after side by side. Run under a display: {@code xvfb-run -a -s "-screen 0
 * 1280x1024x24" mvn -B -q test-compile exec:java -Dexec.classpathScope=test
 * -Dexec.mainClass=barwright.ui.present.PresentationScreenshots -Dexec.args="docs/images light 1024x768 28"} (optional after the size: the text size in points, the index of the tab shown).
 */
public final class PresentationScreenshots {
    private PresentationScreenshots() {
    }

    public static void main(String[] args) throws Exception {
        Path folder = Path.of(args.length > 0 ? args[0] : "docs/images");
        String theme = args.length > 1 ? args[1] : "light";
        String[] size = (args.length > 2 ? args[2] : "1280x880").split("x");
        int textSize = args.length > 3 ? Integer.parseInt(args[3]) : 0;
        int tab = args.length > 4 ? Integer.parseInt(args[4]) : 0;
        Files.createDirectories(folder);
        // the main window behind at the same size, as on a screen of that size
        MainWindow main = ShotWindow.open(theme, textSize, Integer.parseInt(size[0]), Integer.parseInt(size[1]));
        AtomicReference<PresentationFrame> frame = new AtomicReference<>();
        Thread.sleep(1500);
        SwingUtilities.invokeAndWait(() -> {
            PresentationFrame shown = new PresentationFrame(main.document(), main.view(), main.results());
            shown.setBounds(0, 0, Integer.parseInt(size[0]), Integer.parseInt(size[1]));
            shown.setVisible(true);
            shown.togglePin();
            double diameter = main.document().tree().path("front").path("bar").path("section")
                    .path("outerDiameterMm").asDouble();
            main.document().edit(KeyPath.of("front.bar.section.outerDiameterMm"), DoubleNode.valueOf(diameter + 2),
                    null, null);
            ((javax.swing.JTabbedPane) barwright.ui.NamedComponents.find(shown.getContentPane(),
                    "presentation.views")).setSelectedIndex(tab);
            frame.set(shown);
        });
        Thread.sleep(2000);
        Path file = folder.resolve("presentation-" + theme + "-" + size[0] + "x" + size[1]
                + (textSize > 0 ? "-" + textSize + "pt" : "") + (tab > 0 ? "-tab" + tab : "") + ".png");
        ShotWindow.capture(frame.get().getRootPane(), file);
        System.exit(0);
    }
}
