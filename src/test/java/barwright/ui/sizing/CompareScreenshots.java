package barwright.ui.sizing;

import barwright.ui.app.MainWindow;
import barwright.ui.tools.ShotWindow;

import javax.swing.JComboBox;
import javax.swing.JTextField;
import java.nio.file.Files;
import java.nio.file.Path;

/**
 * Writes a screenshot of the compare view, on the club hatchback sample (invented), at a text size and window size.
 * Run under a display: {@code xvfb-run -a -s "-screen 0 1280x1024x24" mvn -B -q test-compile exec:java
 * -Dexec.classpathScope=test -Dexec.mainClass=barwright.ui.sizing.CompareScreenshots
 * -Dexec.args="docs/images 28 1024x768"} (folder, text size in points or 0, window size); the file is
 * sizing-compare.png at the system text size and 1260x840, else sizing-compare-WxH-textN.png.
 */
public final class CompareScreenshots {
    private CompareScreenshots() {
    }

    public static void main(String[] args) throws Exception {
        Path folder = Path.of(args.length > 0 ? args[0] : "docs/images");
        String text = args.length > 1 ? args[1] : "0";
        String[] size = (args.length > 2 ? args[2] : "1260x840").split("x");
        Files.createDirectories(folder);
        int width = Integer.parseInt(size[0]);
        int height = Integer.parseInt(size[1]);
        MainWindow window = ShotWindow.open("light", Integer.parseInt(text), width, height);
        SizingScreens.analysed(window);
        SizingWindow views = SizingScreens.open(window, SizingWindow.Tab.COMPARE, width, height);
        SizingScreens.onEdt(() -> {
            fill(views);
            return null;
        });
        SizingScreens.until("the comparison", () -> views.compare().work().isIdle() && views.compare().shown() != null);
        boolean usual = "0".equals(text) && "1260x840".equals(size[0] + "x" + size[1]);
        ShotWindow.capture(views, folder.resolve(usual ? "sizing-compare.png"
                : "sizing-compare-" + size[0] + "x" + size[1] + "-text" + text + ".png"));
        SizingScreens.onEdt(() -> {
            views.dispose();
            window.dispose();
            return null;
        });
        System.exit(0);
    }

    /**
     * The open car against two variants built in the variant builder (rear bar in hole 1; front bar 25 mm with
     * stiffer front springs), and one more change waiting in its list. Event thread.
     */
    static void fill(SizingWindow views) {
        CompareView compare = views.compare();
        VariantBuilder builder = compare.variant();
        JTextField name = SizingScreens.find(views, "compare.name");
        JTextField value = SizingScreens.find(views, "compare.value");
        JComboBox<?> hole = SizingScreens.find(views, "compare.hole");
        name.setText("as it is");
        compare.addOpenCar();
        name.setText("rear bar hole 1");
        builder.choose("Rear bar — " + VariantChoices.ARM_HOLE);
        hole.setSelectedIndex(0);
        builder.addChange();
        compare.addVariant();
        name.setText("front bar 25 mm, springs 80");
        builder.choose("Front bar — Outside diameter");
        value.setText("25");
        builder.addChange();
        builder.choose("Front axle — Spring rate");
        value.setText("80");
        builder.addChange();
        compare.addVariant();
        name.setText("setup 4");
        builder.choose("Rear axle — Spring rate");
        value.setText("60");
        builder.addChange();
    }
}
