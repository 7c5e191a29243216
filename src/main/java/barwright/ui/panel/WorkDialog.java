package barwright.ui.panel;

import barwright.physics.AnalysisResult;
import barwright.report.work.Derivation;
import barwright.report.work.Derivations;
import barwright.report.work.KeyFigure;
import barwright.report.work.WorkText;
import barwright.ui.field.ViewSettings;

import javax.swing.JTextPane;
import javax.swing.text.Element;
import javax.swing.text.SimpleAttributeSet;
import javax.swing.text.StyleConstants;
import javax.swing.text.StyledDocument;
import java.awt.Dimension;
import java.awt.Font;
import java.awt.FontMetrics;
import java.awt.Insets;
import java.awt.Window;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/** Shows how a key figure was worked out: formula, the numbers put in with units, the result, the source. */
public final class WorkDialog {
    /** The width the dialog asks for, in characters: a line of the working whole at the normal text size. */
    private static final int COLUMNS = 96;
    /** The most lines the dialog asks room for; a longer working scrolls. */
    private static final int MOST_ROWS = 34;
    /**
     * A line "symbol = value meaning" as WorkText sets it (the symbol padded to 10 characters, the value to 18):
     * the match ends where the meaning starts.
     */
    private static final Pattern FIGURE_LINE = Pattern.compile("^ {4}.{10,}? = .{18,}? (?=\\S)");
    private static final Pattern INDENT = Pattern.compile("^ +");

    private WorkDialog() {
    }

    /** @return the working as text in the chosen units */
    public static String text(AnalysisResult result, KeyFigure figure, ViewSettings view) {
        Derivation derivation = Derivations.of(result, figure);
        return WorkText.of(derivation, view.units(), view.locale());
    }

    public static void show(Window owner, AnalysisResult result, KeyFigure figure, ViewSettings view, boolean stale) {
        Derivation derivation = Derivations.of(result, figure);
        String text = (stale ? "OUT OF DATE: this is the working for the last car the program accepted.\n\n" : "")
                + WorkText.of(derivation, view.units(), view.locale());
        TextDialog.show(owner, "How it is worked out: " + derivation.title(), "work.dialog", pane(text));
    }

    /**
     * The working in a monospaced text that wraps to the dialog's width with a hanging indent: a line too long
     * for a projector's screen goes on under its own meaning (or under its formula), so the symbol, value and
     * meaning columns stay readable, and nothing is out of sight sideways. The text itself is unchanged, so a
     * copy is the working as written.
     */
    static JTextPane pane(String text) {
        int lines = (int) text.lines().count();
        JTextPane pane = new JTextPane() {
            @Override
            public Dimension getPreferredScrollableViewportSize() {
                FontMetrics metrics = getFontMetrics(getFont());
                Insets insets = getInsets();
                return new Dimension(COLUMNS * metrics.charWidth('m') + insets.left + insets.right,
                        Math.min(MOST_ROWS, lines + 2) * metrics.getHeight() + insets.top + insets.bottom);
            }
        };
        pane.setName("work.text");
        pane.setFont(new Font(Font.MONOSPACED, Font.PLAIN, pane.getFont().getSize()));
        pane.setText(text);
        hang(pane);
        return pane;
    }

    /** Gives each line (a paragraph) a hanging indent to its meaning column, or to its own indent. */
    private static void hang(JTextPane pane) {
        Font font = pane.getFont();
        float columnWidth = pane.getFontMetrics(font).charWidth('m');
        StyledDocument document = pane.getStyledDocument();
        SimpleAttributeSet letters = new SimpleAttributeSet();
        StyleConstants.setFontFamily(letters, font.getFamily());
        StyleConstants.setFontSize(letters, font.getSize());
        document.setCharacterAttributes(0, document.getLength(), letters, false);
        String all = pane.getText();
        Element root = document.getDefaultRootElement();
        for (int index = 0; index < root.getElementCount(); index++) {
            Element line = root.getElement(index);
            String words = all.substring(line.getStartOffset(),
                    Math.min(line.getEndOffset(), document.getLength()));
            float indent = meaningColumn(words) * columnWidth;
            SimpleAttributeSet hanging = new SimpleAttributeSet();
            StyleConstants.setLeftIndent(hanging, indent);
            StyleConstants.setFirstLineIndent(hanging, -indent);
            document.setParagraphAttributes(line.getStartOffset(), 1, hanging, false);
        }
    }

    /**
     * @return the column where a line's continuation goes: where its meaning starts on a figure's line, else
     *         under its first character (a formula, a note)
     */
    static int meaningColumn(String line) {
        Matcher figure = FIGURE_LINE.matcher(line);
        if (figure.find()) {
            return figure.end();
        }
        Matcher indent = INDENT.matcher(line);
        return indent.find() ? indent.end() : 0;
    }
}
