package barwright.ui.linkage;

import barwright.model.AxlePosition;
import barwright.model.FrontViewPoint;
import barwright.model.TurnDirection;
import barwright.physics.linkage.FrontViewFigure;
import barwright.physics.linkage.FrontViewFigure.ConstructionLine;
import barwright.physics.linkage.FrontViewFigure.Figure;
import barwright.physics.linkage.FrontViewFigure.Member;
import barwright.physics.linkage.FrontViewFigure.Pickup;
import barwright.physics.linkage.FrontViewFigure.Side;
import barwright.physics.linkage.InstantCentre;
import barwright.physics.linkage.RollCentre;
import barwright.units.Quantity;
import barwright.units.UnitSystem;

import javax.swing.UIManager;
import java.awt.BasicStroke;
import java.awt.Color;
import java.awt.Font;
import java.awt.FontMetrics;
import java.awt.Graphics2D;
import java.awt.Rectangle;
import java.awt.RenderingHints;
import java.awt.Shape;
import java.awt.Stroke;
import java.awt.geom.Ellipse2D;
import java.awt.geom.Line2D;
import java.awt.geom.Path2D;
import java.awt.geom.Point2D;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.function.DoubleFunction;

/**
 * Draws one axle's linkage seen from behind (the car's left on the picture's left, as the car picture), to scale:
 * ground, body, wheels, links, and the construction an instructor draws on the board (each side's arm lines to
 * its instant centre, the lines from the contact points through the instant centres, the roll centre where they
 * meet), the cambers to the road beside the wheels. Sizes follow the font, so a larger text size draws thicker
 * lines and larger labels. Paints on any Graphics2D: the screen, a PNG, an SVG.
 */
final class FrontViewPainter {
    /** Drawn wheel: tyre diameter and section width (m); the file has neither, so a typical 15-16 in wheel. */
    static final double DRAWN_TYRE_DIAMETER = 0.6;
    static final double DRAWN_TYRE_WIDTH = 0.2;

    /** A pickup where it was drawn (pixels), for the mouse. */
    record Handle(Pickup pickup, Point2D.Double at) {
    }

    /** How metres on the road map to pixels: x = centreX - y * scale (seen from behind), pixelY = groundY - z * scale. */
    record Mapping(double centreX, double groundY, double scale) {
        Point2D.Double toPixels(FrontViewPoint road) {
            return new Point2D.Double(centreX - road.y() * scale, groundY - road.z() * scale);
        }

        /** @return the road point under a pixel */
        FrontViewPoint toRoad(double x, double y) {
            return new FrontViewPoint((centreX - x) / scale, (groundY - y) / scale);
        }
    }

    /** What the painter is given besides the scene. */
    record Style(Font font, UnitSystem units, Locale locale, Pickup highlighted) {
    }

    private final List<Handle> handles = new ArrayList<>();
    private final List<String> drawnText = new ArrayList<>();
    private Mapping mapping;

    /** @return the pickups drawn at the last paint, for hit testing */
    List<Handle> handles() {
        return List.copyOf(handles);
    }

    /** @return every text written at the last paint, for the window tests */
    List<String> drawnText() {
        return List.copyOf(drawnText);
    }

    /** @return the mapping of the last paint, or null before the first */
    Mapping mapping() {
        return mapping;
    }

    void paint(Graphics2D g, int width, int height, LinkageScene scene, Style style) {
        handles.clear();
        drawnText.clear();
        g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
        g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
        g.setRenderingHint(RenderingHints.KEY_STROKE_CONTROL, RenderingHints.VALUE_STROKE_PURE);
        g.setColor(colour("Panel.background", Color.WHITE));
        g.fillRect(0, 0, width, height);
        if (scene == null || scene.figure() == null) {
            return;
        }
        Font font = style.font();
        float size = font.getSize2D();
        int line = g.getFontMetrics(font).getHeight();
        Color text = colour("Label.foreground", Color.BLACK);

        // the heading, two lines at the top
        g.setColor(text);
        g.setFont(font.deriveFont(Font.BOLD));
        int y = line;
        write(g, heading(scene), 10, y);
        g.setFont(font);
        y += line;
        write(g, situation(scene, style), 10, y);

        // the legend, three lines at the bottom
        int legendTop = height - 2 * line - 6;
        Rectangle area = new Rectangle(0, y + line / 2, width, Math.max(40, legendTop - y - line));
        Figure figure = scene.figure();
        mapping = fit(figure, area, g.getFontMetrics(font));

        Shape clip = g.getClip();
        g.clip(area);
        ground(g, area, size);
        body(g, figure, size);
        wheel(g, figure.left(), true, size, text);
        wheel(g, figure.right(), false, size, text);
        construction(g, figure, size);
        members(g, figure, scene.axle(), size);
        pickups(g, figure, scene.axle(), size, style.highlighted());
        rollCentre(g, scene, style, size);
        g.setClip(clip);
        camberLabels(g, figure, style, font, text);
        legend(g, legendTop, font, text, width, scene);
    }

