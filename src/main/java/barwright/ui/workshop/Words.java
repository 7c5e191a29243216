package barwright.ui.workshop;

import javax.swing.BorderFactory;
import javax.swing.JTextArea;
import javax.swing.UIManager;
import java.awt.Rectangle;

/** Words on a workshop page that wrap at the page's width, in the window's text, read-only. Event thread. */
final class Words extends JTextArea {
    Words(String name, String text) {
        super(text);
        setName(name);
        setEditable(false);
        setFocusable(false);
        setLineWrap(true);
        setWrapStyleWord(true);
        setOpaque(false);
        setBorder(BorderFactory.createEmptyBorder(2, 4, 2, 4));
    }

    @Override
    public void updateUI() {
        super.updateUI();
        setFont(UIManager.getFont("Label.font"));
    }

    @Override
    public void scrollRectToVisible(Rectangle shown) {
        // the words sit in a page that scrolls: a new text must not scroll the page down to its caret
    }
}
