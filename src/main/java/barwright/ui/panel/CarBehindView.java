package barwright.ui.panel;

import barwright.model.TurnDirection;
import barwright.physics.AnalysisResult;
import barwright.physics.SteadyCornering;
import barwright.physics.TurnResult;
import barwright.physics.WheelLoads;
import barwright.ui.task.CorneringProbe;
import barwright.ui.task.ResultsModel;
import barwright.units.Quantity;

import javax.swing.JComponent;
import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Dimension;
import java.awt.Font;
import java.awt.Graphics;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.geom.AffineTransform;
import java.awt.geom.Path2D;
import java.awt.geom.RoundRectangle2D;

import java.util.ArrayList;
import java.util.List;
/**
 * The car seen from behind in a steady turn at the slider's lateral acceleration: the body rolled about the
 * roll axis (drawn larger than life, and saying so), each wheel's load as a column beside it, and an inside
 * wheel that has lifted drawn off the ground.
 */
public final class CarBehindView extends JComponent {
    /** Body roll is a degree or two: it is drawn this many times larger so that it can be seen. */
    static final double ROLL_DRAWN_LARGER = 5;
    private final ResultsModel results;
    private final CorneringProbe probe;
    private final FigureFormat format;
    /** The figures written at the last paint, for the window tests. */
    private final List<String> drawnFigures = new ArrayList<>();

    public CarBehindView(ResultsModel results, CorneringProbe probe, FigureFormat format) {
        this.results = results;
        this.probe = probe;
        this.format = format;
        setName("carBehind");
        setPreferredSize(new Dimension(520, 340));
        results.addListener(this::repaint);
        probe.addListener(this::repaint);
        format.view().addListener(this::repaint); // the SI/US switch redraws at once, not at the next slider move
    }

    /** @return the figures (heading, body roll, wheel loads) written at the last paint */
    public List<String> drawnFigures() {
        return List.copyOf(drawnFigures);
    }

    /** @return the lateral acceleration shown (m/s^2) */
    public double acceleration() {
        AnalysisResult result = result();
        return result == null ? 0 : result.turn(probe.turn()).limit() * probe.fractionOfLimit();
    }

    private AnalysisResult result() {
        var shown = results.shown();
        return shown == null ? null : shown.result();
    }

    @Override
    protected void paintComponent(Graphics graphics) {
        AnalysisResult result = result();
        drawnFigures.clear();
        Graphics2D g = (Graphics2D) graphics.create();
        try {
            g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
            g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
            g.setColor(Palette.colour("Panel.background", Color.WHITE));
            g.fillRect(0, 0, getWidth(), getHeight());
            if (result != null) {
                paintCar(g, result);
            }
        } finally {
            g.dispose();
        }
    }

    private void paintCar(Graphics2D g, AnalysisResult result) {
        TurnDirection turn = probe.turn();
        TurnResult turnResult = result.turn(turn);
        SteadyCornering cornering = turnResult.cornering();
        double accel = acceleration();
        WheelLoads loads = cornering.wheelLoads(accel);
        WheelLoads atLimit = cornering.wheelLoads(turnResult.limit());
        double roll = cornering.rollAngle(accel);
        Color text = Palette.colour("Label.foreground", Color.BLACK);
        Font font = getFont() != null ? getFont() : new Font(Font.SANS_SERIF, Font.PLAIN, 13);
        int line = g.getFontMetrics(font).getHeight();

        int width = getWidth();
        int top = line * 2 + 12;
        int bottom = getHeight() - line - 8;
        // the car takes the upper part; the road's push on each tyre hangs below the ground line as columns
        int ground = top + (int) ((bottom - top) * 0.58);
        double track = Math.max(result.vehicle().front().track(), result.vehicle().rear().track());
        double scale = Math.min(width * 0.66 / (track + 0.3), (ground - top) / 1.45); // px per metre
        double centre = width / 2.0;
        boolean left = turn == TurnDirection.LEFT;
        // seen from behind the car's left is on the left; the outside of a left turn is on the right
        double leftLoadFront = left ? loads.frontInside() : loads.frontOutside();
        double rightLoadFront = left ? loads.frontOutside() : loads.frontInside();
        double leftLoadRear = left ? loads.rearInside() : loads.rearOutside();
        double rightLoadRear = left ? loads.rearOutside() : loads.rearInside();

        g.setColor(Palette.muted());
        g.setStroke(new BasicStroke(1.5f));
        g.drawLine(10, ground, width - 10, ground);

        double halfTrack = result.vehicle().rear().track() / 2 * scale;
        double tyreWidth = 0.21 * scale;
        double tyreHeight = 0.6 * scale;
        int lift = (int) Math.max(4, line * 0.5);
        tyre(g, centre - halfTrack, ground - (leftLoadRear <= 0 ? lift : 0), tyreWidth, tyreHeight, text);
        tyre(g, centre + halfTrack, ground - (rightLoadRear <= 0 ? lift : 0), tyreWidth, tyreHeight, text);

        // the body, rolled about the rear roll centre toward the outside of the turn
        double rollCentre = ground - result.vehicle().rear().rollCentreHeight() * scale;
        AffineTransform saved = g.getTransform();
        g.rotate((left ? 1 : -1) * roll * ROLL_DRAWN_LARGER, centre, rollCentre);
        Path2D body = new Path2D.Double();
        double bodyHalf = halfTrack - tyreWidth * 0.6;
        double sill = ground - 0.42 * scale;
        double waist = ground - 0.95 * scale;
        double roof = ground - 1.32 * scale;
        body.moveTo(centre - bodyHalf, sill);
        body.lineTo(centre - bodyHalf, waist);
        body.lineTo(centre - bodyHalf * 0.7, roof);
        body.lineTo(centre + bodyHalf * 0.7, roof);
        body.lineTo(centre + bodyHalf, waist);
        body.lineTo(centre + bodyHalf, sill);
        body.closePath();
        g.setColor(Palette.colour("Barwright.bodyFill", new Color(0xDDE3EA)));
        g.fill(body);
        g.setColor(text);
        g.draw(body);
        double cgY = ground - result.masses().sprungCgHeight() * scale;
        g.fillOval((int) centre - 5, (int) cgY - 5, 10, 10);
        g.setTransform(saved);
        g.setColor(Palette.muted());
        g.fillOval((int) centre - 3, (int) rollCentre - 3, 6, 6);

        arrow(g, centre, cgY, (left ? 1 : -1) * bodyHalf * (0.3 + 0.5 * probe.fractionOfLimit()), text);
        g.setFont(font);
        g.setColor(text);
        String force = "m·a_y";
        g.drawString(force, (int) (centre + (left ? 12 : -12 - g.getFontMetrics().stringWidth(force))),
                (int) cgY - 8);

        double maxLoad = Math.max(Math.max(atLimit.frontOutside(), atLimit.rearOutside()), 1);
        double columnHeight = bottom - ground - line * 1.6;
        columns(g, centre - halfTrack, new double[]{leftLoadFront, leftLoadRear}, maxLoad, columnHeight, ground,
                font);
        columns(g, centre + halfTrack, new double[]{rightLoadFront, rightLoadRear}, maxLoad, columnHeight, ground,
                font);

        g.setColor(text);
        g.setFont(font.deriveFont(Font.BOLD));
        String heading = String.format(format.view().locale(), "%s turn at %s (%.0f %% of the %s grip limit)",
                left ? "Left" : "Right", format.text(accel, Quantity.ACCELERATION), probe.fractionOfLimit() * 100,
                format.text(turnResult.limit(), Quantity.ACCELERATION));
        g.drawString(heading, 12, line + 2);
        g.setFont(font);
        String rollText = "Body roll " + format.text(roll, Quantity.ANGLE) + " (drawn " + (int) ROLL_DRAWN_LARGER
                + "\u00D7 larger), seen from behind.";
        g.drawString(rollText, 12, line * 2 + 4);
        drawnFigures.add(heading);
        drawnFigures.add(rollText);
        legend(g, getHeight() - 8, font, text);
    }

