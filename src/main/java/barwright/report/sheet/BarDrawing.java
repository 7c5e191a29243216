package barwright.report.sheet;

import barwright.model.AntiRollBar;
import barwright.model.BarCentreline;
import barwright.model.Point3;
import barwright.model.TubeSection;
import barwright.model.UBarDimensions;
import barwright.units.Figures;
import barwright.units.Quantity;
import barwright.units.UnitSystem;

import java.io.IOException;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;

/**
 * A bar drawn to scale. A plain U-bar is seen from above: the torsion tube across, the arms along the car,
 * the bushings as grey blocks and the link holes on both arms (the one in use red). A shaped bar is seen from
 * above and from behind, one scale for both, so a drop or a sweep shows, with the drop measured beside it.
 * Under either, the end of an arm enlarged: every link hole numbered from 1, with its arm length or set-back,
 * the one in use red.
 */
final class BarDrawing {
    private static final float[] IN_USE = {0.80f, 0.10f, 0.05f};
    private static final float[] BUSHING = {0.45f, 0.45f, 0.45f};
    /** Height of the enlarged arm end with its numbers and dimensions. */
    private static final float DETAIL_HEIGHT = 36;
    /** Height of the two lines of dimensions under the drawing. */
    private static final float NOTES_HEIGHT = 20;

    private BarDrawing() {
    }

    /**
     * What was drawn, for the tests: the hole numbers written in the enlarged arm end, the one in use, the
     * bushings drawn in each view and the drop as drawn in the view from behind.
     *
     * @param holeNumbers  the numbers written beside the holes, in order
     * @param holeInUse    the number of the hole drawn red
     * @param bushings     bushing blocks drawn (every view counted)
     * @param dropDrawn    height of the centreline as drawn in the view from behind (pt); 0 where there is none
     * @param widthDrawn   width of the centreline across the car as drawn in that view (pt); 0 where none
     */
    record Drawn(List<Integer> holeNumbers, int holeInUse, int bushings, float dropDrawn, float widthDrawn) {
        static final Drawn NOTHING = new Drawn(List.of(), 0, 0, 0, 0);
    }

    /**
     * Draws into the box whose lower-left corner is (x, y).
     */
    static Drawn draw(PdfCanvas canvas, String title, AntiRollBar bar, UnitSystem units, float x, float y,
                      float width, float height) throws IOException {
        canvas.black();
        canvas.text(title, x, y + height - 10, PdfCanvas.BOLD, 9);
        if (bar == null) {
            canvas.text("no bar", x, y + height - 26, PdfCanvas.REGULAR, 9);
            return Drawn.NOTHING;
        }
        canvas.text(sectionText(bar, units), x, y + height - 22, PdfCanvas.REGULAR, 8);
        float viewsTop = y + height - 30;
        float viewsBottom = y + NOTES_HEIGHT + DETAIL_HEIGHT;
        Drawn views = bar.isShaped()
                ? shaped(canvas, bar, units, x, viewsBottom, width, viewsTop - viewsBottom)
                : uBar(canvas, bar, units, x, viewsBottom, width, viewsTop - viewsBottom);
        List<Integer> numbers = holeDetail(canvas, bar, units, x, y + NOTES_HEIGHT, width);
        canvas.paragraph(notes(bar, units), x, y + NOTES_HEIGHT - 8, width, PdfCanvas.REGULAR, 7);
        return new Drawn(numbers, bar.selectedArm() + 1, views.bushings(), views.dropDrawn(), views.widthDrawn());
    }

