package barwright.ui.chart;

import barwright.physics.curve.Series;
import barwright.physics.curve.TyreCurves;
import barwright.ui.field.ViewSettings;
import barwright.units.Figures;
import barwright.units.Quantity;
import org.jfree.chart.ChartFactory;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.plot.IntervalMarker;
import org.jfree.chart.plot.PlotOrientation;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.ui.RectangleAnchor;
import org.jfree.chart.ui.TextAnchor;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;

import javax.swing.JComponent;
import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.geom.Ellipse2D;

/**
 * A tyre's peak friction against vertical load (model.md 8.1): the law's line, or the interpolation between the
 * measured points with the points marked and the model's continuation past them dashed over a shaded band; with
 * the axle's static, inside and outside wheel loads at the limit as upright lines. Event thread.
 */
public final class TyreLoadChart {
    private static final String WITHIN = "Peak friction between the measured points";
    private static final String LAW = "Peak friction (the file's law)";
    private static final String BELOW = "Below the measured loads";
    private static final String PAST = "Beyond the measured loads: the model's estimate";
    private static final String POINTS = "Measured points";

    private final ViewSettings view;
    private final XYSeriesCollection data = new XYSeriesCollection();
    private final JFreeChart chart;
    private boolean fromPoints;

    public TyreLoadChart(ViewSettings view) {
        this.view = view;
        chart = ChartFactory.createXYLineChart("Peak friction against load", "", "", data, PlotOrientation.VERTICAL,
                true, true, false);
        style();
    }

    /** @return the chart in a panel named {@code name} */
    public JComponent panel(String name) {
        return ChartStyle.panel(chart, name);
    }

    /**
     * Draws the line and the loads in the chosen units.
     *
     * @param loads the axle's wheel loads at the limit
     */
    public void show(TyreCurves.FrictionLine line, TyreCurves.AxleLoads loads) {
        chart.setNotify(false);
        try {
            data.removeAllSeries();
            fromPoints = line.fromPoints();
            data.addSeries(series(line.withinData(), fromPoints ? WITHIN : LAW));
            if (fromPoints) {
                data.addSeries(series(line.beyond().get(0), BELOW));
                data.addSeries(series(line.beyond().get(1), PAST));
                data.addSeries(series(line.measured(), POINTS));
            }
            XYPlot plot = chart.getXYPlot();
            plot.clearDomainMarkers();
            if (fromPoints) {
                double top = Axes.shown(line.beyond().get(1).x()[line.beyond().get(1).size() - 1], Quantity.FORCE, view);
                plot.addDomainMarker(outsideData(0, Axes.shown(line.lowestData(), Quantity.FORCE, view), null));
                plot.addDomainMarker(outsideData(Axes.shown(line.highestData(), Quantity.FORCE, view), top,
                        "no data here"));
            }
            plot.addDomainMarker(load(loads.staticLoad(), "static", ChartStyle.series(4), RectangleAnchor.BOTTOM_LEFT,
                    TextAnchor.BOTTOM_RIGHT));
            plot.addDomainMarker(load(loads.inside(), "inside at the limit", ChartStyle.series(1),
                    RectangleAnchor.TOP_RIGHT, TextAnchor.TOP_LEFT));
            // the outside label at mid-height, left of its line: it never meets the inside one at the top
            plot.addDomainMarker(load(loads.outside(), "outside at the limit", ChartStyle.series(0),
                    RectangleAnchor.LEFT, TextAnchor.CENTER_RIGHT));
            plot.getDomainAxis().setLabel(Axes.label("Vertical load on the tyre", Quantity.FORCE, view));
            plot.getRangeAxis().setLabel("Peak friction μ (lateral force / load)");
            style();
        } finally {
            chart.setNotify(true);
        }
    }

    private XYSeries series(Series line, String name) {
        return Axes.series(new Series(name, line.x(), line.y()), Quantity.FORCE, Quantity.RATIO, view);
    }

    private ValueMarker load(double si, String words, Color colour, RectangleAnchor anchor, TextAnchor text) {
        ValueMarker marker = new ValueMarker(Axes.shown(si, Quantity.FORCE, view), colour, new BasicStroke(1.5f));
        marker.setLabel(words + " " + Figures.format(si, Quantity.FORCE, view.units(), 0, view.locale()));
        marker.setLabelFont(ChartStyle.labelFont());
        marker.setLabelPaint(ChartStyle.text());
        marker.setLabelBackgroundColor(new Color(0, 0, 0, 0));
        marker.setLabelAnchor(anchor);
        marker.setLabelTextAnchor(text);
        return marker;
    }

    private static IntervalMarker outsideData(double from, double to, String words) {
        Color grid = ChartStyle.text();
        IntervalMarker band = new IntervalMarker(from, to, new Color(grid.getRed(), grid.getGreen(), grid.getBlue(), 28));
        if (words != null) {
            band.setLabel(words);
            band.setLabelFont(ChartStyle.labelFont());
            band.setLabelPaint(ChartStyle.text());
            band.setLabelAnchor(RectangleAnchor.BOTTOM_RIGHT);
            band.setLabelTextAnchor(TextAnchor.BOTTOM_RIGHT);
        }
        return band;
    }

    /** Sets the renderer and the theme's colours again, as after a change of theme. */
    public void style() {
        XYLineAndShapeRenderer renderer = new XYLineAndShapeRenderer(true, false);
        Color line = ChartStyle.series(0);
        renderer.setSeriesPaint(0, line);
        renderer.setSeriesStroke(0, new BasicStroke(2.5f));
        if (fromPoints) {
            BasicStroke dashed = new BasicStroke(2f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 1f,
                    new float[]{7f, 5f}, 0f);
            for (int i = 1; i <= 2; i++) {
                renderer.setSeriesPaint(i, ChartStyle.series(2));
                renderer.setSeriesStroke(i, dashed);
            }
            renderer.setSeriesVisibleInLegend(1, false);
            renderer.setSeriesPaint(3, ChartStyle.text());
            renderer.setSeriesLinesVisible(3, false);
            renderer.setSeriesShapesVisible(3, true);
            renderer.setSeriesShape(3, new Ellipse2D.Double(-4.5, -4.5, 9, 9));
        }
        chart.getXYPlot().setRenderer(renderer);
        ChartStyle.apply(chart);
    }

    /** @return the chart itself, for export and for tests */
    public JFreeChart chart() {
        return chart;
    }
}
