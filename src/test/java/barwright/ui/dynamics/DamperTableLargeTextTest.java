package barwright.ui.dynamics;

import barwright.ui.document.Samples;
import barwright.ui.panel.FittedColumnsTable;
import barwright.ui.window.WindowFixture;
import barwright.ui.window.WindowUnderTest;
import org.assertj.swing.edt.GuiActionRunner;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;

import javax.swing.table.TableColumn;
import java.awt.Component;
import java.util.ArrayList;
import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * The damper table on a projector (1024x768, the largest text size): every column at least as wide as its
 * header's and its cells' texts, so no header reads "Fo..." and no number "-2..."; the table scrolls sideways
 * instead of squeezing them.
 */
@Tag("window")
class DamperTableLargeTextTest {
    @RegisterExtension
    final WindowUnderTest opened = new WindowUnderTest();

    @Test
    void atTheLargestTextOnA1024By768ScreenNoDamperColumnIsNarrowerThanItsTexts() {
        WindowFixture fixture = opened.onProjector();
        GuiActionRunner.execute(() -> {
            fixture.window.document().replace(Samples.load(Samples.ALL.get(Samples.ALL.size() - 1)), null, "sample");
            return null;
        });
        fixture.settle();
        List<String> cut = GuiActionRunner.execute(() -> {
            DamperPage page = (DamperPage) fixture.robot.finder().findByName(fixture.window, "dampers.page", false);
            fixture.showResultsPage(page);
            FittedColumnsTable table = (FittedColumnsTable) page.table();
            List<String> faults = new ArrayList<>();
            // guards the test itself: the sample's front damper has several points
            assertThat(table.getRowCount()).isGreaterThan(3);
            assertThat(table.isShowing()).isTrue();
            for (int view = 0; view < table.getColumnCount(); view++) {
                TableColumn column = table.getColumnModel().getColumn(view);
                Component header = table.getTableHeader().getDefaultRenderer().getTableCellRendererComponent(table,
                        column.getHeaderValue(), false, false, -1, view);
                int needed = header.getPreferredSize().width;
                for (int row = 0; row < table.getRowCount(); row++) {
                    needed = Math.max(needed, table.prepareWholeRenderer(table.getCellRenderer(row, view), row, view)
                            .getPreferredSize().width);
                }
                if (column.getWidth() < needed) {
                    faults.add(column.getHeaderValue() + ": " + column.getWidth() + " px of " + needed);
                }
            }
            return faults;
        });
        assertThat(cut).isEmpty();
    }
}
