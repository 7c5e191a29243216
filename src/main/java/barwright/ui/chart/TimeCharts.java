package barwright.ui.chart;

import barwright.physics.dynamics.RollState;
import org.jfree.chart.ChartPanel;
import org.jfree.chart.axis.NumberAxis;
import org.jfree.chart.plot.CombinedDomainXYPlot;
import org.jfree.chart.plot.ValueMarker;
import org.jfree.chart.plot.XYPlot;
import org.jfree.chart.renderer.xy.XYLineAndShapeRenderer;
import org.jfree.chart.ui.RectangleEdge;
import org.jfree.data.xy.XYSeriesCollection;

import java.awt.BasicStroke;
import java.awt.Stroke;
import java.awt.geom.Point2D;
import java.awt.geom.Rectangle2D;
import java.util.List;

/** What the charts against time share: the time axis, the cursor, the thinning of long runs, the dashes. */
final class TimeCharts {
    /** A run longer than this many states is drawn every n-th state: more points than pixels only cost time. */
    static final int MOST_DRAWN = 1500;
    static final Stroke DASHED = new BasicStroke(1.6f, BasicStroke.CAP_BUTT, BasicStroke.JOIN_MITER, 1f,
            new float[] {7f, 5f}, 0f);
    static final Stroke LINE = new BasicStroke(1.8f);

    private TimeCharts() {
    }

    /** @return the step through the states that draws at most {@link #MOST_DRAWN} of them */
    static int stride(List<RollState> states) {
        return Math.max(1, (states.size() + MOST_DRAWN - 1) / MOST_DRAWN);
    }

    /** @return the shared time axis of a combined plot */
    static CombinedDomainXYPlot combined() {
        NumberAxis time = new NumberAxis("Time (s)");
        time.setAutoRangeIncludesZero(false);
        CombinedDomainXYPlot plot = new CombinedDomainXYPlot(time);
        plot.setGap(10);
        return plot;
    }

    /** @return a subplot with its own value axis and plain lines */
    static XYPlot subplot(XYSeriesCollection data, String axisLabel) {
        NumberAxis values = new NumberAxis(axisLabel);
        values.setAutoRangeIncludesZero(false);
        XYLineAndShapeRenderer renderer = new XYLineAndShapeRenderer(true, false);
        return new XYPlot(data, null, values, renderer);
    }

    /** @return the time cursor: a thin line across a subplot */
    static ValueMarker cursor() {
        ValueMarker cursor = new ValueMarker(0);
        cursor.setPaint(ChartStyle.text());
        cursor.setStroke(new BasicStroke(1.2f));
        return cursor;
    }

    /** @return the time under a point of the panel (s), or NaN outside the plots */
    static double timeAt(ChartPanel panel, CombinedDomainXYPlot plot, Point2D onScreen) {
        var info = panel.getChartRenderingInfo().getPlotInfo();
        if (info.getSubplotCount() == 0) {
            return Double.NaN;
        }
        Rectangle2D area = info.getSubplotInfo(0).getDataArea();
        Point2D java2d = panel.translateScreenToJava2D(new java.awt.Point((int) onScreen.getX(), (int) onScreen.getY()));
        double x = Math.max(area.getMinX(), Math.min(area.getMaxX(), java2d.getX()));
        return plot.getDomainAxis().java2DToValue(x, area, RectangleEdge.BOTTOM);
    }
}
