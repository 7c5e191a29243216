package barwright.ui.chart;

import barwright.measure.BarRateFit;
import barwright.measure.ReadingRole;
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

/** A bar's load and deflection readings with the fitted line drawn over them (model.md 12.1). Event thread. */
public final class BarRateChart {
    private final XYSeriesCollection data = new XYSeriesCollection();
    private final JFreeChart chart;
    private final ChartPanel panel;

    public BarRateChart() {
        chart = ChartFactory.createXYLineChart("Load against deflection", "Deflection", "Load", data,
                PlotOrientation.VERTICAL, true, true, false);
        ChartStyle.apply(chart);
        panel = ChartStyle.panel(chart, "chart.barRate");
    }

    public JComponent component() {
        return panel;
    }

    /** Draws the readings (used, free play, outliers apart) and the fitted line in the chosen units. */
    public void show(BarRateFit fit, UnitSystem units) {
        DisplayUnit length = Quantity.LENGTH.unit(units);
        DisplayUnit force = Quantity.FORCE.unit(units);
        XYSeries used = new XYSeries("readings used", false);
        XYSeries left = new XYSeries("free play or outlier (left out)", false);
        XYSeries line = new XYSeries("fitted line", false);
        double largest = 0;
        for (int i = 0; i < fit.readings().size(); i++) {
            var reading = fit.readings().get(i);
            largest = Math.max(largest, reading.deflection());
            (fit.roles().get(i) == ReadingRole.FITTED ? used : left).add(length.fromSi(reading.deflection()),
                    force.fromSi(reading.load()));
        }
        line.add(length.fromSi(fit.lash()), 0);
        line.add(length.fromSi(largest), force.fromSi(fit.loadAt(largest)));
        data.removeAllSeries();
        data.addSeries(used);
        data.addSeries(left);
        data.addSeries(line);
        XYPlot plot = chart.getXYPlot();
        ChartStyle.pointsAndFittedLine(plot);
        plot.getDomainAxis().setLabel("Deflection (" + length.symbol() + ")");
        plot.getRangeAxis().setLabel("Load (" + force.symbol() + ")");
    }

    public void clear() {
        data.removeAllSeries();
    }
}
