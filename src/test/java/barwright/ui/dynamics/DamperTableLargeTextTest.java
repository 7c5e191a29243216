package barwright.ui.dynamics;

import barwright.ui.app.Themes;
import barwright.ui.document.Samples;
import barwright.ui.window.WindowFixture;
import org.assertj.swing.edt.GuiActionRunner;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import javax.swing.JTable;
import javax.swing.SwingUtilities;
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
    private WindowFixture fixture;

    @AfterEach
    void close() {
        if (fixture != null) {
            fixture.close();
        }
    }

    @Test
    void atTheLargestTextOnA1024By768ScreenNoDamperColumnIsNarrowerThanItsTexts() {
        fixture = new WindowFixture(1024, 768, Themes.largestTextSize());
        GuiActionRunner.execute(() -> {
            fixture.window.document().replace(Samples.load(Samples.ALL.get(Samples.ALL.size() - 1)), null, "sample");
            return null;
        });
        fixture.settle();
        List<String> cut = GuiActionRunner.execute(() -> {
            DamperPage page = (DamperPage) fixture.robot.finder().findByName(fixture.window, "dampers.page", false);
            var tabs = fixture.window.tabs();
            tabs.setSelectedIndex(tabs.indexOfComponent(tabOf(page)));
            fixture.window.validate();
            JTable table = page.table();
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
                    needed = Math.max(needed, table.prepareRenderer(table.getCellRenderer(row, view), row, view)
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

    /** @return the page's child of the results tabs (the page itself, or the scroll pane holding it) */
    private Component tabOf(Component page) {
        Component at = page;
        while (at.getParent() != null && at.getParent() != fixture.window.tabs()) {
            at = at.getParent();
        }
        return at;
    }
}
