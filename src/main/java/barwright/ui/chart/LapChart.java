package barwright.ui.chart;

import barwright.physics.dynamics.RollState;
import barwright.units.DisplayUnit;
import barwright.units.Quantity;
import barwright.units.UnitSystem;
import org.jfree.chart.ChartPanel;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.plot.CombinedDomainXYPlot;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.data.xy.XYSeries;
import org.jfree.data.xy.XYSeriesCollection;

import javax.swing.JComponent;
import java.awt.event.MouseAdapter;
import java.awt.event.MouseEvent;
import java.util.List;
import java.util.function.DoubleConsumer;

/**
 * A logged lap replayed: the four wheel loads, the front share of the load transfer and each axle's grip used
 * against its limit, along the lap, with a time cursor that a click or a drag moves. Event thread.
 */
public final class LapChart {
    private final XYSeriesCollection loadData = new XYSeriesCollection();
    private final XYSeriesCollection shareData = new XYSeriesCollection();
    private final XYSeriesCollection gripData = new XYSeriesCollection();
    private final XYPlot loadPlot = TimeCharts.subplot(loadData, "Wheel load");
    private final XYPlot sharePlot = TimeCharts.subplot(shareData, "Front share (%)");
    private final XYPlot gripPlot = TimeCharts.subplot(gripData, "Grip used (%)");
    private final List<ValueMarker> cursors = List.of(TimeCharts.cursor(), TimeCharts.cursor(), TimeCharts.cursor());
    private final CombinedDomainXYPlot plot = TimeCharts.combined();
    private final JFreeChart chart;
    private final ChartPanel panel;

    /** @param onCursor told the time (s) a click or a drag on the chart puts the cursor at */
    public LapChart(DoubleConsumer onCursor) {
        plot.add(loadPlot, 3);
        plot.add(sharePlot, 2);
        plot.add(gripPlot, 2);
        List<XYPlot> plots = List.of(loadPlot, sharePlot, gripPlot);
        for (int i = 0; i < 3; i++) {
            plots.get(i).addDomainMarker(cursors.get(i));
        }
        ValueMarker limit = new ValueMarker(100);
        limit.setPaint(ChartStyle.series(2));
        limit.setStroke(TimeCharts.DASHED);
        limit.setLabel("the axle's limit");
        limit.setLabelFont(ChartStyle.labelFont());
        gripPlot.addRangeMarker(limit);
        chart = new JFreeChart("Open a lap log to replay it", JFreeChart.DEFAULT_TITLE_FONT, plot, true);
        ChartStyle.apply(chart);
        panel = ChartStyle.panel(chart, "chart.lap");
        panel.setDomainZoomable(false);
        panel.setRangeZoomable(false);
        MouseAdapter mouse = new MouseAdapter() {
            @Override
            public void mousePressed(MouseEvent event) {
                moved(event);
            }

            @Override
            public void mouseDragged(MouseEvent event) {
                moved(event);
            }

            private void moved(MouseEvent event) {
                panel.requestFocusInWindow();
                double time = TimeCharts.timeAt(panel, plot, event.getPoint());
                if (Double.isFinite(time) && loadData.getSeriesCount() > 0) {
                    onCursor.accept(time);
                }
            }
        };
        panel.addMouseListener(mouse);
        panel.addMouseMotionListener(mouse);
        panel.setFocusable(true);
    }

    public JComponent component() {
        return panel;
    }

    public JFreeChart chart() {
        return chart;
    }

    /**
     * Draws a replay in the chosen units.
     *
     * @param states         the run
     * @param frontGripUsed  the front axle's grip used at each state (1 = at its limit)
     * @param rearGripUsed   the rear's
     */
    public void show(String title, List<RollState> states, double[] frontGripUsed, double[] rearGripUsed,
                     UnitSystem units) {
        DisplayUnit force = Quantity.FORCE.unit(units);
        XYSeries[] loads = {new XYSeries("left front", false), new XYSeries("right front", false),
                new XYSeries("left rear", false), new XYSeries("right rear", false)};
        XYSeries share = new XYSeries("front share of load transfer", false);
        XYSeries front = new XYSeries("front axle", false);
        XYSeries rear = new XYSeries("rear axle", false);
        int stride = TimeCharts.stride(states);
        for (int i = 0; i < states.size(); i += stride) {
            RollState state = states.get(i);
            double time = state.time();
            loads[0].add(time, force.fromSi(state.leftFront()), false);
            loads[1].add(time, force.fromSi(state.rightFront()), false);
            loads[2].add(time, force.fromSi(state.leftRear()), false);
            loads[3].add(time, force.fromSi(state.rightRear()), false);
            share.add(time, 100 * state.frontShare(), false);
            front.add(time, 100 * frontGripUsed[i], false);
            rear.add(time, 100 * rearGripUsed[i], false);
        }
        loadData.removeAllSeries();
        for (XYSeries series : loads) {
            loadData.addSeries(series);
        }
        shareData.removeAllSeries();
        shareData.addSeries(share);
        gripData.removeAllSeries();
        gripData.addSeries(front);
        gripData.addSeries(rear);
        for (int w = 0; w < 4; w++) {
            loadPlot.getRenderer().setSeriesPaint(w, ChartStyle.series(w));
        }
        sharePlot.getRenderer().setSeriesPaint(0, ChartStyle.series(4));
        gripPlot.getRenderer().setSeriesPaint(0, ChartStyle.series(0));
        gripPlot.getRenderer().setSeriesPaint(1, ChartStyle.series(2));
        loadPlot.getRangeAxis().setLabel("Wheel load (" + force.symbol() + ")");
        chart.setTitle(title);
        ChartStyle.apply(chart);
    }

    /** Moves the cursor (s). */
    public void cursor(double time) {
        cursors.forEach(marker -> marker.setValue(time));
    }

    /** @return the number of points drawn per line (for the window tests) */
    public int drawnPoints() {
        return loadData.getSeriesCount() == 0 ? 0 : loadData.getItemCount(0);
    }

    public void clear(String title) {
        loadData.removeAllSeries();
        shareData.removeAllSeries();
        gripData.removeAllSeries();
        chart.setTitle(title);
        ChartStyle.apply(chart);
    }
}
