package barwright.ui.insight;

import org.jfree.chart.ChartPanel;
import org.jfree.chart.JFreeChart;

import javax.swing.BorderFactory;
import javax.swing.JTextArea;

/** The pieces the three views share: a chart panel that fills its space, and a wrapped read-only text. */
final class InsightCharts {
    private InsightCharts() {
    }

    /** @return the chart in a panel that redraws at any size (no buffer, no zoom, no pop-up menu) */
    static ChartPanel panel(JFreeChart chart, String name) {
        ChartPanel panel = new ChartPanel(chart, false, false, false, true, true);
        panel.setName(name);
        panel.setMouseWheelEnabled(false);
        panel.setPopupMenu(null);
        panel.setMinimumDrawWidth(200);
        panel.setMinimumDrawHeight(150);
        panel.setMaximumDrawWidth(4000);
        panel.setMaximumDrawHeight(3000);
        return panel;
    }

    /** @return a read-only text area that wraps at words, for the figures in sentences */
    static JTextArea sentences(String name) {
        JTextArea text = new JTextArea();
        text.setName(name);
        text.setEditable(false);
        text.setLineWrap(true);
        text.setWrapStyleWord(true);
        text.setBorder(BorderFactory.createEmptyBorder(4, 8, 4, 8));
        return text;
    }
}
