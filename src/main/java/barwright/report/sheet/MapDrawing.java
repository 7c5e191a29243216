package barwright.report.sheet;

import barwright.sizing.SetupFigures;
import barwright.sizing.map.AdjustmentMap;
import barwright.sizing.map.BarOption;
import barwright.sizing.map.MapCell;
import barwright.units.Figures;
import barwright.units.Quantity;
import barwright.units.UnitSystem;

import java.io.IOException;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import static barwright.units.Conversions.toPercent;

/**
 * The adjustment map as a coloured table with its key. Each cell's tint says how far its front share of load
 * transfer lies from a reference share (a target, or the static front weight): blue above it (more of the
 * transfer at the front, toward understeer), amber below (toward oversteer), white at it, deeper with the
 * distance. The tint is never the only cue: each cell writes its distance in points, a dashed frame marks the
 * cell nearest the reference, a heavy frame the current setting (its holes marked by triangles in the
 * headers, the word "current" written once, in the key) and red words an inside wheel lifting before the
 * limit.
 */
final class MapDrawing {
    /**
     * The least distance (as a share) the tint scale spans. The scale otherwise reaches full colour at the
     * cell farthest from the reference, so a map whose cells all lie on one side, or all far off, still shows
     * its gradation (a fixed span saturates such a map into one flat colour); this floor keeps a map whose
     * cells all lie within a point or two of the reference pale, since every cell is then near it.
     */
    static final double MIN_SPAN = 0.02;
    private static final float[] ABOVE = {0.40f, 0.60f, 0.95f};
    private static final float[] BELOW = {0.98f, 0.66f, 0.25f};
    private static final float[] NO_ROLL = {0.85f, 0.85f, 0.85f};
    private static final float[] LIFT = {0.75f, 0.05f, 0.05f};
    private static final float HEADER_WIDTH = 84;
    private static final float CELL_HEIGHT = 46;
    private static final float HEADER_HEIGHT = 24;
    private static final int SWATCHES = 11;

    private MapDrawing() {
    }

    /** @return the distance (as a share) at which the tint is full: the farthest cell's, at least {@link #MIN_SPAN} */
    static double span(AdjustmentMap map, double referenceShare) {
        double farthest = 0;
        for (MapCell cell : map.cells()) {
            if (cell.figures() != null) {
                farthest = Math.max(farthest, Math.abs(cell.figures().frontLoadTransferShare() - referenceShare));
            }
        }
        return Math.max(MIN_SPAN, farthest);
    }

    /** @return each cell's fill (red, green, blue in 0..1), row by row as {@link AdjustmentMap#cells()} */
    static List<float[]> tints(AdjustmentMap map, double referenceShare) {
        double span = span(map, referenceShare);
        List<float[]> tints = new ArrayList<>();
        for (MapCell cell : map.cells()) {
            tints.add(cell.figures() == null ? NO_ROLL.clone()
                    : tint(cell.figures().frontLoadTransferShare() - referenceShare, span));
        }
        return tints;
    }

    /** @return the index of the cell whose front share is nearest the reference, or -1 where no cell has one */
    static int nearest(AdjustmentMap map, double referenceShare) {
        int nearest = -1;
        double best = Double.POSITIVE_INFINITY;
        for (int i = 0; i < map.cells().size(); i++) {
            SetupFigures figures = map.cells().get(i).figures();
            if (figures != null && Math.abs(figures.frontLoadTransferShare() - referenceShare) < best) {
                best = Math.abs(figures.frontLoadTransferShare() - referenceShare);
                nearest = i;
            }
        }
        return nearest;
    }

    /** @return white at the reference, blending linearly to full blue (above) or amber (below) at the span */
    static float[] tint(double difference, double span) {
        float strength = (float) Math.min(1, Math.abs(difference) / span);
        float[] full = difference >= 0 ? ABOVE : BELOW;
        return new float[]{1 - strength * (1 - full[0]), 1 - strength * (1 - full[1]), 1 - strength * (1 - full[2])};
    }

