package barwright.ui.window;

import barwright.ui.Display;
import barwright.ui.ScriptedDialogs;
import barwright.ui.action.Settings;
import barwright.ui.app.MainWindow;
import barwright.ui.app.Themes;
import barwright.ui.document.Samples;
import org.assertj.swing.core.BasicRobot;
import org.assertj.swing.core.Robot;
import org.assertj.swing.edt.GuiActionRunner;
import org.assertj.swing.fixture.FrameFixture;
import org.assertj.swing.timing.Condition;
import org.assertj.swing.timing.Pause;
import org.assertj.swing.timing.Timeout;

/**
 * Opens the main window on the sample for a test, placed at (100,100) inside the EDT task that creates it
 * (toolchain.md: clicks then land reliably under Xvfb), with in-memory settings and scripted dialogs. Public
 * so that the window tests of other views (barwright.ui.sizing) open the window the same way.
 */
public final class WindowFixture implements AutoCloseable {
    public final Robot robot;
    public final MainWindow window;
    public final FrameFixture frame;
    public final ScriptedDialogs dialogs = new ScriptedDialogs();

    private final int textSize;

    public WindowFixture() {
        this(1150, 880, 0);
    }

    /**
     * @param textSize points, or 0 for the system's size; the text size goes back to the system's on close
     */
    public WindowFixture(int width, int height, int textSize) {
        this.textSize = textSize;
        Display.require();
        robot = BasicRobot.robotWithNewAwtHierarchy();
        window = GuiActionRunner.execute(() -> {
            Themes.apply(Themes.Theme.LIGHT, textSize);
            Settings settings = Settings.inMemory();
            if (textSize > 0) {
                settings.put("textSize", Integer.toString(textSize));
            }
            MainWindow created = new MainWindow(Samples.open(Samples.CLUB_HATCHBACK), settings, dialogs,
                    () -> { });
            created.setSize(width, height);
            created.setLocation(100, 100);
            return created;
        });
        frame = new FrameFixture(robot, window);
        // at the size asked for: show() alone packs the window to its preferred size (1679 x 2248 px at the
        // largest text), which no screen of the size under test would give
        frame.show(new java.awt.Dimension(width, height));
        settle();
    }

    /** Waits until no analysis runs or waits and results are on screen. */
    public void settle() {
        Pause.pause(new Condition("the analysis to settle") {
            @Override
            public boolean test() {
                return GuiActionRunner.execute(() -> !barwright.ui.panel.NumberField.anyTypingPending()
                        && window.analysis().isIdle() && window.results().shown() != null);
            }
        }, Timeout.timeout(20_000));
        robot.waitForIdle();
    }

    /** Selects the editor's page of that title, and waits until the analysis settles. */
    public void showEditorPage(String title) {
        frame.tabbedPane("editor.tabs").selectTab(title);
        settle();
    }

    /** Selects the results tab holding the page (itself, or a scroll pane around it), laid out. Event thread. */
    public void showResultsPage(java.awt.Component page) {
        var tabs = window.tabs();
        java.awt.Component at = page;
        while (at.getParent() != null && at.getParent() != tabs) {
            at = at.getParent();
        }
        tabs.setSelectedIndex(tabs.indexOfComponent(at));
        window.validate();
    }

    String figure(String name) {
        return GuiActionRunner.execute(() -> window.figures().figureText(name));
    }

    @Override
    public void close() {
        frame.cleanUp();
        if (textSize > 0) {
            GuiActionRunner.execute(() -> Themes.apply(Themes.Theme.LIGHT, 0));
        }
    }
}
