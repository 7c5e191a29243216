package barwright.ui.panel;

import barwright.physics.AnalysisResult;
import barwright.report.work.Derivation;
import barwright.report.work.Derivations;
import barwright.report.work.KeyFigure;
import barwright.report.work.WorkText;
import barwright.ui.field.ViewSettings;

import javax.swing.JTextArea;
import java.awt.Font;
import java.awt.Window;

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
        JTextArea area = new JTextArea(text);
        area.setName("work.text");
        area.setFont(new Font(Font.MONOSPACED, Font.PLAIN, area.getFont().getSize()));
        area.setColumns(96);
        area.setRows(Math.min(34, (int) text.lines().count() + 2));
        TextDialog.show(owner, "How it is worked out: " + derivation.title(), "work.dialog", area);
    }
}
