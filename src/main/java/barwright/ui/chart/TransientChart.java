package barwright.ui.chart;

import barwright.physics.dynamics.RollState;
import barwright.units.DisplayUnit;
import barwright.units.Quantity;
import barwright.units.UnitSystem;
import org.jfree.chart.ChartPanel;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.LegendItem;
import org.jfree.chart.LegendItemCollection;
import org.jfree.chart.plot.CombinedDomainXYPlot;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;

import javax.swing.JComponent;
import java.awt.Color;
import java.awt.geom.Line2D;
import java.util.List;
import java.util.function.ToDoubleFunction;

/**
 * A step of lateral acceleration as the body's roll and the four wheel loads against time, each with its steady
 * value (the steady analysis at the step's target) as a dashed line of the same colour, and a time cursor for
 * the playback. Event thread.
 */
public final class TransientChart {
    private static final String[] WHEELS = {"LF", "RF", "LR", "RR"};
    private static final List<ToDoubleFunction<RollState>> LOADS = List.of(RollState::leftFront,
            RollState::rightFront, RollState::leftRear, RollState::rightRear);
    private final XYSeriesCollection rollData = new XYSeriesCollection();
    private final XYSeriesCollection loadData = new XYSeriesCollection();
    private final XYPlot rollPlot = TimeCharts.subplot(rollData, "Body roll");
    private final XYPlot loadPlot = TimeCharts.subplot(loadData, "Wheel load");
    private final ValueMarker rollCursor = TimeCharts.cursor();
    private final ValueMarker loadCursor = TimeCharts.cursor();
    private final JFreeChart chart;
    private final ChartPanel panel;
    private double[] steadyShown = new double[0];

    public TransientChart() {
        CombinedDomainXYPlot plot = TimeCharts.combined();
        plot.add(rollPlot, 2);
        plot.add(loadPlot, 3);
        rollPlot.addDomainMarker(rollCursor);
        loadPlot.addDomainMarker(loadCursor);
        chart = new JFreeChart("Turn-in: a step of lateral acceleration", JFreeChart.DEFAULT_TITLE_FONT, plot, true);
        ChartStyle.apply(chart);
        panel = ChartStyle.panel(chart, "chart.turnIn");
        panel.setDomainZoomable(false);
        panel.setRangeZoomable(false);
    }

    public JComponent component() {
        return panel;
    }

    public JFreeChart chart() {
        return chart;
    }

    /**
     * Draws a run in the chosen units.
     *
     * @param states      the run
     * @param steadyRoll  the steady analysis's roll at the target (rad)
     * @param steadyLoads its wheel loads: left front, right front, left rear, right rear (N)
     * @param insideLeft  true in a left turn (the left wheels inside), for the legend
     */
    public void show(List<RollState> states, double steadyRoll, double[] steadyLoads, boolean insideLeft,
                     UnitSystem units) {
        DisplayUnit angle = Quantity.ANGLE.unit(units);
        DisplayUnit force = Quantity.FORCE.unit(units);
        XYSeries roll = new XYSeries("body roll", false);
        XYSeries[] loads = new XYSeries[4];
        for (int w = 0; w < 4; w++) {
            boolean left = w % 2 == 0;
            loads[w] = new XYSeries(WHEELS[w] + (left == insideLeft ? " inside" : " outside"), false);
        }
        int stride = TimeCharts.stride(states);
        for (int i = 0; i < states.size(); i += stride) {
            add(states.get(i), roll, loads, angle, force);
        }
        if ((states.size() - 1) % stride != 0) {
            add(states.get(states.size() - 1), roll, loads, angle, force);
        }
        rollData.removeAllSeries();
        rollData.addSeries(roll);
        loadData.removeAllSeries();
        for (XYSeries series : loads) {
            loadData.addSeries(series);
        }
        rollPlot.clearRangeMarkers();
        loadPlot.clearRangeMarkers();
        steadyShown = new double[5];
        steadyShown[0] = angle.fromSi(steadyRoll);
        rollPlot.addRangeMarker(steady(steadyShown[0], ChartStyle.series(4)));
        for (int w = 0; w < 4; w++) {
            steadyShown[w + 1] = force.fromSi(steadyLoads[w]);
            loadPlot.addRangeMarker(steady(steadyShown[w + 1], ChartStyle.series(w)));
        }
        rollPlot.getRenderer().setSeriesPaint(0, ChartStyle.series(4));
        rollPlot.getRenderer().setSeriesStroke(0, TimeCharts.LINE);
        for (int w = 0; w < 4; w++) {
            loadPlot.getRenderer().setSeriesPaint(w, ChartStyle.series(w));
            loadPlot.getRenderer().setSeriesStroke(w, TimeCharts.LINE);
        }
        rollPlot.getRangeAxis().setLabel("Body roll (" + angle.symbol() + ")");
        loadPlot.getRangeAxis().setLabel("Wheel load (" + force.symbol() + ")");
        loadPlot.setFixedLegendItems(legend(loadPlot, "steady (dashed)"));
        ChartStyle.apply(chart);
    }

    private static void add(RollState state, XYSeries roll, XYSeries[] loads, DisplayUnit angle, DisplayUnit force) {
        roll.add(state.time(), angle.fromSi(state.roll()), false); // one change event, when the series joins its data
        for (int w = 0; w < 4; w++) {
            loads[w].add(state.time(), force.fromSi(LOADS.get(w).applyAsDouble(state)), false);
        }
    }

    /** @return the subplot's own legend items and one for its dashed steady lines */
    private static LegendItemCollection legend(XYPlot plot, String dashedWords) {
        plot.setFixedLegendItems(null);
        LegendItemCollection items = new LegendItemCollection();
        items.addAll(plot.getLegendItems());
        LegendItem dashed = new LegendItem(dashedWords, null, null, null, new Line2D.Double(-7, 0, 7, 0),
                TimeCharts.DASHED, ChartStyle.text());
        items.add(dashed);
        return items;
    }

    private static ValueMarker steady(double value, Color colour) {
        ValueMarker marker = new ValueMarker(value);
        marker.setPaint(colour);
        marker.setStroke(TimeCharts.DASHED);
        return marker;
    }

    /** Moves the time cursor (s). */
    public void cursor(double time) {
        rollCursor.setValue(time);
        loadCursor.setValue(time);
    }

    /**
     * @return the steady values drawn dashed, in display units: roll, then left front, right front, left rear,
     *         right rear (for the window tests)
     */
    public double[] steadyShown() {
        return steadyShown.clone();
    }

    public void clear(String why) {
        rollData.removeAllSeries();
        loadData.removeAllSeries();
        rollPlot.clearRangeMarkers();
        loadPlot.clearRangeMarkers();
        steadyShown = new double[0];
        chart.setTitle(why);
        ChartStyle.apply(chart);
    }

    /** Puts the chart's title back after a {@link #clear}. */
    public void title(String words) {
        chart.setTitle(words);
        ChartStyle.apply(chart);
    }
}
