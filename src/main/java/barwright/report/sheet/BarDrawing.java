package barwright.report.sheet;

import barwright.model.AntiRollBar;
import barwright.model.Point3;
import barwright.model.TubeSection;
import barwright.model.UBarDimensions;
import barwright.units.Figures;
import barwright.units.Quantity;
import barwright.units.UnitSystem;

import java.io.IOException;
import java.util.List;
import java.util.Locale;

/**
 * A bar seen from above, to scale: the torsion tube across, the arms along the car with every link hole
 * (the hole in use filled), the bushings as blocks, and the main dimensions written on it.
 */
final class BarDrawing {
    private BarDrawing() {
    }

    /**
     * Draws into the box whose lower-left corner is (x, y).
     */
    static void draw(PdfCanvas canvas, String title, AntiRollBar bar, UnitSystem units, float x, float y,
                     float width, float height) throws IOException {
        canvas.black();
        canvas.text(title, x, y + height - 10, PdfCanvas.BOLD, 9);
        if (bar == null) {
            canvas.text("no bar", x, y + height - 26, PdfCanvas.REGULAR, 9);
            return;
        }
        canvas.text(sectionText(bar, units), x, y + height - 22, PdfCanvas.REGULAR, 8);
        if (bar.dimensions() == null) {
            drawCentreline(canvas, bar.centreline().points(), x, y, width, height - 30);
            return;
        }
        UBarDimensions dimensions = bar.dimensions();
        double length = dimensions.torsionLength();
        double arm = dimensions.longestArm();
        float drawingTop = y + height - 40;
        float scale = (float) Math.min((width - 20) / length, (height - 70) / arm);
        float left = x + (width - (float) (length * scale)) / 2;
        float right = left + (float) (length * scale);
        float tube = drawingTop - 8;
        float thickness = Math.max(1.5f, (float) (bar.section().outerDiameter() * scale));
        canvas.lineWidth(thickness);
        canvas.line(left, tube, right, tube);
        float armEnd = tube - (float) (arm * scale);
        canvas.line(left, tube, left, armEnd);
        canvas.line(right, tube, right, armEnd);
        canvas.lineWidth(0.6f);
        // bushings, symmetric about the middle
        float middle = (left + right) / 2;
        float halfSpan = (float) (dimensions.bushingSpan() * scale / 2);
        canvas.colour(0.35f, 0.35f, 0.35f);
        for (float bushing : new float[]{middle - halfSpan, middle + halfSpan}) {
            canvas.filledRectangle(bushing - 4, tube - thickness / 2 - 3, 8, thickness + 6);
        }
        // holes: every arm length, the one in use filled
        List<Double> arms = dimensions.armLengths();
        for (int hole = 0; hole < arms.size(); hole++) {
            float holeY = tube - (float) (arms.get(hole) * scale);
            boolean selected = hole == bar.selectedArm();
            canvas.colour(selected ? 0.75f : 0.1f, selected ? 0.2f : 0.1f, selected ? 0.1f : 0.1f);
            for (float side : new float[]{left, right}) {
                canvas.circle(side, holeY, selected ? 3.2f : 2.2f, selected);
            }
        }
        canvas.black();
        float labels = armEnd - 12;
        labels = canvas.paragraph("torsion length " + length(length, units) + ", bushings "
                + length(dimensions.bushingSpan(), units) + " apart (grey blocks)", x, labels, width, PdfCanvas.REGULAR, 7);
        canvas.paragraph("arm lengths " + armList(arms, units) + "; in use: hole " + (bar.selectedArm() + 1)
                + " (filled); link motion ratio " + String.format(Locale.ROOT, "%.2f",
                bar.linkMotionRatio()), x, labels, width, PdfCanvas.REGULAR, 7);
    }

    private static void drawCentreline(PdfCanvas canvas, List<Point3> points, float x, float y, float width,
                                       float height) throws IOException {
        double minY = points.stream().mapToDouble(Point3::y).min().orElse(0);
        double maxY = points.stream().mapToDouble(Point3::y).max().orElse(1);
        double minX = points.stream().mapToDouble(Point3::x).min().orElse(0);
        double maxX = points.stream().mapToDouble(Point3::x).max().orElse(1);
        float scale = (float) Math.min((width - 20) / Math.max(1e-6, maxY - minY),
                (height - 20) / Math.max(1e-6, maxX - minX));
        float[] across = new float[points.size()];
        float[] along = new float[points.size()];
        for (int i = 0; i < points.size(); i++) {
            // seen from above: the car's left (+y) drawn to the left, forward (+x) drawn up
            across[i] = x + 10 + (float) ((maxY - points.get(i).y()) * scale);
            along[i] = y + 10 + (float) ((points.get(i).x() - minX) * scale);
        }
        canvas.lineWidth(2);
        canvas.polyline(across, along);
        canvas.lineWidth(0.6f);
        canvas.text("shaped bar: centreline seen from above (beam-element model)", x, y, PdfCanvas.REGULAR, 7);
    }

    static String sectionText(AntiRollBar bar, UnitSystem units) {
        String diameter = length(bar.section().outerDiameter(), units);
        String section = bar.section() instanceof TubeSection tube
                ? "tube " + diameter + " x " + length(tube.wall(), units) + " wall" : "solid " + diameter;
        return section + ", " + bar.material().name();
    }

    private static String armList(List<Double> arms, UnitSystem units) {
        StringBuilder text = new StringBuilder();
        for (int i = 0; i < arms.size(); i++) {
            text.append(i == 0 ? "" : ", ").append(length(arms.get(i), units));
        }
        return text.toString();
    }

    static String length(double metres, UnitSystem units) {
        return Figures.format(metres, Quantity.LENGTH, units, units == UnitSystem.US ? 3 : 1);
    }
}
