package barwright.ui.sizing;

import barwright.model.Vehicle;
import barwright.ui.ScriptedDialogs;
import barwright.ui.app.MainWindow;
import barwright.ui.document.Samples;
import barwright.ui.window.WindowFixture;
import com.fasterxml.jackson.databind.JsonNode;
import org.assertj.swing.core.Robot;
import org.assertj.swing.data.TableCell;
import org.assertj.swing.edt.GuiActionRunner;
import org.assertj.swing.finder.WindowFinder;
import org.assertj.swing.fixture.DialogFixture;
import org.assertj.swing.fixture.FrameFixture;
import org.assertj.swing.fixture.JTableFixture;
import org.assertj.swing.timing.Condition;
import org.assertj.swing.timing.Pause;
import org.assertj.swing.timing.Timeout;

import java.util.function.Supplier;

/**
 * The main window as its own window tests open it (on the club hatchback sample, invented data), with the sizing
 * views opened from its Tools menu as a person would, and the checks the sizing window tests share.
 */
final class SizingWindowFixture implements AutoCloseable {
    private final WindowFixture main;
    final Robot robot;
    final MainWindow window;
    final FrameFixture frame;
    final ScriptedDialogs dialogs;

    SizingWindowFixture() {
        this(new WindowFixture());
    }

    /** The main window at that size and text size (points, 0 for the system's). */
    SizingWindowFixture(int width, int height, int textSize) {
        this(new WindowFixture(width, height, textSize));
    }

    private SizingWindowFixture(WindowFixture main) {
        this.main = main;
        robot = main.robot;
        window = main.window;
        frame = main.frame;
        dialogs = main.dialogs;
    }

    /** Opens the sizing views through Tools > item and returns their window. */
    DialogFixture openTool(String item) {
        frame.menuItemWithPath("Tools", item).click();
        DialogFixture dialog = WindowFinder.findDialog("sizing.window").withTimeout(10_000).using(robot);
        robot.waitForIdle();
        return dialog;
    }

    /**
     * Opens the sizing views through Tools > item at the main window's size, as on a screen of that size (the
     * window is no larger than the screen), and returns their window.
     */
    DialogFixture openToolAtScreenSize(String item) {
        DialogFixture dialog = openTool(item);
        GuiActionRunner.execute(() -> {
            SizingWindow views = views();
            views.setSize(window.getSize());
            views.validate();
            return null;
        });
        robot.waitForIdle();
        return dialog;
    }

    /** Sizes the rear bar for a front share of 52 % with the form as it opens otherwise, and waits for the rows. */
    DialogFixture searchRearFor52() {
        DialogFixture sizing = openTool("Size a bar to a target…");
        sizing.comboBox("search.axle").selectItem("rear bar");
        sizing.radioButton("search.shareItself").click();
        sizing.textBox("search.share").deleteText().enterText("52");
        sizing.button("search.run").click();
        SearchView view = views().search();
        waitFor("the search", () -> view.work().isIdle() && view.table().getRowCount() > 0);
        return sizing;
    }

    SizingWindow views() {
        return GuiActionRunner.execute(() -> window.contribution(SizingViews.class).views());
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

    /** @return a copy of the open document's tree as it stands */
    JsonNode tree() {
        return GuiActionRunner.execute(() -> window.document().tree().deepCopy());
    }

    /** @return the car the window opens on, read by the core */
    static Vehicle sample() {
        return Samples.load(Samples.CLUB_HATCHBACK).vehicle();
    }

    /**
     * @return the cell's text as shown once the cell is scrolled into view, as a user would scroll to it (a column
     *         the view's edge cuts shows "…" until then)
     */
    static String shownValue(JTableFixture table, int row, int column) {
        GuiActionRunner.execute(() -> {
            table.target().scrollRectToVisible(table.target().getCellRect(row, column, true));
            return null;
        });
        table.robot().waitForIdle();
        return table.valueAt(TableCell.row(row).column(column));
    }

    /** @return the number at the start of a shown figure, e.g. 52.3 from "52.3 %" (either decimal sign) */
    static double number(String text) {
        return Double.parseDouble(text.trim().split(" ")[0].replace(',', '.'));
    }

    @Override
    public void close() {
        main.close();
    }

    /**
     * @return what a person would find cut in a results table: each deciding column that ends past the scroll
     *         pane's visible width, and each header narrower than its text. Event thread.
     */
    static java.util.List<String> cutColumns(javax.swing.JTable table, int... deciding) {
        javax.swing.JScrollPane scroll = (javax.swing.JScrollPane) javax.swing.SwingUtilities.getAncestorOfClass(
                javax.swing.JScrollPane.class, table);
        int visible = scroll.getViewport().getExtentSize().width;
        java.util.List<String> cut = new java.util.ArrayList<>();
        for (int column : deciding) {
            java.awt.Rectangle cell = table.getCellRect(0, column, true);
            if (cell.x + cell.width > visible) {
                cut.add(table.getColumnName(column) + " ends at " + (cell.x + cell.width) + " px of " + visible);
            }
        }
        for (int column = 0; column < table.getColumnCount(); column++) {
            var header = table.getTableHeader().getDefaultRenderer().getTableCellRendererComponent(table,
                    table.getColumnName(column), false, false, -1, column);
            int width = table.getColumnModel().getColumn(column).getWidth();
            if (width < header.getPreferredSize().width) {
                cut.add("header " + table.getColumnName(column) + " " + width + " px of "
                        + header.getPreferredSize().width);
            }
        }
        return cut;
    }
}
