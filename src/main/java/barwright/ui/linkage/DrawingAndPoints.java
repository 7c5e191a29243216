package barwright.ui.linkage;

import javax.swing.JComponent;
import javax.swing.JPanel;
import javax.swing.JTabbedPane;
import java.awt.BorderLayout;
import java.awt.event.ComponentAdapter;
import java.awt.event.ComponentEvent;

/**
 * The front-view drawing with the table of points beside it where the width allows (the drawing keeps at least
 * sixteen lines of text's width), and in a tab of its own behind the drawing where it does not (a small screen, a
 * large text): the drawing is a picture, so it takes the room it is given and is never cut or scrolled.
 */
final class DrawingAndPoints extends JPanel {
    /** The drawing's least width beside the table, in lines of text (judged from the screenshots). */
    private static final int DRAWING_LINES_BESIDE = 16;
    private final JComponent drawing;
    private final JComponent points;
    private final JTabbedPane tabs = new JTabbedPane();
    private Boolean beside;

    DrawingAndPoints(JComponent drawing, JComponent points) {
        super(new BorderLayout(6, 6));
        this.drawing = drawing;
        this.points = points;
        setName("linkage.drawingAndPoints");
        tabs.setName("linkage.tabs");
        arrange(true);
        addComponentListener(new ComponentAdapter() {
            @Override
            public void componentResized(ComponentEvent event) {
                rearrange();
            }
        });
    }

    /** Puts the table beside the drawing or in a tab, as the width now allows. */
    void rearrange() {
        java.awt.Font text = javax.swing.UIManager.getFont("Label.font"); // the text size chosen
        int line = getFontMetrics(text != null ? text : getFont()).getHeight();
        arrange(!points.isVisible() || getWidth() >= DRAWING_LINES_BESIDE * line + points.getPreferredSize().width);
    }

    /** @return true where the table is beside the drawing */
    boolean beside() {
        return Boolean.TRUE.equals(beside);
    }

    private void arrange(boolean side) {
        if (beside != null && beside == side) {
            return;
        }
        beside = side;
        removeAll();
        tabs.removeAll();
        if (side) {
            add(drawing, BorderLayout.CENTER);
            add(points, BorderLayout.EAST);
        } else {
            tabs.addTab("Drawing", drawing);
            tabs.addTab("Points", points);
            tabs.setToolTipTextAt(1, "The measured points of this axle's linkage, in the units shown: type to change");
            add(tabs, BorderLayout.CENTER);
        }
        revalidate();
        repaint();
    }
}
