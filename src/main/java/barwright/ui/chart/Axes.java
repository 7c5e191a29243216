package barwright.ui.chart;

import barwright.physics.curve.Series;
import barwright.ui.field.ViewSettings;
import barwright.units.Quantity;
import org.jfree.data.xy.XYSeries;

/** Axis labels and series in the display units of the chosen system. */
final class Axes {
    private Axes() {
    }

    /** @return e.g. "Lateral acceleration a_y (g)" */
    static String label(String words, Quantity quantity, ViewSettings view) {
        String symbol = quantity.unit(view.units()).symbol();
        return symbol.isEmpty() ? words : words + " (" + symbol + ")";
    }

    /** @return the SI line as a chart series in the display units of the chosen system */
    static XYSeries series(Series line, Quantity x, Quantity y, ViewSettings view) {
        XYSeries series = new XYSeries(line.name());
        double[] xs = line.x();
        double[] ys = line.y();
        for (int i = 0; i < xs.length; i++) {
            series.add(shown(xs[i], x, view), shown(ys[i], y, view));
        }
        return series;
    }

    /** @return the SI value in the display unit of the chosen system */
    static double shown(double si, Quantity quantity, ViewSettings view) {
        return quantity.unit(view.units()).fromSi(si);
    }
}
