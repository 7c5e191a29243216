package barwright.ui.panel;

import barwright.physics.AnalysisResult;

import java.awt.Shape;
import java.awt.geom.AffineTransform;
import java.awt.geom.Path2D;
import java.awt.geom.Point2D;
import java.awt.geom.Rectangle2D;
import java.awt.geom.RoundRectangle2D;
import java.util.ArrayList;
import java.util.List;

/**
 * The car of {@link CarBehindView} at one scale (pixels): both tyres, the rolled body, its centre of mass and
 * the rear roll centre, and where the names beside it find a place clear of them.
 */
final class CarShape {
    final List<RoundRectangle2D> tyres;
    final Shape body;
    final Point2D cg;
    final double rollCentreY;

    private CarShape(List<RoundRectangle2D> tyres, Shape body, Point2D cg, double rollCentreY) {
        this.tyres = tyres;
        this.body = body;
        this.cg = cg;
        this.rollCentreY = rollCentreY;
    }

    /**
     * @param centre the car's middle (x, pixels)
     * @param ground the ground line (y, pixels)
     * @param scale  pixels per metre
     * @param line   the text's line height (pixels): a lifted wheel stands half of it off the ground
     * @param roll   the body roll (rad), drawn {@link CarBehindView#ROLL_DRAWN_LARGER} times larger
     */
    static CarShape of(AnalysisResult result, double centre, int ground, double scale, int line, double roll,
                       boolean left, boolean leftLifted, boolean rightLifted) {
        double halfTrack = result.vehicle().rear().track() / 2 * scale;
        double tyreWidth = 0.21 * scale;
        double tyreHeight = 0.6 * scale;
        int lift = (int) Math.max(4, line * 0.5);
        List<RoundRectangle2D> tyres = new ArrayList<>();
        for (int side = -1; side <= 1; side += 2) {
            double bottom = ground - ((side < 0 ? leftLifted : rightLifted) ? lift : 0);
            tyres.add(new RoundRectangle2D.Double(centre + side * halfTrack - tyreWidth / 2, bottom - tyreHeight,
                    tyreWidth, tyreHeight, tyreWidth * 0.5, tyreWidth * 0.5));
        }
        double rollCentre = ground - result.vehicle().rear().rollCentreHeight() * scale;
        AffineTransform rolled = AffineTransform.getRotateInstance(
                (left ? 1 : -1) * roll * CarBehindView.ROLL_DRAWN_LARGER, centre, rollCentre);
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
        double cgY = ground - result.masses().sprungCgHeight() * scale;
        return new CarShape(tyres, rolled.createTransformedShape(body),
                rolled.transform(new Point2D.Double(centre, cgY), null), rollCentre);
    }

    /** @return whether the words' box keeps a few pixels clear of both tyres and the body, inside the picture */
    boolean clear(Rectangle2D words, int width, double top) {
        Rectangle2D padded = new Rectangle2D.Double(words.getX() - 3, words.getY() - 3, words.getWidth() + 6,
                words.getHeight() + 6);
        if (words.getX() < 2 || words.getMaxX() > width - 2 || words.getY() < top) {
            return false;
        }
        for (RoundRectangle2D tyre : tyres) {
            if (tyre.getBounds2D().intersects(padded)) {
                return false;
            }
        }
        return !body.getBounds2D().intersects(padded); // its bounds: a margin about the rolled corners
    }

    /**
     * @return a place for the force's name clear of the body and the tyres: above the roof on the outside of
     * the turn, beside the outside tyre, or under the words at the top; null where none is clear (with
     * {@code aboveRoof}, the roof's line is always taken: the car was drawn smaller to leave it)
     */
    Rectangle2D forceLabelPlace(int textWidth, int ascent, int descent, boolean left, int width, double top,
                                boolean aboveRoof) {
        Rectangle2D bounds = body.getBounds2D();
        double height = ascent + descent;
        double cgX = cg.getX();
        double outsideX = left ? cgX + 12 : cgX - 12 - textWidth;
        outsideX = Math.max(4, Math.min(outsideX, width - 4 - textWidth));
        double roofY = bounds.getY() - 6 - height;
        RoundRectangle2D outsideTyre = tyres.get(left ? 1 : 0);
        double besideX = left ? outsideTyre.getMaxX() + 8 : outsideTyre.getX() - 8 - textWidth;
        Rectangle2D[] places = {
                new Rectangle2D.Double(outsideX, roofY, textWidth, height),
                new Rectangle2D.Double(besideX, cg.getY() - height - 4, textWidth, height),
                new Rectangle2D.Double(outsideX, top, textWidth, height)};
        for (Rectangle2D place : places) {
            if (clear(place, width, top)) {
                return place;
            }
        }
        return aboveRoof ? new Rectangle2D.Double(outsideX, Math.max(top, roofY), textWidth, height) : null;
    }

    /**
     * @param avoid    a name already placed (the force's), or null
     * @param anywhere where no place beside the car is clear: under the ground line all the same (else null)
     * @return a place for the roll centre's name: beside its dot on the side away from the arrow, or beyond the
     * tyre on that side, or beyond the other tyre; the first clear of the tyres, the body and {@code avoid}
     */
    Rectangle2D rollCentrePlace(int textWidth, int ascent, int descent, double centre, boolean left, int width,
                                Rectangle2D avoid, boolean anywhere) {
        double height = ascent + descent;
        // beside its dot, but above the ground line, clear of the load columns that hang below it
        double ground = Math.max(tyres.get(0).getMaxY(), tyres.get(1).getMaxY());
        double y = Math.min(rollCentreY - height / 2, ground - 3 - height);
        RoundRectangle2D awayTyre = tyres.get(left ? 0 : 1);
        RoundRectangle2D otherTyre = tyres.get(left ? 1 : 0);
        Rectangle2D[] places = {
                new Rectangle2D.Double(left ? centre - 8 - textWidth : centre + 8, y, textWidth, height),
                new Rectangle2D.Double(left ? awayTyre.getX() - 8 - textWidth : awayTyre.getMaxX() + 8,
                        y, textWidth, height),
                new Rectangle2D.Double(left ? otherTyre.getMaxX() + 8 : otherTyre.getX() - 8 - textWidth,
                        y, textWidth, height)};
        for (Rectangle2D place : places) {
            if (clear(place, width, 0) && (avoid == null || !avoid.intersects(place))) {
                return place;
            }
        }
        return anywhere ? new Rectangle2D.Double(Math.max(4, Math.min(centre - textWidth / 2.0,
                width - 4 - textWidth)), ground + 4, textWidth, height) : null;
    }
}