    /**
     * Draws, under a tyre, the road's push on the front and the rear wheel of that side as two columns hanging
     * below the ground line: values[0] front, values[1] rear (N).
     */
    private void columns(Graphics2D g, double tyreX, double[] values, double maxLoad, double height, int ground,
                         Font font) {
        Font small = font.deriveFont(font.getSize2D() * 0.9f);
        g.setFont(small);
        int barWidth = Math.max(16, g.getFontMetrics().stringWidth("0000") / 2 + 8);
        int gap = g.getFontMetrics().stringWidth("00000 lbf") - barWidth + 6;
        Color[] colours = {Palette.front(), Palette.rear()};
        for (int i = 0; i < 2; i++) {
            double x = tyreX + (i == 0 ? -gap / 2.0 - barWidth : gap / 2.0);
            int barHeight = (int) Math.round(height * Math.max(0, values[i]) / maxLoad);
            g.setColor(colours[i]);
            g.fillRect((int) x, ground + 2, barWidth, barHeight);
            String label = values[i] <= 0 ? "lifted" : format.text(values[i], Quantity.FORCE);
            drawnFigures.add(label);
            int labelWidth = g.getFontMetrics().stringWidth(label);
            g.drawString(label, (int) (x + barWidth / 2.0 - labelWidth / 2.0),
                    ground + 2 + barHeight + g.getFontMetrics().getAscent() + 2);
        }
    }

    private void legend(Graphics2D g, int y, Font font, Color text) {
        g.setFont(font);
        int x = 12;
        g.setColor(Palette.front());
        g.fillRect(x, y - 10, 12, 12);
        g.setColor(text);
        g.drawString("front wheel", x + 18, y);
        x += 36 + g.getFontMetrics().stringWidth("front wheel");
        g.setColor(Palette.rear());
        g.fillRect(x, y - 10, 12, 12);
        g.setColor(text);
        g.drawString("rear wheel: the load each tyre puts on the road", x + 18, y);
    }

    private static void tyre(Graphics2D g, double centreX, double bottom, double width, double height, Color text) {
        RoundRectangle2D shape = new RoundRectangle2D.Double(centreX - width / 2, bottom - height, width, height,
                width * 0.5, width * 0.5);
        g.setColor(Palette.colour("Barwright.tyreFill", new Color(0x3A3A3A)));
        g.fill(shape);
        g.setColor(text);
        g.draw(shape);
    }

    private static void arrow(Graphics2D g, double x, double y, double length, Color colour) {
        g.setColor(colour);
        g.setStroke(new BasicStroke(2.5f));
        double end = x + length;
        g.drawLine((int) x, (int) y, (int) end, (int) y);
        double head = Math.signum(length) * 9;
        g.fillPolygon(new int[]{(int) end, (int) (end - head), (int) (end - head)},
                new int[]{(int) y, (int) y - 6, (int) y + 6}, 3);
    }
}
