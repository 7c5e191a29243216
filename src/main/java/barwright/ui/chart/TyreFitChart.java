package barwright.ui.chart;

import barwright.io.FileWriteException;
import barwright.tyrefit.CurveFit;
import barwright.tyrefit.TyreFit;
import barwright.tyrefit.TyreMeasurement;
import barwright.units.DisplayUnit;
import barwright.units.Quantity;
import barwright.units.UnitSystem;
import org.jfree.chart.ChartFactory;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.plot.PlotOrientation;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.title.TextTitle;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;

import java.awt.BasicStroke;
import java.awt.geom.Ellipse2D;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;

import static barwright.units.Constants.RADIANS_PER_DEGREE;

/**
 * A tyre fit over its data: the measured lateral force against slip angle as dots and each fitted curve as a
 * line of the same colour. It draws without a window, so the command line can write it as a PNG.
 */
public final class TyreFitChart {
    private TyreFitChart() {
    }

    /** @return the chart: the fitted curves as lines (in the legend), the measurements as dots of their colour */
    public static JFreeChart of(TyreFit fit, List<TyreMeasurement> data) {
        return of(fit, data, Quantity.FORCE.unit(UnitSystem.SI));
    }

    /** @return the same chart with the forces (and the curves' names) in a display unit, N or lbf */
    public static JFreeChart of(TyreFit fit, List<TyreMeasurement> data, DisplayUnit force) {
        XYSeriesCollection series = new XYSeriesCollection();
        XYLineAndShapeRenderer renderer = new XYLineAndShapeRenderer();
        int index = 0;
        for (CurveFit curve : fit.curves()) {
            String name = String.format(Locale.ROOT, "%.0f %s, camber %.1f°", force.fromSi(curve.load()),
                    force.symbol(), curve.camber() / RADIANS_PER_DEGREE);
            XYSeries line = new XYSeries(name + " fit", false);
            XYSeries dots = new XYSeries(name + " measured", false);
            double widest = 0;
            for (TyreMeasurement row : data) {
                if (row.load() == curve.load() && row.camber() == curve.camber()) {
                    dots.add(row.slipAngle() / RADIANS_PER_DEGREE, force.fromSi(row.lateralForce()));
                    widest = Math.max(widest, Math.abs(row.slipAngle()));
                }
            }
            for (int k = -100; k <= 100; k++) {
                double slip = widest * k / 100;
                line.add(slip / RADIANS_PER_DEGREE, force.fromSi(curve.formula().force(slip)));
            }
            series.addSeries(line);
            series.addSeries(dots);
            java.awt.Color colour = ChartStyle.distinct(index);
            renderer.setSeriesPaint(2 * index, colour);
            renderer.setSeriesPaint(2 * index + 1, colour);
            renderer.setSeriesLinesVisible(2 * index, true);
            renderer.setSeriesShapesVisible(2 * index, false);
            renderer.setSeriesStroke(2 * index, new BasicStroke(2f));
            renderer.setSeriesLinesVisible(2 * index + 1, false);
            renderer.setSeriesShapesVisible(2 * index + 1, true);
            renderer.setSeriesShape(2 * index + 1, new Ellipse2D.Double(-2.5, -2.5, 5, 5));
            renderer.setSeriesVisibleInLegend(2 * index + 1, false);
            index++;
        }
        JFreeChart chart = ChartFactory.createXYLineChart("Tyre fit: lateral force against slip angle",
                "Slip angle (deg)", "Lateral force (" + force.symbol() + ")", series, PlotOrientation.VERTICAL, true, false, false);
        XYPlot plot = chart.getXYPlot();
        plot.setRenderer(renderer);
        double worst = fit.curves().stream().mapToDouble(CurveFit::worstShareOfPeak).max().orElse(0);
        chart.addSubtitle(new TextTitle(String.format(Locale.ROOT, "Lines: Magic Formula fits; dots: measured. "
                + "Worst residual %.1f %% of a curve's peak.", 100 * worst)));
        ChartStyle.apply(chart);
        return chart;
    }

    /** Writes the chart as PNG (or SVG for a name ending in .svg), atomically. */
    public static void write(TyreFit fit, List<TyreMeasurement> data, Path target) throws FileWriteException {
        ChartExport.write(of(fit, data), target);
    }
}
