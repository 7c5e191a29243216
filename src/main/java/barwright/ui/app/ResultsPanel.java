package barwright.ui.app;

import barwright.ui.panel.PagePanel;

import javax.swing.JViewport;

/**
 * The charts and the key figures, laid out by {@link ResultsLayout}, inside a scroll pane: as wide as the
 * view always, as high as the view while that leaves the car picture its least height, and higher (the view
 * scrolls up and down) on a low window with a large text size.
 */
final class ResultsPanel extends PagePanel {
    ResultsPanel() {
        super(null);
        setName("results.area");
    }

    @Override
    public boolean getScrollableTracksViewportWidth() {
        return true;
    }

    @Override
    public boolean getScrollableTracksViewportHeight() {
        return !(getParent() instanceof JViewport viewport) || viewport.getHeight() >= getMinimumSize().height;
    }
}
