package barwright.ui.linkage;

import javax.swing.JComponent;
import javax.swing.JPanel;
import java.awt.BorderLayout;
import java.awt.event.ComponentAdapter;
import java.awt.event.ComponentEvent;

/**
 * The front-view drawing with the table of points beside it where the width allows (the drawing keeps at least
 * sixteen lines of text's width), and under it where it does not (a small screen, a large text): the drawing then
 * fills the page's view and the table follows below, with the words, where the page scrolls. The drawing is a
 * picture, so it takes the room it is given and is never cut or scrolled. (A pair of tabs, drawing and points,
 * took a line of the drawing's height at 28 points, which the picture could not spare.)
 */
final class DrawingAndPoints extends JPanel {
    /** The drawing's least width beside the table, in lines of text (judged from the screenshots). */
    private static final int DRAWING_LINES_BESIDE = 16;
    private final JComponent drawing;
    private final JComponent points;
    private Boolean beside;
    /** Whether the axle has points to show (an axle without a linkage has none). */
    private boolean hasPoints = true;
    private boolean arrangedWithPoints = true;

    DrawingAndPoints(JComponent drawing, JComponent points) {
        super(new BorderLayout(6, 6));
        this.drawing = drawing;
        this.points = points;
        setName("linkage.drawingAndPoints");
        arrange(true);
        addComponentListener(new ComponentAdapter() {
            @Override
            public void componentResized(ComponentEvent event) {
                rearrange();
            }
        });
    }

    /** Decides at once, with the new width: a resize event comes later, after a layout at the old arrangement. */
    @Override
    public void setBounds(int x, int y, int width, int height) {
        boolean resized = width != getWidth();
        super.setBounds(x, y, width, height);
        if (resized) {
            rearrange();
        }
    }

    /** Puts the table beside the drawing or under it, as the width now allows. */
    void rearrange() {
        java.awt.Font text = javax.swing.UIManager.getFont("Label.font"); // the text size chosen
        int line = getFontMetrics(text != null ? text : getFont()).getHeight();
        arrange(!hasPoints || getWidth() >= DRAWING_LINES_BESIDE * line + points.getPreferredSize().width);
    }

    /** Shows the table of points, or the drawing alone for an axle without a linkage. */
    void setHasPoints(boolean has) {
        hasPoints = has;
        rearrange();
    }

    private void arrange(boolean side) {
        if (beside != null && beside == side && arrangedWithPoints == hasPoints) {
            return;
        }
        beside = side;
        arrangedWithPoints = hasPoints;
        removeAll();
        add(drawing, BorderLayout.CENTER);
        if (hasPoints) {
            add(points, side ? BorderLayout.EAST : BorderLayout.SOUTH);
        }
        revalidate();
        repaint();
        // the page measured this column in the old arrangement: lay it out again once this pass is done
        javax.swing.SwingUtilities.invokeLater(() -> {
            revalidate();
            repaint();
        });
    }
}
