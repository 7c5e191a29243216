package barwright.ui.dynamics;

import barwright.ui.app.Themes;
import barwright.ui.document.Samples;
import barwright.ui.window.WindowFixture;
import barwright.ui.window.WindowUnderTest;
import org.assertj.swing.edt.GuiActionRunner;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;

import javax.swing.JTable;
import javax.swing.UIManager;
import java.awt.Rectangle;
import java.util.ArrayList;
import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * The text size changed after the window was built (View &gt; Larger text, up to the largest, on a 1024x768
 * screen): the dampers page works out again how tall it must be, so its table shows every row instead of three
 * rows and a scroll bar inside it.
 */
@Tag("window")
class DamperRowsAfterTextSizeChangeTest {
    @RegisterExtension
    final WindowUnderTest opened = new WindowUnderTest();

    @AfterEach
    void systemTextSizeAgain() {
        opened.close();
        GuiActionRunner.execute(() -> Themes.apply(Themes.Theme.LIGHT, 0));
    }

    @Test
    void afterTheTextIsMadeLargestEveryDamperRowIsInView() {
        WindowFixture fixture = opened.open(1024, 768, 0);
        GuiActionRunner.execute(() -> {
            fixture.window.document().replace(Samples.load(Samples.ALL.get(Samples.ALL.size() - 1)), null, "sample");
            return null;
        });
        fixture.settle();
        for (int step = 0; step < 20 && textSize() < Themes.largestTextSize(); step++) {
            fixture.frame.menuItemWithPath("View", "Larger text").click();
            fixture.robot.waitForIdle();
        }
        assertThat(textSize()).isEqualTo(Themes.largestTextSize());
        fixture.settle();
        GuiActionRunner.execute(() -> {
            DamperPage page = (DamperPage) fixture.robot.finder().findByName(fixture.window, "dampers.page", false);
            fixture.showResultsPage(page);
            return null;
        });
        fixture.robot.waitForIdle();
        List<String> hidden = GuiActionRunner.execute(() -> {
            DamperPage page = (DamperPage) fixture.robot.finder().findByName(fixture.window, "dampers.page", false);
            JTable table = page.table();
            // guards the test itself: the sample's front damper has more rows than the three a squeezed table shows
            assertThat(table.getRowCount()).isGreaterThan(3);
            assertThat(table.isShowing()).isTrue();
            Rectangle visible = table.getVisibleRect();
            List<String> faults = new ArrayList<>();
            for (int row = 0; row < table.getRowCount(); row++) {
                Rectangle cell = table.getCellRect(row, 0, true);
                if (cell.y < visible.y || cell.y + cell.height > visible.y + visible.height) {
                    faults.add("row " + (row + 1) + " at y " + cell.y + ".." + (cell.y + cell.height)
                            + ", in view " + visible.y + ".." + (visible.y + visible.height));
                }
            }
            return faults;
        });
        assertThat(hidden).isEmpty();
    }

    private static int textSize() {
        return GuiActionRunner.execute(() -> UIManager.getFont("Label.font").getSize());
    }
}