    private String heading(LinkageScene scene) {
        String axle = scene.axle() == AxlePosition.FRONT ? "Front axle" : "Rear axle";
        return axle + ": " + LinkagePage.typeWords(scene.type()) + ", seen from behind, to scale";
    }

    private String situation(LinkageScene scene, Style style) {
        if (scene.acceleration() == 0) {
            return "Driving straight: body roll 0\u00B0 (move the slider to corner)";
        }
        return String.format(style.locale(), "%s turn at %s: body roll %.2f\u00B0",
                scene.turn() == TurnDirection.LEFT ? "Left" : "Right",
                format(scene.acceleration(), Quantity.ACCELERATION, style, 2), Math.toDegrees(Math.abs(scene.roll())));
    }

    /** Fits the axle, its wheels and the roll centre into the area, leaving room for the camber labels beside. */
    private static Mapping fit(Figure figure, Rectangle area, FontMetrics metrics) {
        double half = Math.max(Math.abs(figure.left().contact().y()), Math.abs(figure.right().contact().y()))
                + DRAWN_TYRE_WIDTH;
        double top = DRAWN_TYRE_DIAMETER + 0.05;
        double bottom = -0.06;
        for (Pickup pickup : figure.pickups()) {
            top = Math.max(top, pickup.at().z() + 0.08);
            half = Math.max(half, Math.abs(pickup.at().y()) + 0.05);
        }
        RollCentre centre = figure.state().rollCentre();
        if (centre != null && centre.height() > -0.4 && centre.height() < 1.5) {
            top = Math.max(top, centre.height() + 0.08);
            bottom = Math.min(bottom, centre.height() - 0.08);
        }
        double labelRoom = metrics.stringWidth("IC 12345 mm outboard") + 16;
        // two lines under the ground for the roll centre's label
        double under = 2.2 * metrics.getHeight();
        double scale = Math.min((area.width - 2 * labelRoom) / (2 * half), (area.height - under) / (top - bottom));
        scale = Math.max(scale, 1);
        double spare = Math.max(0, area.height - under - (top - bottom) * scale);
        double groundY = area.y + spare / 2 + top * scale;
        return new Mapping(area.x + area.width / 2.0, groundY, scale);
    }

    private void ground(Graphics2D g, Rectangle area, float size) {
        double groundY = mapping.groundY();
        g.setColor(colour("Barwright.groundFill", blend(colour("Panel.background", Color.WHITE),
                colour("Label.foreground", Color.BLACK), 0.08)));
        g.fillRect(area.x, (int) Math.round(groundY), area.width, area.y + area.height);
        g.setColor(colour("Label.foreground", Color.BLACK));
        g.setStroke(new BasicStroke(Math.max(2f, size * 0.18f)));
        g.draw(new Line2D.Double(area.x, groundY, area.x + area.width, groundY));
    }

