package barwright.ui.linkage;

import barwright.model.FrontViewPoint;
import barwright.physics.linkage.FrontViewFigure.Pickup;
import barwright.ui.field.ViewSettings;

import javax.swing.JComponent;
import java.awt.Cursor;
import java.awt.Dimension;
import java.awt.Font;
import java.awt.Graphics;
import java.awt.Graphics2D;
import java.awt.event.MouseAdapter;
import java.awt.event.MouseEvent;
import java.util.List;
import java.util.function.Function;

/**
 * The front-view drawing on screen: paints the scene with {@link FrontViewPainter} and lets a person drag a
 * measured point with the mouse. The drag is reported as road points (m) under the mouse; the page turns them
 * into the file's values. Event thread.
 */
final class FrontViewDrawing extends JComponent {
    /** What the page does with a drag. */
    interface DragListener {
        /** The mouse moved with a point held: from where it was pressed to where it is now (road axes, m). */
        void dragged(Pickup pickup, FrontViewPoint pressed, FrontViewPoint now);

        /** The mouse let go of the point. */
        void released(Pickup pickup, FrontViewPoint pressed, FrontViewPoint now);
    }

    /** The most lines the key takes at the drawing's foot; where it needs more, it goes under the drawing. */
    private static final int KEY_LINES_INSIDE = 3;
    private final FrontViewPainter painter = new FrontViewPainter();
    private final KeyBelow keyBelow = new KeyBelow();
    private final ViewSettings view;
    private final Function<Pickup, String> pointName;
    private DragListener dragListener;
    private LinkageScene scene;
    private Pickup hovered;
    private Pickup held;
    private FrontViewPoint pressedAt;
    private long paintedRevision = -1;

    /** @param pointName the name of a pickup, for its tooltip */
    FrontViewDrawing(ViewSettings view, Function<Pickup, String> pointName) {
        this.view = view;
        this.pointName = pointName;
        setName("linkage.drawing");
        setFocusable(false);
        MouseAdapter mouse = new MouseAdapter() {
            @Override
            public void mouseMoved(MouseEvent event) {
                hover(event);
            }

            @Override
            public void mousePressed(MouseEvent event) {
                Pickup under = under(event.getX(), event.getY());
                if (under != null && painter.mapping() != null) {
                    held = under;
                    pressedAt = painter.mapping().toRoad(event.getX(), event.getY());
                }
            }

            @Override
            public void mouseDragged(MouseEvent event) {
                if (held != null && dragListener != null) {
                    dragListener.dragged(held, pressedAt, painter.mapping().toRoad(event.getX(), event.getY()));
                }
            }

            @Override
            public void mouseReleased(MouseEvent event) {
                if (held != null && dragListener != null) {
                    Pickup let = held;
                    held = null;
                    dragListener.released(let, pressedAt, painter.mapping().toRoad(event.getX(), event.getY()));
                }
                held = null;
            }
        };
        addMouseListener(mouse);
        addMouseMotionListener(mouse);
        view.addListener(this::repaint);
    }

    /** The key's place under the drawing, shown where the drawing has no room for it (a large text, a narrow view). */
    JComponent keyBelow() {
        return keyBelow;
    }

    /** @return whether the key fits the drawing's foot in a few lines at its present width and text size */
    boolean keyInside() {
        java.awt.FontMetrics metrics = getFontMetrics(font());
        int width = getWidth() > 0 ? getWidth() : getPreferredSize().width;
        return FrontViewText.height(keyPieces(width)) <= KEY_LINES_INSIDE * metrics.getHeight();
    }

    /** @return the boxes of the key's words at the last paint, in the drawing's or the strip's pixels */
    List<java.awt.Rectangle> keyBoxes() {
        return keyBelow.isVisible() ? keyBelow.painter.keyBoxes() : painter.keyBoxes();
    }

    /** @return the box of every text written inside the drawing at the last paint (pixels) */
    List<java.awt.Rectangle> textBoxes() {
        return painter.textBoxes();
    }

    /** @return the key laid out across a width at the drawing's text size */
    private List<FrontViewText.Piece> keyPieces(int width) {
        return FrontViewPainter.keyPieces(getFontMetrics(font()), getFontMetrics(font().deriveFont(Font.BOLD)), 0,
                width, scene);
    }

    /** Shows the key under the drawing or in it, as the width and text size now allow. */
    private void placeKey() {
        boolean below = !keyInside();
        if (keyBelow.isVisible() != below) {
            keyBelow.setVisible(below);
        }
        keyBelow.revalidate();
        keyBelow.repaint();
    }

    @Override
    public void setBounds(int x, int y, int width, int height) {
        boolean resized = width != getWidth();
        super.setBounds(x, y, width, height);
        if (resized) {
            // after this layout pass: a component invalidated while its parents are laid out is not laid out again
            javax.swing.SwingUtilities.invokeLater(this::placeKey);
        }
    }

