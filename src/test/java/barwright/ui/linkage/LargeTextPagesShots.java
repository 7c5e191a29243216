package barwright.ui.linkage;

import barwright.ui.app.Themes;
import barwright.ui.document.Samples;
import barwright.ui.tools.Screenshots;
import barwright.ui.window.WindowFixture;
import org.assertj.swing.edt.GuiActionRunner;

import java.awt.Component;
import java.nio.file.Files;
import java.nio.file.Path;

/**
 * Looking at the linkage page, the dampers page and the front bar's page at 1024x768 with the largest text and
 * at full size (1280x1024, the system text): PNGs into the folder given (default /tmp/pages). Run under Xvfb.
 */
public final class LargeTextPagesShots {
    private LargeTextPagesShots() {
    }

    public static void main(String[] args) throws Exception {
        Path folder = Path.of(args.length > 0 ? args[0] : "/tmp/pages");
        Files.createDirectories(folder);
        shots(new WindowFixture(1024, 768, Themes.largestTextSize()), folder, "small");
        shots(new WindowFixture(1280, 1024, 0), folder, "full");
        System.exit(0);
    }

    private static void shots(WindowFixture fixture, Path folder, String set) throws Exception {
        fixture.frame.tabbedPane("editor.tabs").selectTab("Front bar");
        LinkagePage page = GuiActionRunner.execute(() ->
                (LinkagePage) fixture.robot.finder().findByName(fixture.window, "linkage.page", false));
        select(fixture, page);
        LinkageWindows.settle(fixture.window, page);
        Screenshots.write(fixture.window.getRootPane(), folder.resolve(set + "-linkage.png"));
        GuiActionRunner.execute(() -> {
            fixture.window.document().replace(Samples.load(Samples.ALL.get(Samples.ALL.size() - 1)), null, "sample");
            return null;
        });
        fixture.settle();
        select(fixture, fixture.robot.finder().findByName(fixture.window, "dampers.page", false));
        Thread.sleep(1500);
        Screenshots.write(fixture.window.getRootPane(), folder.resolve(set + "-dampers.png"));
        fixture.close();
    }

    private static void select(WindowFixture fixture, Component page) {
        GuiActionRunner.execute(() -> {
            var tabs = fixture.window.tabs();
            Component at = page;
            while (at.getParent() != tabs) {
                at = at.getParent();
            }
            tabs.setSelectedComponent(at);
            fixture.window.validate();
            return null;
        });
    }
}
