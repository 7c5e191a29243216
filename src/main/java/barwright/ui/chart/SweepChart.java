package barwright.ui.chart;

import barwright.ui.field.ViewSettings;
import barwright.ui.task.AnalysisOutcome;
import barwright.ui.task.CorneringProbe;
import barwright.ui.task.SweepParameter;
import barwright.ui.task.SweepResult;
import barwright.units.Quantity;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.CombinedDomainXYPlot;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.title.TextTitle;
import org.jfree.chart.ui.RectangleAnchor;
import org.jfree.chart.ui.TextAnchor;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;

import java.awt.BasicStroke;
import java.awt.Font;

/**
 * Front share of load transfer and roll gradient as one bar's diameter, wall or arm hole changes: two plots
 * stacked on one shared x axis, each with its own value axis, so that the two lines can neither cross at a
 * point that means nothing nor hide one another. The share's plot carries the static front weight as a
 * level line (the yardstick the share is read against); both carry the value on the car now.
 */
public final class SweepChart extends ResultChart {
    private final XYSeriesCollection shareData;
    private final XYSeriesCollection rollData;
    private final XYPlot sharePlot;
    private final XYPlot rollPlot;
    private final TextTitle note = new TextTitle("");

    public SweepChart(ViewSettings view, CorneringProbe probe) {
        this(view, probe, new Parts());
    }

    /** The two plots and their data, made before the chart that holds them. */
    private static final class Parts {
        final XYSeriesCollection share = new XYSeriesCollection();
        final XYSeriesCollection roll = new XYSeriesCollection();
        final XYPlot sharePlot = part(share, 0);
        final XYPlot rollPlot = part(roll, 2);
        final CombinedDomainXYPlot combined = new CombinedDomainXYPlot(new NumberAxis(""));

        Parts() {
            ((NumberAxis) combined.getDomainAxis()).setAutoRangeIncludesZero(false);
            combined.setGap(12);
            combined.add(sharePlot, 1);
            combined.add(rollPlot, 1);
        }

        private static XYPlot part(XYSeriesCollection data, int colour) {
            NumberAxis values = new NumberAxis("");
            values.setAutoRangeIncludesZero(false);
            XYLineAndShapeRenderer renderer = new XYLineAndShapeRenderer(true, true);
            renderer.setSeriesPaint(0, ChartStyle.series(colour));
            renderer.setSeriesStroke(0, new BasicStroke(2f));
            return new XYPlot(data, null, values, renderer);
        }
    }

    private SweepChart(ViewSettings view, CorneringProbe probe, Parts parts) {
        super(view, probe, new JFreeChart("Bar sweep", new Font(Font.SANS_SERIF, Font.BOLD, 14), parts.combined,
                true), "chart.sweep");
        this.shareData = parts.share;
        this.rollData = parts.roll;
        this.sharePlot = parts.sharePlot;
        this.rollPlot = parts.rollPlot;
        chart().addSubtitle(note);
        restyle();
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
        shareData.removeAllSeries();
        rollData.removeAllSeries();
        for (XYPlot plot : new XYPlot[]{sharePlot, rollPlot}) {
            plot.clearDomainMarkers();
            plot.clearRangeMarkers();
        }
        String bar = sweep.request().axle().key() + " bar";
        chart().getTitle().setText("Changing the " + bar + "'s " + sweep.request().parameter().words());
        if (sweep.unavailable() != null) {
            note.setText(sweep.unavailable());
            return;
        }
        note.setText("");
        XYSeries share = new XYSeries("Front share of load transfer (upper plot)");
        XYSeries roll = new XYSeries("Roll gradient (lower plot)");
        for (SweepResult.Point point : sweep.points()) {
            double x = Axes.shown(point.parameter(), Quantity.LENGTH, view);
            share.add(x, Axes.shown(point.frontShare(), Quantity.SHARE, view));
            roll.add(x, Axes.shown(point.rollGradient(), Quantity.ROLL_GRADIENT, view));
        }
        shareData.addSeries(share);
        rollData.addSeries(roll);
        double now = Axes.shown(sweep.current(), Quantity.LENGTH, view);
        sharePlot.addDomainMarker(marker(now, "on the car now", RectangleAnchor.TOP_RIGHT, TextAnchor.TOP_LEFT));
        rollPlot.addDomainMarker(marker(now, null, RectangleAnchor.TOP_RIGHT, TextAnchor.TOP_LEFT));
        if (outcome.result() != null) {
            double staticFront = Axes.shown(outcome.result().masses().frontMassFraction(), Quantity.SHARE, view);
            ValueMarker level = marker(staticFront, "static front weight", RectangleAnchor.BOTTOM_LEFT,
                    TextAnchor.BOTTOM_LEFT);
            level.setStroke(new BasicStroke(1.2f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 1,
                    new float[]{6, 4}, 0));
            sharePlot.addRangeMarker(level);
            // the level line is always in view, so the share is read against it
            NumberAxis shareAxis = (NumberAxis) sharePlot.getRangeAxis();
            double low = Math.min(share.getMinY(), staticFront);
            double high = Math.max(share.getMaxY(), staticFront);
            double margin = Math.max((high - low) * 0.1, 0.5);
            shareAxis.setRange(low - margin, high + margin);
        }
        String what = sweep.request().parameter() == SweepParameter.ARM_HOLE ? "Arm length of the hole"
                : sweep.request().parameter() == SweepParameter.WALL ? "Tube wall" : "Outside diameter";
        ((CombinedDomainXYPlot) chart().getPlot()).getDomainAxis()
                .setLabel(Axes.label(what + " of the " + bar, Quantity.LENGTH, view));
        sharePlot.getRangeAxis().setLabel(Axes.label("Front share", Quantity.SHARE, view));
        rollPlot.getRangeAxis().setLabel(Axes.label("Roll gradient", Quantity.ROLL_GRADIENT, view));
    }

    private static ValueMarker marker(double at, String label, RectangleAnchor anchor, TextAnchor textAnchor) {
        ValueMarker marker = new ValueMarker(at, ChartStyle.text(), new BasicStroke(1.5f));
        if (label != null) {
            marker.setLabel(label);
            marker.setLabelPaint(ChartStyle.text());
            marker.setLabelFont(ChartStyle.labelFont());
            marker.setLabelAnchor(anchor);
            marker.setLabelTextAnchor(textAnchor);
        }
        return marker;
    }
}
