package barwright.ui.panel;

import javax.swing.JComponent;
import javax.swing.JScrollPane;
import javax.swing.JViewport;
import javax.swing.SwingUtilities;
import javax.swing.UIManager;
import java.awt.BorderLayout;
import java.awt.Dimension;
import java.awt.Font;

/**
 * A page always as wide as the view: as high as the view where that holds all of it, and at its own height,
 * scrolling up and down, where it does not (a 1024x768 projector with large text), so that what it shows keeps
 * a size that can be read rather than being squeezed. Given a chart, the chart stands above its words and
 * takes the height they leave, but never less than a least height: a share of the view's height or a number of
 * lines of text (the chart's title, legend and axes grow with the text size, and the plot needs room besides),
 * whichever is more; below that the page scrolls to the words. Event thread.
 */
public final class ScrollingPage extends PagePanel {
    private static final int GAP = 4;
    private final JComponent words;
    private final int leastLines;
    private final double leastShare;
    private int laidOutWidth = -1;

    private ScrollingPage(JComponent content, JComponent words, int leastLines, double leastShare) {
        super(words == null ? new BorderLayout() : new BorderLayout(0, GAP));
        this.words = words;
        this.leastLines = leastLines;
        this.leastShare = leastShare;
        add(content, BorderLayout.CENTER);
        if (words != null) {
            add(words, BorderLayout.SOUTH);
        }
    }

    /** @return the content in a pane that scrolls up and down, never sideways */
    public static JScrollPane of(JComponent content) {
        return scrolling(new ScrollingPage(content, null, 0, 0));
    }

    /**
     * @param leastLines the chart's least height in lines of the window's text (its title, legend, axes and a
     *                   plot at the present text size)
     * @param leastShare the share of the view's height the chart gets at least
     * @return the chart over the words in a pane that scrolls up and down, never sideways
     */
    public static JScrollPane chartOverWords(JComponent chart, JComponent words, int leastLines, double leastShare) {
        return scrolling(new ScrollingPage(chart, words, leastLines, leastShare));
    }

    private static JScrollPane scrolling(ScrollingPage page) {
        JScrollPane scroll = new JScrollPane(page, JScrollPane.VERTICAL_SCROLLBAR_AS_NEEDED,
                JScrollPane.HORIZONTAL_SCROLLBAR_NEVER);
        scroll.setBorder(null);
        scroll.getVerticalScrollBar().setUnitIncrement(16);
        return scroll;
    }

    /** @return the chart's least height (pixels): the least lines of text, or the share of the view */
    private int chartLeastHeight() {
        Font font = UIManager.getFont("Label.font");
        int line = getFontMetrics(font != null ? font : getFont()).getHeight();
        return Math.max(leastLines * line, (int) Math.round(viewHeight() * leastShare));
    }

    private int viewHeight() {
        return getParent() instanceof JViewport viewport ? viewport.getHeight() : getHeight();
    }

    @Override
    public Dimension getPreferredSize() {
        Dimension wanted = super.getPreferredSize();
        if (words == null) {
            return wanted;
        }
        return new Dimension(wanted.width, chartLeastHeight() + GAP + words.getPreferredSize().height);
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

    @Override
    public boolean getScrollableTracksViewportWidth() {
        return true;
    }

    @Override
    public boolean getScrollableTracksViewportHeight() {
        return getParent() instanceof JViewport viewport && viewport.getHeight() >= getPreferredSize().height;
    }
}
