package barwright.ui.dynamics;

import barwright.physics.dynamics.RollState;
import barwright.ui.field.ViewSettings;
import barwright.ui.panel.Palette;
import barwright.units.Figures;
import barwright.units.Quantity;

import javax.swing.JComponent;
import javax.swing.UIManager;
import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Dimension;
import java.awt.Font;
import java.awt.FontMetrics;
import java.awt.Graphics;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.geom.AffineTransform;
import java.awt.geom.GeneralPath;
import java.awt.geom.RoundRectangle2D;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * The car seen from behind at one instant of a run: the body rolled about the roll centre (drawn larger than
 * life, and saying so), each wheel's load as a column under its tyre with a tick at its load standing still,
 * and a wheel with no load drawn off the ground. Fed a state; it computes nothing. Event thread.
 */
final class RollingCarView extends JComponent {
    /** Body roll is a few degrees: drawn this many times larger so that a class can see it move. */
    static final double ROLL_DRAWN_LARGER = 5;
    private static final String[] WHEEL_WORDS = {"LF", "RF", "LR", "RR"};
    private final ViewSettings view;
    private final List<String> drawnText = new ArrayList<>();
    private CarOutline outline;
    private RollState state;
    private String absent = "No run yet.";

    RollingCarView(ViewSettings view, String name) {
        this.view = view;
        setName(name);
        setPreferredSize(new Dimension(380, 300));
        setMinimumSize(new Dimension(220, 200));
        view.addListener(this::repaint);
    }

    /** Shows the car at one instant. */
    void show(CarOutline car, RollState instant) {
        outline = car;
        state = instant;
        repaint();
    }

    /** Shows words instead of a car (no run, or why there is none). */
    void showNothing(String why) {
        outline = null;
        state = null;
        absent = why;
        repaint();
    }

    /** @return the texts written at the last paint (for the window tests) */
    List<String> drawnText() {
        return List.copyOf(drawnText);
    }

    /** @return the instant shown, or null */
    RollState shownState() {
        return state;
    }

    @Override
    protected void paintComponent(Graphics graphics) {
        Graphics2D g = (Graphics2D) graphics.create();
        drawnText.clear();
        try {
            g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
            g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
            g.setColor(colour("Panel.background", Color.WHITE));
            g.fillRect(0, 0, getWidth(), getHeight());
            Font font = getFont() != null ? getFont() : new Font(Font.SANS_SERIF, Font.PLAIN, 13);
            g.setFont(font);
            Color ink = colour("Label.foreground", Color.BLACK);
            g.setColor(ink);
            if (state == null) {
                write(g, absent, 10, g.getFontMetrics().getAscent() + 8);
                return;
            }
            draw(g, font, ink);
        } finally {
            g.dispose();
        }
    }

    private void draw(Graphics2D g, Font font, Color ink) {
        FontMetrics metrics = g.getFontMetrics();
        int line = metrics.getHeight();
        g.setFont(font.deriveFont(Font.BOLD));
        write(g, String.format(Locale.ROOT, "t = %.3f s    a_y %s", state.time(),
                figure(Math.abs(state.lateral()), Quantity.ACCELERATION, 2)) + turnWords(), 10, line);
        g.setFont(font);
        write(g, "Body roll " + figure(Math.abs(state.roll()), Quantity.ANGLE, 2) + " (drawn "
                + (int) ROLL_DRAWN_LARGER + "\u00D7 larger), seen from behind", 10, 2 * line + 2);

        int top = 2 * line + 12;
        int legendTop = getHeight() - line - 6;
        int ground = top + (int) ((legendTop - top) * 0.55);
        double scale = Math.min(getWidth() * 0.6 / (outline.track() + 0.3), (ground - top) / 1.45);
        double middle = getWidth() / 2.0;
        double halfTrack = outline.track() / 2 * scale;
        g.setColor(Palette.muted());
        g.setStroke(new BasicStroke(1.5f));
        g.drawLine(6, ground, getWidth() - 6, ground);

        double[] loads = {state.leftFront(), state.rightFront(), state.leftRear(), state.rightRear()};
        int raised = Math.max(5, line / 2);
        for (int side = 0; side < 2; side++) {
            double x = middle + (side == 0 ? -halfTrack : halfTrack);
            boolean lifted = loads[side + 2] <= 0; // the rear tyre is the one in front of the eye
            wheel(g, x, ground - (lifted ? raised : 0), 0.2 * scale, 0.6 * scale, ink);
        }
        body(g, middle, ground, halfTrack, scale, ink);

        double room = legendTop - ground - line * 2 - 6;
        for (int wheel = 0; wheel < 4; wheel++) {
            double tyreX = middle + (wheel % 2 == 0 ? -halfTrack : halfTrack);
            column(g, tyreX, ground + 2, room, wheel, loads[wheel]);
        }
        g.setColor(ink);
        write(g, "Columns: front and rear wheel loads; the tick is the load standing still.", 10,
                getHeight() - 6);
    }

