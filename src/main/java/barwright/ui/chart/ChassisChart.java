package barwright.ui.chart;

import barwright.insight.ChassisPoint;
import barwright.insight.ChassisStudyResult;
import barwright.ui.field.ViewSettings;
import barwright.units.Quantity;
import org.jfree.chart.ChartFactory;
import org.jfree.chart.ChartPanel;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.axis.LogAxis;
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
import java.awt.Color;
import java.text.DecimalFormat;

import javax.swing.JComponent;

/**
 * The chassis study's chart: front share and the share of a bar change that reaches the tyres (left scale,
 * percent) and roll gradient (right scale) against chassis torsional stiffness on a log scale, with the rigid
 * and no-stiffness limits, this car, and the stiffness at which a bar change keeps 80 % of its effect.
 */
public final class ChassisChart {
    private final ViewSettings view;
    private final XYSeriesCollection shares = new XYSeriesCollection();
    private final XYSeriesCollection roll = new XYSeriesCollection();
    private final JFreeChart chart;

    public ChassisChart(ViewSettings view) {
        this.view = view;
        chart = ChartFactory.createXYLineChart("What a flexible chassis costs", "", "", shares,
                PlotOrientation.VERTICAL, true, true, false);
        XYPlot plot = chart.getXYPlot();
        LogAxis stiffness = new LogAxis("");
        stiffness.setNumberFormatOverride(new DecimalFormat("#,##0"));
        stiffness.setSmallestValue(1);
        plot.setDomainAxis(stiffness);
        NumberAxis rollAxis = new NumberAxis("");
        rollAxis.setAutoRangeIncludesZero(false);
        plot.setRangeAxis(1, rollAxis);
        plot.setDataset(1, roll);
        plot.mapDatasetToRangeAxis(1, 1);
        style();
    }

    /** @return the chart in a panel named {@code name}, ready to place in a view */
    public JComponent panel(String name) {
        return ChartStyle.panel(chart, name);
    }

    /** Sets the renderers and the theme's colours again, as after a change of theme. */
    public void style() {
        XYPlot plot = chart.getXYPlot();
        XYLineAndShapeRenderer shareRenderer = new XYLineAndShapeRenderer(true, false);
        shareRenderer.setSeriesPaint(0, ChartStyle.series(0));
        shareRenderer.setSeriesStroke(0, new BasicStroke(2.5f));
        shareRenderer.setSeriesPaint(1, ChartStyle.series(4));
        shareRenderer.setSeriesStroke(1, new BasicStroke(2.5f));
        XYLineAndShapeRenderer rollRenderer = new XYLineAndShapeRenderer(true, false);
        rollRenderer.setSeriesPaint(0, ChartStyle.series(2));
        rollRenderer.setSeriesStroke(0, new BasicStroke(2f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 1f,
                new float[]{6f, 4f}, 0f));
        plot.setRenderer(0, shareRenderer);
        plot.setRenderer(1, rollRenderer);
        ChartStyle.apply(chart);
    }

    /** Draws the study in the units chosen. */
    public void show(ChassisStudyResult study) {
        chart.setNotify(false);
        try {
            shares.removeAllSeries();
            roll.removeAllSeries();
            XYSeries front = new XYSeries("Front share of load transfer (left scale)");
            XYSeries delivered = new XYSeries("Share of a bar change that reaches the tyres (left scale)");
            XYSeries gradient = new XYSeries("Roll gradient (right scale)");
            for (ChassisPoint point : study.sweep()) {
                double x = stiffness(point.chassisStiffness());
                front.add(x, point.frontShare() * 100);
                delivered.add(x, point.deliveredShare() * 100);
                gradient.add(x, Quantity.ROLL_GRADIENT.unit(view.units()).fromSi(point.rollGradient()));
            }
            shares.addSeries(front);
            shares.addSeries(delivered);
            roll.addSeries(gradient);
            XYPlot plot = chart.getXYPlot();
            plot.clearDomainMarkers();
            plot.clearRangeMarkers();
            plot.addRangeMarker(level(study.rigid().frontShare() * 100, "front share, rigid chassis"));
            if (study.decoupled() != null) {
                plot.addRangeMarker(level(study.decoupled().frontShare() * 100, "front share, no chassis stiffness"));
            }
            if (study.current() != null) {
                plot.addDomainMarker(upright(stiffness(study.current().chassisStiffness()), "this car",
                        ChartStyle.text(), RectangleAnchor.TOP_LEFT, TextAnchor.TOP_RIGHT));
            }
            if (study.stiffnessForTarget() != null) {
                plot.addDomainMarker(upright(stiffness(study.stiffnessForTarget()), "80 % of a bar change gets through",
                        ChartStyle.series(4), RectangleAnchor.BOTTOM_RIGHT, TextAnchor.BOTTOM_LEFT));
            }
            plot.addDomainMarker(upright(stiffness(study.totalRollStiffness()), "= both axles' roll stiffness",
                    ChartStyle.series(1), RectangleAnchor.TOP_RIGHT, TextAnchor.TOP_LEFT));
            String unit = Quantity.ROLL_STIFFNESS.unit(view.units()).symbol();
            plot.getDomainAxis().setLabel("Chassis torsional stiffness (" + unit + ", log scale)");
            plot.getRangeAxis(0).setLabel("Share (%)");
            plot.getRangeAxis(0).setRange(0, 105);
            plot.getRangeAxis(1).setLabel("Roll gradient (" + Quantity.ROLL_GRADIENT.unit(view.units()).symbol() + ")");
            style();
        } finally {
            chart.setNotify(true);
        }
    }

    private double stiffness(double nmPerRad) {
        return Quantity.ROLL_STIFFNESS.unit(view.units()).fromSi(nmPerRad);
    }

    private static ValueMarker level(double value, String label) {
        ValueMarker marker = new ValueMarker(value, ChartStyle.series(1), new BasicStroke(1.2f, BasicStroke.CAP_BUTT,
                BasicStroke.JOIN_MITER, 1f, new float[]{4f, 4f}, 0f));
        marker.setLabel(label);
        marker.setLabelFont(ChartStyle.labelFont());
        marker.setLabelPaint(ChartStyle.text());
        marker.setLabelBackgroundColor(new Color(0, 0, 0, 0));
        marker.setLabelAnchor(RectangleAnchor.LEFT);
        marker.setLabelTextAnchor(TextAnchor.BOTTOM_LEFT);
        return marker;
    }

    private static ValueMarker upright(double at, String label, Color colour, RectangleAnchor anchor, TextAnchor text) {
        ValueMarker marker = new ValueMarker(at, colour, new BasicStroke(1.5f));
        marker.setLabel(label);
        marker.setLabelFont(ChartStyle.labelFont());
        marker.setLabelPaint(colour);
        marker.setLabelBackgroundColor(new Color(0, 0, 0, 0));
        marker.setLabelAnchor(anchor);
        marker.setLabelTextAnchor(text);
        return marker;
    }

    /** @return the chart itself, for export and for tests */
    public JFreeChart chart() {
        return chart;
    }
}
