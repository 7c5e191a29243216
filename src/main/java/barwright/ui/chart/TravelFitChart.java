package barwright.ui.chart;

import barwright.measure.MotionRatioFit;
import barwright.units.DisplayUnit;
import barwright.units.Quantity;
import barwright.units.UnitSystem;
import org.jfree.chart.ChartFactory;
import org.jfree.chart.ChartPanel;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.plot.PlotOrientation;
import org.jfree.chart.plot.XYPlot;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;

import javax.swing.JComponent;

/** Component travel against wheel travel, the readings and the fitted straight line (model.md 12.2). Event thread. */
public final class TravelFitChart {
    private final XYSeriesCollection data = new XYSeriesCollection();
    private final JFreeChart chart;
    private final ChartPanel panel;

    public TravelFitChart() {
        chart = ChartFactory.createXYLineChart("Component travel against wheel travel", "Wheel travel",
                "Component travel", data, PlotOrientation.VERTICAL, true, true, false);
        ChartStyle.apply(chart);
        panel = ChartStyle.panel(chart, "chart.motionRatio");
    }

    public JComponent component() {
        return panel;
    }

    /**
     * Draws the readings (outliers apart) and the straight line of slope {@code ratio / cosineCorrection}
     * through their mean: the line the ratio was read from, before the cosine correction.
     */
    public void show(MotionRatioFit fit, UnitSystem units) {
        DisplayUnit length = Quantity.LENGTH.unit(units);
        XYSeries used = new XYSeries("readings", false);
        XYSeries outliers = new XYSeries("outliers (look again)", false);
        XYSeries line = new XYSeries("straight-line fit", false);
        double lowest = Double.POSITIVE_INFINITY;
        double highest = Double.NEGATIVE_INFINITY;
        double meanWheel = 0;
        double meanComponent = 0;
        int n = fit.readings().size();
        for (int i = 0; i < n; i++) {
            var reading = fit.readings().get(i);
            lowest = Math.min(lowest, reading.wheelTravel());
            highest = Math.max(highest, reading.wheelTravel());
            meanWheel += reading.wheelTravel() / n;
            meanComponent += reading.componentTravel() / n;
            (fit.outliers().get(i) ? outliers : used).add(length.fromSi(reading.wheelTravel()),
                    length.fromSi(reading.componentTravel()));
        }
        double slope = fit.ratio() / fit.cosineCorrection();
        line.add(length.fromSi(lowest), length.fromSi(meanComponent + slope * (lowest - meanWheel)));
        line.add(length.fromSi(highest), length.fromSi(meanComponent + slope * (highest - meanWheel)));
        data.removeAllSeries();
        data.addSeries(used);
        data.addSeries(outliers);
        data.addSeries(line);
        XYPlot plot = chart.getXYPlot();
        ChartStyle.pointsAndFittedLine(plot);
        plot.getDomainAxis().setLabel("Wheel travel, bump positive (" + length.symbol() + ")");
        plot.getRangeAxis().setLabel("Component travel (" + length.symbol() + ")");
    }

    public void clear() {
        data.removeAllSeries();
    }
}
