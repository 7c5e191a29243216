package barwright.ui.chart;

import barwright.physics.curve.TyreCurves;
import barwright.ui.field.ViewSettings;
import barwright.units.Quantity;
import org.jfree.chart.ChartFactory;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.PlotOrientation;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.ui.RectangleAnchor;
import org.jfree.chart.ui.TextAnchor;
import org.jfree.data.xy.XYSeriesCollection;

import javax.swing.JComponent;
import java.awt.BasicStroke;
import java.awt.Color;

/**
 * The camber effect of a tyre at one load (model.md 8.2): the peak friction (left scale) and the camber thrust
 * at zero slip (right scale) against the camber to the road, with the best camber marked. Event thread.
 */
public final class TyreCamberChart {
    private final ViewSettings view;
    private final XYSeriesCollection friction = new XYSeriesCollection();
    private final XYSeriesCollection thrust = new XYSeriesCollection();
    private final JFreeChart chart;

    public TyreCamberChart(ViewSettings view) {
        this.view = view;
        chart = ChartFactory.createXYLineChart("Camber effect", "", "", friction, PlotOrientation.VERTICAL, true,
                true, false);
        XYPlot plot = chart.getXYPlot();
        NumberAxis thrustAxis = new NumberAxis("");
        plot.setRangeAxis(1, thrustAxis);
        plot.setDataset(1, thrust);
        plot.mapDatasetToRangeAxis(1, 1);
        ((NumberAxis) plot.getRangeAxis(0)).setAutoRangeIncludesZero(false);
        style();
    }

    /** @return the chart in a panel named {@code name} */
    public JComponent panel(String name) {
        return ChartStyle.panel(chart, name);
    }

    /** @param loadWords e.g. "at the static load" */
    public void show(TyreCurves.CamberEffect effect, String loadWords) {
        chart.setNotify(false);
        try {
            friction.removeAllSeries();
            thrust.removeAllSeries();
            friction.addSeries(Axes.series(effect.friction(), Quantity.ANGLE, Quantity.RATIO, view));
            thrust.addSeries(Axes.series(effect.thrust(), Quantity.ANGLE, Quantity.FORCE, view));
            XYPlot plot = chart.getXYPlot();
            plot.clearDomainMarkers();
            ValueMarker best = new ValueMarker(Axes.shown(effect.best(), Quantity.ANGLE, view), ChartStyle.series(4),
                    new BasicStroke(1.5f));
            best.setLabel(String.format(view.locale(), "best camber %.1f°", Axes.shown(effect.best(), Quantity.ANGLE,
                    view)));
            best.setLabelFont(ChartStyle.labelFont());
            best.setLabelPaint(ChartStyle.text());
            best.setLabelBackgroundColor(new Color(0, 0, 0, 0));
            best.setLabelAnchor(effect.best() < 0 ? RectangleAnchor.TOP_RIGHT : RectangleAnchor.TOP_LEFT);
            best.setLabelTextAnchor(effect.best() < 0 ? TextAnchor.TOP_LEFT : TextAnchor.TOP_RIGHT);
            plot.addDomainMarker(best);
            chart.getTitle().setText("Camber effect " + loadWords);
            plot.getDomainAxis().setLabel(Axes.label("Camber to the road (negative: top leans in)", Quantity.ANGLE,
                    view));
            plot.getRangeAxis(0).setLabel("Peak friction μ (left scale)");
            plot.getRangeAxis(1).setLabel(Axes.label("Camber thrust (right scale)", Quantity.FORCE, view));
            style();
        } finally {
            chart.setNotify(true);
        }
    }

    /** Sets the renderers and the theme's colours again, as after a change of theme. */
    public void style() {
        XYLineAndShapeRenderer frictionRenderer = new XYLineAndShapeRenderer(true, false);
        frictionRenderer.setSeriesPaint(0, ChartStyle.series(0));
        frictionRenderer.setSeriesStroke(0, new BasicStroke(2.5f));
        XYLineAndShapeRenderer thrustRenderer = new XYLineAndShapeRenderer(true, false);
        thrustRenderer.setSeriesPaint(0, ChartStyle.series(2));
        thrustRenderer.setSeriesStroke(0, new BasicStroke(2f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 1f,
                new float[]{6f, 4f}, 0f));
        chart.getXYPlot().setRenderer(0, frictionRenderer);
        chart.getXYPlot().setRenderer(1, thrustRenderer);
        ChartStyle.apply(chart);
    }

    /** @return the chart itself, for export and for tests */
    public JFreeChart chart() {
        return chart;
    }
}
