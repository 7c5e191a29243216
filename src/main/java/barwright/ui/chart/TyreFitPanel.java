package barwright.ui.chart;

import barwright.tyrefit.TyreFit;
import barwright.tyrefit.TyreMeasurement;
import barwright.units.DisplayUnit;
import org.jfree.chart.ChartPanel;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.title.LegendTitle;

import javax.swing.JComponent;
import java.util.List;

/** The tyre fit's chart ({@link TyreFitChart}) in a panel for a window, redrawn for each fit and unit. Event thread. */
public final class TyreFitPanel {
    private final ChartPanel panel;

    public TyreFitPanel(String name) {
        panel = ChartStyle.panel(null, name);
    }

    public JComponent component() {
        return panel;
    }

    /**
     * Draws the fit over its data with the forces in the unit given; without the title and the note under it, which
     * the window says around the chart (its tab, the residual summary), so that the plot keeps the room.
     */
    public void show(TyreFit fit, List<TyreMeasurement> data, DisplayUnit force) {
        JFreeChart chart = TyreFitChart.of(fit, data, force);
        chart.setTitle((String) null);
        for (int i = chart.getSubtitleCount() - 1; i >= 0; i--) {
            if (!(chart.getSubtitle(i) instanceof LegendTitle)) {
                chart.removeSubtitle(chart.getSubtitle(i));
            }
        }
        panel.setChart(chart);
    }

    /** Shows nothing (no fit yet, or a refused file). */
    public void clear() {
        panel.setChart(null);
    }

    /** @return the chart shown, or null; for tests */
    public JFreeChart chart() {
        return panel.getChart();
    }
}
