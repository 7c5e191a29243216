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
 * The tube view on a 1024x768 screen with the largest text size (club hatchback sample, invented data): its
 * settings and results as two tabs, and after a find several tubes in view with the columns a choice turns on.
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
        DialogFixture sizing = fixture.openTool("Tube or solid bar of the same rate…");
        GuiActionRunner.execute(() -> {
            SizingWindow views = fixture.views();
            views.setSize(1024, 768);
            views.validate();
            return null;
        });
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
}
