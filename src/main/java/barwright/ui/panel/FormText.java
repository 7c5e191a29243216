package barwright.ui.panel;

import javax.swing.UIManager;
import java.awt.Dimension;
import java.awt.Font;
import java.awt.FontMetrics;
import java.awt.Insets;

/**
 * A form's field label or group heading. Beside its field it keeps its whole line (the form puts it above the
 * field rather than squeeze it); above the field, or as a heading, it wraps at words where the form is narrower
 * than its line (a large text on a small screen), and never breaks a word.
 */
final class FormText extends WrappingText {
    /** The look's key of the heading font (bold, as the look's fourth heading level). */
    private static final String HEADING_FONT = "h4.font";
    /** Spare width on a line (pixels), see lineWidth. */
    private static final int SPARE = 2;
    private final boolean heading;
    private boolean wraps;

    private FormText(String text, boolean heading) {
        super(text);
        this.heading = heading;
        this.wraps = heading;
        useFont();
    }

    /** @return a field's label, on one line until the form stacks it above its field */
    static FormText label(String text) {
        return new FormText(text, false);
    }

    /** @return a group's heading, wrapped at words where the form is narrower than it */
    static FormText heading(String text) {
        return new FormText(text, true);
    }

    /** Lets the text wrap at words (above its field) or keeps it on one line (beside it). */
    void setWraps(boolean wraps) {
        this.wraps = heading || wraps;
    }

    /** @return whether the text may wrap (above its field, or a heading), or keeps one line (beside its field) */
    boolean wraps() {
        return wraps;
    }

    /**
     * @return the width of the text on one line (pixels), borders included, with a little to spare: the text view
     * adds up its glyphs' widths its own way, and a label given exactly the measured width could wrap its last word
     */
    int lineWidth() {
        FontMetrics metrics = getFontMetrics(getFont());
        double widest = 0;
        for (String line : getText().split("\n", -1)) {
            widest = Math.max(widest, getFont().getStringBounds(line, metrics.getFontRenderContext()).getWidth());
        }
        Insets insets = getInsets();
        return (int) Math.ceil(widest) + SPARE + insets.left + insets.right;
    }

    /** @return the width of the longest word (pixels), borders included: the text never breaks inside it */
    int longestWordWidth() {
        FontMetrics metrics = getFontMetrics(getFont());
        int widest = 0;
        for (String word : getText().split("\\s+")) {
            widest = Math.max(widest, metrics.stringWidth(word));
        }
        Insets insets = getInsets();
        return widest + insets.left + insets.right;
    }

    @Override
    public Dimension getMinimumSize() {
        return new Dimension(wraps ? longestWordWidth() : lineWidth(), super.getMinimumSize().height);
    }

    /** The whole line, or the width the form offers where that is less; as tall as the text at its width. */
    @Override
    public Dimension getPreferredSize() {
        int width = lineWidth();
        if (wraps) {
            width = Math.max(longestWordWidth(), Math.min(width, offeredWidth()));
        }
        return new Dimension(width, super.getPreferredSize().height);
    }

    @Override
    public void updateUI() {
        super.updateUI();
        useFont();
    }

    private void useFont() {
        Font label = UIManager.getFont("Label.font");
        Font bold = UIManager.getFont(HEADING_FONT);
        // (the heading flag is unset while the text area's own constructor installs the look)
        setFont(heading && bold != null ? bold : heading && label != null ? label.deriveFont(Font.BOLD) : label);
    }
}
