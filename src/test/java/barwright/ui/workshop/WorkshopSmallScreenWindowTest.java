package barwright.ui.workshop;

import barwright.ui.NamedComponents;
import barwright.ui.app.Themes;
import barwright.ui.window.WindowFixture;
import org.assertj.swing.edt.GuiActionRunner;
import org.jfree.chart.ChartPanel;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import javax.swing.JComponent;
import javax.swing.JTabbedPane;
import javax.swing.JTable;
import javax.swing.SwingUtilities;
import javax.swing.UIManager;
import javax.swing.table.TableColumn;
import java.awt.Component;
import java.awt.geom.Rectangle2D;
import java.util.ArrayList;
import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * The workshop on a projector at 1024x768 with the largest text (28 points), where the page is some 590 px
 * wide: its four tabs stay on one row, the readings tables' column names are whole and in view, and the charts
 * of the fits keep a plot that can be read (before, the bar rate's chart was a squashed title with no plot).
 */
@Tag("window")
class WorkshopSmallScreenWindowTest {
    /** Invented readings: 30 N/mm past 1 mm of free play. */
    private static final String BAR_READINGS = "0\t0\n0\t0.5\n60\t3\n120\t5\n180\t7\n240\t9\n300\t11\n";
    /** Invented readings: a ratio of 0.6 with one reading off the line. */
    private static final String TRAVEL_READINGS = "-40\t-24\n-20\t-12\n0\t0\n20\t12\n40\t29\n60\t36\n";
    private WindowFixture fixture;
    private JTabbedPane pages;

    @BeforeEach
    void open() {
        fixture = new WindowFixture(1024, 768, Themes.largestTextSize());
        pages = GuiActionRunner.execute(() -> {
            JTabbedPane tabs = fixture.window.tabs();
            for (int i = 0; i < tabs.getTabCount(); i++) {
                if ("Workshop".equals(tabs.getTitleAt(i))) {
                    tabs.setSelectedIndex(i);
                }
            }
            return (JTabbedPane) NamedComponents.find(fixture.window, "workshop.pages");
        });
        GuiActionRunner.execute(() -> {
            ((BarRatePage) NamedComponents.find(fixture.window, "workshop.page")).paste(BAR_READINGS);
            ((MotionRatioPage) NamedComponents.find(fixture.window, "motionRatio.page")).paste(TRAVEL_READINGS);
        });
        fixture.robot.waitForIdle();
    }

    @AfterEach
    void close() {
        if (fixture != null) {
            fixture.close();
        }
    }

    /**
     * One row of tabs is a line of text and the tab's insets, some 1.5 lines; the two rows they took before were
     * over three lines. Two lines is the bound: a second row would pass it.
     */
    @Test
    void theFourTabsStayOnOneRow() {
        int line = GuiActionRunner.execute(WorkshopSmallScreenWindowTest::lineHeight);
        int strip = GuiActionRunner.execute(() -> pages.getSelectedComponent().getY());
        assertThat(GuiActionRunner.execute(pages::getTabRunCount)).isEqualTo(1);
        assertThat(strip).as("the tab strip's height, lines of %d px", line).isLessThanOrEqualTo(2 * line);
    }

    /**
     * Each column's name, as the header draws it, is no wider than its column (else it is cut to "L..."), and
     * every column is in view without scrolling sideways.
     */
    @Test
    void theReadingsTablesShowEveryColumnNameWhole() {
        List<String> cut = new ArrayList<>();
        String[] tables = {"workshop.readings", "motionRatio.readings"};
        for (int page = 0; page < tables.length; page++) {
            int index = page;
            GuiActionRunner.execute(() -> pages.setSelectedIndex(index));
            fixture.robot.waitForIdle();
            cut.addAll(GuiActionRunner.execute(() -> cutNames(
                    (JTable) NamedComponents.find(fixture.window, tables[index]))));
        }
        assertThat(cut).isEmpty();
    }

    private static List<String> cutNames(JTable table) {
        List<String> cut = new ArrayList<>();
        for (int i = 0; i < table.getColumnCount(); i++) {
            TableColumn column = table.getColumnModel().getColumn(i);
            Component name = table.getTableHeader().getDefaultRenderer().getTableCellRendererComponent(table,
                    column.getHeaderValue(), false, false, -1, i);
            if (name.getPreferredSize().width > column.getWidth()) {
                cut.add(table.getName() + " " + column.getHeaderValue() + ": " + name.getPreferredSize().width
                        + " px in a column of " + column.getWidth());
            }
        }
        int shown = table.getParent().getWidth();
        if (table.getWidth() > shown) {
            cut.add(table.getName() + ": " + table.getWidth() + " px of columns in " + shown + " px of view");
        }
        return cut;
    }

    /**
     * After painting, each fit's chart has a plot (the area inside its axes) at least 300 px wide and 150 px
     * high: the page is some 570 px wide, of which the load axis's name and ticks take some 130 px at 28 points;
     * 150 px high holds four rows of the 28-point tick labels, the fewest that show a scale.
     */
    @Test
    void eachFitsChartKeepsAPlotThatCanBeRead() throws Exception {
        List<String> small = new ArrayList<>();
        String[] charts = {"chart.barRate", "chart.motionRatio"};
        for (int page = 0; page < charts.length; page++) {
            int index = page;
            GuiActionRunner.execute(() -> pages.setSelectedIndex(index));
            fixture.robot.waitForIdle();
            ChartPanel chart = GuiActionRunner.execute(() ->
                    (ChartPanel) NamedComponents.find((java.awt.Container) pages.getSelectedComponent(), charts[index]));
            GuiActionRunner.execute(() -> chart.scrollRectToVisible(new java.awt.Rectangle(chart.getSize())));
            fixture.robot.waitForIdle();
            Rectangle2D plot = plotArea(chart);
            if (plot.getWidth() < 300 || plot.getHeight() < 150) {
                small.add(charts[index] + ": plot " + Math.round(plot.getWidth()) + " x " + Math.round(plot.getHeight()));
            }
        }
        assertThat(small).isEmpty();
    }

    /** Paints the chart where it is shown and returns its plot's area (pixels). */
    private static Rectangle2D plotArea(ChartPanel chart) throws Exception {
        SwingUtilities.invokeAndWait(() -> chart.paintImmediately(chart.getVisibleRect()));
        return GuiActionRunner.execute(() -> (Rectangle2D) chart.getChartRenderingInfo().getPlotInfo()
                .getDataArea().clone());
    }

    private static int lineHeight() {
        return new JComponent() { }.getFontMetrics(UIManager.getFont("Label.font")).getHeight();
    }
}
