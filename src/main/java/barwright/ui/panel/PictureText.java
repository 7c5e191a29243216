package barwright.ui.panel;

import java.awt.Font;
import java.awt.FontMetrics;
import java.awt.Graphics2D;
import java.util.ArrayList;
import java.util.List;

/** Text drawn into a picture, wrapped at word boundaries so that no figure runs off the picture's edge. */
final class PictureText {
    private PictureText() {
    }

    /** @return the text broken between words into lines no wider than width (a single long word stays whole) */
    static List<String> split(FontMetrics metrics, String text, int width) {
        List<String> lines = new ArrayList<>();
        StringBuilder current = new StringBuilder();
        for (String word : text.split(" ")) {
            String tried = current.isEmpty() ? word : current + " " + word;
            if (!current.isEmpty() && metrics.stringWidth(tried) > width) {
                lines.add(current.toString());
                current.setLength(0);
                current.append(word);
            } else {
                current.setLength(0);
                current.append(tried);
            }
        }
        lines.add(current.toString());
        return lines;
    }

    /** @return how many lines the text takes when wrapped at the width */
    static int lines(FontMetrics metrics, String text, int width) {
        return split(metrics, text, width).size();
    }

    /**
     * Draws the text from (x, baseline), breaking it between words where a line would be wider than width.
     *
     * @return the baseline of the last line drawn
     */
    static int wrapped(Graphics2D g, Font font, String text, int x, int baseline, int width) {
        g.setFont(font);
        FontMetrics metrics = g.getFontMetrics();
        int y = baseline - metrics.getHeight();
        for (String line : split(metrics, text, width)) {
            y += metrics.getHeight();
            g.drawString(line, x, y);
        }
        return y;
    }
}
