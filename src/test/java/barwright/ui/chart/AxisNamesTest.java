package barwright.ui.chart;

import org.jfree.chart.ChartFactory;
import org.jfree.chart.ChartPanel;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.Axis;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;
import org.junit.jupiter.api.Test;

import javax.swing.SwingUtilities;
import java.awt.Font;
import java.awt.Graphics2D;
import java.awt.geom.Rectangle2D;
import java.awt.image.BufferedImage;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * A vertical axis's name no longer than the plot beside it: JFreeChart draws a longer one past the plot, over
 * the title. Runs headless: the panel is painted into an image.
 */
class VerticalAxisLabelsTest {
    private static final String LONG_NAME = "Vertical load on the wheel (N), a long name";

    private static JFreeChart chart(float points) {
        XYSeries line = new XYSeries("line");
        line.add(0, 0);
        line.add(1, 5000);
        JFreeChart chart = ChartFactory.createXYLineChart("A title", "a_y (g)", LONG_NAME,
                new XYSeriesCollection(line));
        chart.getXYPlot().getRangeAxis().setLabelFont(new Font(Font.SANS_SERIF, Font.PLAIN, Math.round(points)));
        return chart;
    }

    /** Paints the panel twice (the second time with the font the first drawing chose) and returns the axis. */
    private static Object[] paintedAt(int width, int height, float points) throws Exception {
        Object[] result = new Object[2];
        SwingUtilities.invokeAndWait(() -> {
            ChartPanel panel = ChartStyle.panel(chart(points), "test");
            panel.setSize(width, height);
            panel.doLayout();
            BufferedImage image = new BufferedImage(width, height, BufferedImage.TYPE_INT_ARGB);
            for (int i = 0; i < 2; i++) {
                Graphics2D g = image.createGraphics();
                panel.paint(g);
                g.dispose();
            }
            result[0] = panel;
            result[1] = panel.getChart().getXYPlot().getRangeAxis();
        });
        return result;
    }

    @Test
    void aLongNameBesideAShortPlotIsMadeSmallerToFitIt() throws Exception {
        Object[] painted = paintedAt(600, 260, 28);
        ChartPanel panel = (ChartPanel) painted[0];
        Axis axis = (Axis) painted[1];
        Rectangle2D plot = panel.getChartRenderingInfo().getPlotInfo().getDataArea();
        double nameLength = panel.getFontMetrics(axis.getLabelFont()).stringWidth(LONG_NAME);
        assertThat(axis.getLabelFont().getSize2D()).isLessThan(28f);
        // the name fits the plot's height, unless the smallest size allowed is reached
        assertThat(nameLength <= plot.getHeight()
                || axis.getLabelFont().getSize() == VerticalAxisLabels.SMALLEST_POINTS).isTrue();
    }

    @Test
    void aNameThatFitsKeepsTheThemesSize() throws Exception {
        Object[] painted = paintedAt(900, 900, 13);
        assertThat(((Axis) painted[1]).getLabelFont().getSize2D()).isEqualTo(13f);
    }
}
