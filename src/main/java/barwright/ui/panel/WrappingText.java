package barwright.ui.panel;

import javax.swing.BorderFactory;
import javax.swing.JTextArea;
import javax.swing.UIManager;
import java.awt.Container;
import java.awt.Dimension;
import java.awt.Insets;

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
    public Dimension getMinimumSize() {
        if (isMinimumSizeSet()) {
            return super.getMinimumSize();
        }
        return new Dimension(Math.min(getPreferredSize().width, 120), super.getMinimumSize().height);
    }

    /**
     * As tall as the text wrapped at the width it has; never wider than its container offers. (A text area's
     * own wish is the width it was last given, so a text once laid out wide kept its container wide: the
     * editor scrolled sideways at a large text.)
     */
    @Override
    public Dimension getPreferredSize() {
        Dimension own = super.getPreferredSize();
        if (isPreferredSizeSet()) {
            return own;
        }
        return new Dimension(Math.min(own.width, offeredWidth()), own.height);
    }

    /** @return the width inside the container, once it is laid out (pixels); no limit before */
    protected final int offeredWidth() {
        Container parent = getParent();
        if (parent == null || parent.getWidth() <= 0) {
            return Integer.MAX_VALUE;
        }
        Insets insets = parent.getInsets();
        return Math.max(1, parent.getWidth() - insets.left - insets.right);
    }

    @Override
    public void updateUI() {
        super.updateUI();
        setFont(UIManager.getFont("Label.font"));
        setOpaque(false);
    }
}
