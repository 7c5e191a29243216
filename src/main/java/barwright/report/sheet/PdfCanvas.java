package barwright.report.sheet;

import org.apache.pdfbox.pdmodel.PDPageContentStream;
import org.apache.pdfbox.pdmodel.font.PDType1Font;
import org.apache.pdfbox.pdmodel.font.Standard14Fonts;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.util.ArrayList;
import java.util.List;
import java.util.Map;

/**
 * Drawing on one PDF page in points (1/72 in) from the bottom-left corner, with the standard Helvetica fonts
 * (no font files needed). Text is transliterated to what those fonts' WinAnsi encoding holds. The canvas
 * keeps the vertical extent of everything drawn ({@link #marks()}), so a test can see how a page is filled.
 */
final class PdfCanvas {
    static final PDType1Font REGULAR = new PDType1Font(Standard14Fonts.FontName.HELVETICA);
    static final PDType1Font BOLD = new PDType1Font(Standard14Fonts.FontName.HELVETICA_BOLD);
    /** Characters the program writes that the standard fonts' encoding may lack, and what stands for them. */
    private static final Map<Character, String> TRANSLITERATION = Map.of('·', " ", '³', "^3", '²', "^2", '−', "-",
            'φ', "phi", '≤', "<=", '≥', ">=", '\u2009', " ", '\u00a0', " ", '→', "->");
    /** Bezier handle length for a quarter circle (the usual 4 (sqrt 2 - 1) / 3). */
    private static final float CIRCLE_HANDLE = 0.5523f;

    private final PDPageContentStream stream;
    private final List<Extent> marks = new ArrayList<>();

    PdfCanvas(PDPageContentStream stream) {
        this.stream = stream;
    }

    /**
     * The vertical extent of one thing drawn, in points from the page's foot.
     *
     * @param low  its lowest point
     * @param high its highest point
     */
    record Extent(float low, float high) {
    }

    /** @return the vertical extent of every text, line and shape drawn so far, in drawing order */
    List<Extent> marks() {
        return List.copyOf(marks);
    }

    private void mark(float a, float b) {
        marks.add(new Extent(Math.min(a, b), Math.max(a, b)));
    }

    /** @return the text with every character the font cannot show replaced */
    static String printable(String text, PDType1Font font) {
        StringBuilder out = new StringBuilder(text.length());
        for (char c : text.toCharArray()) {
            String replacement = TRANSLITERATION.get(c);
            if (replacement != null) {
                out.append(replacement);
            } else if (c == '\n' || c == '\t') {
                out.append(' ');
            } else if (encodable(font, c)) {
                out.append(c);
            } else {
                out.append('?');
            }
        }
        return out.toString();
    }

    private static boolean encodable(PDType1Font font, char c) {
        try {
            font.encode(String.valueOf(c));
            return true;
        } catch (IllegalArgumentException | IOException notInEncoding) {
            return false;
        }
    }

    static float width(String text, PDType1Font font, float size) {
        try {
            return font.getStringWidth(printable(text, font)) / 1000 * size;
        } catch (IOException impossible) {
            throw new UncheckedIOException(impossible);
        }
    }

    void text(String text, float x, float y, PDType1Font font, float size) throws IOException {
        stream.beginText();
        stream.setFont(font, size);
        stream.newLineAtOffset(x, y);
        stream.showText(printable(text, font));
        stream.endText();
        // a line of text reaches from its descenders to its capitals
        mark(y - 0.22f * size, y + 0.72f * size);
    }

    void textRight(String text, float right, float y, PDType1Font font, float size) throws IOException {
        text(text, right - width(text, font, size), y, font, size);
    }

    void textCentred(String text, float centre, float y, PDType1Font font, float size) throws IOException {
        text(text, centre - width(text, font, size) / 2, y, font, size);
    }

    /**
     * Writes text wrapped to a width.
     *
     * @return the y of the line after the last one written
     */
    float paragraph(String text, float x, float y, float width, PDType1Font font, float size) throws IOException {
        float leading = size * 1.3f;
        StringBuilder line = new StringBuilder();
        for (String word : text.split(" ")) {
            String candidate = line.isEmpty() ? word : line + " " + word;
            if (width(candidate, font, size) > width && !line.isEmpty()) {
                text(line.toString(), x, y, font, size);
                y -= leading;
                line = new StringBuilder(word);
            } else {
                line = new StringBuilder(candidate);
            }
        }
        if (!line.isEmpty()) {
            text(line.toString(), x, y, font, size);
            y -= leading;
        }
        return y;
    }

    void colour(float red, float green, float blue) throws IOException {
        stream.setStrokingColor(red, green, blue);
        stream.setNonStrokingColor(red, green, blue);
    }

    void fillColour(float red, float green, float blue) throws IOException {
        stream.setNonStrokingColor(red, green, blue);
    }

    void black() throws IOException {
        colour(0, 0, 0);
    }

    void lineWidth(float width) throws IOException {
        stream.setLineWidth(width);
    }

    void dash(float on, float off) throws IOException {
        stream.setLineDashPattern(on > 0 ? new float[]{on, off} : new float[0], 0);
    }

    void line(float x1, float y1, float x2, float y2) throws IOException {
        mark(y1, y2);
        stream.moveTo(x1, y1);
        stream.lineTo(x2, y2);
        stream.stroke();
    }

    void polyline(float[] x, float[] y) throws IOException {
        if (x.length < 2) {
            return;
        }
        for (float point : y) {
            mark(point, point);
        }
        stream.moveTo(x[0], y[0]);
        for (int i = 1; i < x.length; i++) {
            stream.lineTo(x[i], y[i]);
        }
        stream.stroke();
    }

    void rectangle(float x, float y, float width, float height) throws IOException {
        mark(y, y + height);
        stream.addRect(x, y, width, height);
        stream.stroke();
    }

    void filledRectangle(float x, float y, float width, float height) throws IOException {
        mark(y, y + height);
        stream.addRect(x, y, width, height);
        stream.fill();
    }

    void circle(float centreX, float centreY, float radius, boolean filled) throws IOException {
        circlePath(centreX, centreY, radius);
        if (filled) {
            stream.fill();
        } else {
            stream.stroke();
        }
    }

    /** A filled triangle, e.g. a marker pointing at a row or column. */
    void filledTriangle(float x1, float y1, float x2, float y2, float x3, float y3) throws IOException {
        mark(Math.min(y1, Math.min(y2, y3)), Math.max(y1, Math.max(y2, y3)));
        stream.moveTo(x1, y1);
        stream.lineTo(x2, y2);
        stream.lineTo(x3, y3);
        stream.closePath();
        stream.fill();
    }

    /** A circle filled with the fill colour and outlined in the stroke colour. */
    void outlinedCircle(float centreX, float centreY, float radius) throws IOException {
        circlePath(centreX, centreY, radius);
        stream.closePath();
        stream.fillAndStroke();
    }

    private void circlePath(float centreX, float centreY, float radius) throws IOException {
        mark(centreY - radius, centreY + radius);
        float handle = radius * CIRCLE_HANDLE;
        stream.moveTo(centreX + radius, centreY);
        stream.curveTo(centreX + radius, centreY + handle, centreX + handle, centreY + radius, centreX, centreY + radius);
        stream.curveTo(centreX - handle, centreY + radius, centreX - radius, centreY + handle, centreX - radius, centreY);
        stream.curveTo(centreX - radius, centreY - handle, centreX - handle, centreY - radius, centreX, centreY - radius);
        stream.curveTo(centreX + handle, centreY - radius, centreX + radius, centreY - handle, centreX + radius, centreY);
    }
}
