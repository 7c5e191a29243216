package barwright.ui.chart;

import barwright.model.TurnDirection;
import barwright.physics.TurnResult;
import barwright.physics.curve.CorneringCurves;
import barwright.physics.curve.Series;
import barwright.ui.field.ViewSettings;
import barwright.ui.task.AnalysisOutcome;
import barwright.ui.task.CorneringProbe;
import barwright.units.Quantity;
import org.jfree.chart.ChartFactory;
import org.jfree.chart.annotations.XYPointerAnnotation;
import org.jfree.chart.plot.PlotOrientation;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.ui.TextAnchor;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;

import java.awt.BasicStroke;

/** The four wheel loads against lateral acceleration, up to the grip limit, with the lift points marked. */
public final class WheelLoadChart extends ResultChart {
    static final int POINTS = 121;
    private final XYSeriesCollection data;
    private final ValueMarker probeMarker = new ValueMarker(0);

    public WheelLoadChart(ViewSettings view, CorneringProbe probe) {
        this(view, probe, new XYSeriesCollection());
    }

    private WheelLoadChart(ViewSettings view, CorneringProbe probe, XYSeriesCollection data) {
        super(view, probe, ChartFactory.createXYLineChart("Wheel loads", "", "", data, PlotOrientation.VERTICAL,
                true, true, false), "chart.wheelLoads");
        this.data = data;
        XYPlot plot = chart().getXYPlot();
        XYLineAndShapeRenderer renderer = new XYLineAndShapeRenderer(true, false);
        for (int i = 0; i < 4; i++) {
            renderer.setSeriesPaint(i, ChartStyle.series(i));
            renderer.setSeriesStroke(i, new BasicStroke(2f));
        }
        plot.setRenderer(renderer);
        probeMarker.setStroke(new BasicStroke(1f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 1f,
                new float[]{4f, 4f}, 0f));
        plot.addDomainMarker(probeMarker);
    }

    @Override
    public String title() {
        return "Wheel loads";
    }

    @Override
    public String fileStem() {
        return "wheel-loads";
    }

    @Override
    protected void fill(AnalysisOutcome outcome) {
        TurnDirection direction = probe.turn();
        TurnResult turn = outcome.result().turn(direction);
        String inside = direction.word();
        String outside = direction == TurnDirection.LEFT ? "right" : "left";
        CorneringCurves curves = CorneringCurves.sample(turn, POINTS);
        XYSeries frontOutside = force(curves.frontOutside("Front outside (" + outside + ")"));
        XYSeries frontInside = force(curves.frontInside("Front inside (" + inside + ")"));
        XYSeries rearOutside = force(curves.rearOutside("Rear outside (" + outside + ")"));
        XYSeries rearInside = force(curves.rearInside("Rear inside (" + inside + ")"));
        double limit = turn.limit();
        data.removeAllSeries();
        data.addSeries(frontOutside);
        data.addSeries(frontInside);
        data.addSeries(rearOutside);
        data.addSeries(rearInside);
        XYPlot plot = chart().getXYPlot();
        plot.clearAnnotations();
        markLift(plot, "front", turn.frontInsideLift(), limit);
        markLift(plot, "rear", turn.rearInsideLift(), limit);
        chart().getTitle().setText("Wheel loads in a " + direction.word() + " turn, up to the grip limit");
        plot.getDomainAxis().setLabel(Axes.label("Lateral acceleration a_y", Quantity.ACCELERATION, view));
        plot.getRangeAxis().setLabel(Axes.label("Vertical load on the wheel", Quantity.FORCE, view));
        probeMoved(outcome);
    }

    private XYSeries force(Series line) {
        return Axes.series(line, Quantity.ACCELERATION, Quantity.FORCE, view);
    }

    private void markLift(XYPlot plot, String axle, double lift, double limit) {
        if (lift <= limit) {
            double x = Axes.shown(lift, Quantity.ACCELERATION, view);
            XYPointerAnnotation mark = new XYPointerAnnotation(String.format(view.locale(),
                    "inside %s lifts at %.2f g", axle, x), x, 0, -Math.PI / 4);
            mark.setTextAnchor(TextAnchor.BOTTOM_RIGHT);
            mark.setPaint(ChartStyle.text());
            mark.setFont(ChartStyle.labelFont());
            mark.setArrowPaint(ChartStyle.text());
            plot.addAnnotation(mark);
        }
    }

    @Override
    public void probeMoved(AnalysisOutcome outcome) {
        if (outcome == null || outcome.result() == null) {
            return;
        }
        double accel = outcome.result().turn(probe.turn()).limit() * probe.fractionOfLimit();
        probeMarker.setValue(Axes.shown(accel, Quantity.ACCELERATION, view));
        probeMarker.setPaint(ChartStyle.text());
    }
}
