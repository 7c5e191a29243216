package barwright.ui.insight;

import javax.swing.BorderFactory;
import javax.swing.JTextArea;

/** What the three views share: a wrapped read-only text. */
final class InsightCharts {
    private InsightCharts() {
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
