package barwright.ui.sizing;

import javax.swing.JComponent;
import javax.swing.JPanel;
import javax.swing.JSplitPane;
import javax.swing.JTabbedPane;
import java.awt.BorderLayout;
import java.awt.event.ComponentAdapter;
import java.awt.event.ComponentEvent;
import java.util.List;

/**
 * The compare view's results: the figures table above the charts where the view is tall enough for both to be
 * read (a split), and the figures as the first tab beside the charts' tabs where it is not (the largest text on a
 * 1024x768 projector left a few rows of figures and a chart with no room for its plot). Event thread.
 */
final class CompareResults extends JPanel {
    /** The figures' tab title where they are a tab beside the charts. */
    static final String FIGURES = "Figures";
    /** The figures and a chart are stacked where the view is at least this many lines of text high. */
    private static final int TALL_IN_LINES = 30;
    /** The share of the height the figures take when stacked. */
    private static final double FIGURES_SHARE = 0.42;

    private final JComponent figures;
    private final JTabbedPane tabs;
    private final JSplitPane split = new JSplitPane(JSplitPane.VERTICAL_SPLIT);
    private Boolean stacked;

    /**
     * @param figures the figures table (in its scroll pane)
     * @param tabs    the charts' tabbed pane, one tab a chart
     */
    CompareResults(JComponent figures, JTabbedPane tabs) {
        super(new BorderLayout());
        setName("compare.results");
        this.figures = figures;
        this.tabs = tabs;
        split.setBorder(null);
        split.setResizeWeight(FIGURES_SHARE);
        split.setContinuousLayout(true);
        addComponentListener(new ComponentAdapter() {
            @Override
            public void componentResized(ComponentEvent event) {
                arrange();
            }
        });
    }

    /** Shows these charts in place of those shown, keeping the chart chosen where there still is one. */
    void showCharts(List<String> titles, List<JComponent> charts) {
        int first = firstChart();
        int chosen = Math.max(0, tabs.getSelectedIndex() - first);
        boolean figuresChosen = first == 1 && tabs.getSelectedIndex() == 0;
        while (tabs.getTabCount() > first) {
            tabs.removeTabAt(tabs.getTabCount() - 1);
        }
        for (int i = 0; i < charts.size(); i++) {
            tabs.addTab(titles.get(i), charts.get(i));
        }
        if (tabs.getTabCount() > first && !figuresChosen) {
            tabs.setSelectedIndex(first + Math.min(chosen, tabs.getTabCount() - first - 1));
        }
    }

    /** @return true where the figures are a tab beside the charts (a short view) */
    boolean figuresInTabs() {
        return firstChart() == 1;
    }

    /** Brings the figures into view (their tab, where they are one). */
    void showFigures() {
        if (figuresInTabs()) {
            tabs.setSelectedIndex(0);
        }
    }

    private int firstChart() {
        return tabs.getTabCount() > 0 && tabs.getComponentAt(0) == figures ? 1 : 0;
    }

    private boolean tall() {
        return getHeight() >= TALL_IN_LINES * getFontMetrics(getFont()).getHeight();
    }

    /** Arranges the figures and the charts for the height the view has been given (none until it has one). */
    private void arrange() {
        if (getHeight() <= 0) {
            return;
        }
        boolean wantStacked = tall();
        if (stacked != null && stacked == wantStacked) {
            return;
        }
        stacked = wantStacked;
        removeAll();
        if (wantStacked) {
            if (figuresInTabs()) {
                tabs.removeTabAt(0);
            }
            split.setTopComponent(figures);
            split.setBottomComponent(tabs);
            add(split, BorderLayout.CENTER);
            split.setDividerLocation((int) (getHeight() * FIGURES_SHARE));
        } else {
            tabs.insertTab(FIGURES, null, figures, "The figures of every setup, with the difference of each from "
                    + "the first", 0);
            tabs.setSelectedIndex(0);
            add(tabs, BorderLayout.CENTER);
        }
        revalidate();
        repaint();
    }
}
