package barwright.ui.workshop;

import barwright.model.AxlePosition;
import barwright.ui.NamedComponents;
import barwright.ui.app.MainWindow;
import barwright.ui.tools.ShotWindow;

import javax.swing.JTabbedPane;
import javax.swing.SwingUtilities;
import java.nio.file.Files;
import java.nio.file.Path;

/**
 * Writes screenshots of the four workshop pages to docs/images/workshop-*.png, with invented readings on the
 * club hatchback sample. Run under a display: {@code xvfb-run -a -s "-screen 0 1280x1024x24" mvn -B -q
 * test-compile exec:java -Dexec.classpathScope=test -Dexec.mainClass=barwright.ui.workshop.WorkshopScreenshots
 * -Dexec.args="docs/images light 28 1024x768"} (folder, theme, text size in points or 0, window size).
 */
public final class WorkshopScreenshots {
    private WorkshopScreenshots() {
    }

    public static void main(String[] args) throws Exception {
        Path folder = Path.of(args.length > 0 ? args[0] : "docs/images");
        String theme = args.length > 1 ? args[1] : "light";
        String text = args.length > 2 ? args[2] : "0";
        String[] size = (args.length > 3 ? args[3] : "1280x880").split("x");
        Files.createDirectories(folder);
        MainWindow window = ShotWindow.open(theme, Integer.parseInt(text), Integer.parseInt(size[0]),
                Integer.parseInt(size[1]));
        SwingUtilities.invokeAndWait(() -> {
            for (int i = 0; i < window.tabs().getTabCount(); i++) {
                if ("Workshop".equals(window.tabs().getTitleAt(i))) {
                    window.tabs().setSelectedIndex(i);
                }
            }
        });
        Thread.sleep(1500);
        String suffix = "-" + theme + ("0".equals(text) ? "" : "-text" + text) + "-" + size[0] + "x" + size[1];
        JTabbedPane pages = (JTabbedPane) NamedComponents.find(window, "workshop.pages");
        SwingUtilities.invokeAndWait(() -> {
            ((BarRatePage) NamedComponents.find(window, "workshop.page")).paste("0\t0\n0\t0.5\n60\t3\n120\t5\n180\t7\n240\t9.1\n300\t11\n");
            StringBuilder travel = new StringBuilder();
            for (int wheel = -40; wheel <= 40; wheel += 10) {
                travel.append(wheel).append('\t').append(String.format("%.1f", 0.62 * wheel + 0.0008 * wheel * wheel))
                        .append('\n');
            }
            ((MotionRatioPage) NamedComponents.find(window, "motionRatio.page")).paste(travel.toString());
            ((CentreOfMassPage) NamedComponents.find(window, "cg.page")).setReadings(AxlePosition.REAR, 0.25, 652.8, 0.2825);
            ((CornerWeightsPage) NamedComponents.find(window, "corners.page")).setReadings(270, 372, 193, 185);
        });
        String[] names = {"workshop-bar-rate", "workshop-motion-ratio", "workshop-centre-of-mass", "workshop-corners"};
        for (int page = 0; page < names.length; page++) {
            int index = page;
            SwingUtilities.invokeAndWait(() -> pages.setSelectedIndex(index));
            Thread.sleep(800);
            ShotWindow.capture(window.getRootPane(), folder.resolve(names[page] + suffix + ".png"));
        }
        SwingUtilities.invokeAndWait(window::dispose);
        System.exit(0);
    }

}
