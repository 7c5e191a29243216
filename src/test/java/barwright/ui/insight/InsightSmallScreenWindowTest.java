package barwright.ui.insight;

import barwright.ui.app.Themes;
import barwright.ui.window.WindowFixture;
import org.assertj.swing.edt.GuiActionRunner;
import org.jfree.chart.ChartPanel;
import org.jfree.chart.LegendItem;
import org.jfree.chart.LegendItemCollection;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import javax.swing.JTabbedPane;
import javax.swing.UIManager;
import java.awt.Rectangle;
import java.awt.geom.Rectangle2D;
import java.util.ArrayList;
import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * "Lift, balance, chassis" on a projector at 1024x768 with the largest text (28 points), where the page is
 * some 590 px wide: its three tabs stay on one row, and each chart keeps a plot that can be read.
 */
@Tag("window")
class InsightSmallScreenWindowTest {
    private WindowFixture fixture;
    private InsightPanel panel;

    @BeforeEach
    void open() throws Exception {
        fixture = new WindowFixture(1024, 768, Themes.largestTextSize());
        panel = InsightWindows.panel(fixture.window);
        GuiActionRunner.execute(() -> fixture.window.tabs().setSelectedComponent(panel));
        InsightWindows.settle(fixture.window, panel);
    }

    @AfterEach
    void close() {
        if (fixture != null) {
            fixture.close();
        }
    }

    /**
     * One row of tabs is a line of text and the tab's insets, some 1.5 lines; the three rows they took before were
     * some 170 px, over four lines. Two lines is the bound: a second row would pass it.
     */
    @Test
    void theThreeTabsStayOnOneRow() {
        JTabbedPane tabs = panel.tabs();
        int line = GuiActionRunner.execute(InsightSmallScreenWindowTest::lineHeight);
        int strip = GuiActionRunner.execute(() -> tabs.getSelectedComponent().getY());
        assertThat(GuiActionRunner.execute(tabs::getTabRunCount)).isEqualTo(1);
        assertThat(strip).as("the tab strip's height, lines of %d px", line).isLessThanOrEqualTo(2 * line);
    }

    /**
     * After painting, each chart's plot (the area inside the axes) is at least 300 px wide and 150 px high at
     * 28 points: the page is some 590 px wide, of which the value axis's name and ticks take some 130 px
     * (the chassis chart has one on each side, some 250 px); 150 px high holds four rows of the 28-point tick
     * labels of the vertical axis, the fewest that show a scale. Before, the chassis plot was a 20 px strip.
     */
    @Test
    void eachChartKeepsAPlotThatCanBeRead() throws Exception {
        List<String> small = new ArrayList<>();
        String[] names = {"insight.envelope.chart", "insight.sensitivity.chart", "insight.chassis.chart"};
        for (int tab = 0; tab < names.length; tab++) {
            int index = tab;
            GuiActionRunner.execute(() -> panel.tabs().setSelectedIndex(index));
            InsightWindows.settle(fixture.window, panel);
            ChartPanel chart = (ChartPanel) GuiActionRunner.execute(() ->
                    fixture.robot.finder().findByName(panel, names[index], true));
            Rectangle2D plot = plotArea(chart);
            int least = names[tab].contains("envelope") ? 300 : 250;
            if (plot.getWidth() < least || plot.getHeight() < 150) {
                small.add(names[tab] + ": plot " + Math.round(plot.getWidth()) + " x " + Math.round(plot.getHeight()));
            }
        }
        assertThat(small).isEmpty();
    }

    /** The envelope's legend names what is missing in words that read right, and has no "(no ... yet)" left. */
    @Test
    void theEnvelopeLegendSaysWhatIsNotYetDrawn() {
        LegendItemCollection items = GuiActionRunner.execute(() ->
                panel.envelope().chart().chart().getXYPlot().getLegendItems());
        List<String> labels = new ArrayList<>();
        for (int i = 0; i < items.getItemCount(); i++) {
            LegendItem item = items.get(i);
            labels.add(item.getLabel());
        }
        assertThat(labels).contains("the previous setting: none yet").noneMatch(label -> label.startsWith("(no"));
    }

    /** Paints the chart where it is shown and returns its plot's area (pixels). */
    static Rectangle2D plotArea(ChartPanel chart) throws Exception {
        javax.swing.SwingUtilities.invokeAndWait(() -> {
            Rectangle visible = chart.getVisibleRect();
            chart.paintImmediately(visible);
        });
        return GuiActionRunner.execute(() -> (Rectangle2D) chart.getChartRenderingInfo().getPlotInfo()
                .getDataArea().clone());
    }

    static int lineHeight() {
        return new javax.swing.JLabel().getFontMetrics(UIManager.getFont("Label.font")).getHeight();
    }
}
