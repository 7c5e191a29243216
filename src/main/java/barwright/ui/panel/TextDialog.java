package barwright.ui.panel;

import javax.swing.BorderFactory;
import javax.swing.JButton;
import javax.swing.JComponent;
import javax.swing.JDialog;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.JTextArea;
import javax.swing.text.JTextComponent;
import javax.swing.KeyStroke;
import java.awt.BorderLayout;
import java.awt.FlowLayout;
import java.awt.GraphicsConfiguration;
import java.awt.GraphicsEnvironment;
import java.awt.Insets;
import java.awt.Rectangle;
import java.awt.Toolkit;
import java.awt.Window;
import java.awt.event.KeyEvent;

/**
 * A window of read-only text a person can scroll, select and copy, closed with Close or Escape. It is never
 * larger than the screen's usable part (without the task bar): on a small screen or with a large text the text
 * scrolls inside it.
 */
final class TextDialog {
    private TextDialog() {
    }

    /**
     * @param area the text, already filled and sized (a plain text area wraps at words)
     * @param name the dialog's component name (tests find it by it)
     */
    static void show(Window owner, String title, String name, JTextComponent area) {
        JDialog dialog = make(owner, title, name, area);
        fitInside(dialog, usableBounds(owner));
        dialog.setLocationRelativeTo(owner);
        keepInside(dialog, usableBounds(owner));
        area.setCaretPosition(0);
        dialog.setVisible(true);
    }

    /** @return the dialog, packed to the text's own size, not yet shown */
    static JDialog make(Window owner, String title, String name, JTextComponent area) {
        JDialog dialog = new JDialog(owner, title, java.awt.Dialog.ModalityType.MODELESS);
        dialog.setName(name);
        area.setEditable(false);
        if (area instanceof JTextArea plain) {
            plain.setLineWrap(true);
            plain.setWrapStyleWord(true);
        }
        area.setBorder(BorderFactory.createEmptyBorder(10, 12, 10, 12));
        JButton close = new JButton("Close");
        close.addActionListener(event -> dialog.dispose());
        JPanel buttons = new JPanel(new FlowLayout(FlowLayout.RIGHT));
        buttons.add(close);
        dialog.getContentPane().add(new JScrollPane(area), BorderLayout.CENTER);
        dialog.getContentPane().add(buttons, BorderLayout.SOUTH);
        dialog.getRootPane().setDefaultButton(close);
        dialog.getRootPane().registerKeyboardAction(event -> dialog.dispose(),
                KeyStroke.getKeyStroke(KeyEvent.VK_ESCAPE, 0), JComponent.WHEN_IN_FOCUSED_WINDOW);
        dialog.pack();
        return dialog;
    }

    /** Makes the dialog no wider and no taller than the usable part of the screen; its text then scrolls. */
    static void fitInside(Window dialog, Rectangle usable) {
        int width = Math.min(dialog.getWidth(), usable.width);
        int height = Math.min(dialog.getHeight(), usable.height);
        if (width != dialog.getWidth() || height != dialog.getHeight()) {
            dialog.setSize(width, height);
            dialog.validate();
        }
    }

    /** Moves the dialog, where centring on its owner put part of it off the usable screen, back onto it. */
    static void keepInside(Window dialog, Rectangle usable) {
        int x = Math.max(usable.x, Math.min(dialog.getX(), usable.x + usable.width - dialog.getWidth()));
        int y = Math.max(usable.y, Math.min(dialog.getY(), usable.y + usable.height - dialog.getHeight()));
        dialog.setLocation(x, y);
    }

    /** @return the screen the owner is on (the default screen without one), less its task bars and docks */
    static Rectangle usableBounds(Window owner) {
        GraphicsConfiguration screen = owner != null ? owner.getGraphicsConfiguration()
                : GraphicsEnvironment.getLocalGraphicsEnvironment().getDefaultScreenDevice().getDefaultConfiguration();
        Rectangle bounds = screen.getBounds();
        Insets bars = Toolkit.getDefaultToolkit().getScreenInsets(screen);
        return new Rectangle(bounds.x + bars.left, bounds.y + bars.top, bounds.width - bars.left - bars.right,
                bounds.height - bars.top - bars.bottom);
    }
}
