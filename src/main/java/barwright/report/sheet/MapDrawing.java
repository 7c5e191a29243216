package barwright.report.sheet;

import barwright.sizing.SetupFigures;
import barwright.sizing.map.AdjustmentMap;
import barwright.sizing.map.MapCell;
import barwright.units.Figures;
import barwright.units.Quantity;
import barwright.units.UnitSystem;

import java.io.IOException;
import java.util.Locale;

import static barwright.units.Conversions.toPercent;

/**
 * The adjustment map as a coloured table. Each cell's tint says how far its front share of load transfer
 * lies from a reference share: blue where more of the transfer is at the front (toward understeer), amber
 * where less (toward oversteer), pale near the reference. A red frame marks an inside wheel lifting before
 * the limit; a heavy black frame the current setting.
 */
final class MapDrawing {
    /** The tint is full at this distance from the reference share. */
    private static final double FULL_TINT = 0.08;

    private MapDrawing() {
    }

    /**
     * @param referenceShare the share the tint is centred on
     * @return the height used (pt)
     */
    static float draw(PdfCanvas canvas, AdjustmentMap map, double referenceShare, UnitSystem units, float x, float top,
                      float width) throws IOException {
        int columns = map.columns().size();
        int rows = map.rows().size();
        float headerWidth = 110;
        float cellWidth = Math.min(110, (width - headerWidth) / Math.max(1, columns));
        float cellHeight = 34;
        float headerHeight = 22;
        canvas.black();
        canvas.text("front bar \\ rear bar", x, top - 12, PdfCanvas.BOLD, 7);
        for (int c = 0; c < columns; c++) {
            float cx = x + headerWidth + c * cellWidth;
            canvas.paragraph(map.columns().get(c).label(), cx + 2, top - 8, cellWidth - 4, PdfCanvas.BOLD, 6.5f);
        }
        for (int r = 0; r < rows; r++) {
            float cy = top - headerHeight - (r + 1) * cellHeight;
            canvas.black();
            canvas.paragraph(map.rows().get(r).label(), x, cy + cellHeight - 10, headerWidth - 6, PdfCanvas.BOLD, 6.5f);
            for (int c = 0; c < columns; c++) {
                cell(canvas, map.cell(r, c), referenceShare, units, x + headerWidth + c * cellWidth, cy, cellWidth,
                        cellHeight);
            }
        }
        return headerHeight + rows * cellHeight;
    }

    private static void cell(PdfCanvas canvas, MapCell cell, double referenceShare, UnitSystem units, float x,
                             float y, float width, float height) throws IOException {
        SetupFigures figures = cell.figures();
        if (figures == null) {
            canvas.colour(0.85f, 0.85f, 0.85f);
            canvas.filledRectangle(x, y, width, height);
            canvas.black();
            canvas.text("no stable roll", x + 4, y + height / 2 - 3, PdfCanvas.REGULAR, 7);
        } else {
            float[] tint = tint(figures.frontLoadTransferShare() - referenceShare);
            canvas.fillColour(tint[0], tint[1], tint[2]);
            canvas.filledRectangle(x, y, width, height);
            canvas.black();
            canvas.text(String.format(Locale.ROOT, "%.1f %% front", toPercent(figures.frontLoadTransferShare())), x + 4,
                    y + height - 10, PdfCanvas.BOLD, 7.5f);
            canvas.text(Figures.format(figures.rollGradient(), Quantity.ROLL_GRADIENT, units, 2) + ", "
                    + Figures.format(figures.limit(), Quantity.ACCELERATION, units, 2) + " "
                    + figures.balance().key(), x + 4, y + height - 19, PdfCanvas.REGULAR, 6.5f);
            String lift = (figures.frontLiftsBeforeLimit() ? "inside front lifts " : "")
                    + (figures.rearLiftsBeforeLimit() ? "inside rear lifts" : "");
            if (!lift.isEmpty()) {
                canvas.colour(0.75f, 0.05f, 0.05f);
                canvas.text(lift.trim(), x + 4, y + 4, PdfCanvas.REGULAR, 6.5f);
                canvas.lineWidth(1.2f);
                canvas.rectangle(x + 1.5f, y + 1.5f, width - 3, height - 3);
            }
        }
        canvas.black();
        canvas.lineWidth(cell.current() ? 2.4f : 0.4f);
        canvas.rectangle(x, y, width, height);
        if (cell.current()) {
            canvas.textRight("current", x + width - 3, y + height - 10, PdfCanvas.BOLD, 6.5f);
        }
        canvas.lineWidth(0.5f);
    }

    /** @return a pale tint: blue above the reference, amber below, white at it */
    static float[] tint(double difference) {
        float strength = (float) Math.min(1, Math.abs(difference) / FULL_TINT) * 0.55f;
        return difference >= 0 ? new float[]{1 - strength * 0.8f, 1 - strength * 0.45f, 1}
                : new float[]{1, 1 - strength * 0.35f, 1 - strength * 0.9f};
    }
}
