package barwright.ui.sizing;

import barwright.ui.app.Themes;
import org.assertj.swing.edt.GuiActionRunner;
import org.assertj.swing.fixture.DialogFixture;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import javax.swing.JTable;
import java.awt.Rectangle;
import java.util.ArrayList;
import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * The sizing window on a 1024x768 screen with the largest text size (club hatchback sample, invented data): the
 * tube view's settings and results as two tabs, and after a find several tubes in view with the columns a choice
 * turns on; the arm-hole map with at least two whole rows and two whole columns of cells in view.
 */
@Tag("window")
class SizingSmallScreenWindowTest {
    private SizingWindowFixture fixture;

    @AfterEach
    void close() {
        if (fixture != null) {
            fixture.close();
        }
    }

    @Test
    void withTheLargestTextAt1024By768TheTubesAreTabsAndSeveralRowsAndTheDecidingColumnsShow() {
        fixture = new SizingWindowFixture(1024, 768, Themes.largestTextSize());
        DialogFixture sizing = fixture.openToolAtScreenSize("Tube or solid bar of the same rate…");
        fixture.robot.waitForIdle();
        TubeView view = fixture.views().tubes();
        // side by side the settings took the width and left the results no rows at all
        assertThat(GuiActionRunner.execute(view::settingsAndResultsTabbed)).isTrue();
        sizing.checkBox("tubes.material.4130 chromoly").check();
        sizing.button("tubes.find").click();
        fixture.waitFor("the tubes", () -> view.work().isIdle() && view.table().getRowCount() >= 3);
        fixture.robot.waitForIdle();
        // a finished find turns to its results
        assertThat(GuiActionRunner.execute(() -> view.table().isShowing())).isTrue();
        List<String> faults = GuiActionRunner.execute(() -> {
            JTable table = view.table();
            List<String> cut = new ArrayList<>();
            Rectangle shown = table.getVisibleRect();
            if (shown.height < 3 * table.getRowHeight()) {
                cut.add("the rows in view are " + shown.height + " px high, under three rows of "
                        + table.getRowHeight() + " px");
            }
            cut.addAll(SizingWindowFixture.cutColumns(table, TubeView.MASS, TubeView.SAFETY, TubeView.LIFE));
            return cut;
        });
        assertThat(faults).isEmpty();
    }

    @Test
    void withTheLargestTextAt1024By768TheMapShowsTwoWholeRowsAndTwoWholeColumnsOfCells() {
        fixture = new SizingWindowFixture(1024, 768, Themes.largestTextSize());
        fixture.openToolAtScreenSize("Arm-hole map…");
        MapView map = fixture.views().map();
        // the club hatchback has three front holes and four rear ones
        fixture.waitFor("the map", () -> map.work().isIdle() && map.cells().size() == 12);
        fixture.robot.waitForIdle();
        int[] whole = GuiActionRunner.execute(() -> {
            javax.swing.JViewport viewport = (javax.swing.JViewport) javax.swing.SwingUtilities.getAncestorOfClass(
                    javax.swing.JViewport.class, map.cells().get(0));
            Rectangle inView = new Rectangle(viewport.getExtentSize());
            java.util.Set<Integer> rows = new java.util.TreeSet<>();
            java.util.Set<Integer> columns = new java.util.TreeSet<>();
            for (MapCellView cell : map.cells()) {
                Rectangle bounds = javax.swing.SwingUtilities.convertRectangle(cell.getParent(), cell.getBounds(),
                        viewport);
                if (inView.contains(bounds)) {
                    String[] place = cell.getName().split("\\.");
                    rows.add(Integer.parseInt(place[2]));
                    columns.add(Integer.parseInt(place[3]));
                }
            }
            return new int[]{rows.size(), columns.size()};
        });
        assertThat(whole[0]).as("whole rows of cells in view").isGreaterThanOrEqualTo(2);
        assertThat(whole[1]).as("whole columns of cells in view").isGreaterThanOrEqualTo(2);
    }
}
