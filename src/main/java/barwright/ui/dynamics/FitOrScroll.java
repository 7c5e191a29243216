package barwright.ui.dynamics;

import javax.swing.JComponent;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.JSplitPane;
import javax.swing.UIManager;
import javax.swing.JViewport;
import javax.swing.Scrollable;
import java.awt.BorderLayout;
import java.awt.Dimension;
import java.awt.Rectangle;

/**
 * A page's content that fills the space it is given, but never shrinks below a height at which its charts and
 * picture can still be read: below that (a 768-pixel screen, a large text size) it scrolls instead.
 */
final class FitOrScroll extends JPanel implements Scrollable {
    /** A page narrower than this (pixels at the normal text size) stacks its chart above its picture. */
    static final int STACK_BELOW_WIDTH = 760;
    /** The least height beside each other, in pixels at the normal text size. */
    private final int sideBySideHeight;
    private boolean stacked;

    private FitOrScroll(JComponent content, int sideBySideHeight) {
        super(new BorderLayout());
        this.sideBySideHeight = sideBySideHeight;
        add(content, BorderLayout.CENTER);
    }

    /**
     * @return the height below which the content scrolls, at the current text size: worked out anew each time, so
     *         that a text size changed after the page was made (View &gt; Larger text) counts
     */
    private int leastHeight() {
        int sideBySide = Math.round(sideBySideHeight * textScale());
        return stacked ? 2 * sideBySide : sideBySide;
    }

    /**
     * @param leastHeight the height below which the content scrolls (pixels at the normal text size)
     * @param split       the chart beside the picture: stacked, and given twice the height, on a narrow page
     */
    static JScrollPane of(JComponent content, int leastHeight, JSplitPane split) {
        FitOrScroll fit = new FitOrScroll(content, leastHeight);
        JScrollPane scroll = new JScrollPane(fit, JScrollPane.VERTICAL_SCROLLBAR_AS_NEEDED,
                JScrollPane.HORIZONTAL_SCROLLBAR_NEVER) {
            /**
             * Stacks or unstacks the split for the width and the text size of now, at each layout: a new size of
             * the page and a new text size (which lays every page out again) both count.
             */
            @Override
            public void doLayout() {
                fit.followWidth(getWidth(), split);
                super.doLayout();
            }
        };
        scroll.setBorder(null);
        scroll.getVerticalScrollBar().setUnitIncrement(16);
        return scroll;
    }

    /** Turns the split to suit a page this wide at the current text size, where it is not turned so already. */
    private void followWidth(int width, JSplitPane split) {
        boolean narrow = width < STACK_BELOW_WIDTH * textScale();
        int orientation = narrow ? JSplitPane.VERTICAL_SPLIT : JSplitPane.HORIZONTAL_SPLIT;
        if (split.getOrientation() != orientation) {
            split.setOrientation(orientation);
            split.resetToPreferredSizes();
        }
        if (narrow != stacked) {
            stacked = narrow;
            revalidate();
        }
    }

    /**
     * @return a page's body: the chart beside the picture (the picture over what goes under it), the page's words
     *         and the cautions below both, scrolling where the page is short
     * @param chartShare the share of the width the chart takes
     */
    static JScrollPane chartAndPicture(JComponent chart, JComponent picture, JComponent underPicture,
                                       double chartShare, JComponent words, int leastHeight) {
        JPanel right = new JPanel(new BorderLayout(4, 4));
        right.add(picture, BorderLayout.CENTER);
        right.add(underPicture, BorderLayout.SOUTH);
        JSplitPane split = new JSplitPane(JSplitPane.HORIZONTAL_SPLIT, chart, right);
        split.setResizeWeight(chartShare);
        split.setOneTouchExpandable(true);
        JPanel bottom = new JPanel(new BorderLayout(4, 4));
        bottom.add(words, BorderLayout.CENTER);
        bottom.add(TurnInView.caution(), BorderLayout.SOUTH);
        JPanel content = new JPanel(new BorderLayout(6, 6));
        content.add(split, BorderLayout.CENTER);
        content.add(bottom, BorderLayout.SOUTH);
        return of(content, leastHeight, split);
    }

    /** @return the text size against the normal 13 points, at least 1 */
    private static float textScale() {
        java.awt.Font font = UIManager.getFont("Label.font");
        return font == null ? 1f : Math.max(1f, font.getSize2D() / 13f);
    }

    @Override
    public Dimension getPreferredScrollableViewportSize() {
        return getPreferredSize();
    }

    @Override
    public Dimension getPreferredSize() {
        Dimension wanted = super.getPreferredSize();
        return new Dimension(wanted.width, Math.max(wanted.height, leastHeight()));
    }

    @Override
    public int getScrollableUnitIncrement(Rectangle visible, int orientation, int direction) {
        return 16;
    }

    @Override
    public int getScrollableBlockIncrement(Rectangle visible, int orientation, int direction) {
        return Math.max(16, visible.height - 32);
    }

    @Override
    public boolean getScrollableTracksViewportWidth() {
        return true;
    }

    @Override
    public boolean getScrollableTracksViewportHeight() {
        return getParent() instanceof JViewport viewport && viewport.getHeight() >= leastHeight();
    }
}
