package barwright.ui.chart;

import barwright.physics.curve.Series;
import barwright.ui.field.ViewSettings;
import barwright.units.Quantity;
import org.jfree.chart.ChartFactory;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.plot.PlotOrientation;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.data.xy.XYSeriesCollection;

import javax.swing.JComponent;
import java.awt.BasicStroke;
import java.awt.Color;
import java.util.List;

/**
 * A tyre's lateral force against slip angle (the Magic Formula, model.md 8) at the axle's static, inside and
 * outside wheel loads at the limit: how much more the outside tyre gives, and how much less the inside one
 * loses, than the load moved between them. Event thread.
 */
public final class TyreSlipChart {
    private final ViewSettings view;
    private final XYSeriesCollection data = new XYSeriesCollection();
    private final JFreeChart chart;

    public TyreSlipChart(ViewSettings view) {
        this.view = view;
        chart = ChartFactory.createXYLineChart("Lateral force against slip angle", "", "", data,
                PlotOrientation.VERTICAL, true, true, false);
        style();
    }

    /** @return the chart in a panel named {@code name} */
    public JComponent panel(String name) {
        return ChartStyle.panel(chart, name);
    }

    /**
     * @param lines  static, inside and outside curves in SI (rad, N), in that order
     * @param camber words on the camber the curves are drawn at, e.g. "zero camber", or ""
     */
    public void show(List<Series> lines, String camber) {
        chart.setNotify(false);
        try {
            data.removeAllSeries();
            lines.forEach(line -> data.addSeries(Axes.series(line, Quantity.ANGLE, Quantity.FORCE, view)));
            chart.getTitle().setText("Force against slip angle" + (camber.isEmpty() ? "" : " (" + camber + ")"));
            chart.getXYPlot().getDomainAxis().setLabel(Axes.label("Slip angle", Quantity.ANGLE, view));
            chart.getXYPlot().getRangeAxis().setLabel(Axes.label("Lateral force", Quantity.FORCE, view));
            style();
        } finally {
            chart.setNotify(true);
        }
    }

    /** Sets the renderer and the theme's colours again, as after a change of theme. */
    public void style() {
        XYLineAndShapeRenderer renderer = new XYLineAndShapeRenderer(true, false);
        Color[] colours = {ChartStyle.series(4), ChartStyle.series(1), ChartStyle.series(0)};
        for (int i = 0; i < colours.length; i++) {
            renderer.setSeriesPaint(i, colours[i]);
            renderer.setSeriesStroke(i, new BasicStroke(i == 0 ? 2f : 2.5f));
        }
        chart.getXYPlot().setRenderer(renderer);
        ChartStyle.apply(chart);
    }

    /** @return the chart itself, for export and for tests */
    public JFreeChart chart() {
        return chart;
    }
}