    /**
     * @return as wide as a chart at the system text (fourteen lines at a large one: wider made the page wider
     *         than a small screen's tab), and tall enough for the picture to read at the current text size: the four lines
     *         of heading and key, the roll centre's label under the ground, and some fourteen lines of picture
     */
    private int roomHeight;

    @Override
    public Dimension getPreferredSize() {
        int line = getFontMetrics(font()).getHeight();
        int height = roomHeight > 0 ? Math.max(getMinimumSize().height, Math.min(roomHeight, line * 20))
                : Math.max(300, line * 20);
        return new Dimension(Math.max(420, line * 14), height);
    }

    /** Never taller than this (pixels; 0 for no bound): the height of the view the page scrolls in. */
    void fitHeight(int height) {
        if (height != roomHeight) {
            roomHeight = height;
            revalidate();
        }
    }

    /**
     * @return small: the drawing scales to the room it is given (a picture fits, it does not scroll); about nine
     *         lines of text high, so the heading, the key and some picture still show
     */
    @Override
    public Dimension getMinimumSize() {
        int line = getFontMetrics(font()).getHeight();
        return new Dimension(240, Math.max(180, line * 9));
    }

    void setDragListener(DragListener listener) {
        this.dragListener = listener;
    }

    void show(LinkageScene newScene) {
        scene = newScene;
        placeKey();
        repaint();
    }

    LinkageScene scene() {
        return scene;
    }

    /** @return the revision of the scene last painted, for the speed harness */
    long paintedRevision() {
        return paintedRevision;
    }

    /** @return the texts written at the last paint */
    List<String> drawnText() {
        return painter.drawnText();
    }

    /** @return the pickups and where they were drawn at the last paint (pixels) */
    List<FrontViewPainter.Handle> handles() {
        return painter.handles();
    }

    /** @return the last paint's pixels per metre */
    double mappingScale() {
        return painter.mapping().scale();
    }

    boolean isDragging() {
        return held != null;
    }

    private void hover(MouseEvent event) {
        Pickup under = under(event.getX(), event.getY());
        if (!java.util.Objects.equals(under, hovered)) {
            hovered = under;
            setCursor(Cursor.getPredefinedCursor(under == null ? Cursor.DEFAULT_CURSOR : Cursor.HAND_CURSOR));
            setToolTipText(under == null ? null : pointName.apply(under) + ": drag to move it (one undo step)");
            repaint();
        }
    }

    /** @return the pickup within reach of a pixel (the nearest), or null */
    private Pickup under(int x, int y) {
        double reach = Math.max(10, font().getSize2D() * 0.9);
        Pickup nearest = null;
        double best = reach;
        for (FrontViewPainter.Handle handle : painter.handles()) {
            double distance = handle.at().distance(x, y);
            if (distance <= best) {
                best = distance;
                nearest = handle.pickup();
            }
        }
        return nearest;
    }

    private Font font() {
        Font font = getFont();
        return font != null ? font : new Font(Font.SANS_SERIF, Font.PLAIN, 13);
    }

    @Override
    protected void paintComponent(Graphics graphics) {
        if (keyBelow.isVisible() == keyInside()) {
            javax.swing.SwingUtilities.invokeLater(this::placeKey); // the text size changed since the last layout
        }
        Graphics2D g = (Graphics2D) graphics.create();
        try {
            painter.paint(g, getWidth(), getHeight(), scene, new FrontViewPainter.Style(font(), view.units(),
                    view.locale(), held != null ? held : hovered, !keyBelow.isVisible()));
        } finally {
            g.dispose();
        }
        if (scene != null) {
            paintedRevision = scene.revision();
        }
    }

    /** Paints the scene as it is on screen into an export's graphics, at the charts' export size. */
    void paintExport(Graphics2D g, Font font) {
        new FrontViewPainter().paint(g, barwright.ui.chart.ChartExport.WIDTH, barwright.ui.chart.ChartExport.HEIGHT,
                scene, new FrontViewPainter.Style(font, view.units(), view.locale(), null, true));
    }

    /** The key under the drawing: as tall as its lines at the drawing's width, laid out as in the drawing. */
    private final class KeyBelow extends JComponent {
        private final FrontViewPainter painter = new FrontViewPainter();

        KeyBelow() {
            setName("linkage.key");
            setVisible(false);
        }

        @Override
        public Dimension getPreferredSize() {
            int width = FrontViewDrawing.this.getWidth() > 0 ? FrontViewDrawing.this.getWidth()
                    : FrontViewDrawing.this.getPreferredSize().width;
            return new Dimension(100, FrontViewText.height(keyPieces(width)) + 8);
        }

        @Override
        public Dimension getMinimumSize() {
            return getPreferredSize();
        }

        @Override
        protected void paintComponent(Graphics graphics) {
            Graphics2D g = (Graphics2D) graphics.create();
            try {
                painter.paintKey(g, getWidth(), getHeight(), scene, font());
            } finally {
                g.dispose();
            }
        }
    }
}
