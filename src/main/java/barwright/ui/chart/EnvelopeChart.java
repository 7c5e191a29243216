package barwright.ui.chart;

import barwright.insight.EnvelopePoint;
import barwright.insight.LiftBoundary;
import barwright.insight.LiftEnvelopeResult;
import barwright.insight.Wheel;
import barwright.model.AxlePosition;
import barwright.model.TurnDirection;
import org.jfree.chart.ChartFactory;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.annotations.XYTextAnnotation;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.PlotOrientation;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.ui.RectangleAnchor;
import org.jfree.chart.ui.TextAnchor;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;

import java.awt.BasicStroke;
import java.awt.Font;
import java.text.DecimalFormat;

import static barwright.units.Constants.STANDARD_GRAVITY;

/**
 * The lift envelope as a chart in the a_y-a_x plane: lateral acceleration across (a left turn to the left of
 * the centre, a right turn to the right), longitudinal acceleration up (power) and down (braking), both in g.
 * Each inside wheel lifts outside its line.
 */
public final class EnvelopeChart {
    /** Series order: the legend and the colours follow it. */
    public static final int FRONT = 0;
    public static final int REAR = 1;
    public static final int COMPARED_FRONT = 2;
    public static final int COMPARED_REAR = 3;
    public static final int ROLLOVER = 4;
    /** Past this lateral acceleration the chart does not reach (g): the report's "stays down" ceiling. */
    private static final double MOST_LATERAL_G = 3.0;

    private final XYSeriesCollection data = new XYSeriesCollection();
    private final JFreeChart chart;

    public EnvelopeChart() {
        chart = ChartFactory.createXYLineChart("Where an inside wheel lifts: braking, power and cornering", "", "",
                data, PlotOrientation.VERTICAL, true, true, false);
        XYPlot plot = chart.getXYPlot();
        // magnitudes on both sides of the centre: the side says which way the car turns
        ((NumberAxis) plot.getDomainAxis()).setNumberFormatOverride(new DecimalFormat("0.0;0.0"));
        plot.getDomainAxis().setLabel("Lateral acceleration a_y (g)");
        plot.getRangeAxis().setLabel("a_x (g): braking < 0 < power");
        style();
    }

    /** Colours, strokes and fonts from the theme (again after a theme change). */
    public void style() {
        XYLineAndShapeRenderer renderer = new XYLineAndShapeRenderer(true, false);
        BasicStroke solid = new BasicStroke(2.5f);
        BasicStroke dashed = new BasicStroke(2f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 1f,
                new float[]{7f, 5f}, 0f);
        renderer.setSeriesPaint(FRONT, ChartStyle.series(0));
        renderer.setSeriesStroke(FRONT, solid);
        renderer.setSeriesPaint(REAR, ChartStyle.series(2));
        renderer.setSeriesStroke(REAR, solid);
        renderer.setSeriesPaint(COMPARED_FRONT, ChartStyle.series(1));
        renderer.setSeriesStroke(COMPARED_FRONT, dashed);
        renderer.setSeriesPaint(COMPARED_REAR, ChartStyle.series(3));
        renderer.setSeriesStroke(COMPARED_REAR, dashed);
        renderer.setSeriesPaint(ROLLOVER, ChartStyle.text());
        renderer.setSeriesStroke(ROLLOVER, new BasicStroke(1.2f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 1f,
                new float[]{2f, 3f}, 0f));
        chart.getXYPlot().setRenderer(renderer);
        ChartStyle.apply(chart);
    }

    /** @return the chart in a panel named {@code name}, ready to place in a view */
    public javax.swing.JComponent panel(String name) {
        return ChartStyle.panel(chart, name);
    }

    public JFreeChart chart() {
        return chart;
    }

    public XYSeriesCollection data() {
        return data;
    }

    /**
     * @param compared      the envelope to draw dashed beside, or null
     * @param comparedLabel how the legend names it, e.g. "previous setting"
     */
    public void show(LiftEnvelopeResult current, LiftEnvelopeResult compared, String comparedLabel) {
        chart.setNotify(false);
        try {
            data.removeAllSeries();
            data.addSeries(axleSeries("inside front lifts", current, AxlePosition.FRONT));
            data.addSeries(axleSeries("inside rear lifts", current, AxlePosition.REAR));
            if (compared != null) {
                data.addSeries(axleSeries("inside front, " + comparedLabel, compared, AxlePosition.FRONT));
                data.addSeries(axleSeries("inside rear, " + comparedLabel, compared, AxlePosition.REAR));
            } else {
                data.addSeries(new XYSeries(comparedLabel + ": none yet", false, true));
                data.addSeries(new XYSeries(" ", false, true));
            }
            data.addSeries(rolloverSeries(current));
            marks(current, compared);
            style();
            XYLineAndShapeRenderer renderer = (XYLineAndShapeRenderer) chart.getXYPlot().getRenderer();
            renderer.setSeriesVisibleInLegend(COMPARED_REAR, compared != null);
        } finally {
            chart.setNotify(true);
        }
    }

