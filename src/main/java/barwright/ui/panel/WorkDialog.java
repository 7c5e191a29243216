package barwright.ui.panel;

import barwright.physics.AnalysisResult;
import barwright.report.work.Derivation;
import barwright.report.work.Derivations;
import barwright.report.work.KeyFigure;
import barwright.report.work.WorkText;
import barwright.ui.field.ViewSettings;

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
import java.awt.Font;
import java.awt.Window;
import java.awt.event.KeyEvent;

/** Shows how a key figure was worked out: formula, the numbers put in with units, the result, the source. */
public final class WorkDialog {
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
        JDialog dialog = new JDialog(owner, "How it is worked out: " + derivation.title(),
                java.awt.Dialog.ModalityType.MODELESS);
        dialog.setName("work.dialog");
        JTextArea area = new JTextArea(text);
        area.setName("work.text");
        area.setEditable(false);
        area.setLineWrap(true);
        area.setWrapStyleWord(true);
        Font base = area.getFont();
        area.setFont(new Font(Font.MONOSPACED, Font.PLAIN, base.getSize()));
        area.setBorder(BorderFactory.createEmptyBorder(10, 12, 10, 12));
        area.setColumns(96);
        area.setRows(Math.min(34, (int) text.lines().count() + 2));
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
