package barwright.ui.sizing;

import barwright.ui.app.Themes;
import org.assertj.swing.edt.GuiActionRunner;
import org.assertj.swing.fixture.DialogFixture;
import org.jfree.chart.ChartPanel;
import org.jfree.chart.ChartRenderingInfo;
import org.jfree.chart.entity.LegendItemEntity;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import javax.swing.JTabbedPane;
import java.awt.Rectangle;
import java.awt.geom.Rectangle2D;
import java.awt.image.BufferedImage;
import java.util.ArrayList;
import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * The compare view on a 1024x768 screen with the largest text size (club hatchback sample, invented data): the
 * setups and the results are two tabs, each with the view's whole room; a comparison made turns to the results;
 * with the open car and two variants built in the variant builder, every setup's name shows whole over its column
 * and a chart has room to be read with its whole legend inside it.
 */
@Tag("window")
class CompareSmallScreenWindowTest {
    /**
     * The least plot (data area) a chart keeps, in pixels. Wide: at 1024 px the chart takes the view's width, and
     * beside the figures (the layout before) it had under 400 px. High: with 28-point text a tick label is about
     * 33 px, so 180 px holds five lines of ticks on the value axis, enough to read a curve's values against.
     */
    private static final int PLOT_WIDTH = 600;
    private static final int PLOT_HEIGHT = 180;
    private SizingWindowFixture fixture;

    @AfterEach
    void close() {
        if (fixture != null) {
            fixture.close();
        }
    }

    @Test
    void withTheLargestTextAt1024By768ThreeSetupsShowWholeHeadersAndAChartWithItsLegend() {
        fixture = new SizingWindowFixture(1024, 768, Themes.largestTextSize());
        DialogFixture sizing = fixture.openToolAtScreenSize("Compare setups…");
        fixture.robot.waitForIdle();
        CompareView view = fixture.views().compare();
        assertThat(GuiActionRunner.execute(view::setupsAndResultsTabbed)).isTrue();

        sizing.textBox("compare.name").deleteText().enterText("as it is");
        sizing.button("compare.addOpen").click();
        sizing.comboBox("compare.what").selectItem("Rear bar — " + VariantChoices.ARM_HOLE);
        sizing.comboBox("compare.hole").selectItem(0);
        sizing.button("compare.addChange").click();
        sizing.textBox("compare.name").deleteText().enterText("rear bar hole 1");
        sizing.button("compare.addVariant").click();
        fixture.waitFor("two setups compared", () -> view.work().isIdle() && view.shown() != null
                && view.shown().configurations().size() == 2);
        // a comparison made turns to the results; the setups are one click away
        assertThat(GuiActionRunner.execute(() -> view.figureTable().isShowing())).isTrue();
        sizing.tabbedPane("compare.settingsOrResults").selectTab("Setups");
        sizing.comboBox("compare.what").selectItem("Front bar — Outside diameter");
        sizing.textBox("compare.value").deleteText().enterText("25");
        sizing.button("compare.addChange").click();
        sizing.comboBox("compare.what").selectItem("Front axle — Spring rate");
        sizing.textBox("compare.value").deleteText().enterText("80");
        sizing.button("compare.addChange").click();
        sizing.textBox("compare.name").deleteText().enterText("front bar 25 mm, springs 80");
        sizing.button("compare.addVariant").click();
        fixture.waitFor("three setups compared", () -> view.work().isIdle() && view.shown() != null
                && view.shown().configurations().size() == 3);
        fixture.robot.waitForIdle();

        assertThat(GuiActionRunner.execute(() -> view.figureTable().isShowing())).isTrue();
        List<String> cut = GuiActionRunner.execute(() -> SizingWindowFixture.cutColumns(view.figureTable()));
        assertThat(cut).isEmpty();
        assertThat(GuiActionRunner.execute(() -> view.figureTable().getColumnCount())).isEqualTo(4);

        // the chart with the most legend items: two lines (inside front, inside rear) per setup
        JTabbedPane charts = GuiActionRunner.execute(view::charts);
        GuiActionRunner.execute(() -> {
            charts.setSelectedIndex(charts.indexOfTab("Inside wheel loads"));
            return null;
        });
        fixture.robot.waitForIdle();
        List<String> faults = GuiActionRunner.execute(() -> {
            ChartPanel panel = (ChartPanel) charts.getSelectedComponent();
            List<String> found = new ArrayList<>();
            if (!panel.isShowing()) {
                found.add("the chart is not in view");
                return found;
            }
            int width = panel.getWidth();
            int height = panel.getHeight();
            ChartRenderingInfo info = new ChartRenderingInfo();
            BufferedImage image = new BufferedImage(width, height, BufferedImage.TYPE_INT_RGB);
            var graphics = image.createGraphics();
            panel.getChart().draw(graphics, new Rectangle2D.Double(0, 0, width, height), info);
            graphics.dispose();
            Rectangle2D plot = info.getPlotInfo().getDataArea();
            if (plot.getWidth() < PLOT_WIDTH || plot.getHeight() < PLOT_HEIGHT) {
                found.add("the plot is " + plot.getWidth() + " x " + plot.getHeight() + " px in a chart of "
                        + width + " x " + height);
            }
            int items = 0;
            Rectangle chart = new Rectangle(0, 0, width, height);
            for (Object entity : info.getEntityCollection().getEntities()) {
                if (entity instanceof LegendItemEntity legend) {
                    items++;
                    Rectangle2D area = legend.getArea().getBounds2D();
                    if (!chart.contains(area)) {
                        found.add("legend item " + legend.getSeriesKey() + " at " + area + " outside " + chart);
                    }
                    if (area.intersects(plot)) {
                        found.add("legend item " + legend.getSeriesKey() + " over the plot");
                    }
                }
            }
            int lines = panel.getChart().getXYPlot().getDataset().getSeriesCount();
            if (items != lines) {
                found.add(items + " legend items for " + lines + " lines");
            }
            return found;
        });
        assertThat(faults).isEmpty();
    }
}
