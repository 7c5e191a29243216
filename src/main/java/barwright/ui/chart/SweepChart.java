package barwright.ui.chart;

import barwright.ui.field.ViewSettings;
import barwright.ui.task.AnalysisOutcome;
import barwright.ui.task.CorneringProbe;
import barwright.ui.task.SweepParameter;
import barwright.ui.task.SweepResult;
import barwright.units.Quantity;
import org.jfree.chart.ChartFactory;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.PlotOrientation;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.title.TextTitle;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;

import java.awt.BasicStroke;

/** Front share of load transfer and roll gradient as one bar's diameter, wall or arm hole changes. */
public final class SweepChart extends ResultChart {
    private final XYSeriesCollection shareData;
    private final XYSeriesCollection rollData = new XYSeriesCollection();
    private final TextTitle note = new TextTitle("");

    public SweepChart(ViewSettings view, CorneringProbe probe) {
        this(view, probe, new XYSeriesCollection());
    }

    private SweepChart(ViewSettings view, CorneringProbe probe, XYSeriesCollection shareData) {
        super(view, probe, ChartFactory.createXYLineChart("Bar sweep", "", "", shareData, PlotOrientation.VERTICAL,
                true, true, false), "chart.sweep");
        this.shareData = shareData;
        XYPlot plot = chart().getXYPlot();
        NumberAxis rollAxis = new NumberAxis("");
        rollAxis.setAutoRangeIncludesZero(false);
        plot.setRangeAxis(1, rollAxis);
        plot.setDataset(1, rollData);
        plot.mapDatasetToRangeAxis(1, 1);
        ((NumberAxis) plot.getRangeAxis()).setAutoRangeIncludesZero(false);
        XYLineAndShapeRenderer shareRenderer = new XYLineAndShapeRenderer(true, true);
        shareRenderer.setSeriesPaint(0, ChartStyle.series(0));
        shareRenderer.setSeriesStroke(0, new BasicStroke(2f));
        XYLineAndShapeRenderer rollRenderer = new XYLineAndShapeRenderer(true, true);
        rollRenderer.setSeriesPaint(0, ChartStyle.series(2));
        rollRenderer.setSeriesStroke(0, new BasicStroke(2f));
        plot.setRenderer(0, shareRenderer);
        plot.setRenderer(1, rollRenderer);
        chart().addSubtitle(note);
    }

    @Override
    public String title() {
        return "Bar sweep";
    }

    @Override
    public String fileStem() {
        return "bar-sweep";
    }

    @Override
    protected void fill(AnalysisOutcome outcome) {
        SweepResult sweep = outcome.sweep();
        if (sweep == null) {
            return; // not worked out yet: it is asked for when this chart comes on screen
        }
        XYPlot plot = chart().getXYPlot();
        shareData.removeAllSeries();
        rollData.removeAllSeries();
        plot.clearDomainMarkers();
        String bar = sweep.request().axle().key() + " bar";
        chart().getTitle().setText("Changing the " + bar + "'s " + sweep.request().parameter().words());
        if (sweep.unavailable() != null) {
            note.setText(sweep.unavailable());
            return;
        }
        note.setText("");
        XYSeries share = new XYSeries("Front share of load transfer (left scale)");
        XYSeries roll = new XYSeries("Roll gradient (right scale)");
        for (SweepResult.Point point : sweep.points()) {
            double x = Axes.shown(point.parameter(), Quantity.LENGTH, view);
            share.add(x, Axes.shown(point.frontShare(), Quantity.SHARE, view));
            roll.add(x, Axes.shown(point.rollGradient(), Quantity.ROLL_GRADIENT, view));
        }
        shareData.addSeries(share);
        rollData.addSeries(roll);
        ValueMarker current = new ValueMarker(Axes.shown(sweep.current(), Quantity.LENGTH, view), ChartStyle.text(),
                new BasicStroke(1.5f));
        current.setLabel("on the car now");
        current.setLabelPaint(ChartStyle.text());
        current.setLabelAnchor(org.jfree.chart.ui.RectangleAnchor.TOP_RIGHT);
        current.setLabelTextAnchor(org.jfree.chart.ui.TextAnchor.TOP_LEFT);
        plot.addDomainMarker(current);
        String what = sweep.request().parameter() == SweepParameter.ARM_HOLE ? "Arm length of the hole"
                : sweep.request().parameter() == SweepParameter.WALL ? "Tube wall" : "Outside diameter";
        plot.getDomainAxis().setLabel(Axes.label(what + " of the " + bar, Quantity.LENGTH, view));
        plot.getRangeAxis(0).setLabel(Axes.label("Front share of load transfer", Quantity.SHARE, view));
        plot.getRangeAxis(1).setLabel(Axes.label("Roll gradient", Quantity.ROLL_GRADIENT, view));
    }
}
