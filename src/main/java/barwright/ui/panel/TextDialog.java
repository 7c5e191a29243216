package barwright.ui.panel;

import javax.swing.BorderFactory;
import javax.swing.JButton;
import javax.swing.JComponent;
import javax.swing.JDialog;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.JTextArea;
import javax.swing.KeyStroke;
import java.awt.BorderLayout;
import java.awt.FlowLayout;
import java.awt.Window;
import java.awt.event.KeyEvent;

/** A window of read-only text a person can scroll, select and copy, closed with Close or Escape. */
final class TextDialog {
    private TextDialog() {
    }

    /**
     * @param area the text, already filled and sized
     * @param name the dialog's component name (tests find it by it)
     */
    static void show(Window owner, String title, String name, JTextArea area) {
        JDialog dialog = new JDialog(owner, title, java.awt.Dialog.ModalityType.MODELESS);
        dialog.setName(name);
        area.setEditable(false);
        area.setLineWrap(true);
        area.setWrapStyleWord(true);
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
        dialog.setLocationRelativeTo(owner);
        area.setCaretPosition(0);
        dialog.setVisible(true);
    }
}
