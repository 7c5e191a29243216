package barwright.ui.panel;

import javax.swing.JPanel;
import javax.swing.JViewport;
import javax.swing.Scrollable;
import java.awt.Dimension;
import java.awt.LayoutManager;
import java.awt.Rectangle;

/**
 * A panel that, inside a scroll pane, takes the width of the view and scrolls up and down, so that its lines
 * of text wrap rather than run off the edge; when the view is narrower than the panel's least width (a large
 * text size on a small screen) it keeps that width and scrolls sideways, so that no label, field or figure is
 * ever cut into a different number.
 */
public class PagePanel extends JPanel implements Scrollable {
    public PagePanel(LayoutManager layout) {
        super(layout);
    }

    @Override
    public Dimension getPreferredScrollableViewportSize() {
        return getPreferredSize();
    }

    @Override
    public int getScrollableUnitIncrement(Rectangle visible, int orientation, int direction) {
        return 16;
    }

    @Override
    public int getScrollableBlockIncrement(Rectangle visible, int orientation, int direction) {
        return visible.height;
    }

    @Override
    public boolean getScrollableTracksViewportWidth() {
        return !(getParent() instanceof JViewport viewport) || viewport.getWidth() >= getMinimumSize().width;
    }

    @Override
    public boolean getScrollableTracksViewportHeight() {
        return false;
    }
}
