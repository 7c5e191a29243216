package barwright.report.sheet;

import barwright.units.Quantity;
import barwright.units.UnitSystem;

import java.io.IOException;
import java.util.List;

/**
 * Boxes and ruled lines for what a crew writes at the track: the session and conditions, the holes run, tyre
 * pressures cold and hot, tyre temperatures across the tread, ride heights and corner weights at each corner,
 * the driver's comments and notes. The two blocks of ruled lines share whatever height is left.
 */
final class CrewBlock {
    /** The column headings of the four-corner table. */
    static final List<String> CORNERS = List.of("front left", "front right", "rear left", "rear right");
    private static final float FIELD_HEIGHT = 16;
    private static final float ROW_HEIGHT = 16;
    private static final float RULE_SPACING = 16;
    private static final float LABEL_WIDTH = 135;
    private static final int CORNER_ROWS = 5;
    private static final int LEAST_COMMENT_LINES = 3;
    private static final int LEAST_NOTE_LINES = 2;
    /** The height above the ruled lines: heading, two rows of fields, the four-corner table (pt). */
    private static final float BOXES_HEIGHT = 12 + 2 * (14 + FIELD_HEIGHT) + 4 + 12 + CORNER_ROWS * ROW_HEIGHT + 4;
    /** The height of a block of ruled lines without its lines: the gap above and the label (pt). */
    private static final float RULED_LABEL_HEIGHT = 4 + 10;
    /** The height the block needs at the least (pt): every box, three lines of comments and two of notes. */
    static final float LEAST_HEIGHT = BOXES_HEIGHT + 2 * RULED_LABEL_HEIGHT
            + (LEAST_COMMENT_LINES + LEAST_NOTE_LINES) * RULE_SPACING;

    private CrewBlock() {
    }

    /**
     * Draws the block from {@code top} down to {@code bottom}.
     */
    static void draw(PdfCanvas canvas, UnitSystem units, float x, float top, float width, float bottom)
            throws IOException {
        boolean us = units == UnitSystem.US;
        String temperature = us ? "°F" : "°C";
        canvas.black();
        canvas.text("At the track (for the crew to fill in)", x, top, PdfCanvas.BOLD, 10);
        float y = top - 12;
        y = fields(canvas, x, y, width, new String[]{"Event, session", "Driver", "Time", "Track temp " + temperature,
                "Air temp " + temperature}, new float[]{0.34f, 0.2f, 0.12f, 0.17f, 0.17f});
        y = fields(canvas, x, y, width, new String[]{"Weather, surface", "Fuel load", "Front bar: hole run",
                "Rear bar: hole run", "Other changes"}, new float[]{0.26f, 0.12f, 0.17f, 0.17f, 0.28f});
        y -= 4;
        y = corners(canvas, x, y, width, new String[]{
                "Tyre pressure, cold (" + (us ? "psi" : "kPa or bar") + ")",
                "Tyre pressure, hot",
                "Tyre temp, in / mid / out " + temperature,
                "Ride height (" + Quantity.LENGTH.unit(units).symbol() + ")",
                "Corner weight (" + Quantity.MASS.unit(units).symbol() + ")"});
        // the comments and notes share what is left
        float left = y - bottom - 2 * RULED_LABEL_HEIGHT;
        int lines = Math.max(LEAST_COMMENT_LINES + LEAST_NOTE_LINES, (int) (left / RULE_SPACING));
        int comments = Math.max(LEAST_COMMENT_LINES, (lines + 1) / 2);
        y = ruled(canvas, "Driver's comments (entry, mid-corner, exit; which corners)", x, y - 4, width, comments);
        ruled(canvas, "Notes and changes for the next run", x, y - 4, width,
                Math.max(LEAST_NOTE_LINES, lines - comments));
    }

    /** A row of labelled boxes; the shares of the width sum to 1. @return the y below it */
    private static float fields(PdfCanvas canvas, float x, float top, float width, String[] labels, float[] shares)
            throws IOException {
        float left = x;
        for (int i = 0; i < labels.length; i++) {
            float boxWidth = width * shares[i] - (i == labels.length - 1 ? 0 : 4);
            canvas.black();
            canvas.text(labels[i], left + 1, top - 7, PdfCanvas.REGULAR, 6.5f);
            canvas.lineWidth(0.5f);
            canvas.rectangle(left, top - 10 - FIELD_HEIGHT, boxWidth, FIELD_HEIGHT);
            left += width * shares[i];
        }
        return top - 14 - FIELD_HEIGHT;
    }

    /** A table with a column per corner and a box in each. @return the y below it */
    private static float corners(PdfCanvas canvas, float x, float top, float width, String[] rows)
            throws IOException {
        float columnWidth = (width - LABEL_WIDTH) / CORNERS.size();
        canvas.black();
        for (int c = 0; c < CORNERS.size(); c++) {
            canvas.textCentred(CORNERS.get(c), x + LABEL_WIDTH + (c + 0.5f) * columnWidth, top - 8, PdfCanvas.BOLD, 7);
        }
        float y = top - 12;
        canvas.lineWidth(0.5f);
        for (String row : rows) {
            canvas.text(row, x, y - ROW_HEIGHT + 5, PdfCanvas.REGULAR, 7);
            for (int c = 0; c < CORNERS.size(); c++) {
                float cellX = x + LABEL_WIDTH + c * columnWidth;
                canvas.rectangle(cellX, y - ROW_HEIGHT, columnWidth, ROW_HEIGHT);
                if (row.contains("in / mid / out")) {
                    // three boxes across the tread
                    canvas.line(cellX + columnWidth / 3, y - ROW_HEIGHT, cellX + columnWidth / 3, y);
                    canvas.line(cellX + 2 * columnWidth / 3, y - ROW_HEIGHT, cellX + 2 * columnWidth / 3, y);
                }
            }
            y -= ROW_HEIGHT;
        }
        return y - 4;
    }

    /** A label over ruled lines. @return the y below the last line */
    private static float ruled(PdfCanvas canvas, String label, float x, float top, float width, int lines)
            throws IOException {
        canvas.black();
        canvas.text(label, x, top - 7, PdfCanvas.BOLD, 7.5f);
        float y = top - 10;
        canvas.colour(0.55f, 0.55f, 0.55f);
        canvas.lineWidth(0.4f);
        for (int i = 0; i < lines; i++) {
            y -= RULE_SPACING;
            canvas.line(x, y, x + width, y);
        }
        canvas.black();
        return y;
    }
}
