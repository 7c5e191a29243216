package barwright.ui.workshop;

import javax.swing.JButton;
import javax.swing.JComponent;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.JSplitPane;
import java.awt.BorderLayout;
import java.awt.FlowLayout;
import java.awt.event.ComponentAdapter;
import java.awt.event.ComponentEvent;

/**
 * A workshop page's readings and its answer: side by side where the page is wide enough for the readings at
 * the current text size and a useful answer beside them, one above the other on a small screen or with large
 * text, so that neither is squeezed to a sliver.
 */
final class ReadingsAndAnswer extends JSplitPane {
    /** The answer's least useful width beside the readings (pixels at the system text size). */
    private static final int ANSWER_WIDTH = 420;
    private final JComponent readings;

    /** The readings with the "use in the car" button under them, and the answer. */
    static ReadingsAndAnswer of(JComponent readings, JButton use, JComponent answer) {
        JPanel bottom = new JPanel(new FlowLayout(FlowLayout.TRAILING));
        bottom.add(use);
        JPanel left = new JPanel(new BorderLayout(4, 4));
        left.add(readings, BorderLayout.NORTH);
        left.add(bottom, BorderLayout.CENTER);
        return new ReadingsAndAnswer(left, answer);
    }

    private ReadingsAndAnswer(JComponent readings, JComponent answer) {
        super(HORIZONTAL_SPLIT, new JScrollPane(readings), new JScrollPane(answer));
        this.readings = readings;
        setResizeWeight(0.5);
        addComponentListener(new ComponentAdapter() {
            @Override
            public void componentResized(ComponentEvent event) {
                reflow();
            }
        });
    }

    private void reflow() {
        int wanted = readings.getPreferredSize().width + ANSWER_WIDTH * getFont().getSize() / 13;
        int orientation = getWidth() >= wanted ? HORIZONTAL_SPLIT : VERTICAL_SPLIT;
        if (orientation != getOrientation()) {
            setOrientation(orientation);
            setDividerLocation(0.5);
        }
    }
}
