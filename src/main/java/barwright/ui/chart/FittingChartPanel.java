package barwright.ui.chart;

import org.jfree.chart.ChartPanel;
import org.jfree.chart.ChartRenderingInfo;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.event.ChartProgressEvent;

/**
 * A chart panel that, after each drawing, fits the chart's words to the room the drawing gave them: the axis
 * names ({@link AxisNames}), the legend's lines ({@link LegendLines}) and the marker labels
 * ({@link MarkerLabels}). A change to any of them redraws the chart once more; the next drawing finds nothing to
 * change, as none of them moves the plot's data area. Event thread.
 */
final class FittingChartPanel extends ChartPanel {
    /** Whether this panel is drawing its chart now: only its own drawings are fitted to. */
    private boolean painting;

    FittingChartPanel(JFreeChart chart) {
        super(chart, false, false, false, true, true);
    }

    @Override
    public void paintComponent(java.awt.Graphics graphics) {
        painting = true;
        try {
            super.paintComponent(graphics);
        } finally {
            painting = false;
        }
    }

    /** Also for a chart put in the panel later: the panel listens to whichever chart it shows. */
    @Override
    public void chartProgress(ChartProgressEvent event) {
        super.chartProgress(event);
        if (event.getType() != ChartProgressEvent.DRAWING_FINISHED || event.getChart() != getChart()) {
            return;
        }
        JFreeChart chart = getChart();
        ChartRenderingInfo info = getChartRenderingInfo();
        if (chart == null || info == null || !painting) {
            return; // the chart was drawn elsewhere (written to a file): this panel's last drawing says nothing
        }
        fitWords(chart, info, this);
    }

    /**
     * Fits the chart's words to the drawing the rendering information describes.
     *
     * @param metrics a component whose font metrics measure the words
     */
    static void fitWords(JFreeChart chart, ChartRenderingInfo info, java.awt.Component metrics) {
        java.awt.geom.Rectangle2D dataArea = info.getPlotInfo().getDataArea();
        if (info.getChartArea() == null || info.getChartArea().isEmpty() || dataArea == null || dataArea.isEmpty()) {
            return; // not drawn yet, or drawn with no room for a plot
        }
        AxisNames.fit(chart, info, metrics);
        LegendLines.fit(chart, info);
        MarkerLabels.place(chart.getPlot(), info.getPlotInfo());
    }
}
