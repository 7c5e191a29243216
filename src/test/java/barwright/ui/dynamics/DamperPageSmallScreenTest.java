package barwright.ui.dynamics;

import barwright.model.AxlePosition;
import barwright.ui.app.Themes;
import barwright.ui.document.Samples;
import barwright.ui.window.WindowFixture;
import org.assertj.swing.edt.GuiActionRunner;
import org.jfree.chart.ChartPanel;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import javax.swing.JTable;
import javax.swing.JViewport;
import javax.swing.SwingUtilities;
import javax.swing.table.TableColumn;
import java.awt.Component;
import java.awt.Rectangle;
import java.awt.geom.Rectangle2D;
import java.util.ArrayList;
import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * The dampers page on a shop laptop or a projector (1024x768, the largest text size), for each axle of the
 * invented sample "Club hatchback with dampers": the table shows its four columns whole, without scrolling
 * sideways, and all its rows, and the chart keeps a plot to read the curve on.
 */
@Tag("window")
class DamperPageSmallScreenTest {
    /**
     * The least plot, in pixels. At 28 pt a tick label such as "-2,500" is about 90 px wide and 33 px tall: 320 px
     * across holds four such labels with gaps between them, and 220 px high holds five gridlines with their labels,
     * enough to read the two curves' shape on either side of zero. The page before this fix drew no plot at all.
     */
    private static final int LEAST_PLOT_WIDTH = 320;
    private static final int LEAST_PLOT_HEIGHT = 220;
    private WindowFixture fixture;

    @AfterEach
    void close() {
        if (fixture != null) {
            fixture.close();
        }
    }

    @Test
    void bothAxlesShowTheirFourColumnsWholeAndAPlotOfUsableSize() {
        checkBothAxles(1024, 768, Themes.largestTextSize(), LEAST_PLOT_WIDTH, LEAST_PLOT_HEIGHT);
    }

    /**
     * At full size with the system's text the page is narrow too (the results area beside the editor and the
     * figures), so the chart is under the table there as well: the table must not be squeezed to its header. At
     * 13 pt a tick label is under half the 28 pt one's size, so a plot of 250 x 200 px reads as well.
     */
    @Test
    void atFullSizeTheTableKeepsItsRowsUnderWhichTheChartHasItsPlot() {
        checkBothAxles(1280, 880, 0, 250, 200);
    }

    private void checkBothAxles(int width, int height, int textSize, int leastPlotWidth, int leastPlotHeight) {
        fixture = new WindowFixture(width, height, textSize);
        GuiActionRunner.execute(() -> {
            fixture.window.document().replace(Samples.load(Samples.ALL.get(Samples.ALL.size() - 1)), null, "sample");
            return null;
        });
        fixture.settle();
        DamperPage page = GuiActionRunner.execute(() -> {
            DamperPage found = (DamperPage) fixture.robot.finder().findByName(fixture.window, "dampers.page", false);
            var tabs = fixture.window.tabs();
            tabs.setSelectedIndex(tabs.indexOfComponent(tabOf(found)));
            return found;
        });
        for (AxlePosition axle : AxlePosition.values()) {
            GuiActionRunner.execute(() -> {
                page.chooseAxle(axle);
                fixture.window.validate();
                return null;
            });
            fixture.robot.waitForIdle();
            List<String> faults = GuiActionRunner.execute(() -> faults(page));
            assertThat(faults).as(axle.toString()).isEmpty();
            Rectangle2D plot = GuiActionRunner.execute(() -> {
                ChartPanel chart = (ChartPanel) page.chart().component();
                // painted now, at the size it has on the screen, so the rendering info is this layout's
                chart.paintImmediately(0, 0, chart.getWidth(), chart.getHeight());
                return chart.getChartRenderingInfo().getPlotInfo().getDataArea();
            });
            assertThat(plot.getWidth()).as(axle + " plot width").isGreaterThanOrEqualTo(leastPlotWidth);
            assertThat(plot.getHeight()).as(axle + " plot height").isGreaterThanOrEqualTo(leastPlotHeight);
        }
    }

    /** @return each column whose header is cut or out of the table's view, and the table's rows being there */
    private static List<String> faults(DamperPage page) {
        JTable table = page.table();
        List<String> faults = new ArrayList<>();
        if (table.getRowCount() < 3 || !table.isShowing()) {
            faults.add("the table's points are not on screen (" + table.getRowCount() + " rows)");
        }
        JViewport viewport = (JViewport) SwingUtilities.getAncestorOfClass(JViewport.class, table);
        Rectangle seen = viewport.getViewRect();
        if (seen.height < table.getRowCount() * table.getRowHeight()) {
            faults.add("rows hidden: " + seen.height + " px for " + table.getRowCount() + " rows of "
                    + table.getRowHeight() + " px");
        }
        for (int view = 0; view < table.getColumnCount(); view++) {
            TableColumn column = table.getColumnModel().getColumn(view);
            Component header = table.getTableHeader().getDefaultRenderer().getTableCellRendererComponent(table,
                    column.getHeaderValue(), false, false, -1, view);
            Rectangle cell = table.getTableHeader().getHeaderRect(view);
            if (column.getWidth() < header.getPreferredSize().width
                    || table.getTableHeader().getHeight() < header.getPreferredSize().height) {
                faults.add(column.getHeaderValue() + ": header cut, " + column.getWidth() + "x"
                        + table.getTableHeader().getHeight() + " px for " + header.getPreferredSize());
            }
            if (cell.x < seen.x || cell.x + cell.width > seen.x + seen.width) {
                faults.add(column.getHeaderValue() + ": out of view, at " + cell.x + "-" + (cell.x + cell.width)
                        + " px of a view " + seen.x + "-" + (seen.x + seen.width));
            }
        }
        return faults;
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
