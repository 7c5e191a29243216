package barwright.ui.chart;

import barwright.ui.field.ViewSettings;
import barwright.ui.task.AnalysisOutcome;
import barwright.ui.task.CorneringProbe;
import org.jfree.chart.ChartPanel;
import org.jfree.chart.JFreeChart;
import org.jfree.chart.title.TextTitle;

import javax.swing.JComponent;

/** One chart of the results: it redraws itself from an analysis, in the chosen units. */
public abstract class ResultChart {
    protected final ViewSettings view;
    protected final CorneringProbe probe;
    private final JFreeChart chart;
    private final ChartPanel panel;
    private final TextTitle staleNote = new TextTitle("");

    protected ResultChart(ViewSettings view, CorneringProbe probe, JFreeChart chart, String name) {
        this.view = view;
        this.probe = probe;
        this.chart = chart;
        chart.addSubtitle(0, staleNote);
        this.panel = ChartStyle.panel(chart, name);
        ChartStyle.apply(chart);
    }

    /** @return the chart's title for tabs and file names */
    public abstract String title();

    /** @return a file name stem for exports, e.g. "wheel-loads" */
    public abstract String fileStem();

    /** Fills the chart from an analysis (on the event thread). */
    protected abstract void fill(AnalysisOutcome outcome);

    public final void show(AnalysisOutcome outcome, boolean stale) {
        chart.setNotify(false);
        try {
            staleNote.setText(stale ? "Out of date: the last car the program accepted" : "");
            if (outcome != null && outcome.result() != null) {
                fill(outcome);
            }
        } finally {
            chart.setNotify(true);
        }
    }

    /** Dresses the chart in the current theme and text size again (after a theme change). */
    public final void restyle() {
        ChartStyle.apply(chart);
    }

    /** Called when the slider moves; charts that mark the probe override it. */
    public void probeMoved(AnalysisOutcome outcome) {
    }

    public JFreeChart chart() {
        return chart;
    }

    public JComponent component() {
        return panel;
    }
}