    private static Drawn uBar(PdfCanvas canvas, AntiRollBar bar, UnitSystem units, float x, float y, float width,
                              float height) throws IOException {
        UBarDimensions dimensions = bar.dimensions();
        double length = dimensions.torsionLength();
        double arm = dimensions.longestArm();
        canvas.text("seen from above", x, y + height - 8, PdfCanvas.REGULAR, 6.5f);
        float scale = (float) Math.min((width - 20) / length, (height - 26) / arm);
        float left = x + (width - (float) (length * scale)) / 2;
        float right = left + (float) (length * scale);
        float tube = y + height - 18;
        float thickness = Math.max(1.5f, (float) (bar.section().outerDiameter() * scale));
        canvas.lineWidth(thickness);
        canvas.line(left, tube, right, tube);
        float armEnd = tube - (float) (arm * scale);
        canvas.line(left, tube, left, armEnd);
        canvas.line(right, tube, right, armEnd);
        canvas.lineWidth(0.6f);
        float middle = (left + right) / 2;
        float halfSpan = (float) (dimensions.bushingSpan() * scale / 2);
        for (float bushing : new float[]{middle - halfSpan, middle + halfSpan}) {
            bushing(canvas, bushing, tube, thickness);
        }
        List<Double> arms = dimensions.armLengths();
        for (int hole = 0; hole < arms.size(); hole++) {
            float holeY = tube - (float) (arms.get(hole) * scale);
            for (float side : new float[]{left, right}) {
                hole(canvas, side, holeY, Math.max(1.6f, thickness / 2 - 0.4f), hole == bar.selectedArm());
            }
        }
        canvas.black();
        return new Drawn(List.of(), 0, 2, 0, 0);
    }

    private static Drawn shaped(PdfCanvas canvas, AntiRollBar bar, UnitSystem units, float x, float y, float width,
                                float height) throws IOException {
        BarCentreline centreline = bar.centreline();
        List<Point3> points = centreline.points();
        double minX = points.stream().mapToDouble(Point3::x).min().orElseThrow();
        double maxX = points.stream().mapToDouble(Point3::x).max().orElseThrow();
        double minY = points.stream().mapToDouble(Point3::y).min().orElseThrow();
        double maxY = points.stream().mapToDouble(Point3::y).max().orElseThrow();
        double minZ = points.stream().mapToDouble(Point3::z).min().orElseThrow();
        double maxZ = points.stream().mapToDouble(Point3::z).max().orElseThrow();
        // room at the right for the drop's dimension; one scale for both views, so a drop reads true to size
        float labelRoom = 62;
        float viewGap = 18;
        float drawableHeight = height - 2 * viewGap - 12;
        float scale = (float) Math.min((width - labelRoom) / Math.max(1e-6, maxY - minY),
                drawableHeight / Math.max(1e-6, (maxX - minX) + (maxZ - minZ)));
        float thickness = Math.max(1.5f, (float) (bar.section().outerDiameter() * scale));
        float planHeight = (float) ((maxX - minX) * scale);
        float planBottom = y + height - 19 - planHeight - thickness / 2;
        float rearTop = planBottom - viewGap;
        float rearBottom = rearTop - (float) ((maxZ - minZ) * scale);
        // seen from above: the car's left (+y) drawn to the left, forward (+x) up
        canvas.black();
        canvas.text("seen from above (forward up)", x, y + height - 8, PdfCanvas.REGULAR, 6.5f);
        Projection plan = point -> new float[]{x + (float) ((maxY - point.y()) * scale),
                planBottom + (float) ((point.x() - minX) * scale)};
        // seen from behind: the car's left still to the left, up drawn up
        Projection rear = point -> new float[]{x + (float) ((maxY - point.y()) * scale),
                rearBottom + (float) ((point.z() - minZ) * scale)};
        canvas.text("seen from behind", x, rearTop + thickness / 2 + 5, PdfCanvas.REGULAR, 6.5f);
        view(canvas, bar, plan, thickness);
        float[] rearExtent = view(canvas, bar, rear, thickness);
        int bushings = 2 * centreline.bushings().size();
        double drop = maxZ - minZ;
        float dimensionX = x + (float) ((maxY - minY) * scale) + 12;
        canvas.black();
        canvas.lineWidth(0.5f);
        if (drop > 1e-4) {
            canvas.line(dimensionX, rearTop, dimensionX, rearBottom);
            canvas.line(dimensionX - 3, rearTop, dimensionX + 3, rearTop);
            canvas.line(dimensionX - 3, rearBottom, dimensionX + 3, rearBottom);
            canvas.text(Figures.format(drop, Quantity.LENGTH, units, units == UnitSystem.US ? 2 : 0) + " drop",
                    dimensionX + 5, (rearTop + rearBottom) / 2 - 2.5f, PdfCanvas.BOLD, 7);
        } else {
            canvas.text("flat: no drop", dimensionX, rearTop - 2.5f, PdfCanvas.REGULAR, 7);
        }
        return new Drawn(List.of(), 0, bushings, rearExtent[1], rearExtent[0]);
    }