    /**
     * Draws the map and its key below it.
     *
     * @param referenceShare the share the tint is centred on
     * @param referenceText  that share in words, e.g. "the target 58.0 %"
     * @return the height used (pt)
     */
    static float draw(PdfCanvas canvas, AdjustmentMap map, double referenceShare, String referenceText,
                      UnitSystem units, float x, float top, float width) throws IOException {
        int columns = map.columns().size();
        int rows = map.rows().size();
        float cellWidth = Math.min(110, (width - HEADER_WIDTH) / Math.max(1, columns));
        double span = span(map, referenceShare);
        List<float[]> tints = tints(map, referenceShare);
        int nearest = nearest(map, referenceShare);
        canvas.black();
        canvas.paragraph("front bar (rows) \\ rear bar (columns)", x, top - 8, HEADER_WIDTH - 6, PdfCanvas.BOLD, 6.5f);
        boolean uniformColumns = uniform(map.columns());
        for (int c = 0; c < columns; c++) {
            float cx = x + HEADER_WIDTH + c * cellWidth;
            BarOption option = map.columns().get(c);
            canvas.black();
            if (option.current()) {
                // a triangle pointing down at the rear hole in use
                canvas.filledTriangle(cx + 2, top - 3, cx + 9, top - 3, cx + 5.5f, top - 9);
            }
            canvas.paragraph(optionText(option, uniformColumns, units), cx + 11, top - 8, cellWidth - 13,
                    PdfCanvas.BOLD, 6.5f);
        }
        boolean uniformRows = uniform(map.rows());
        for (int r = 0; r < rows; r++) {
            float cy = top - HEADER_HEIGHT - (r + 1) * CELL_HEIGHT;
            BarOption option = map.rows().get(r);
            canvas.black();
            if (option.current()) {
                // a triangle pointing right at the front hole in use
                float middle = cy + CELL_HEIGHT - 8;
                canvas.filledTriangle(x, middle + 3.5f, x, middle - 3.5f, x + 6, middle);
            }
            canvas.paragraph(optionText(option, uniformRows, units), x + 9, cy + CELL_HEIGHT - 10, HEADER_WIDTH - 14,
                    PdfCanvas.BOLD, 6.5f);
            for (int c = 0; c < columns; c++) {
                int index = r * columns + c;
                cell(canvas, map.cell(r, c), tints.get(index), index == nearest, referenceShare, units,
                        x + HEADER_WIDTH + c * cellWidth, cy, cellWidth);
            }
        }
        float keyTop = top - HEADER_HEIGHT - rows * CELL_HEIGHT - 14;
        float bottom = key(canvas, referenceShare, referenceText, span, x, keyTop, width);
        return top - bottom;
    }

    private static boolean uniform(List<BarOption> options) {
        return options.stream().map(BarOption::barLabel).distinct().count() <= 1;
    }

    /**
     * @return "hole 2 (210 mm)" where every option is one bar, else that bar's label first; the car's own bar
     * (labelled "current" by the map) is called "the car's bar" so the word is written once, in the key
     */
    static String optionText(BarOption option, boolean uniform, UnitSystem units) {
        if (option.bar() == null) {
            return "no bar";
        }
        String arm = Double.isNaN(option.armLength()) ? ""
                : " (" + Figures.format(option.armLength(), Quantity.LENGTH, units, units == UnitSystem.US ? 2 : 0) + ")";
        String hole = "hole " + (option.hole() + 1) + arm;
        if (uniform) {
            return hole;
        }
        String bar = "current".equals(option.barLabel()) ? "the car's bar" : option.barLabel();
        return bar + ", " + hole;
    }

    private static void cell(PdfCanvas canvas, MapCell cell, float[] tint, boolean nearest, double referenceShare,
                             UnitSystem units, float x, float y, float width) throws IOException {
        float height = CELL_HEIGHT;
        SetupFigures figures = cell.figures();
        canvas.fillColour(tint[0], tint[1], tint[2]);
        canvas.filledRectangle(x, y, width, height);
        canvas.black();
        if (figures == null) {
            canvas.paragraph("no stable roll", x + 4, y + height - 10, width - 8, PdfCanvas.REGULAR, 7);
        } else {
            double share = figures.frontLoadTransferShare();
            canvas.text(String.format(Locale.ROOT, "%.1f %% front", toPercent(share)), x + 5, y + height - 12,
                    PdfCanvas.BOLD, 7.5f);
            canvas.text(distanceText(share - referenceShare) + (nearest ? ", nearest" : ""), x + 5, y + height - 20.5f,
                    PdfCanvas.REGULAR, 6.5f);
            canvas.paragraph(Figures.format(figures.rollGradient(), Quantity.ROLL_GRADIENT, units, 2) + ", "
                    + Figures.format(figures.limit(), Quantity.ACCELERATION, units, 2) + " "
                    + figures.balance().key(), x + 5, y + height - 29, width - 8, PdfCanvas.REGULAR, 6.5f);
            String lift = figures.frontLiftsBeforeLimit() && figures.rearLiftsBeforeLimit() ? "both inside wheels lift"
                    : figures.frontLiftsBeforeLimit() ? "inside front lifts"
                    : figures.rearLiftsBeforeLimit() ? "inside rear lifts" : "";
            if (!lift.isEmpty()) {
                canvas.colour(LIFT[0], LIFT[1], LIFT[2]);
                canvas.text(lift, x + 5, y + 5.5f, PdfCanvas.REGULAR, 6.5f);
            }
        }
        if (nearest) {
            nearestFrame(canvas, x, y, width, height);
        }
        canvas.black();
        canvas.lineWidth(cell.current() ? 2.6f : 0.4f);
        canvas.rectangle(x, y, width, height);
        canvas.lineWidth(0.5f);
    }

