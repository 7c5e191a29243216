package barwright.ui.chart;

import org.jfree.chart.ChartFactory;
import org.jfree.chart.ChartPanel;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.Axis;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;
import org.junit.jupiter.api.Test;

import javax.swing.SwingUtilities;
import javax.swing.UIManager;
import javax.swing.plaf.FontUIResource;
import java.awt.Font;
import java.awt.Graphics2D;
import java.awt.geom.Rectangle2D;
import java.awt.image.BufferedImage;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * A vertical axis's name no longer than the plot beside it: JFreeChart draws a longer one past the plot, over
 * the title. Runs headless: the panel is painted into an image.
 */
class AxisNamesTest {
    private static final String LONG_NAME = "Vertical load on the wheel, a long name for a test (N)";

    private static JFreeChart chart(float points) {
        XYSeries line = new XYSeries("line");
        line.add(0, 0);
        line.add(1, 5000);
        JFreeChart chart = ChartFactory.createXYLineChart("A title", "a_y (g)", LONG_NAME,
                new XYSeriesCollection(line));
        Object before = UIManager.get("defaultFont");
        UIManager.put("defaultFont", new FontUIResource(Font.SANS_SERIF, Font.PLAIN, Math.round(points)));
        try {
            ChartStyle.apply(chart); // the axis names at the window's text size, as every chart's are
        } finally {
            UIManager.put("defaultFont", before);
        }
        return chart;
    }

    /** Paints the panel twice (the second time with the font the first drawing chose) and returns the axis. */
    private static Object[] paintedAt(int width, int height, float points) throws Exception {
        Object[] result = new Object[2];
        SwingUtilities.invokeAndWait(() -> {
            Object before = UIManager.get("defaultFont");
            UIManager.put("defaultFont", new FontUIResource(Font.SANS_SERIF, Font.PLAIN, Math.round(points)));
            ChartPanel panel = ChartStyle.panel(chart(points), "test");
            try {
                paint(panel, width, height);
            } finally {
                UIManager.put("defaultFont", before);
            }
            result[0] = panel;
            result[1] = panel.getChart().getXYPlot().getRangeAxis();
        });
        return result;
    }

    private static void paint(ChartPanel panel, int width, int height) {
        panel.setSize(width, height);
        panel.doLayout();
        BufferedImage image = new BufferedImage(width, height, BufferedImage.TYPE_INT_ARGB);
        for (int i = 0; i < 2; i++) {
            Graphics2D g = image.createGraphics();
            panel.paint(g);
            g.dispose();
        }
    }

    @Test
    void aLongNameBesideAShortPlotIsMadeSmallerToFitIt() throws Exception {
        Object[] painted = paintedAt(600, 700, 28);
        ChartPanel panel = (ChartPanel) painted[0];
        Axis axis = (Axis) painted[1];
        Rectangle2D plot = panel.getChartRenderingInfo().getPlotInfo().getDataArea();
        // guards the test itself: at its own 28 pt the name is longer than the plot is high
        assertThat(panel.getFontMetrics(axis.getLabelFont().deriveFont(28f)).stringWidth(LONG_NAME))
                .isGreaterThan((int) plot.getHeight());
        assertThat(axis.getLabel()).isEqualTo(LONG_NAME);
        assertThat(axis.getLabelFont().getSize2D()).isLessThan(28f).isGreaterThanOrEqualTo(AxisNames.SMALLEST_POINTS);
        assertThat(panel.getFontMetrics(axis.getLabelFont()).stringWidth(LONG_NAME)).isLessThanOrEqualTo(
                (int) plot.getHeight());
    }

    @Test
    void aNameTooLongEvenAtTheSmallestSizeGivesWayToItsUnit() throws Exception {
        Object[] painted = paintedAt(600, 200, 28);
        ChartPanel panel = (ChartPanel) painted[0];
        Axis axis = (Axis) painted[1];
        Rectangle2D plot = panel.getChartRenderingInfo().getPlotInfo().getDataArea();
        // guards the test itself: at the smallest size the whole name is longer than the plot is high
        assertThat(panel.getFontMetrics(axis.getLabelFont().deriveFont((float) AxisNames.SMALLEST_POINTS))
                .stringWidth(LONG_NAME)).isGreaterThan((int) plot.getHeight());
        assertThat(axis.getLabel()).isEqualTo("(N)");
        assertThat(panel.getFontMetrics(axis.getLabelFont()).stringWidth("(N)")).isLessThanOrEqualTo(
                (int) plot.getHeight());
        // with room again the whole name comes back, at the size it had
        SwingUtilities.invokeAndWait(() -> {
            Object before = UIManager.get("defaultFont");
            UIManager.put("defaultFont", new FontUIResource(Font.SANS_SERIF, Font.PLAIN, 28));
            try {
                paint(panel, 1600, 1400);
            } finally {
                UIManager.put("defaultFont", before);
            }
        });
        assertThat(axis.getLabel()).isEqualTo(LONG_NAME);
        assertThat(axis.getLabelFont().getSize2D()).isEqualTo(28f);
    }

    @Test
    void aNameThatFitsKeepsTheThemesSize() throws Exception {
        Object[] painted = paintedAt(900, 900, 13);
        assertThat(((Axis) painted[1]).getLabelFont().getSize2D()).isEqualTo(13f);
    }
}
