package barwright.ui.insight;

import barwright.ui.panel.PagePanel;

import javax.swing.JComponent;
import javax.swing.JScrollPane;
import javax.swing.JViewport;
import javax.swing.SwingUtilities;
import javax.swing.UIManager;
import java.awt.BorderLayout;
import java.awt.Dimension;
import java.awt.Font;

/**
 * A view's chart above its words and controls, always as wide as the view. The chart takes the height the words
 * leave; where that would be less than {@link #CHART_SHARE} of the view or than a least height in lines of text
 * (the chart's title, legend and axes grow with the text size, and the plot needs room besides), the chart
 * keeps that height and the page scrolls up and down to the words below. At 1024x768 with 28-point text the
 * chart split with its words had shrunk to a strip. Event thread.
 */
final class ChartOverWords extends PagePanel {
    /** The share of the view's height the chart gets at least, as the split it replaces gave it. */
    static final double CHART_SHARE = 0.72;
    private final JComponent chart;
    private final JComponent words;
    private final int leastLines;
    private int laidOutWidth = -1;

    private ChartOverWords(JComponent chart, JComponent words, int leastLines) {
        super(new BorderLayout(0, 4));
        this.chart = chart;
        this.words = words;
        this.leastLines = leastLines;
        add(chart, BorderLayout.CENTER);
        add(words, BorderLayout.SOUTH);
    }

    /**
     * @param leastLines the chart's least height in lines of the window's text (its title, legend, axes and a
     *                   plot at the present text size)
     * @return the chart over the words in a pane that scrolls up and down, never sideways
     */
    static JScrollPane of(JComponent chart, JComponent words, int leastLines) {
        ChartOverWords page = new ChartOverWords(chart, words, leastLines);
        JScrollPane scroll = new JScrollPane(page, JScrollPane.VERTICAL_SCROLLBAR_AS_NEEDED,
                JScrollPane.HORIZONTAL_SCROLLBAR_NEVER);
        scroll.setBorder(null);
        scroll.getVerticalScrollBar().setUnitIncrement(16);
        return scroll;
    }

    /** @return the chart's least height (pixels): the least lines of text, or the share of the view */
    int chartLeastHeight() {
        Font font = UIManager.getFont("Label.font");
        int line = getFontMetrics(font != null ? font : getFont()).getHeight();
        return Math.max(leastLines * line, (int) Math.round(viewHeight() * CHART_SHARE));
    }

    private int viewHeight() {
        return getParent() instanceof JViewport viewport ? viewport.getHeight() : getHeight();
    }

    @Override
    public Dimension getPreferredSize() {
        Dimension wanted = super.getPreferredSize();
        return new Dimension(wanted.width, chartLeastHeight() + 4 + words.getPreferredSize().height);
    }

    @Override
    public void doLayout() {
        super.doLayout();
        // wrapped words know their height only once they have their width: ask again after a change of width
        if (getWidth() != laidOutWidth) {
            laidOutWidth = getWidth();
            SwingUtilities.invokeLater(this::revalidate);
        }
    }

    /** @return the chart (tests) */
    JComponent chart() {
        return chart;
    }

    @Override
    public boolean getScrollableTracksViewportWidth() {
        return true;
    }

    @Override
    public boolean getScrollableTracksViewportHeight() {
        return getParent() instanceof JViewport viewport && viewport.getHeight() >= getPreferredSize().height;
    }
}
