package barwright.ui.panel;

import barwright.physics.Warning;
import barwright.ui.task.ResultsModel;

import javax.swing.BorderFactory;
import javax.swing.BoxLayout;
import javax.swing.JTextArea;
import java.awt.Color;
import java.util.List;

/** The analysis's warnings in words: lifts before the limit, weak or yielding bars, rolling over. */
public final class WarningsPanel extends PagePanel {
    private final ResultsModel results;
    private List<Warning> showing;

    public WarningsPanel(ResultsModel results) {
        super(null);
        this.results = results;
        setName("warnings");
        setLayout(new BoxLayout(this, BoxLayout.Y_AXIS));
        setBorder(BorderFactory.createEmptyBorder(4, 8, 4, 8));
        results.addListener(this::refresh);
    }

    private void refresh() {
        var shown = results.shown();
        List<Warning> warnings = shown == null || shown.result() == null ? null : shown.result().warnings();
        if (warnings == null || warnings.equals(showing)) {
            return; // the same warnings: nothing to rebuild
        }
        if (sameCodes(warnings, showing)) {
            // the same warnings with new figures (an edit moves the numbers in them): the lines keep their place
            // and only their words change, rather than the whole list being made again on every edit
            for (int i = 0; i < warnings.size(); i++) {
                ((JTextArea) getComponent(i)).setText("\u26A0 " + warnings.get(i).message());
            }
            showing = warnings;
            return;
        }
        showing = warnings;
        removeAll();
        if (warnings.isEmpty()) {
            add(line("warning.none", "No warnings: no inside wheel lifts before the grip limit, and both bars "
                    + "keep a safety factor of 1.5 or more at the check travel.", null));
        }
        for (Warning warning : warnings) {
            JTextArea line = line("warning." + warning.code(), "\u26A0 " + warning.message(), Palette.warning());
            line.setToolTipText("Code for scripts: " + warning.code());
            add(line);
        }
        revalidate();
        repaint();
    }

    /** @return whether both lists hold warnings of the same codes in the same order (and at least one) */
    private static boolean sameCodes(List<Warning> next, List<Warning> before) {
        if (before == null || before.isEmpty() || next.size() != before.size()) {
            return false;
        }
        for (int i = 0; i < next.size(); i++) {
            if (!next.get(i).code().equals(before.get(i).code())) {
                return false;
            }
        }
        return true;
    }

    private static JTextArea line(String name, String text, Color colour) {
        JTextArea area = new WrappingText(text);
        area.setName(name);
        if (colour != null) {
            area.setForeground(colour);
        }
        return area;
    }

    /** @return the text of every warning shown, for tests and screen readers */
    public List<String> texts() {
        return java.util.Arrays.stream(getComponents()).map(c -> ((JTextArea) c).getText()).toList();
    }

}
