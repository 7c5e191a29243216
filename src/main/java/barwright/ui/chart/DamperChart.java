package barwright.ui.chart;

import barwright.model.Damper;
import barwright.units.DisplayUnit;
import barwright.units.Quantity;
import barwright.units.UnitSystem;
import org.jfree.chart.ChartFactory;
import org.jfree.chart.ChartPanel;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.plot.PlotOrientation;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;

import javax.swing.JComponent;
import java.awt.BasicStroke;

/**
 * One axle's damper curve: force against velocity at the damper, and the same curve at the wheel (velocity
 * divided by the motion ratio, force multiplied by it: the work the damper does is the work done at the wheel).
 * Bump is positive, rebound negative, and the axes say so. Event thread.
 */
public final class DamperChart {
    private final XYSeriesCollection data = new XYSeriesCollection();
    private final JFreeChart chart;
    private final ChartPanel panel;

    public DamperChart() {
        chart = ChartFactory.createXYLineChart("Damper force against velocity", "", "", data,
                PlotOrientation.VERTICAL, true, true, false);
        XYPlot plot = chart.getXYPlot();
        XYLineAndShapeRenderer renderer = new XYLineAndShapeRenderer(true, true);
        renderer.setSeriesPaint(0, ChartStyle.series(0));
        renderer.setSeriesStroke(0, new BasicStroke(2.2f));
        renderer.setSeriesPaint(1, ChartStyle.series(2));
        renderer.setSeriesStroke(1, new BasicStroke(1.6f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 1f,
                new float[] {6f, 4f}, 0f));
        plot.setRenderer(renderer);
        plot.addDomainMarker(zeroLine());
        plot.addRangeMarker(zeroLine());
        ChartStyle.apply(chart);
        panel = ChartStyle.panel(chart, "chart.damper");
    }

    private static ValueMarker zeroLine() {
        ValueMarker zero = new ValueMarker(0);
        zero.setPaint(ChartStyle.text());
        zero.setStroke(new BasicStroke(0.8f));
        return zero;
    }

    public JComponent component() {
        return panel;
    }

    public JFreeChart chart() {
        return chart;
    }

    /**
     * Draws an axle's curve at the damper and at the wheel in the chosen units.
     *
     * @param axleWords e.g. "Front"
     */
    public void show(String axleWords, Damper damper, UnitSystem units) {
        DisplayUnit length = Quantity.LENGTH.unit(units);
        DisplayUnit force = Quantity.FORCE.unit(units);
        XYSeries atDamper = new XYSeries("at the damper", false);
        XYSeries atWheel = new XYSeries(String.format(java.util.Locale.ROOT,
                "at the wheel (motion ratio %.2f)", damper.motionRatio()), false);
        double ratio = damper.motionRatio();
        for (int i = 0; i < damper.velocities().size(); i++) {
            double velocity = damper.velocities().get(i);
            double pushed = damper.forces().get(i);
            // velocities in m/s become the length unit per second: mm/s or in/s
            atDamper.add(length.fromSi(velocity), force.fromSi(pushed));
            atWheel.add(length.fromSi(velocity / ratio), force.fromSi(pushed * ratio));
        }
        data.removeAllSeries();
        data.addSeries(atDamper);
        data.addSeries(atWheel);
        XYPlot plot = chart.getXYPlot();
        chart.setTitle(axleWords + " damper: force against velocity");
        plot.getDomainAxis().setLabel("Velocity (" + length.symbol() + "/s): bump +, rebound \u2212");
        plot.getRangeAxis().setLabel("Force (" + force.symbol() + "): bump +, rebound \u2212");
        ChartStyle.apply(chart);
    }

    public void clear(String why) {
        data.removeAllSeries();
        chart.setTitle(why);
        ChartStyle.apply(chart);
    }

    /** @return the number of series drawn (for the window tests) */
    public int seriesCount() {
        return data.getSeriesCount();
    }

    /** @return a drawn point in display units: series 0 at the damper, 1 at the wheel (for the window tests) */
    public double[] point(int series, int index) {
        return new double[] {data.getXValue(series, index), data.getYValue(series, index)};
    }
}