    /** The body: a box around the points fixed to it, rolled and moved with it. */
    private void body(Graphics2D g, Figure figure, float size) {
        FrontViewFigure.BodyPlace body = figure.body();
        double inner = 0.15;
        double low = 0.12;
        double high = 0.5;
        for (Member member : figure.members()) {
            if (member.kind() != FrontViewFigure.Kind.WATTS_CENTRE_LINK) {
                inner = Math.max(inner, Math.abs(member.from().y() - body.lateralShift()));
                high = Math.max(high, member.from().z() - body.height() + 0.06);
            }
        }
        inner = Math.min(inner + 0.04, Math.abs(figure.left().contact().y()) - DRAWN_TYRE_WIDTH * 0.7);
        Path2D shape = new Path2D.Double();
        FrontViewPoint[] corners = {new FrontViewPoint(inner, low), new FrontViewPoint(inner, high),
                new FrontViewPoint(-inner, high), new FrontViewPoint(-inner, low)};
        for (int i = 0; i < corners.length; i++) {
            Point2D.Double p = mapping.toPixels(body.toRoad(corners[i]));
            if (i == 0) {
                shape.moveTo(p.x, p.y);
            } else {
                shape.lineTo(p.x, p.y);
            }
        }
        shape.closePath();
        g.setColor(colour("Barwright.bodyFill", new Color(0xDDE3EA)));
        g.fill(shape);
        g.setColor(colour("Label.disabledForeground", Color.GRAY));
        g.setStroke(new BasicStroke(Math.max(1.5f, size * 0.1f)));
        g.draw(shape);
        // the body's centreline, where a beam axle's roll centre is found
        Point2D.Double a = mapping.toPixels(body.toRoad(new FrontViewPoint(0, low)));
        Point2D.Double b = mapping.toPixels(body.toRoad(new FrontViewPoint(0, high)));
        g.setStroke(dashed(Math.max(1f, size * 0.08f), size * 0.5f));
        g.draw(new Line2D.Double(a, b));
    }

    /** A wheel standing on its contact point, leaning by its camber (top outward for positive camber). */
    private void wheel(Graphics2D g, Side side, boolean left, float size, Color text) {
        double lean = side.camber();
        // the wheel's upward axis: for the left wheel positive camber leans the top to +y (outward)
        double upY = (left ? 1 : -1) * Math.sin(lean);
        double upZ = Math.cos(lean);
        double acrossY = upZ;
        double acrossZ = -upY;
        FrontViewPoint c = side.contact();
        double w = DRAWN_TYRE_WIDTH / 2;
        double d = DRAWN_TYRE_DIAMETER;
        FrontViewPoint[] corners = {
                new FrontViewPoint(c.y() - acrossY * w, c.z() - acrossZ * w),
                new FrontViewPoint(c.y() - acrossY * w + upY * d, c.z() - acrossZ * w + upZ * d),
                new FrontViewPoint(c.y() + acrossY * w + upY * d, c.z() + acrossZ * w + upZ * d),
                new FrontViewPoint(c.y() + acrossY * w, c.z() + acrossZ * w)};
        Path2D shape = new Path2D.Double();
        for (int i = 0; i < corners.length; i++) {
            Point2D.Double p = mapping.toPixels(corners[i]);
            if (i == 0) {
                shape.moveTo(p.x, p.y);
            } else {
                shape.lineTo(p.x, p.y);
            }
        }
        shape.closePath();
        g.setColor(colour("Barwright.tyreFill", blend(colour("Panel.background", Color.WHITE), text, 0.22)));
        g.fill(shape);
        g.setColor(text);
        g.setStroke(new BasicStroke(Math.max(1.5f, size * 0.12f)));
        g.draw(shape);
    }

    /** @return the drawn wheel's centre: half the drawn tyre's height up the wheel's plane from the contact point */
    private static FrontViewPoint hub(Side side, boolean left) {
        double lean = side.camber();
        return new FrontViewPoint(side.contact().y() + (left ? 1 : -1) * Math.sin(lean) * DRAWN_TYRE_DIAMETER / 2,
                side.contact().z() + Math.cos(lean) * DRAWN_TYRE_DIAMETER / 2);
    }

    private void construction(Graphics2D g, Figure figure, float size) {
        Color construction = constructionColour();
        RollCentre centre = figure.state().rollCentre();
        FrontViewPoint rc = centre == null ? null : new FrontViewPoint(centre.offset(), centre.height());
        for (Side side : List.of(figure.left(), figure.right())) {
            InstantCentre ic = side.instantCentre();
            if (ic == null) {
                continue;
            }
            g.setColor(colour("Label.disabledForeground", Color.GRAY));
            g.setStroke(dashed(Math.max(1.5f, size * 0.12f), size * 0.6f));
            for (ConstructionLine arm : side.construction()) {
                g.draw(ic.atInfinity() ? longLine(arm.anchor(), arm.directionY(), arm.directionZ())
                        : segment(arm.anchor(), new FrontViewPoint(ic.y(), ic.z())));
            }
            // from the contact point through the instant centre, on to the roll centre
            g.setColor(construction);
            g.setStroke(dashed(Math.max(2f, size * 0.16f), size * 0.9f));
            FrontViewPoint contact = side.contact();
            if (ic.atInfinity()) {
                g.draw(longLine(contact, ic.y(), ic.z()));
            } else {
                FrontViewPoint icPoint = new FrontViewPoint(ic.y(), ic.z());
                FrontViewPoint far = rc != null && contact.distanceTo(rc) > contact.distanceTo(icPoint) ? rc : icPoint;
                g.draw(segment(contact, far));
                cross(g, icPoint, size, construction);
            }
        }
    }

