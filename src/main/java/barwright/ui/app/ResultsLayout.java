package barwright.ui.app;

import java.awt.Component;
import java.awt.Container;
import java.awt.Dimension;
import java.awt.Insets;
import java.awt.LayoutManager;

/**
 * Puts the key figures beside the charts when both fit, and below them when they do not (a projector at
 * 1024x768, a shop laptop, a large text size), so that the car picture never shrinks to a sliver. The
 * figures keep their preferred width when beside; below, they take the full width and scroll if they must.
 */
final class ResultsLayout implements LayoutManager {
    /** The narrowest the charts and the car picture may get before the figures move below (pixels). */
    static final int CHARTS_MIN_WIDTH = 480;
    /** The share of the height the figures take at most when below the charts. */
    private static final double FIGURES_BELOW_SHARE = 0.42;
    /** The height the charts keep, with their tab strip, controls and the warnings, when the figures are below. */
    static final int CHARTS_MIN_HEIGHT = 440;
    /** The least height of the figures when below: a few rows, the rest scrolls (pixels). */
    private static final int FIGURES_MIN_HEIGHT = 120;
    private final Component charts;
    private final Component figures;
    private boolean beside = true;

    ResultsLayout(Component charts, Component figures) {
        this.charts = charts;
        this.figures = figures;
    }

    /** @return whether the last layout put the figures beside the charts (false: below) */
    boolean beside() {
        return beside;
    }

    @Override
    public void layoutContainer(Container parent) {
        Insets insets = parent.getInsets();
        int x = insets.left;
        int y = insets.top;
        int width = Math.max(0, parent.getWidth() - insets.left - insets.right);
        int height = Math.max(0, parent.getHeight() - insets.top - insets.bottom);
        int figuresWidth = Math.min(figures.getPreferredSize().width, width);
        beside = width - figuresWidth >= CHARTS_MIN_WIDTH;
        if (beside) {
            charts.setBounds(x, y, width - figuresWidth, height);
            figures.setBounds(x + width - figuresWidth, y, figuresWidth, height);
        } else {
            int below = Math.max(FIGURES_MIN_HEIGHT,
                    Math.min((int) Math.round(height * FIGURES_BELOW_SHARE), height - CHARTS_MIN_HEIGHT));
            below = Math.min(below, height);
            charts.setBounds(x, y, width, height - below);
            figures.setBounds(x, y + height - below, width, below);
        }
    }

    @Override
    public Dimension preferredLayoutSize(Container parent) {
        Dimension chartsSize = charts.getPreferredSize();
        Dimension figuresSize = figures.getPreferredSize();
        Insets insets = parent.getInsets();
        return new Dimension(chartsSize.width + figuresSize.width + insets.left + insets.right,
                Math.max(chartsSize.height, figuresSize.height) + insets.top + insets.bottom);
    }

    @Override
    public Dimension minimumLayoutSize(Container parent) {
        Insets insets = parent.getInsets();
        return new Dimension(CHARTS_MIN_WIDTH / 2 + insets.left + insets.right, 300 + insets.top + insets.bottom);
    }

    @Override
    public void addLayoutComponent(String name, Component component) {
    }

    @Override
    public void removeLayoutComponent(Component component) {
    }
}
