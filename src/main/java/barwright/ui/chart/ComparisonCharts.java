package barwright.ui.chart;

import barwright.physics.curve.Chart;
import barwright.physics.curve.Series;
import barwright.ui.field.ViewSettings;
import org.jfree.chart.ChartFactory;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.plot.PlotOrientation;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.ui.RectangleInsets;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;

import java.awt.BasicStroke;
import java.awt.Color;

/**
 * A comparison's chart (plain data in SI) drawn with JFreeChart in the units chosen: one colour per setup; where a
 * chart has two lines per setup (inside front and inside rear wheel), the second is dashed.
 */
public final class ComparisonCharts {
    /** Theme series colours far apart from one another, one per setup compared (up to four). */
    private static final int[] SETUP_COLOURS = {0, 2, 4, 5};

    private ComparisonCharts() {
    }

    /**
     * @param setups how many setups the chart's lines belong to
     * @param name   the panel's component name
     * @return the chart drawn in a panel, ready to place in a view
     */
    public static javax.swing.JComponent panel(Chart chart, int setups, ViewSettings view, String name) {
        return ChartStyle.panel(draw(chart, setups, view), name);
    }

    /** @param setups how many setups the chart's lines belong to */
    public static JFreeChart draw(Chart chart, int setups, ViewSettings view) {
        XYSeriesCollection data = new XYSeriesCollection();
        var xUnit = chart.x().unit(view.units());
        var yUnit = chart.y().unit(view.units());
        for (Series series : chart.series()) {
            XYSeries line = new XYSeries(series.name(), false, true);
            double[] x = series.x();
            double[] y = series.y();
            for (int i = 0; i < x.length; i++) {
                line.add(xUnit.fromSi(x[i]), yUnit.fromSi(y[i]));
            }
            data.addSeries(line);
        }
        JFreeChart drawn = ChartFactory.createXYLineChart(chart.title(), label(chart.xLabel(), xUnit.symbol()),
                label(chart.yLabel(), yUnit.symbol()), data, PlotOrientation.VERTICAL, true, true, false);
        XYLineAndShapeRenderer renderer = new XYLineAndShapeRenderer(true, false);
        int perSetup = Math.max(1, chart.series().size() / Math.max(1, setups));
        for (int i = 0; i < chart.series().size(); i++) {
            Color colour = ChartStyle.series(SETUP_COLOURS[(i / perSetup) % SETUP_COLOURS.length]);
            renderer.setSeriesPaint(i, colour);
            renderer.setSeriesStroke(i, i % perSetup == 0 ? new BasicStroke(2.2f)
                    : new BasicStroke(2.2f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 1f, new float[]{7f, 4f}, 0f));
        }
        drawn.getXYPlot().setRenderer(renderer);
        ChartStyle.apply(drawn);
        // room after each setup's name, so that a line's sample does not read as part of the name before it
        drawn.getLegend().setItemLabelPadding(new RectangleInsets(2, 2, 2, 18));
        return drawn;
    }

    private static String label(String words, String unit) {
        return unit.isEmpty() ? words : words + " (" + unit + ")";
    }
}