    private void members(Graphics2D g, Figure figure, AxlePosition axle, float size) {
        Color links = axle == AxlePosition.FRONT ? colour("Barwright.frontColor", new Color(0x1F, 0x6F, 0xB5))
                : colour("Barwright.rearColor", new Color(0xC2, 0x4E, 0x1A));
        g.setStroke(new BasicStroke(Math.max(3f, size * 0.38f), BasicStroke.CAP_ROUND, BasicStroke.JOIN_ROUND));
        if (figure.left().instantCentre() == null) {
            // a beam axle: the axle tube between the wheel centres
            g.setColor(colour("Label.foreground", Color.BLACK));
            double hub = DRAWN_TYRE_DIAMETER / 2;
            g.draw(segment(new FrontViewPoint(figure.left().contact().y(), hub),
                    new FrontViewPoint(figure.right().contact().y(), hub)));
        }
        g.setColor(links);
        for (Member member : figure.members()) {
            g.draw(segment(member.from(), member.to()));
        }
        // a trailing arm runs from its pivot axis back to the hub: drawn from the axis's outer end to the wheel centre
        for (Member member : figure.members()) {
            if (member.kind() == FrontViewFigure.Kind.PIVOT_AXIS) {
                Side side = member.to().y() > figure.body().lateralShift() ? figure.left() : figure.right();
                g.draw(segment(member.to(), hub(side, side == figure.left())));
            }
        }
    }

    private void pickups(Graphics2D g, Figure figure, AxlePosition axle, float size, Pickup highlighted) {
        double radius = Math.max(5, size * 0.45);
        Color fill = colour("Panel.background", Color.WHITE);
        Color edge = colour("Label.foreground", Color.BLACK);
        for (Pickup pickup : figure.pickups()) {
            Point2D.Double p = mapping.toPixels(pickup.at());
            handles.add(new Handle(pickup, p));
            boolean lit = pickup.equals(highlighted);
            double r = lit ? radius * 1.4 : radius;
            Ellipse2D.Double dot = new Ellipse2D.Double(p.x - r, p.y - r, 2 * r, 2 * r);
            g.setColor(lit ? colour("Component.focusColor", new Color(0x2D, 0x7F, 0xF9)) : fill);
            g.fill(dot);
            g.setColor(edge);
            g.setStroke(new BasicStroke(Math.max(1.5f, size * 0.14f)));
            g.draw(dot);
        }
    }

    private void rollCentre(Graphics2D g, LinkageScene scene, Style style, float size) {
        Figure figure = scene.figure();
        RollCentre centre = figure.state().rollCentre();
        Font big = style.font().deriveFont(Font.BOLD, size * 1.15f);
        g.setFont(big);
        FontMetrics metrics = g.getFontMetrics();
        Color red = onBackground(new Color(0xC6, 0x28, 0x28), new Color(0xFF, 0x7A, 0x7A));
        if (centre == null) {
            String words = "No roll centre: the lines are parallel";
            Point2D.Double mid = mapping.toPixels(new FrontViewPoint(0, 0.25));
            label(g, words, mid.x - metrics.stringWidth(words) / 2.0, mid.y, red);
            return;
        }
        Point2D.Double p = mapping.toPixels(new FrontViewPoint(centre.offset(), centre.height()));
        double r = Math.max(6, size * 0.6);
        g.setColor(red);
        g.fill(new Ellipse2D.Double(p.x - r, p.y - r, 2 * r, 2 * r));
        String words = "Roll centre " + format(centre.height(), Quantity.LENGTH, style, 0)
                + (centre.height() < 0 ? " below the ground" : " above the ground");
        if (Math.abs(centre.offset()) >= 0.0005) {
            words += ", " + format(Math.abs(centre.offset()), Quantity.LENGTH, style, 0)
                    + (centre.offset() > 0 ? " to the left" : " to the right");
        }
        // the label sits under the ground line, below the point, joined to it by a thin leader
        double labelWidth = metrics.stringWidth(words);
        double x = Math.max(4, Math.min(p.x - labelWidth / 2, mapping.centreX() * 2 - labelWidth - 4));
        double y = Math.max(p.y + r, mapping.groundY()) + metrics.getHeight() * 1.2;
        g.setStroke(new BasicStroke(Math.max(1f, size * 0.08f)));
        g.draw(new Line2D.Double(p.x, p.y + r, p.x, y - metrics.getAscent()));
        label(g, words, x, y, red);
    }

