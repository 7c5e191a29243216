package barwright.ui.panel;

import javax.swing.BorderFactory;
import javax.swing.JTextArea;
import javax.swing.UIManager;

/** A read-only line of text that wraps at the width it is given, looking like a label. */
public class WrappingText extends JTextArea {
    public WrappingText(String text) {
        super(text);
        setEditable(false);
        setFocusable(false);
        setLineWrap(true);
        setWrapStyleWord(true);
        setOpaque(false);
        setBorder(BorderFactory.createEmptyBorder(1, 0, 1, 0));
        setFont(UIManager.getFont("Label.font"));
    }

    /** Wraps rather than widens: the least width is a few words, whatever the text's length. */
    @Override
    public java.awt.Dimension getMinimumSize() {
        if (isMinimumSizeSet()) {
            return super.getMinimumSize();
        }
        return new java.awt.Dimension(Math.min(super.getPreferredSize().width, 120), super.getMinimumSize().height);
    }

    @Override
    public void updateUI() {
        super.updateUI();
        setFont(UIManager.getFont("Label.font"));
        setOpaque(false);
    }
}