    /** Maps a point of the bar (vehicle axes, m) onto the page (pt). */
    private interface Projection {
        float[] onPage(Point3 point);
    }

    /** @return the extent of the centreline as drawn: across, up (pt) */
    private static float[] view(PdfCanvas canvas, AntiRollBar bar, Projection view, float thickness)
            throws IOException {
        BarCentreline centreline = bar.centreline();
        List<Point3> points = centreline.points();
        float[] across = new float[points.size()];
        float[] up = new float[points.size()];
        for (int i = 0; i < points.size(); i++) {
            float[] page = view.onPage(points.get(i));
            across[i] = page[0];
            up[i] = page[1];
        }
        canvas.black();
        canvas.lineWidth(thickness);
        canvas.polyline(across, up);
        float[] extent = {extent(across), extent(up)};
        canvas.lineWidth(0.6f);
        for (Point3 bushing : centreline.bushings()) {
            float[] page = view.onPage(bushing);
            bushing(canvas, page[0], page[1], thickness);
        }
        for (int hole = 0; hole < centreline.holeSetbacks().size(); hole++) {
            double setback = centreline.holeSetbacks().get(hole);
            for (Point3 end : new Point3[]{along(points.get(0), points.get(1), setback),
                    along(points.get(points.size() - 1), points.get(points.size() - 2), setback)}) {
                float[] page = view.onPage(end);
                hole(canvas, page[0], page[1], Math.max(1.6f, thickness / 2 - 0.4f), hole == bar.selectedArm());
            }
        }
        canvas.black();
        return extent;
    }

    private static float extent(float[] values) {
        float low = Float.POSITIVE_INFINITY;
        float high = Float.NEGATIVE_INFINITY;
        for (float value : values) {
            low = Math.min(low, value);
            high = Math.max(high, value);
        }
        return high - low;
    }

    /** @return the point a distance from {@code from} toward {@code toward} */
    private static Point3 along(Point3 from, Point3 toward, double distance) {
        double dx = toward.x() - from.x();
        double dy = toward.y() - from.y();
        double dz = toward.z() - from.z();
        double length = Math.sqrt(dx * dx + dy * dy + dz * dz);
        double t = length > 0 ? distance / length : 0;
        return new Point3(from.x() + dx * t, from.y() + dy * t, from.z() + dz * t);
    }

    private static void bushing(PdfCanvas canvas, float centreX, float centreY, float thickness) throws IOException {
        canvas.colour(BUSHING[0], BUSHING[1], BUSHING[2]);
        canvas.filledRectangle(centreX - 4, centreY - thickness / 2 - 3, 8, thickness + 6);
        canvas.black();
    }

    private static void hole(PdfCanvas canvas, float centreX, float centreY, float radius, boolean inUse)
            throws IOException {
        canvas.black();
        canvas.lineWidth(0.6f);
        if (inUse) {
            canvas.fillColour(IN_USE[0], IN_USE[1], IN_USE[2]);
        } else {
            canvas.fillColour(1, 1, 1);
        }
        canvas.outlinedCircle(centreX, centreY, radius);
        canvas.black();
    }

