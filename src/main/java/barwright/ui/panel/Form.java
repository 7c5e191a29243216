package barwright.ui.panel;

import javax.swing.BorderFactory;
import javax.swing.JComponent;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JSeparator;
import java.awt.GridBagConstraints;
import java.awt.GridBagLayout;

import static barwright.ui.panel.Grid.at;
import java.awt.Insets;
import java.util.ArrayList;
import java.util.List;

/**
 * A column of labelled fields in titled groups: label, field, unit on one line, the core's message (when the
 * value is refused) on the next. Fields it holds are detached when the form is thrown away.
 */
final class Form extends PagePanel {
    private final List<Runnable> detachers = new ArrayList<>();
    private int row;

    Form() {
        super(new GridBagLayout());
        setBorder(BorderFactory.createEmptyBorder(4, 8, 8, 8));
    }

    /** Starts a group with a heading and a line under it. */
    void group(String title) {
        JLabel heading = new JLabel(title);
        heading.putClientProperty("FlatLaf.styleClass", "h4");
        GridBagConstraints at = at(0, row++, 3);
        at.insets = new Insets(row == 1 ? 2 : 12, 0, 2, 0);
        add(heading, at);
        GridBagConstraints line = at(0, row++, 3);
        line.insets = new Insets(0, 0, 4, 0);
        add(new JSeparator(), line);
    }

    /** Adds a number field with its label, unit and message line. */
    NumberField field(NumberField field) {
        return field(field.spec().label(), field, field.unitLabel(), field.problemLabel());
    }

    /** Adds any component with a label, an optional unit and an optional message line. */
    <T extends JComponent> T field(String label, T component, JComponent unit, JComponent problem) {
        if (component instanceof NumberField number) {
            detachers.add(number::detach);
        } else if (component instanceof TextValueField text) {
            detachers.add(text::detach);
        }
        if (component instanceof javax.swing.JTextField) {
            // a number field never shrinks below what shows "1234.567" whole
            component.setMinimumSize(new java.awt.Dimension(Math.max(component.getPreferredSize().width, 96),
                    component.getPreferredSize().height));
        }
        JLabel name = new JLabel(label);
        name.setLabelFor(component);
        name.setToolTipText(component.getToolTipText());
        GridBagConstraints labelAt = at(0, row, 1);
        labelAt.weightx = 0;
        labelAt.insets = new Insets(2, 0, 2, 8);
        add(name, labelAt);
        GridBagConstraints fieldAt = at(1, row, unit == null ? 2 : 1);
        fieldAt.insets = new Insets(2, 0, 2, 4);
        fieldAt.weightx = 1;
        add(component, fieldAt);
        if (unit != null) {
            GridBagConstraints unitAt = at(2, row, 1);
            unitAt.weightx = 0;
            add(unit, unitAt);
            unit.setPreferredSize(new java.awt.Dimension(Math.max(unit.getPreferredSize().width, 64),
                    unit.getPreferredSize().height));
        }
        row++;
        if (problem != null) {
            GridBagConstraints problemAt = at(0, row++, 3);
            problemAt.insets = new Insets(0, 0, 4, 0);
            add(problem, problemAt);
        }
        return component;
    }

    /** Adds a line of text across the form. */
    void note(JComponent text) {
        GridBagConstraints at = at(0, row++, 3);
        at.insets = new Insets(2, 0, 4, 0);
        add(text, at);
    }

    /** Pushes everything to the top. */
    void end() {
        GridBagConstraints filler = at(0, row++, 3);
        filler.weighty = 1;
        add(new JPanel(), filler);
        ((JComponent) getComponent(getComponentCount() - 1)).setOpaque(false);
    }

    /** Detaches every field (the form is being rebuilt or thrown away). */
    void detach() {
        detachers.forEach(Runnable::run);
        detachers.clear();
    }
}