    /** Both inside wheels of an axle in one series: the left turn's on the left, a gap, the right turn's. */
    private static XYSeries axleSeries(String name, LiftEnvelopeResult envelope, AxlePosition axle) {
        XYSeries series = new XYSeries(name, false, true);
        for (Wheel wheel : Wheel.values()) {
            if (wheel.axle() != axle) {
                continue;
            }
            if (!series.isEmpty()) {
                series.add(0.0, null);
            }
            addBoundary(series, envelope.boundary(wheel), point -> true);
        }
        return series;
    }

    /** Where the second inside wheel lifts and the car rolls over, over the current setting's lines. */
    private static XYSeries rolloverSeries(LiftEnvelopeResult envelope) {
        XYSeries series = new XYSeries("both inside wheels up: rollover", false, true);
        for (Wheel wheel : Wheel.values()) {
            series.add(0.0, null);
            addBoundary(series, envelope.boundary(wheel), EnvelopePoint::rollover);
        }
        return series;
    }

    private static void addBoundary(XYSeries series, LiftBoundary boundary,
                                    java.util.function.Predicate<EnvelopePoint> drawn) {
        double side = boundary.wheel().insideIn() == TurnDirection.LEFT ? -1 : 1;
        boolean gap = false;
        for (EnvelopePoint point : boundary.points()) {
            double lateral = point.lateralAcceleration() / STANDARD_GRAVITY;
            double longitudinal = point.longitudinalAcceleration() / STANDARD_GRAVITY;
            if (lateral > MOST_LATERAL_G || !drawn.test(point)) {
                if (!gap) {
                    series.add(side * MOST_LATERAL_G, null);
                    gap = true;
                }
                continue;
            }
            gap = false;
            series.add(side * lateral, longitudinal);
        }
    }

    private void marks(LiftEnvelopeResult current, LiftEnvelopeResult compared) {
        XYPlot plot = chart.getXYPlot();
        plot.clearDomainMarkers();
        plot.clearRangeMarkers();
        plot.clearAnnotations();
        double left = current.limit(TurnDirection.LEFT) / STANDARD_GRAVITY;
        double right = current.limit(TurnDirection.RIGHT) / STANDARD_GRAVITY;
        plot.addDomainMarker(limitMarker(-left, RectangleAnchor.TOP_LEFT, TextAnchor.TOP_RIGHT));
        plot.addDomainMarker(limitMarker(right, RectangleAnchor.TOP_RIGHT, TextAnchor.TOP_LEFT));
        ValueMarker straight = new ValueMarker(0, ChartStyle.text(), new BasicStroke(0.8f));
        plot.addRangeMarker(straight);
        plot.addDomainMarker(new ValueMarker(0, ChartStyle.text(), new BasicStroke(0.8f)));
        double reach = Math.max(left, right) * 1.35;
        for (LiftEnvelopeResult envelope : compared == null ? java.util.List.of(current)
                : java.util.List.of(current, compared)) {
            for (LiftBoundary boundary : envelope.boundaries()) {
                for (EnvelopePoint point : boundary.points()) {
                    double lateral = point.lateralAcceleration() / STANDARD_GRAVITY;
                    if (lateral <= 2.0) {
                        reach = Math.max(reach, lateral + 0.1);
                    }
                }
            }
        }
        reach = Math.ceil(reach * 10) / 10;
        plot.getDomainAxis().setRange(-reach, reach);
        double low = current.mostBraking() / STANDARD_GRAVITY;
        double high = current.mostAcceleration() / STANDARD_GRAVITY;
        plot.getRangeAxis().setRange(low - 0.05, high + 0.12);
        Font font = ChartStyle.labelFont().deriveFont(Font.BOLD);
        XYTextAnnotation leftTurn = new XYTextAnnotation("← turning left", -reach * 0.55, high + 0.06);
        XYTextAnnotation rightTurn = new XYTextAnnotation("turning right →", reach * 0.55, high + 0.06);
        for (XYTextAnnotation label : new XYTextAnnotation[]{leftTurn, rightTurn}) {
            label.setFont(font);
            label.setPaint(ChartStyle.text());
            plot.addAnnotation(label);
        }
    }

    private static ValueMarker limitMarker(double at, RectangleAnchor anchor, TextAnchor text) {
        ValueMarker marker = new ValueMarker(at, ChartStyle.series(4), new BasicStroke(1.5f,
                BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 1f, new float[]{4f, 3f}, 0f));
        marker.setLabel(String.format(java.util.Locale.ROOT, "limit %.2f g", Math.abs(at)));
        marker.setLabelPaint(ChartStyle.series(4));
        marker.setLabelFont(ChartStyle.labelFont());
        marker.setLabelBackgroundColor(new java.awt.Color(0, 0, 0, 0));
        marker.setLabelAnchor(anchor == RectangleAnchor.TOP_LEFT ? RectangleAnchor.BOTTOM_RIGHT : RectangleAnchor.BOTTOM_LEFT);
        marker.setLabelTextAnchor(text == TextAnchor.TOP_RIGHT ? TextAnchor.BOTTOM_LEFT : TextAnchor.BOTTOM_RIGHT);
        return marker;
    }
}
