package barwright.ui.workshop;

import barwright.report.Cautions;

import javax.swing.JTextArea;
import java.awt.Font;

/** A workshop page's answer: the same text the command line prints (report.measure), in a fixed-width font. */
final class ResultText extends JTextArea {
    ResultText(String name) {
        super(12, 50);
        setName(name);
        setEditable(false);
        setLineWrap(false);
        setFont(new Font(Font.MONOSPACED, Font.PLAIN, getFont().getSize()));
    }

    /** The answer, then the usual caution. */
    void answer(String text) {
        setLineWrap(false); // the answer's figures stand in columns: it scrolls sideways in its box
        setText(text + "\n" + Cautions.SHORT + "\n");
        setCaretPosition(0);
    }

    /** Why there is no answer yet, in words that name the reading. */
    void why(String message) {
        setLineWrap(true); // words only: they wrap at the box's width
        setWrapStyleWord(true);
        setText(message + "\n");
    }
}
