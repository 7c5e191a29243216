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
import java.awt.FontMetrics;
import java.awt.Graphics;
import java.awt.Graphics2D;
import java.awt.RenderingHints;
import java.awt.geom.Rectangle2D;
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
    public static final double ROLL_DRAWN_LARGER = 5;
    /** The least height of the drawing itself, car and columns (pixels): judged from screenshots at 1024x768. */
    public static final int DRAWING_LEAST_HEIGHT = 240;
    private static final String LEGEND_KEY = "columns: the load each tyre puts on the road";
    private final ResultsModel results;
    private final CorneringProbe probe;
    private final FigureFormat format;
    /** The figures written at the last paint, for the window tests. */
    private final List<String> drawnFigures = new ArrayList<>();
    /** Where the tyres, the body and the labels were drawn at the last paint, for the tests. */
    private Placement placed;
    /** Few words: a key beside the picture says what the columns, the dot and the arrow are. */
    private boolean compact;

    /**
     * Where the parts of the picture were drawn at one paint (pixels; fresh rectangles each paint).
     *
     * @param tyres          the left and the right tyre
     * @param body           the rolled body's bounds
     * @param forceLabel     the words "m·a_y, inertial force"; null where the compact picture found no clear place
     * @param rollCentreName the words "rear roll centre"; null where the compact picture found no clear place
     * @param loadFigures    the four wheel loads' figures under the columns
     * @param wordsBottom    the lowest pixel of the words above the drawing (heading, roll, key)
     */
    public record Placement(List<Rectangle2D> tyres, Rectangle2D body, Rectangle2D forceLabel,
                            Rectangle2D rollCentreName, List<Rectangle2D> loadFigures, double wordsBottom) {
        /** @return the names written beside the car: the force's and the roll centre's, those drawn */
        public List<Rectangle2D> labels() {
            List<Rectangle2D> labels = new ArrayList<>();
            if (forceLabel != null) {
                labels.add(forceLabel);
            }
            if (rollCentreName != null) {
                labels.add(rollCentreName);
            }
            return labels;
        }
    }

    /** @return where the parts were drawn at the last paint, or null before a result was drawn */
    public Placement placement() {
        return placed;
    }

    /**
     * Few words in the picture, for presentation mode where one key beside the pictures explains them: above
     * the car only the body roll and the acceleration, no colour key, and the force's and the roll centre's
     * names only where they find a place clear of the car as large as it fits.
     */
    public void setCompact(boolean compact) {
        this.compact = compact;
        revalidate();
        repaint();
    }

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

    /**
     * The least size that still shows the car, its wheels, the load columns with their figures, the heading
     * and the legend whole: the lines of words as they wrap at the present width, two lines of load figures
     * and {@link #DRAWING_LEAST_HEIGHT} of drawing.
     */
    @Override
    public Dimension getMinimumSize() {
        if (isMinimumSizeSet()) {
            return super.getMinimumSize();
        }
        Font font = getFont() != null ? getFont() : new Font(Font.SANS_SERIF, Font.PLAIN, 13);
        var metrics = getFontMetrics(font);
        var bold = getFontMetrics(font.deriveFont(Font.BOLD));
        int width = Math.max(getWidth(), 400) - 24;
        AnalysisResult result = result();
        int lines = 6; // heading, roll and legend once each, and the column key, before there is a result
        if (result != null) {
            List<String> words = words(result);
            lines = PictureText.lines(bold, words.get(0), width) + (compact ? 0
                    : PictureText.lines(metrics, words.get(1), width) + 1 + PictureText.lines(metrics, LEGEND_KEY, width));
        }
        return new Dimension(400, (lines + 2) * metrics.getHeight() + DRAWING_LEAST_HEIGHT);
    }

    /** @return the heading and the body-roll line at the slider's position (compact: one line of both) */
    private List<String> words(AnalysisResult result) {
        TurnResult turnResult = result.turn(probe.turn());
        double accel = acceleration();
        if (compact) {
            // no-break spaces: where the line wraps, it wraps before "at", never between a figure and its unit
            String roll = format.text(turnResult.cornering().rollAngle(accel), Quantity.ANGLE);
            String at = "at " + format.text(accel, Quantity.ACCELERATION);
            return List.of(("Roll " + roll).replace(' ', '\u00a0') + " " + at.replace(' ', '\u00a0'));
        }
        String heading = String.format(format.view().locale(), "%s turn at %s (%.0f %% of the %s grip limit)",
                probe.turn() == TurnDirection.LEFT ? "Left" : "Right", format.text(accel, Quantity.ACCELERATION),
                probe.fractionOfLimit() * 100, format.text(turnResult.limit(), Quantity.ACCELERATION));
        String rollText = "Body roll " + format.text(turnResult.cornering().rollAngle(accel), Quantity.ANGLE)
                + " (drawn " + (int) ROLL_DRAWN_LARGER + "\u00D7 larger), seen from behind.";
        return List.of(heading, rollText);
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
        Graphics2D g = (Graphics2D) graphics.create();
        try {
            paintPicture(g, getWidth(), getHeight(), getFont());
        } finally {
            g.dispose();
        }
    }

    /**
     * Draws the picture into any graphics at any size (the screen, or a PNG or SVG export).
     *
     * @param width  pixels (or SVG user units)
     * @param height pixels (or SVG user units)
     * @param font   the text font; null for a 13-point sans-serif
     */
    public void paintPicture(Graphics2D g, int width, int height, Font font) {
        AnalysisResult result = result();
        drawnFigures.clear();
        // the background before antialiasing is on: the same pixels for a whole-pixel rectangle, but not worked
        // out (and on X11 not sent to the display) as a coverage mask the size of the picture
        g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_OFF);
        g.setColor(Palette.colour("Panel.background", Color.WHITE));
        g.fillRect(0, 0, width, height);
        g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
        g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
        if (result != null) {
            paintCar(g, result, width, height, font != null ? font : new Font(Font.SANS_SERIF, Font.PLAIN, 13));
        }
    }

    private void paintCar(Graphics2D g, AnalysisResult result, int width, int height, Font font) {
        TurnDirection turn = probe.turn();
        TurnResult turnResult = result.turn(turn);
        SteadyCornering cornering = turnResult.cornering();
        double accel = acceleration();
        WheelLoads loads = cornering.wheelLoads(accel);
        WheelLoads atLimit = cornering.wheelLoads(turnResult.limit());
        double roll = cornering.rollAngle(accel);
        Color text = Palette.colour("Label.foreground", Color.BLACK);
        int line = g.getFontMetrics(font).getHeight();
        boolean left = turn == TurnDirection.LEFT;

        // the words first, wrapped at the picture's width so that no figure runs off its edge
        g.setColor(text);
        List<String> words = words(result);
        drawnFigures.addAll(words);
        int y = PictureText.wrapped(g, font.deriveFont(Font.BOLD), words.get(0), 12, line, width - 24);
        if (!compact) {
            y = PictureText.wrapped(g, font, words.get(1), 12, y + line, width - 24);
            y = legend(g, y + line, width - 24, font, text);
        }
        int wordsBottom = y + g.getFontMetrics(font).getDescent();
        int top = y + line / 2;
        int bottom = height - 8;
        // the car takes the upper part; the road's push on each tyre hangs below the ground line as columns
        int ground = top + (int) ((bottom - top) * 0.62);
        double track = Math.max(result.vehicle().front().track(), result.vehicle().rear().track());
        double scale = Math.min(width * 0.66 / (track + 0.3), (ground - top) / 1.45); // px per metre
        double centre = width / 2.0;
        // seen from behind the car's left is on the left; the outside of a left turn is on the right
        double leftLoadFront = left ? loads.frontInside() : loads.frontOutside();
        double rightLoadFront = left ? loads.frontOutside() : loads.frontInside();
        double leftLoadRear = left ? loads.rearInside() : loads.rearOutside();
        double rightLoadRear = left ? loads.rearOutside() : loads.rearInside();

        g.setColor(Palette.muted());
        g.setStroke(new BasicStroke(1.5f));
        g.drawLine(10, ground, width - 10, ground);

        double halfTrack = result.vehicle().rear().track() / 2 * scale;
        Font small = font.deriveFont(font.getSize2D() * 0.85f);
        var labelMetrics = g.getFontMetrics(font);
        var smallMetrics = g.getFontMetrics(small);
        String force = "m·a_y, inertial force";
        Rectangle2D forceLabel = null;
        // the car as large as fits; where the force's label then finds no clear place beside or above the car,
        // the car is drawn a step smaller (at most 8 steps, to 36 % of its size), leaving room above its roof;
        // the compact picture gives up the label rather than the car's size: its key names the arrow
        double largest = scale;
        int steps = compact ? 0 : 8;
        for (int attempt = 0; attempt <= steps && forceLabel == null; attempt++) {
            scale = largest * Math.pow(0.88, attempt);
            halfTrack = result.vehicle().rear().track() / 2 * scale;
            CarShape shape = CarShape.of(result, centre, ground, scale, line, roll, left, leftLoadRear <= 0,
                    rightLoadRear <= 0);
            forceLabel = shape.forceLabelPlace(labelMetrics.stringWidth(force), labelMetrics.getAscent(),
                    labelMetrics.getDescent(), left, width, top, attempt == 8);
        }
        CarShape car = CarShape.of(result, centre, ground, scale, line, roll, left, leftLoadRear <= 0,
                rightLoadRear <= 0);
        double tyreWidth = car.tyres.get(0).getWidth();
        Color tyreFill = Palette.colour("Barwright.tyreFill", new Color(0x3A3A3A));
        for (RoundRectangle2D tyre : car.tyres) {
            g.setColor(tyreFill);
            g.fill(tyre);
            g.setColor(text);
            g.draw(tyre);
        }

        // the body, rolled about the rear roll centre toward the outside of the turn
        double rollCentre = car.rollCentreY;
        g.setColor(Palette.colour("Barwright.bodyFill", new Color(0xDDE3EA)));
        g.fill(car.body);
        g.setColor(text);
        g.setStroke(new BasicStroke(1.5f));
        g.draw(car.body);
        double cgY = car.cg.getY();
        double cgX = car.cg.getX();
        g.fillOval((int) cgX - 5, (int) cgY - 5, 10, 10);
        double bodyHalf = halfTrack - tyreWidth * 0.6;
        g.setFont(small);
        g.setColor(Palette.muted());
        g.fillOval((int) centre - 3, (int) rollCentre - 3, 6, 6);
        // the roll centre's name on the side away from the arrow, clear of the tyres and the body
        String rollCentreName = "rear roll centre";
        Rectangle2D name = car.rollCentrePlace(smallMetrics.stringWidth(rollCentreName), smallMetrics.getAscent(),
                smallMetrics.getDescent(), centre, left, width, forceLabel, !compact);
        if (name != null) {
            rollCentreName(g, name, rollCentreName, smallMetrics, centre, rollCentre);
        }

        arrow(g, cgX, cgY, (left ? 1 : -1) * bodyHalf * (0.3 + 0.5 * probe.fractionOfLimit()), text);
        g.setFont(font);
        g.setColor(text);
        // D'Alembert's inertial force on the sprung mass, pointing to the outside of the turn; its name clear of
        // the body and the tyres, a thin line leading to the arrow where it stands away from it
        if (forceLabel != null) {
            forceLabel(g, forceLabel, force, labelMetrics, cgX, cgY, bodyHalf, left, text);
        }

        double maxLoad = Math.max(Math.max(atLimit.frontOutside(), atLimit.rearOutside()), 1);
        double columnHeight = bottom - ground - line * 2.2;
        // each side's figures stay clear of the other side's, however small the car is drawn
        g.setFont(font.deriveFont(font.getSize2D() * 0.9f));
        double spread = Math.max(halfTrack, g.getFontMetrics().stringWidth("00000 lbf") * 0.6);
        List<Rectangle2D> figures = new ArrayList<>();
        columns(g, centre - spread, new double[]{leftLoadFront, leftLoadRear}, maxLoad, columnHeight, ground,
                font, width, figures);
        columns(g, centre + spread, new double[]{rightLoadFront, rightLoadRear}, maxLoad, columnHeight, ground,
                font, width, figures);
        placed = new Placement(List.of(car.tyres.get(0).getBounds2D(), car.tyres.get(1).getBounds2D()),
                car.body.getBounds2D(), forceLabel, name, figures, wordsBottom);
    }

    /** Writes the roll centre's name in its place, on a light box, a thin line leading back to the dot. */
    private static void rollCentreName(Graphics2D g, Rectangle2D name, String words, FontMetrics metrics,
                                       double centre, double rollCentre) {
        int nameX = (int) name.getX();
        int nameY = (int) (name.getY() + metrics.getAscent());
        if (Math.abs(name.getCenterY() - rollCentre) > metrics.getHeight()
                || Math.abs(name.getCenterX() - centre) > name.getWidth() / 2 + 12) {
            // moved away from its dot: a thin line leads back to it
            g.setStroke(new BasicStroke(1f));
            double toX = name.getCenterX() < centre ? name.getMaxX() : name.getX();
            g.draw(new java.awt.geom.Line2D.Double(toX, name.getCenterY(), centre, rollCentre));
        }
        // on a light box, so that it reads over a column or the ground line
        g.setColor(Palette.colour("Panel.background", Color.WHITE));
        g.fillRect(nameX - 2, (int) name.getY(), (int) name.getWidth() + 4, (int) name.getHeight());
        g.setColor(Palette.muted());
        g.drawString(words, nameX, nameY);
    }

    /** Writes the force's name in its place, a thin line leading to the middle of the arrow. */
    private void forceLabel(Graphics2D g, Rectangle2D forceLabel, String force, FontMetrics labelMetrics,
                            double cgX, double cgY, double bodyHalf, boolean left, Color text) {
        double arrowMiddle = cgX + (left ? 1 : -1) * bodyHalf * (0.15 + 0.25 * probe.fractionOfLimit());
        g.setStroke(new BasicStroke(1f));
        g.setColor(Palette.muted());
        double leadY = forceLabel.getMaxY() < cgY ? forceLabel.getMaxY() : forceLabel.getCenterY();
        double leadX = Math.max(forceLabel.getX(), Math.min(arrowMiddle, forceLabel.getMaxX()));
        if (forceLabel.getMaxY() >= cgY) {
            leadX = forceLabel.getCenterX() < arrowMiddle ? forceLabel.getMaxX() : forceLabel.getX();
        }
        g.draw(new java.awt.geom.Line2D.Double(leadX, leadY, arrowMiddle, cgY - 3));
        g.setColor(text);
        g.drawString(force, (int) forceLabel.getX(), (int) (forceLabel.getY() + labelMetrics.getAscent()));
    }

    /**
     * Draws, under a tyre, the road's push on the front and the rear wheel of that side as two columns hanging
     * below the ground line: values[0] front, values[1] rear (N). The figures sit under the column area on two
     * lines, front above rear, each in its column's colour, kept inside the picture, so that no figure
     * overlaps another or runs off the edge however small the picture.
     */
    private void columns(Graphics2D g, double tyreX, double[] values, double maxLoad, double height, int ground,
                         Font font, int width, List<Rectangle2D> figures) {
        Font small = font.deriveFont(font.getSize2D() * 0.9f);
        g.setFont(small);
        var metrics = g.getFontMetrics();
        int barWidth = Math.max(12, metrics.stringWidth("00") + 4);
        Color[] colours = {Palette.front(), Palette.rear()};
        for (int i = 0; i < 2; i++) {
            double x = tyreX + (i == 0 ? -barWidth - 2 : 2);
            int barHeight = (int) Math.round(height * Math.max(0, values[i]) / maxLoad);
            g.setColor(colours[i]);
            g.fillRect((int) x, ground + 2, barWidth, barHeight);
            String label = values[i] <= 0 ? "lifted" : format.text(values[i], Quantity.FORCE);
            drawnFigures.add(label);
            int labelWidth = metrics.stringWidth(label);
            int labelX = (int) Math.round(tyreX - labelWidth / 2.0);
            labelX = Math.max(4, Math.min(labelX, width - 4 - labelWidth));
            int baseline = (int) (ground + 4 + height + metrics.getAscent() + i * metrics.getHeight());
            g.drawString(label, labelX, baseline);
            figures.add(new Rectangle2D.Double(labelX, baseline - metrics.getAscent(), labelWidth,
                    metrics.getAscent() + metrics.getDescent()));
        }
    }

    /**
     * Writes what the columns are, wrapping at the width; returns the baseline of its last line.
     */
    private static int legend(Graphics2D g, int y, int width, Font font, Color text) {
        g.setFont(font);
        var metrics = g.getFontMetrics();
        int box = metrics.getAscent() * 3 / 4;
        String[] names = {"front wheel", "rear wheel"};
        Color[] colours = {Palette.front(), Palette.rear()};
        int x = 12;
        for (int i = 0; i < 2; i++) {
            int itemWidth = box + 6 + metrics.stringWidth(names[i]);
            if (x > 12 && x + itemWidth > 12 + width) {
                x = 12;
                y += metrics.getHeight();
            }
            g.setColor(colours[i]);
            g.fillRect(x, y - box, box, box);
            g.setColor(text);
            g.drawString(names[i], x + box + 6, y);
            x += itemWidth + 18;
        }
        return PictureText.wrapped(g, font, LEGEND_KEY, 12,
                y + metrics.getHeight(), width);
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