    private void camberLabels(Graphics2D g, Figure figure, Style style, Font font, Color text) {
        Font bold = font.deriveFont(Font.BOLD);
        for (boolean left : new boolean[] {true, false}) {
            Side side = left ? figure.left() : figure.right();
            double degrees = Math.toDegrees(side.camber());
            String camber = Math.abs(degrees) < 0.005 ? String.format(style.locale(), "camber %.2f\u00B0", 0.0)
                    : String.format(style.locale(), "camber %+.2f\u00B0", degrees).replace('-', '\u2212');
            String arm = swingArm(side, style);
            Point2D.Double contact = mapping.toPixels(side.contact());
            double outside = (DRAWN_TYRE_WIDTH / 2 + 0.03) * mapping.scale();
            double y = contact.y - DRAWN_TYRE_DIAMETER / 2 * mapping.scale();
            // seen from behind the left wheel is on the picture's left: its labels go further left
            g.setFont(bold);
            FontMetrics metrics = g.getFontMetrics();
            label(g, camber, left ? contact.x - outside - metrics.stringWidth(camber) : contact.x + outside, y, text);
            if (arm != null) {
                g.setFont(font);
                metrics = g.getFontMetrics();
                label(g, arm, left ? contact.x - outside - metrics.stringWidth(arm) : contact.x + outside,
                        y + metrics.getHeight(), text);
            }
        }
    }

    /** @return the front-view swing-arm length in words, or null for a beam axle */
    private String swingArm(Side side, Style style) {
        InstantCentre ic = side.instantCentre();
        if (ic == null) {
            return null;
        }
        if (ic.atInfinity()) {
            return "IC at infinity";
        }
        double length = Math.hypot(ic.y() - side.contact().y(), ic.z() - side.contact().z());
        // inboard: on the car's side of the contact point (the left contact point has the larger y)
        boolean leftSide = side.contact().y() > 0;
        String across = (leftSide ? ic.y() < side.contact().y() : ic.y() > side.contact().y()) ? "inboard" : "outboard";
        return "IC " + format(length, Quantity.LENGTH, style, 0) + " " + across;
    }

    private void legend(Graphics2D g, int top, Font font, Color text, int width, LinkageScene scene) {
        g.setFont(font);
        FontMetrics metrics = g.getFontMetrics();
        int line = metrics.getHeight();
        int x = 10;
        int y = top + metrics.getAscent() + 2;
        float size = font.getSize2D();
        int sample = (int) (size * 2.4);
        boolean beam = scene.figure().left().instantCentre() == null;
        if (!beam) {
            g.setColor(colour("Label.disabledForeground", Color.GRAY));
            g.setStroke(dashed(Math.max(1.5f, size * 0.12f), size * 0.6f));
            g.drawLine(x, y - metrics.getAscent() / 2, x + sample, y - metrics.getAscent() / 2);
            x += sample + 6;
            x = write(g, "arm lines to each side's instant centre (IC)", x, y, text) + 18;
            g.setColor(constructionColour());
            g.setStroke(dashed(Math.max(2f, size * 0.16f), size * 0.9f));
            g.drawLine(x, y - metrics.getAscent() / 2, x + sample, y - metrics.getAscent() / 2);
            x += sample + 6;
            write(g, "contact point through the IC: the two meet at the roll centre", x, y, text);
        } else {
            write(g, "A beam axle: the roll centre is where its sideways locator meets the body's centreline "
                    + "(dashed).", x, y, text);
        }
        write(g, "Camber to the road (SAE J670): top of the wheel leaning away from the car is positive. "
                + "Drag a circle to move a point.", 10, y + line, text);
    }

