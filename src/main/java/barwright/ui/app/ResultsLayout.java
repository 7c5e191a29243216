package barwright.ui.app;

import java.awt.Component;
import java.awt.Container;
import java.awt.Dimension;
import java.awt.Insets;
import java.awt.LayoutManager;
import java.util.function.IntSupplier;

/**
 * Puts the key figures beside the charts when both fit, and below them when they do not (a projector at
 * 1024x768, a shop laptop, a large text size), so that the car picture never shrinks to a sliver. The
 * figures keep their preferred width when beside; below, they take the full width. The charts never get
 * less than the height their picture needs (the supplier's figure); where the window is lower than that and
 * a few rows of figures, the whole results area scrolls up and down (it sits in a scroll pane,
 * {@link ResultsPanel}) rather than squeeze the picture or cut a number.
 */
final class ResultsLayout implements LayoutManager {
    /** The narrowest the charts and the car picture may get before the figures move below (pixels): the car
     * picture's least width, 400, and its borders. */
    static final int CHARTS_MIN_WIDTH = 440;
    /** The share of the height the figures take at most when below the charts (the rest scrolls in their column):
     * at 1024x768 the car picture then keeps 350 px at every text size. */
    private static final double FIGURES_BELOW_SHARE = 0.36;
    /** The least height of the figures when below, in lines of text: a few rows, the rest scrolls. */
    private static final int FIGURES_MIN_LINES = 5;
    private final Component charts;
    private final Component figures;
    private final IntSupplier chartsMinHeight;
    private final IntSupplier lineHeight;
    private boolean beside = true;

    /**
     * @param chartsMinHeight the least height of the charts column at the present text size (pixels)
     * @param lineHeight      the height of a line of text at the present text size (pixels)
     */
    ResultsLayout(Component charts, Component figures, IntSupplier chartsMinHeight, IntSupplier lineHeight) {
        this.charts = charts;
        this.figures = figures;
        this.chartsMinHeight = chartsMinHeight;
        this.lineHeight = lineHeight;
    }

    /** @return whether the last layout put the figures beside the charts (false: below) */
    boolean beside() {
        return beside;
    }

    /** @return the least width of the results that keeps the figures beside the charts (pixels) */
    int widthForBeside() {
        return CHARTS_MIN_WIDTH + figures.getPreferredSize().width;
    }

    private boolean besideAt(int width) {
        return width - Math.min(figures.getPreferredSize().width, width) >= CHARTS_MIN_WIDTH;
    }

    /**
     * @return the height the charts get above their least before the figures below get more: two lines and a
     * little (at 1024x768 the car picture then keeps 350 px at every text size)
     */
    private int spare() {
        return 2 * lineHeight.getAsInt() + 10;
    }

    private int figuresMinHeight() {
        return FIGURES_MIN_LINES * lineHeight.getAsInt();
    }

    @Override
    public void layoutContainer(Container parent) {
        Insets insets = parent.getInsets();
        int x = insets.left;
        int y = insets.top;
        int width = Math.max(0, parent.getWidth() - insets.left - insets.right);
        int height = Math.max(0, parent.getHeight() - insets.top - insets.bottom);
        int figuresWidth = Math.min(figures.getPreferredSize().width, width);
        beside = besideAt(width);
        int chartsLeast = chartsMinHeight.getAsInt();
        if (beside) {
            charts.setBounds(x, y, width - figuresWidth, height);
            figures.setBounds(x + width - figuresWidth, y, figuresWidth, height);
        } else if (visibleHeight(parent) >= chartsLeast + spare() + figuresMinHeight()) {
            // the charts first: their least and two lines to spare, then the figures (their column scrolls)
            int below = Math.max(figuresMinHeight(),
                    Math.min((int) Math.round(height * FIGURES_BELOW_SHARE), height - chartsLeast - spare()));
            below = Math.max(0, Math.min(below, height - chartsLeast));
            charts.setBounds(x, y, width, height - below);
            figures.setBounds(x, y + height - below, width, below);
        } else {
            // too low for both: the charts fill the view (never less than their least), the figures follow
            int chartsHeight = scrolledChartsHeight(parent);
            charts.setBounds(x, y, width, chartsHeight);
            figures.setBounds(x, y + chartsHeight, width, Math.max(0, height - chartsHeight));
        }
    }

    /** @return the height on screen: the scroll pane's view, or the container's own */
    private static int visibleHeight(Container parent) {
        return parent.getParent() instanceof javax.swing.JViewport viewport ? viewport.getHeight()
                : parent.getHeight();
    }

    /** @return the charts' height when the area scrolls: the view less two lines (a cue that more follows) */
    private int scrolledChartsHeight(Container parent) {
        return Math.max(chartsMinHeight.getAsInt(), visibleHeight(parent) - 2 * lineHeight.getAsInt());
    }

    @Override
    public Dimension preferredLayoutSize(Container parent) {
        Insets insets = parent.getInsets();
        int width = parent.getWidth() - insets.left - insets.right;
        int height = besideAt(width) ? chartsMinHeight.getAsInt()
                : scrolledChartsHeight(parent) + figures.getPreferredSize().height;
        return new Dimension(charts.getPreferredSize().width + figures.getPreferredSize().width + insets.left
                + insets.right, height + insets.top + insets.bottom);
    }

    /** The least size: the charts at their least height, and a few rows of figures below them if they go there. */
    @Override
    public Dimension minimumLayoutSize(Container parent) {
        Insets insets = parent.getInsets();
        int width = parent.getWidth() - insets.left - insets.right;
        int height = chartsMinHeight.getAsInt() + (besideAt(width) ? 0 : figuresMinHeight());
        return new Dimension(CHARTS_MIN_WIDTH / 2 + insets.left + insets.right, height + insets.top + insets.bottom);
    }

    @Override
    public void addLayoutComponent(String name, Component component) {
    }

    @Override
    public void removeLayoutComponent(Component component) {
    }
}
