package barwright.ui.chart;

import barwright.physics.TurnResult;
import barwright.physics.curve.CorneringCurves;
import barwright.ui.field.ViewSettings;
import barwright.ui.task.AnalysisOutcome;
import barwright.ui.task.CorneringProbe;
import barwright.units.Quantity;
import org.jfree.chart.ChartFactory;
import org.jfree.chart.plot.PlotOrientation;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.ui.RectangleAnchor;
import org.jfree.chart.ui.RectangleInsets;
import org.jfree.chart.ui.TextAnchor;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;

import java.awt.BasicStroke;
import java.awt.Color;

/** The handling curve: front minus rear slip angle against lateral acceleration, with both axle limits. */
public final class HandlingChart extends ResultChart {
    private final XYSeriesCollection data;

    public HandlingChart(ViewSettings view, CorneringProbe probe) {
        this(view, probe, new XYSeriesCollection());
    }

    private HandlingChart(ViewSettings view, CorneringProbe probe, XYSeriesCollection data) {
        super(view, probe, ChartFactory.createXYLineChart("Handling", "", "", data, PlotOrientation.VERTICAL,
                true, true, false), "chart.handling");
        this.data = data;
        XYLineAndShapeRenderer renderer = new XYLineAndShapeRenderer(true, false);
        renderer.setSeriesPaint(0, ChartStyle.series(0));
        renderer.setSeriesStroke(0, new BasicStroke(2.2f));
        chart().getXYPlot().setRenderer(renderer);
    }

    @Override
    public String title() {
        return "Handling";
    }

    @Override
    public String fileStem() {
        return "handling-curve";
    }

    @Override
    protected void fill(AnalysisOutcome outcome) {
        TurnResult turn = outcome.result().turn(probe.turn());
        XYSeries curve = Axes.series(CorneringCurves.handling(turn, "Front minus rear slip angle (above zero: understeer)"),
                Quantity.ACCELERATION, Quantity.ANGLE, view);
        data.removeAllSeries();
        data.addSeries(curve);
        XYPlot plot = chart().getXYPlot();
        plot.clearDomainMarkers();
        plot.clearRangeMarkers();
        plot.addDomainMarker(limitMarker("front axle limit", turn.frontLimit(), ChartStyle.series(0)));
        plot.addDomainMarker(limitMarker("rear axle limit", turn.rearLimit(), ChartStyle.series(2)));
        ValueMarker zero = new ValueMarker(0, ChartStyle.text(), new BasicStroke(0.8f));
        plot.addRangeMarker(zero);
        // both axle limits in view: the curve ends at the lower one, the other lies beyond it
        double highest = Axes.shown(Math.max(turn.frontLimit(), turn.rearLimit()), Quantity.ACCELERATION, view);
        plot.getDomainAxis().setAutoRange(false);
        plot.getDomainAxis().setRange(0, Math.max(0.05, highest * 1.08));
        chart().getTitle().setText("Handling in a " + probe.turn().word() + " turn: " + turn.balance().key() + " at the limit");
        plot.getDomainAxis().setLabel(Axes.label("Lateral acceleration a_y", Quantity.ACCELERATION, view));
        plot.getRangeAxis().setLabel(Axes.label("Front slip angle minus rear", Quantity.ANGLE, view));
    }

    private ValueMarker limitMarker(String label, double accel, Color colour) {
        ValueMarker marker = new ValueMarker(Axes.shown(accel, Quantity.ACCELERATION, view), colour,
                new BasicStroke(1.5f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 1f, new float[]{5f, 3f}, 0f));
        marker.setLabel(String.format(view.locale(), "%s %.3f g", label, Axes.shown(accel, Quantity.ACCELERATION,
                view)));
        marker.setLabelPaint(colour);
        marker.setLabelFont(ChartStyle.labelFont());
        boolean front = label.startsWith("front");
        marker.setLabelAnchor(front ? RectangleAnchor.TOP_LEFT : RectangleAnchor.BOTTOM_LEFT);
        marker.setLabelTextAnchor(front ? TextAnchor.TOP_RIGHT : TextAnchor.BOTTOM_RIGHT);
        marker.setLabelOffset(new RectangleInsets(front ? 14 : 4, 4, front ? 4 : 14, 4));
        marker.setLabelBackgroundColor(new Color(0, 0, 0, 0));
        return marker;
    }
}
