package barwright.ui.chart;

import barwright.physics.AnalysisResult;
import barwright.physics.curve.CorneringCurves;
import barwright.ui.field.ViewSettings;
import barwright.ui.task.AnalysisOutcome;
import barwright.ui.task.CorneringProbe;
import barwright.units.Quantity;
import org.jfree.chart.ChartFactory;
import org.jfree.chart.plot.PlotOrientation;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.title.TextTitle;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;

import java.awt.BasicStroke;

/** Body roll against lateral acceleration, with the bars as fitted and with both bars taken off. */
public final class RollChart extends ResultChart {
    private static final int POINTS = 60;
    private final XYSeriesCollection data;
    private final TextTitle note = new TextTitle("");

    public RollChart(ViewSettings view, CorneringProbe probe) {
        this(view, probe, new XYSeriesCollection());
    }

    private RollChart(ViewSettings view, CorneringProbe probe, XYSeriesCollection data) {
        super(view, probe, ChartFactory.createXYLineChart("Body roll", "", "", data, PlotOrientation.VERTICAL,
                true, true, false), "chart.roll");
        this.data = data;
        XYLineAndShapeRenderer renderer = new XYLineAndShapeRenderer(true, false);
        renderer.setSeriesPaint(0, ChartStyle.series(0));
        renderer.setSeriesStroke(0, new BasicStroke(2f));
        renderer.setSeriesPaint(1, ChartStyle.series(2));
        renderer.setSeriesStroke(1, new BasicStroke(2f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 1f,
                new float[]{6f, 4f}, 0f));
        chart().getXYPlot().setRenderer(renderer);
        chart().addSubtitle(note);
    }

    @Override
    public String title() {
        return "Body roll";
    }

    @Override
    public String fileStem() {
        return "body-roll";
    }

    @Override
    protected void fill(AnalysisOutcome outcome) {
        data.removeAllSeries();
        data.addSeries(curve("With the bars as fitted", outcome.result()));
        if (outcome.withoutBars() != null) {
            data.addSeries(curve("With both bars taken off", outcome.withoutBars()));
            note.setText("");
        } else {
            note.setText("Without bars the body has no stable roll position.");
        }
        XYPlot plot = chart().getXYPlot();
        chart().getTitle().setText("Body roll in a " + probe.turn().word() + " turn, each car up to its grip limit");
        plot.getDomainAxis().setLabel(Axes.label("Lateral acceleration a_y", Quantity.ACCELERATION, view));
        plot.getRangeAxis().setLabel(Axes.label("Body roll angle", Quantity.ANGLE, view));
    }

    private XYSeries curve(String name, AnalysisResult result) {
        CorneringCurves curves = CorneringCurves.sample(result.turn(probe.turn()), POINTS);
        return Axes.series(curves.roll(name), Quantity.ACCELERATION, Quantity.ANGLE, view);
    }
}