    private static void nearestFrame(PdfCanvas canvas, float x, float y, float width, float height)
            throws IOException {
        canvas.colour(0.05f, 0.15f, 0.45f);
        canvas.lineWidth(1.4f);
        canvas.dash(3, 2);
        canvas.rectangle(x + 2.2f, y + 2.2f, width - 4.4f, height - 4.4f);
        canvas.dash(0, 0);
        canvas.black();
    }

    /** @return e.g. "3.5 points above", "0.0 points: at it" */
    static String distanceText(double difference) {
        double points = toPercent(difference);
        if (Math.abs(points) < 0.05) {
            return "at the reference";
        }
        return String.format(Locale.ROOT, "%.1f points %s", Math.abs(points), points > 0 ? "above" : "below");
    }

    /** @return the y below the key */
    private static float key(PdfCanvas canvas, double referenceShare, String referenceText, double span, float x,
                             float top, float width) throws IOException {
        // the colour scale, reference at the middle, with its shares written under it
        float swatch = 24;
        for (int i = 0; i < SWATCHES; i++) {
            double difference = span * (2.0 * i / (SWATCHES - 1) - 1);
            float[] tint = tint(difference, span);
            canvas.fillColour(tint[0], tint[1], tint[2]);
            canvas.filledRectangle(x + i * swatch, top - 10, swatch, 10);
        }
        canvas.black();
        canvas.lineWidth(0.4f);
        canvas.rectangle(x, top - 10, SWATCHES * swatch, 10);
        canvas.textCentred(String.format(Locale.ROOT, "%.1f %%", toPercent(referenceShare - span)), x + swatch / 2,
                top - 18, PdfCanvas.REGULAR, 6.5f);
        canvas.textCentred(String.format(Locale.ROOT, "%.1f %%", toPercent(referenceShare)),
                x + SWATCHES * swatch / 2, top - 18, PdfCanvas.BOLD, 6.5f);
        canvas.textCentred(String.format(Locale.ROOT, "%.1f %%", toPercent(referenceShare + span)),
                x + (SWATCHES - 0.5f) * swatch, top - 18, PdfCanvas.REGULAR, 6.5f);
        float textX = x + SWATCHES * swatch + 10;
        boolean floor = span <= MIN_SPAN + 1e-12;
        float y = canvas.paragraph(String.format(Locale.ROOT, "Tinted against %s. Blue: a front share of load "
                        + "transfer above it (toward understeer); amber: below it (toward oversteer); white: at it. "
                        + "The colour deepens with the distance, full at %.1f points (%s).", referenceText,
                toPercent(span), floor ? "the least the scale spans" : "the farthest cell of this map"),
                textX, top - 2, x + width - textX, PdfCanvas.REGULAR, 7);
        y = Math.min(y - 6, top - 30);
        // the frames, each drawn beside its meaning
        float itemX = x;
        canvas.black();
        canvas.lineWidth(2.6f);
        canvas.rectangle(itemX, y - 2, 16, 9);
        canvas.filledTriangle(itemX + 22, y + 7, itemX + 29, y + 7, itemX + 25.5f, y + 1);
        canvas.lineWidth(0.5f);
        String current = "the current setting; triangles mark its front and rear holes";
        canvas.text(current, itemX + 33, y, PdfCanvas.REGULAR, 7);
        itemX += 40 + PdfCanvas.width(current, PdfCanvas.REGULAR, 7);
        nearestFrame(canvas, itemX - 2.2f, y - 4.2f, 20.4f, 13.4f);
        String nearestText = "the cell nearest the reference";
        canvas.text(nearestText, itemX + 22, y, PdfCanvas.REGULAR, 7);
        itemX += 32 + PdfCanvas.width(nearestText, PdfCanvas.REGULAR, 7);
        canvas.colour(LIFT[0], LIFT[1], LIFT[2]);
        canvas.text("red words: an inside wheel lifts before the limit", itemX, y, PdfCanvas.REGULAR, 7);
        canvas.black();
        y -= 13;
        return canvas.paragraph("Each cell: the front share of load transfer, its distance from the reference in "
                + "percentage points, the roll gradient, the limit and the balance there. Holes count from 1 (the "
                + "first in the vehicle file).", x, y, width, PdfCanvas.REGULAR, 7);
    }
}
