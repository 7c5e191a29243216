package barwright.ui.sizing;

import barwright.ui.Display;
import barwright.ui.ScriptedDialogs;
import barwright.ui.action.Settings;
import barwright.ui.app.MainWindow;
import barwright.ui.app.Themes;
import barwright.ui.document.Samples;
import org.assertj.swing.core.BasicRobot;
import org.assertj.swing.core.Robot;
import org.assertj.swing.edt.GuiActionRunner;
import org.assertj.swing.finder.WindowFinder;
import org.assertj.swing.fixture.DialogFixture;
import org.assertj.swing.fixture.FrameFixture;
import org.assertj.swing.timing.Condition;
import org.assertj.swing.timing.Pause;
import org.assertj.swing.timing.Timeout;

import java.util.function.Supplier;

/**
 * The main window on the club hatchback sample (invented) with scripted dialogs and in-memory settings, placed
 * at (100,100) inside the event-thread task that makes it (toolchain.md: clicks then land under Xvfb), and the
 * sizing views opened from its Tools menu as a person would.
 */
final class SizingWindowFixture implements AutoCloseable {
    final Robot robot;
    final MainWindow window;
    final FrameFixture frame;
    final ScriptedDialogs dialogs = new ScriptedDialogs();

    SizingWindowFixture() {
        Display.require();
        robot = BasicRobot.robotWithNewAwtHierarchy();
        window = GuiActionRunner.execute(() -> {
            Themes.apply(Themes.Theme.LIGHT, 0);
            MainWindow created = new MainWindow(Samples.open(Samples.CLUB_HATCHBACK), Settings.inMemory(), dialogs,
                    () -> { });
            created.setSize(1150, 880);
            created.setLocation(100, 100);
            return created;
        });
        frame = new FrameFixture(robot, window);
        frame.show();
        waitFor("the analysis", () -> window.analysis().isIdle() && window.results().shown() != null);
    }

    /** Opens the sizing views through Tools > item and returns their window. */
    DialogFixture openTool(String item) {
        frame.menuItemWithPath("Tools", item).click();
        DialogFixture dialog = WindowFinder.findDialog("sizing.window").withTimeout(10_000).using(robot);
        robot.waitForIdle();
        return dialog;
    }

    SizingWindow views() {
        return GuiActionRunner.execute(() -> SizingViews.of(window).views());
    }

    /** Waits up to 60 s for a condition checked on the event thread. */
    void waitFor(String what, Supplier<Boolean> condition) {
        Pause.pause(new Condition(what) {
            @Override
            public boolean test() {
                return GuiActionRunner.execute(condition::get);
            }
        }, Timeout.timeout(60_000));
        robot.waitForIdle();
    }

    @Override
    public void close() {
        frame.cleanUp();
    }
}