    private String turnWords() {
        if (state.lateral() == 0) {
            return "";
        }
        return state.lateral() > 0 ? ", turning left" : ", turning right";
    }

    private void body(Graphics2D g, double middle, int ground, double halfTrack, double scale, Color ink) {
        double pivotY = ground - outline.rollCentreHeight() * scale;
        AffineTransform before = g.getTransform();
        // roll is positive leaning right; seen from behind the car's right is on the right, so clockwise
        g.rotate(state.roll() * ROLL_DRAWN_LARGER, middle, pivotY);
        double half = halfTrack - 0.12 * scale;
        GeneralPath shell = new GeneralPath();
        double[][] corners = {{-1, 0.40}, {-1, 0.92}, {-0.72, 1.30}, {0.72, 1.30}, {1, 0.92}, {1, 0.40}};
        for (int i = 0; i < corners.length; i++) {
            double x = middle + corners[i][0] * half;
            double y = ground - corners[i][1] * scale;
            if (i == 0) {
                shell.moveTo(x, y);
            } else {
                shell.lineTo(x, y);
            }
        }
        shell.closePath();
        g.setColor(colour("Barwright.bodyFill", new Color(0xDDE3EA)));
        g.fill(shell);
        g.setColor(ink);
        g.setStroke(new BasicStroke(1.6f));
        g.draw(shell);
        int cg = (int) (ground - outline.sprungCgHeight() * scale);
        g.fillOval((int) middle - 5, cg - 5, 10, 10);
        g.setTransform(before);
        g.setColor(Palette.muted());
        g.fillOval((int) middle - 3, (int) pivotY - 3, 6, 6);
    }

    private static void wheel(Graphics2D g, double x, double bottom, double width, double height, Color ink) {
        RoundRectangle2D tyre = new RoundRectangle2D.Double(x - width / 2, bottom - height, width, height,
                width / 2, width / 2);
        g.setColor(colour("Barwright.tyreFill", new Color(0x3A3A3A)));
        g.fill(tyre);
        g.setColor(ink);
        g.draw(tyre);
    }

    private static int columnWidth(FontMetrics metrics) {
        return Math.max(18, metrics.stringWidth("00000") / 2 + 6);
    }

    /**
     * One wheel's load hanging below the ground line beside its tyre (front to the left of the tyre's centre,
     * rear to the right), the load standing still as a tick across it, and the figure under it.
     */
    private void column(Graphics2D g, double tyreX, int y, double room, int wheel, double load) {
        FontMetrics metrics = g.getFontMetrics();
        int width = columnWidth(metrics);
        boolean rear = wheel >= 2;
        int x = (int) (rear ? tyreX + 3 : tyreX - 3 - width);
        double perNewton = room / (2.2 * outline.largestStaticLoad());
        g.setColor(rear ? Palette.rear() : Palette.front());
        g.fillRect(x, y, width, (int) Math.round(Math.max(0, load) * perNewton));
        int tick = y + (int) Math.round(outline.staticLoads()[wheel] * perNewton);
        g.setColor(colour("Label.foreground", Color.BLACK));
        g.setStroke(new BasicStroke(2f));
        g.drawLine(x - 3, tick, x + width + 3, tick);
        String words = WHEEL_WORDS[wheel] + " " + (load <= 0 ? "lifted" : figure(load, Quantity.FORCE, 0));
        // the figures stand at the picture's edges, left wheels left and right wheels right, so they never overlap
        int textX = wheel % 2 == 0 ? 8 : getWidth() - 8 - metrics.stringWidth(words);
        int textY = y + (int) room + (rear ? 2 : 1) * metrics.getHeight() - metrics.getDescent();
        write(g, words, textX, textY);
    }

    private static Color colour(String key, Color fallback) {
        Color themed = UIManager.getColor(key);
        return themed != null ? themed : fallback;
    }

    private void write(Graphics2D g, String text, int x, int y) {
        g.drawString(text, x, y);
        drawnText.add(text);
    }

    private String figure(double si, Quantity quantity, int decimals) {
        return Figures.format(si, quantity, view.units(), decimals, view.locale());
    }
}
