package barwright.ui.sizing;

import javax.swing.JComponent;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.JSplitPane;
import javax.swing.JTabbedPane;
import java.awt.BorderLayout;
import java.awt.Dimension;
import java.awt.event.ComponentAdapter;
import java.awt.event.ComponentEvent;

/**
 * A view's settings beside its results where the width allows both (a split), or as two tabs, "Settings" and
 * "Results", where it does not: with the largest text on a 1024x768 projector the settings alone want most of
 * the width, and squeezing both side by side cut the settings' labels and the results' columns. A finished
 * search turns to the results tab. Event thread.
 */
final class SettingsBeside extends JPanel {
    /** The results want at least this many times the font's height of width beside the settings. */
    private static final int RESULTS_WIDTH_IN_LINES = 24;

    private final String settingsTitle;
    private final JComponent settings;
    private final JComponent results;
    private final JSplitPane split = new JSplitPane(JSplitPane.HORIZONTAL_SPLIT);
    private final JTabbedPane tabs = new JTabbedPane();
    private Boolean tabbed;

    SettingsBeside(String name, JComponent settings, JComponent results) {
        this(name, "Settings", settings, results);
    }

    /** @param settingsTitle the settings' tab title where they are a tab, e.g. "Setups" */
    SettingsBeside(String name, String settingsTitle, JComponent settings, JComponent results) {
        super(new BorderLayout());
        setName(name + ".layout");
        this.settingsTitle = settingsTitle;
        this.settings = settings;
        this.results = results;
        split.setBorder(null);
        split.setResizeWeight(0);
        tabs.setName(name + ".settingsOrResults");
        addComponentListener(new ComponentAdapter() {
            @Override
            public void componentResized(ComponentEvent event) {
                arrange();
            }
        });
        arrange();
    }

    /**
     * @return the settings in a scroll pane as wide as their own text needs (it grows with the text size), never
     *         under 390 px, scrolling up and down only
     */
    static JScrollPane settingsScroll(JComponent form, int height) {
        JScrollPane scroll = new JScrollPane(form) {
            @Override
            public Dimension getPreferredSize() {
                int scrollBar = getVerticalScrollBar().getPreferredSize().width;
                int width = Math.max(390, form.getPreferredSize().width + scrollBar + getInsets().left
                        + getInsets().right);
                return new Dimension(width, height);
            }
        };
        scroll.setHorizontalScrollBarPolicy(JScrollPane.HORIZONTAL_SCROLLBAR_NEVER);
        scroll.getVerticalScrollBar().setUnitIncrement(16);
        return scroll;
    }

    /** @return true where the settings and the results are two tabs */
    boolean tabbed() {
        return Boolean.TRUE.equals(tabbed);
    }

    /** Brings the results into view (their tab, where tabbed). */
    void showResults() {
        if (tabbed()) {
            tabs.setSelectedComponent(results);
        }
    }

    private boolean narrow() {
        if (getWidth() <= 0) {
            return false;
        }
        int line = getFontMetrics(getFont()).getHeight();
        return getWidth() < settings.getPreferredSize().width + RESULTS_WIDTH_IN_LINES * line;
    }

    private void arrange() {
        boolean wantTabs = narrow();
        if (tabbed != null && tabbed == wantTabs) {
            return;
        }
        boolean resultsWereChosen = tabbed() && tabs.getSelectedComponent() == results;
        tabbed = wantTabs;
        removeAll();
        if (wantTabs) {
            tabs.removeAll();
            tabs.addTab(settingsTitle, settings);
            tabs.addTab("Results", results);
            if (resultsWereChosen) {
                tabs.setSelectedComponent(results);
            }
            add(tabs, BorderLayout.CENTER);
        } else {
            split.setLeftComponent(settings);
            split.setRightComponent(results);
            add(split, BorderLayout.CENTER);
            split.resetToPreferredSizes();
        }
        revalidate();
        repaint();
    }
}
