package barwright.ui.workshop;

import javax.swing.JButton;
import javax.swing.JComponent;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.JSplitPane;
import javax.swing.UIManager;
import java.awt.BorderLayout;
import java.awt.Dimension;
import java.awt.FlowLayout;
import java.awt.event.ComponentAdapter;
import java.awt.event.ComponentEvent;

/**
 * A workshop page's readings and its answer (the result, or the chart of the fit): side by side where the page
 * is wide enough for the readings at the current text size and a useful answer beside them, one above the other
 * on a small screen or with large text, so that neither is squeezed to a sliver. One above the other, each
 * asks for its own height and the page scrolls ({@link barwright.ui.panel.ScrollingPage}).
 */
final class ReadingsAndAnswer extends JSplitPane {
    /** The answer's least useful width beside the readings (pixels at the system text size). */
    private static final int ANSWER_WIDTH = 420;
    private final JComponent readings;

    /** The readings with the "use in the car" button under them, and the answer (it scrolls in its box). */
    static ReadingsAndAnswer of(JComponent readings, JButton use, JComponent answer) {
        JPanel bottom = new JPanel(new FlowLayout(FlowLayout.TRAILING));
        bottom.add(use);
        JPanel left = new JPanel(new BorderLayout(4, 4));
        left.add(readings, BorderLayout.NORTH);
        left.add(bottom, BorderLayout.CENTER);
        return new ReadingsAndAnswer(left, new JScrollPane(answer));
    }

    /** The readings and the answer as they are given (each already scrolls where it needs to). */
    static ReadingsAndAnswer beside(JComponent readings, JComponent answer) {
        return new ReadingsAndAnswer(readings, answer);
    }

    /**
     * @return the chart in a box that asks for {@code lines} lines of the window's text in height and width: its
     * title, axes and a plot at the present text size, where the chart sits under the readings
     */
    static JComponent chartBox(JComponent chart, int lines) {
        JPanel box = new JPanel(new BorderLayout()) {
            @Override
            public Dimension getPreferredSize() {
                int line = getFontMetrics(UIManager.getFont("Label.font")).getHeight();
                return new Dimension(lines * line, lines * line);
            }

            @Override
            public Dimension getMinimumSize() {
                return getPreferredSize();
            }
        };
        box.add(chart, BorderLayout.CENTER);
        return box;
    }

    private ReadingsAndAnswer(JComponent readings, JComponent answer) {
        super(HORIZONTAL_SPLIT, readings, answer);
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
            resetToPreferredSizes();
            revalidate();
        }
    }
}
