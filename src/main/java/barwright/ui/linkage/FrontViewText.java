package barwright.ui.linkage;

import java.awt.FontMetrics;
import java.awt.Rectangle;
import java.util.ArrayList;
import java.util.List;

/**
 * The words on the front-view drawing laid out to the width they are given: lines wrapped at spaces, and the key
 * (each dashed line's sample followed by its words) flowed over as many lines as the width needs, so that at a large
 * text size nothing runs off the picture's edge. Pure layout: no painting.
 */
final class FrontViewText {
    /** Room between a key entry's sample line and its words, and between two entries on a line (pixels). */
    private static final int SAMPLE_GAP = 6;
    private static final int ENTRY_GAP = 18;

    /** The line drawn before a key entry's words. */
    enum Sample { NONE, ARM_LINE, CONTACT_LINE }

    /** One entry of the key; {@code newLine} starts it on a line of its own. */
    record Entry(Sample sample, String words, boolean newLine) {
    }

    /** A run of words placed on the key: its sample (on the entry's first run only) at {@code sampleX}, its box. */
    record Piece(Sample sample, int sampleX, String words, Rectangle box, int baseline) {
    }

    private FrontViewText() {
    }

    /** @return the words in lines no wider than the width (a single word wider than it stays whole on its line) */
    static List<String> wrap(String words, FontMetrics metrics, int width) {
        List<String> lines = new ArrayList<>();
        StringBuilder line = new StringBuilder();
        for (String word : words.split(" ")) {
            String longer = line.isEmpty() ? word : line + " " + word;
            if (!line.isEmpty() && metrics.stringWidth(longer) > width) {
                lines.add(line.toString());
                line = new StringBuilder(word);
            } else {
                line = new StringBuilder(longer);
            }
        }
        lines.add(line.toString());
        return lines;
    }

    /**
     * @return the key's entries: the two construction lines of an independent linkage, or the beam axle's note;
     *         first how the drawing is seen where its heading had no room to say so
     */
    static List<Entry> keyEntries(boolean beam, boolean view) {
        List<Entry> entries = new ArrayList<>();
        if (view) {
            entries.add(new Entry(Sample.NONE, "Seen from behind, to scale.", false));
        }
        if (beam) {
            entries.add(new Entry(Sample.NONE, "A beam axle: the roll centre is where its sideways locator meets the "
                    + "body's centreline (dashed).", false));
        } else {
            entries.add(new Entry(Sample.ARM_LINE, "arm lines to each side's instant centre (IC)", false));
            entries.add(new Entry(Sample.CONTACT_LINE, "contact point through the IC: the two meet at the roll centre",
                    false));
        }
        entries.add(new Entry(Sample.NONE, "Camber to the road (SAE J670): top of the wheel leaning away from the car "
                + "is positive. Drag a circle to move a point.", true));
        return entries;
    }

    /**
     * Flows the key's entries into lines within {@code [left, left + width)}: an entry goes on the current line if
     * it fits there whole, else on a new line; an entry wider than a line wraps at spaces.
     *
     * @param top the top of the key's first line (pixels)
     * @param sampleWidth the length of a sample line (pixels)
     */
    static List<Piece> layoutKey(List<Entry> entries, FontMetrics metrics, int left, int top, int width,
                                 int sampleWidth) {
        List<Piece> pieces = new ArrayList<>();
        int line = metrics.getHeight();
        int x = left;
        int row = 0;
        for (Entry entry : entries) {
            int sample = entry.sample() == Sample.NONE ? 0 : sampleWidth + SAMPLE_GAP;
            boolean fits = x + sample + metrics.stringWidth(entry.words()) <= left + width;
            if (x > left && (entry.newLine() || !fits)) {
                row++;
                x = left;
            }
            int sampleX = x;
            x += sample;
            List<String> lines = wrapFirstShorter(entry.words(), metrics, left + width - x, width);
            for (int i = 0; i < lines.size(); i++) {
                if (i > 0) {
                    row++;
                    x = left;
                }
                int baseline = top + row * line + metrics.getAscent();
                int wide = metrics.stringWidth(lines.get(i));
                pieces.add(new Piece(i == 0 ? entry.sample() : Sample.NONE, sampleX, lines.get(i),
                        new Rectangle(x, baseline - metrics.getAscent(), wide, line), baseline));
                x += wide;
            }
            x += ENTRY_GAP;
        }
        return pieces;
    }

    /** @return the height the key's pieces take (pixels), 0 for none */
    static int height(List<Piece> pieces) {
        int bottom = 0;
        int top = Integer.MAX_VALUE;
        for (Piece piece : pieces) {
            bottom = Math.max(bottom, piece.box().y + piece.box().height);
            top = Math.min(top, piece.box().y);
        }
        return pieces.isEmpty() ? 0 : bottom - top;
    }

    /** @return the words wrapped with the first line in {@code first} pixels and the others in {@code rest} */
    private static List<String> wrapFirstShorter(String words, FontMetrics metrics, int first, int rest) {
        List<String> firstLines = wrap(words, metrics, Math.max(1, first));
        if (firstLines.size() == 1) {
            return firstLines;
        }
        List<String> lines = new ArrayList<>();
        lines.add(firstLines.get(0));
        lines.addAll(wrap(words.substring(firstLines.get(0).length()).trim(), metrics, rest));
        return lines;
    }
}