    /**
     * The end of an arm enlarged, the bar's end to the right: each hole numbered from 1 with its arm length
     * (a U-bar: from the bar's axis) or its set-back from the end (a shaped bar).
     *
     * @return the numbers written, in order
     */
    private static List<Integer> holeDetail(PdfCanvas canvas, AntiRollBar bar, UnitSystem units, float x, float y,
                                            float width) throws IOException {
        int count = bar.holeCount();
        double[] position = new double[count];
        String[] dimension = new String[count];
        for (int hole = 0; hole < count; hole++) {
            double metres = bar.isShaped() ? bar.centreline().holeSetbacks().get(hole)
                    : bar.dimensions().armLengths().get(hole);
            position[hole] = bar.isShaped() ? -metres : metres;
            dimension[hole] = Figures.format(metres, Quantity.LENGTH, units, units == UnitSystem.US ? 2 : 0);
        }
        double low = Arrays.stream(position).min().orElseThrow();
        double high = Arrays.stream(position).max().orElseThrow();
        float stripLeft = x + 8;
        float stripRight = x + width * 0.62f;
        float barEnd = stripRight;
        float span = barEnd - 14 - (stripLeft + 14);
        float scale = high > low ? (float) (span / (high - low)) : 0;
        float centre = y + 14;
        canvas.black();
        canvas.text(bar.isShaped() ? "Link holes (arm end enlarged; set back from the end)"
                : "Link holes (arm end enlarged; arm length from the bar's axis)", x, y + DETAIL_HEIGHT - 8,
                PdfCanvas.REGULAR, 6.5f);
        canvas.colour(0.55f, 0.55f, 0.55f);
        canvas.lineWidth(9);
        canvas.line(stripLeft, centre, barEnd, centre);
        canvas.lineWidth(0.5f);
        List<Integer> numbers = new ArrayList<>();
        for (int hole = 0; hole < count; hole++) {
            float holeX = high > low ? stripLeft + 14 + (float) ((position[hole] - low) * scale) : (stripLeft + barEnd) / 2;
            boolean inUse = hole == bar.selectedArm();
            hole(canvas, holeX, centre, 3.2f, inUse);
            if (inUse) {
                canvas.colour(IN_USE[0], IN_USE[1], IN_USE[2]);
            }
            canvas.textCentred(Integer.toString(hole + 1), holeX, centre + 7, PdfCanvas.BOLD, 7);
            canvas.black();
            canvas.textCentred(dimension[hole], holeX, centre - 13, PdfCanvas.REGULAR, 6);
            numbers.add(hole + 1);
        }
        canvas.colour(IN_USE[0], IN_USE[1], IN_USE[2]);
        canvas.text("in use: hole " + (bar.selectedArm() + 1) + " (red)", stripRight + 8, centre - 2.5f, PdfCanvas.BOLD,
                7);
        canvas.black();
        return numbers;
    }

    /** @return the dimensions written under the drawing */
    static String notes(AntiRollBar bar, UnitSystem units) {
        String motion = "link motion ratio " + String.format(Locale.ROOT, "%.2f", bar.linkMotionRatio());
        if (bar.isShaped()) {
            return "Shaped bar (beam-element model); grey blocks: bushings; " + motion + ".";
        }
        UBarDimensions dimensions = bar.dimensions();
        return "Torsion length " + length(dimensions.torsionLength(), units) + ", bushings "
                + length(dimensions.bushingSpan(), units) + " apart (grey blocks); " + motion + ".";
    }

    static String sectionText(AntiRollBar bar, UnitSystem units) {
        String diameter = length(bar.section().outerDiameter(), units);
        String section = bar.section() instanceof TubeSection tube
                ? "tube " + diameter + " x " + length(tube.wall(), units) + " wall" : "solid " + diameter;
        return section + ", " + bar.material().name();
    }

    static String length(double metres, UnitSystem units) {
        return Figures.format(metres, Quantity.LENGTH, units, units == UnitSystem.US ? 3 : 1);
    }
}
