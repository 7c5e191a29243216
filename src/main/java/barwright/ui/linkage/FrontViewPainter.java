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
import java.util.function.DoubleUnaryOperator;

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

    /**
     * What the painter is given besides the scene.
     *
     * @param keyInside whether the key is drawn at the drawing's foot (false: the page shows it under the drawing)
     */
    record Style(Font font, UnitSystem units, Locale locale, Pickup highlighted, boolean keyInside) {
    }

    /** The camber labels' words: each side's camber and, for an independent linkage, its swing arm (or null). */
    private record CamberWords(String leftCamber, String leftArm, String rightCamber, String rightArm) {
    }

    /**
     * Where the figure goes: its mapping, and whether the camber labels sit in a band above the figure (a narrow
     * drawing with a large text: beside the wheels they left the figure no width) in {@code bandLines} lines, the
     * swing arms' words there at {@code armScale} of the text size.
     */
    private record Placement(Mapping mapping, boolean cambersAbove, int bandLines, float armScale) {
    }

    /**
     * The least size of the swing arms' words in the band above the figure, as a share of the text size: a little
     * smaller than the cambers' bold words so that both sides share one line (judged from the 28-point screenshots).
     */
    private static final float ARM_LEAST_SCALE = 0.75f;
    /** The room left and right of the words written across the drawing (pixels). */
    private static final int MARGIN = 10;

    private final List<Handle> handles = new ArrayList<>();
    private final List<String> drawnText = new ArrayList<>();
    private final List<Rectangle> textBoxes = new ArrayList<>();
    private final List<Rectangle> keyBoxes = new ArrayList<>();
    private Mapping mapping;

    /** @return the pickups drawn at the last paint, for hit testing */
    List<Handle> handles() {
        return List.copyOf(handles);
    }

    /** @return every text written at the last paint, for the window tests */
    List<String> drawnText() {
        return List.copyOf(drawnText);
    }

    /** @return the box of every text written at the last paint (pixels), for the window tests */
    List<Rectangle> textBoxes() {
        return List.copyOf(textBoxes);
    }

    /** @return the boxes of the key's words at the last paint (pixels), for the window tests; empty if not drawn */
    List<Rectangle> keyBoxes() {
        return List.copyOf(keyBoxes);
    }

    /** @return the mapping of the last paint, or null before the first */
    Mapping mapping() {
        return mapping;
    }

    void paint(Graphics2D g, int width, int height, LinkageScene scene, Style style) {
        handles.clear();
        drawnText.clear();
        textBoxes.clear();
        keyBoxes.clear();
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
        int wrapWidth = Math.max(1, width - 2 * MARGIN);

        // the heading and the situation at the top, wrapped to the width
        g.setColor(text);
        g.setFont(font.deriveFont(Font.BOLD));
        int y = 0;
        for (String words : FrontViewText.wrap(heading(scene, g.getFontMetrics(), width), g.getFontMetrics(),
                wrapWidth)) {
            y += line;
            write(g, words, MARGIN, y);
        }
        g.setFont(font);
        for (String words : FrontViewText.wrap(situation(scene, style), g.getFontMetrics(), wrapWidth)) {
            y += line;
            write(g, words, MARGIN, y);
        }

        // the key at the bottom, unless it is shown under the drawing
        int keyTop = height;
        List<FrontViewText.Piece> key = List.of();
        if (style.keyInside()) {
            FontMetrics bold = g.getFontMetrics(font.deriveFont(Font.BOLD));
            key = keyPieces(g.getFontMetrics(font), bold, 0, width, scene);
            keyTop = height - FrontViewText.height(key) - 6;
            key = keyPieces(g.getFontMetrics(font), bold, keyTop, width, scene);
        }
        Rectangle area = new Rectangle(0, y + line / 2, width, Math.max(40, keyTop - y - line / 2));
        Figure figure = scene.figure();
        CamberWords cambers = camberWords(figure, style);
        Font big = rollCentreFont(style);
        List<String> rollCentreLines = FrontViewText.wrap(rollCentreWords(figure, style), g.getFontMetrics(big),
                wrapWidth);
        Placement placement = fit(figure, area, g.getFontMetrics(font), g.getFontMetrics(font.deriveFont(Font.BOLD)),
                cambers, rollCentreLines.size() * g.getFontMetrics(big).getHeight(), g.getFontMetrics(big).getHeight());
        mapping = placement.mapping();

        Shape clip = g.getClip();
        g.clip(area);
        ground(g, area, size);
        body(g, figure, size);
        wheel(g, figure.left(), true, size, text);
        wheel(g, figure.right(), false, size, text);
        construction(g, figure, size);
        members(g, figure, scene.axle(), size);
        pickups(g, figure, scene.axle(), size, style.highlighted());
        rollCentre(g, figure, rollCentreLines, big, size, width);
        g.setClip(clip);
        camberLabels(g, figure, cambers, placement, area, font, text, width);
        paintKey(g, key, font, text);
    }

    /**
     * Paints the key alone, across the width given, for the strip under the drawing where the drawing has no room
     * for it (a large text on a small screen).
     */
    void paintKey(Graphics2D g, int width, int height, LinkageScene scene, Font font) {
        keyBoxes.clear();
        g.setRenderingHint(RenderingHints.KEY_ANTIALIASING, RenderingHints.VALUE_ANTIALIAS_ON);
        g.setRenderingHint(RenderingHints.KEY_TEXT_ANTIALIASING, RenderingHints.VALUE_TEXT_ANTIALIAS_ON);
        g.setColor(colour("Panel.background", Color.WHITE));
        g.fillRect(0, 0, width, height);
        if (scene == null || scene.figure() == null) {
            return;
        }
        paintKey(g, keyPieces(g.getFontMetrics(font), g.getFontMetrics(font.deriveFont(Font.BOLD)), 0, width, scene),
                font, colour("Label.foreground", Color.BLACK));
    }

    /** @return the key laid out across a width, its first line's top at {@code top} (pixels) */
    static List<FrontViewText.Piece> keyPieces(FontMetrics metrics, FontMetrics bold, int top, int width,
                                               LinkageScene scene) {
        boolean drawn = scene != null && scene.figure() != null;
        boolean beam = drawn && scene.figure().left().instantCentre() == null;
        boolean view = drawn && !fullHeadingFits(scene, bold, width);
        return FrontViewText.layoutKey(FrontViewText.keyEntries(beam, view), metrics, MARGIN, top + 2,
                Math.max(1, width - 2 * MARGIN), sampleWidth(metrics.getFont()));
    }

    private static int sampleWidth(Font font) {
        return (int) (font.getSize2D() * 2.4);
    }

    /**
     * @return the heading: the axle, its linkage, and how it is seen where that fits one line; on a narrow drawing
     *         the axle and its linkage alone (the key then says how it is seen), which leaves the figure a line more
     */
    private static String heading(LinkageScene scene, FontMetrics bold, int width) {
        return fullHeadingFits(scene, bold, width) ? fullHeading(scene) : shortHeading(scene);
    }

    private static boolean fullHeadingFits(LinkageScene scene, FontMetrics bold, int width) {
        return bold.stringWidth(fullHeading(scene)) <= width - 2 * MARGIN;
    }

    private static String fullHeading(LinkageScene scene) {
        return shortHeading(scene) + ", seen from behind, to scale";
    }

    private static String shortHeading(LinkageScene scene) {
        return (scene.axle() == AxlePosition.FRONT ? "Front axle" : "Rear axle") + ": "
                + LinkagePage.typeWords(scene.type());
    }

    private String situation(LinkageScene scene, Style style) {
        if (scene.acceleration() == 0) {
            return "Driving straight: body roll 0\u00B0 (move the slider to corner)";
        }
        return String.format(style.locale(), "%s turn at %s: body roll %.2f\u00B0",
                scene.turn() == TurnDirection.LEFT ? "Left" : "Right",
                format(scene.acceleration(), Quantity.ACCELERATION, style, 2), Math.toDegrees(Math.abs(scene.roll())));
    }

    /**
     * Fits the axle, its wheels and the roll centre into the area, with room under the ground for the roll centre's
     * label and room for the camber labels: beside the wheels, or in a band above the figure where that draws it
     * larger (a narrow drawing with a large text).
     *
     * @param rollCentreHeight the height of the roll centre's label lines (pixels)
     */
    private static Placement fit(Figure figure, Rectangle area, FontMetrics metrics, FontMetrics bold,
                                 CamberWords cambers, int rollCentreHeight, int rollCentreLine) {
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
        // the roll centre's label under the ground, its first baseline 1.2 lines down, and its descent
        double under = rollCentreHeight + 0.5 * rollCentreLine;
        double beside = Math.min((area.width - 2 * labelRoom) / (2 * half), (area.height - under) / (top - bottom));
        // in the band: the two cambers side by side on one line, the two swing arms on the next, their words a little
        // smaller where that lets them share the line (never under ARM_LEAST_SCALE); else each side on lines of its own
        int room = area.width - 2 * MARGIN - metrics.getHeight(); // a line's height of room between the sides
        int arms = armWidth(metrics, cambers.leftArm()) + armWidth(metrics, cambers.rightArm());
        float armScale = arms <= room ? 1f : (float) room / arms;
        boolean sideBySide = bold.stringWidth(cambers.leftCamber()) + bold.stringWidth(cambers.rightCamber()) <= room
                && armScale >= ARM_LEAST_SCALE;
        int bandLines = sideBySide ? 2 : 4;
        armScale = sideBySide ? armScale : 1f;
        double band = bandLines / 2.0 * (bold.getHeight() + (arms == 0 ? 0 : armScale * metrics.getHeight())) + 4;
        double above = Math.min((area.width - 2 * MARGIN) / (2 * half),
                (area.height - band - under) / (top - bottom));
        boolean cambersAbove = above > beside;
        double scale = Math.max(cambersAbove ? above : beside, 1);
        double figureTop = area.y + (cambersAbove ? band : 0);
        double spare = Math.max(0, area.y + area.height - figureTop - under - (top - bottom) * scale);
        double groundY = figureTop + spare / 2 + top * scale;
        return new Placement(new Mapping(area.x + area.width / 2.0, groundY, scale), cambersAbove, bandLines,
                cambersAbove ? armScale : 1f);
    }

    private static int armWidth(FontMetrics metrics, String arm) {
        return arm == null ? 0 : metrics.stringWidth(arm);
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

    /** @return the roll centre's label, a little larger than the text */
    private static Font rollCentreFont(Style style) {
        return style.font().deriveFont(Font.BOLD, style.font().getSize2D() * 1.15f);
    }

    /** @return the roll centre's height and offset in words, or why there is none */
    private static String rollCentreWords(Figure figure, Style style) {
        RollCentre centre = figure.state().rollCentre();
        if (centre == null) {
            return "No roll centre: the lines are parallel";
        }
        String words = "Roll centre " + format(centre.height(), Quantity.LENGTH, style, 0)
                + (centre.height() < 0 ? " below the ground" : " above the ground");
        if (Math.abs(centre.offset()) >= 0.0005) {
            words += ", " + format(Math.abs(centre.offset()), Quantity.LENGTH, style, 0)
                    + (centre.offset() > 0 ? " to the left" : " to the right");
        }
        return words;
    }

    /** The roll centre's dot, and its label (wrapped to the drawing's width) under the ground, joined by a leader. */
    private void rollCentre(Graphics2D g, Figure figure, List<String> lines, Font big, float size, int width) {
        RollCentre centre = figure.state().rollCentre();
        g.setFont(big);
        FontMetrics metrics = g.getFontMetrics();
        Color red = onBackground(new Color(0xC6, 0x28, 0x28), new Color(0xFF, 0x7A, 0x7A));
        Point2D.Double p;
        double y;
        if (centre == null) {
            p = mapping.toPixels(new FrontViewPoint(0, 0.25));
            y = p.y;
        } else {
            p = mapping.toPixels(new FrontViewPoint(centre.offset(), centre.height()));
            double r = Math.max(6, size * 0.6);
            g.setColor(red);
            g.fill(new Ellipse2D.Double(p.x - r, p.y - r, 2 * r, 2 * r));
            y = Math.max(p.y + r, mapping.groundY()) + metrics.getHeight() * 1.2;
            g.setStroke(new BasicStroke(Math.max(1f, size * 0.08f)));
            g.draw(new Line2D.Double(p.x, p.y + r, p.x, y - metrics.getAscent()));
        }
        for (String words : lines) {
            double labelWidth = metrics.stringWidth(words);
            double x = Math.max(4, Math.min(p.x - labelWidth / 2, width - labelWidth - 4));
            label(g, words, x, y, red);
            y += metrics.getHeight();
        }
    }

    private CamberWords camberWords(Figure figure, Style style) {
        return new CamberWords(camber(figure.left(), style), swingArm(figure.left(), style),
                camber(figure.right(), style), swingArm(figure.right(), style));
    }

    private static String camber(Side side, Style style) {
        double degrees = Math.toDegrees(side.camber());
        return Math.abs(degrees) < 0.005 ? String.format(style.locale(), "camber %.2f\u00B0", 0.0)
                : String.format(style.locale(), "camber %+.2f\u00B0", degrees).replace('-', '\u2212');
    }

    /**
     * Each wheel's camber and swing arm: beside the wheel (the left wheel's further left, as seen from behind), or
     * in the band above the figure, the left wheel's at the left edge and the right wheel's at the right.
     */
    private void camberLabels(Graphics2D g, Figure figure, CamberWords cambers, Placement placement, Rectangle area,
                              Font font, Color text, int width) {
        Font bold = font.deriveFont(Font.BOLD);
        Font armFont = font.deriveFont(font.getSize2D() * placement.armScale());
        int boldLine = g.getFontMetrics(bold).getHeight();
        int line = g.getFontMetrics(armFont).getHeight();
        for (boolean left : new boolean[] {true, false}) {
            Side side = left ? figure.left() : figure.right();
            String camber = left ? cambers.leftCamber() : cambers.rightCamber();
            String arm = left ? cambers.leftArm() : cambers.rightArm();
            double y;
            DoubleUnaryOperator x; // the label's left edge for its width
            if (placement.cambersAbove()) {
                boolean stacked = placement.bandLines() > 2;
                y = area.y + g.getFontMetrics(bold).getAscent() + 2 + (stacked && !left ? boldLine + (arm == null ? 0 : line) : 0);
                x = wide -> left ? MARGIN : width - MARGIN - wide;
            } else {
                Point2D.Double contact = mapping.toPixels(side.contact());
                double outside = (DRAWN_TYRE_WIDTH / 2 + 0.03) * mapping.scale();
                y = contact.y - DRAWN_TYRE_DIAMETER / 2 * mapping.scale();
                x = wide -> left ? contact.x - outside - wide : contact.x + outside;
            }
            g.setFont(bold);
            label(g, camber, x.applyAsDouble(g.getFontMetrics().stringWidth(camber)), y, text);
            if (arm != null) {
                g.setFont(armFont);
                label(g, arm, x.applyAsDouble(g.getFontMetrics().stringWidth(arm)), y + line, text);
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

    /** Paints the key's pieces: each entry's sample line, then its words. */
    private void paintKey(Graphics2D g, List<FrontViewText.Piece> pieces, Font font, Color text) {
        g.setFont(font);
        FontMetrics metrics = g.getFontMetrics();
        float size = font.getSize2D();
        for (FrontViewText.Piece piece : pieces) {
            int middle = piece.baseline() - metrics.getAscent() / 2;
            if (piece.sample() == FrontViewText.Sample.ARM_LINE) {
                g.setColor(colour("Label.disabledForeground", Color.GRAY));
                g.setStroke(dashed(Math.max(1.5f, size * 0.12f), size * 0.6f));
                g.drawLine(piece.sampleX(), middle, piece.sampleX() + sampleWidth(font), middle);
            } else if (piece.sample() == FrontViewText.Sample.CONTACT_LINE) {
                g.setColor(constructionColour());
                g.setStroke(dashed(Math.max(2f, size * 0.16f), size * 0.9f));
                g.drawLine(piece.sampleX(), middle, piece.sampleX() + sampleWidth(font), middle);
            }
            write(g, piece.words(), piece.box().x, piece.baseline(), text);
            keyBoxes.add(piece.box());
        }
    }

    private int write(Graphics2D g, String words, int x, int y, Color colour) {
        g.setColor(colour);
        write(g, words, x, y);
        return x + g.getFontMetrics().stringWidth(words);
    }

    private void write(Graphics2D g, String words, int x, int y) {
        g.drawString(words, x, y);
        drawnText.add(words);
        FontMetrics metrics = g.getFontMetrics();
        textBoxes.add(new Rectangle(x, y - metrics.getAscent(), metrics.stringWidth(words), metrics.getHeight()));
    }

    /** Text on a box of the background colour, so that it reads over lines. */
    private void label(Graphics2D g, String words, double x, double y, Color colour) {
        FontMetrics metrics = g.getFontMetrics();
        g.setColor(withAlpha(colour("Panel.background", Color.WHITE), 215));
        g.fillRect((int) x - 3, (int) y - metrics.getAscent(), metrics.stringWidth(words) + 6, metrics.getHeight());
        g.setColor(colour);
        g.drawString(words, (float) x, (float) y);
        drawnText.add(words);
        textBoxes.add(new Rectangle((int) Math.floor(x), (int) Math.floor(y) - metrics.getAscent(),
                metrics.stringWidth(words) + 1, metrics.getHeight()));
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