    private int write(Graphics2D g, String words, int x, int y, Color colour) {
        g.setColor(colour);
        write(g, words, x, y);
        return x + g.getFontMetrics().stringWidth(words);
    }

    private void write(Graphics2D g, String words, int x, int y) {
        g.drawString(words, x, y);
        drawnText.add(words);
    }

    /** Text on a box of the background colour, so that it reads over lines. */
    private void label(Graphics2D g, String words, double x, double y, Color colour) {
        FontMetrics metrics = g.getFontMetrics();
        g.setColor(withAlpha(colour("Panel.background", Color.WHITE), 215));
        g.fillRect((int) x - 3, (int) y - metrics.getAscent(), metrics.stringWidth(words) + 6, metrics.getHeight());
        g.setColor(colour);
        g.drawString(words, (float) x, (float) y);
        drawnText.add(words);
    }

    private void cross(Graphics2D g, FrontViewPoint at, float size, Color colour) {
        Point2D.Double p = mapping.toPixels(at);
        double r = Math.max(5, size * 0.5);
        g.setColor(colour);
        g.setStroke(new BasicStroke(Math.max(2f, size * 0.16f)));
        g.draw(new Line2D.Double(p.x - r, p.y - r, p.x + r, p.y + r));
        g.draw(new Line2D.Double(p.x - r, p.y + r, p.x + r, p.y - r));
        g.setFont(g.getFont());
    }

    private Line2D segment(FrontViewPoint a, FrontViewPoint b) {
        return new Line2D.Double(mapping.toPixels(a), mapping.toPixels(b));
    }

    /** @return a line through a point in a direction, long enough to leave any picture both ways */
    private Line2D longLine(FrontViewPoint through, double dy, double dz) {
        double far = 50;
        return segment(new FrontViewPoint(through.y() - far * dy, through.z() - far * dz),
                new FrontViewPoint(through.y() + far * dy, through.z() + far * dz));
    }

    private static Stroke dashed(float width, float dash) {
        return new BasicStroke(width, BasicStroke.CAP_BUTT, BasicStroke.JOIN_ROUND, 10f,
                new float[] {Math.max(4f, dash), Math.max(3f, dash * 0.6f)}, 0f);
    }

    static String format(double si, Quantity quantity, Style style, int siDecimals) {
        DoubleFunction<String> number = value -> String.format(style.locale(), "%." + decimals(quantity, style,
                siDecimals) + "f", value);
        return number.apply(quantity.unit(style.units()).fromSi(si)) + " " + quantity.unit(style.units()).symbol();
    }

    /** Millimetres whole; inches to two places. */
    private static int decimals(Quantity quantity, Style style, int siDecimals) {
        return quantity == Quantity.LENGTH && style.units() == UnitSystem.US ? 2 : siDecimals;
    }

    /** @return the colour of the lines from the contact points through the instant centres */
    private static Color constructionColour() {
        return onBackground(new Color(0x6A, 0x3D, 0x9A), new Color(0xC3, 0xA6, 0xF0));
    }

    /** @return the first colour on a light background, the second (lighter) on a dark one, such as a projector's */
    private static Color onBackground(Color onLight, Color onDark) {
        Color background = colour("Panel.background", Color.WHITE);
        double luminance = 0.299 * background.getRed() + 0.587 * background.getGreen() + 0.114 * background.getBlue();
        return luminance < 128 ? onDark : onLight;
    }

    static Color colour(String key, Color fallback) {
        Color colour = UIManager.getColor(key);
        return colour != null ? colour : fallback;
    }

    private static Color blend(Color a, Color b, double share) {
        return new Color((int) (a.getRed() + (b.getRed() - a.getRed()) * share),
                (int) (a.getGreen() + (b.getGreen() - a.getGreen()) * share),
                (int) (a.getBlue() + (b.getBlue() - a.getBlue()) * share));
    }

    private static Color withAlpha(Color colour, int alpha) {
        return new Color(colour.getRed(), colour.getGreen(), colour.getBlue(), alpha);
    }
}
