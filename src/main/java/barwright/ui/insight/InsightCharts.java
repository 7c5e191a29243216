package barwright.ui.insight;

import javax.swing.BorderFactory;
import javax.swing.JTextArea;

/** What the three views share: a wrapped read-only text. */
final class InsightCharts {
    private InsightCharts() {
    }

    /** @return a read-only text area that wraps at words, for the figures in sentences */
    static JTextArea sentences(String name) {
        JTextArea text = new JTextArea() {
            @Override
            public void scrollRectToVisible(java.awt.Rectangle shown) {
                // the words sit under their chart in a page that scrolls: a new text must not scroll the page
                // down to its caret, away from the chart
            }
        };
        text.setName(name);
        text.setEditable(false);
        text.setLineWrap(true);
        text.setWrapStyleWord(true);
        text.setBorder(BorderFactory.createEmptyBorder(4, 8, 4, 8));
        return text;
    }
}
