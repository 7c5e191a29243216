package barwright.ui.workshop;

import barwright.ui.panel.PagePanel;

import javax.swing.JComponent;
import javax.swing.JScrollPane;
import javax.swing.JViewport;
import javax.swing.SwingUtilities;
import java.awt.BorderLayout;

/**
 * A workshop page's content, always as wide as the view: as high as the view where that holds all of it, and
 * at its own height, scrolling up and down, where it does not (a 1024x768 projector with large text), so that
 * the readings, the chart and the answer are each shown at a size that can be read rather than squeezed.
 * Event thread.
 */
final class FittedPage extends PagePanel {
    private int laidOutWidth = -1;

    private FittedPage(JComponent content) {
        super(new BorderLayout());
        add(content, BorderLayout.CENTER);
    }

    /** @return the content in a pane that scrolls up and down, never sideways */
    static JScrollPane of(JComponent content) {
        JScrollPane scroll = new JScrollPane(new FittedPage(content), JScrollPane.VERTICAL_SCROLLBAR_AS_NEEDED,
                JScrollPane.HORIZONTAL_SCROLLBAR_NEVER);
        scroll.setBorder(null);
        scroll.getVerticalScrollBar().setUnitIncrement(16);
        return scroll;
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
