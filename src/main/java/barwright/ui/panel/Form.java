package barwright.ui.panel;

import javax.swing.BorderFactory;
import javax.swing.JComponent;
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
    /** Each labelled row: the label, the field, the unit (or null). */
    private final List<JComponent[]> rows = new ArrayList<>();
    private boolean stacked;
    /** Times in a row the form has asked for a new height after a layout pass. */
    private int heightAsks;
    private static final int MOST_HEIGHT_ASKS = 4;
    private int row;

    Form() {
        super(new GridBagLayout());
        setBorder(BorderFactory.createEmptyBorder(4, 8, 8, 8));
    }

    /** Starts a group with a heading and a line under it. */
    void group(String title) {
        FormText heading = FormText.heading(title);
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
        // (a free-text field, a name or a note, may show part of its text and scroll: it holds no figure)
        if (component instanceof NumberField || component instanceof javax.swing.JComboBox) {
            // a field never shrinks below what shows "1234.567" or its longest choice whole (the page scrolls
            // sideways instead); worked out at the text size in use when it is laid out
            keepWhole(component);
            component.addPropertyChangeListener("font", event -> keepWhole(component));
        }
        // a label that wraps at words when it goes above its field (a large text on a small screen): a name the
        // assistive tools read from the field itself, as a plain label's "label for" would give it
        FormText name = FormText.label(label);
        name.setToolTipText(component.getToolTipText());
        if (component.getAccessibleContext().getAccessibleName() == null) {
            component.getAccessibleContext().setAccessibleName(label);
        }
        // two grid rows a field: the upper one stays empty until a narrow form puts the label there
        row++;
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
        rows.add(new JComponent[]{name, component, unit});
        row++;
        if (problem != null) {
            GridBagConstraints problemAt = at(0, row++, 3);
            problemAt.insets = new Insets(0, 0, 4, 0);
            add(problem, problemAt);
        }
        return component;
    }

    /**
     * @return the width the form needs with each label beside its field (pixels): the grid's own least width
     * with the labels beside their fields, worked out with those constraints if the form is stacked now
     */
    private int besideWidth() {
        if (!stacked) {
            return super.getMinimumSize().width;
        }
        place(false);
        int width = getLayout().minimumLayoutSize(this).width; // not the cached size: the other constraints'
        place(true);
        return width;
    }

    /**
     * @return the narrowest the form can be: each label above its field (a large text on a small screen), the
     * grid's own least width with those constraints
     */
    private int stackedWidth() {
        if (stacked) {
            return super.getMinimumSize().width;
        }
        place(true);
        int width = getLayout().minimumLayoutSize(this).width; // not the cached size: the other constraints'
        place(false);
        return width;
    }

    @Override
    public java.awt.Dimension getMinimumSize() {
        java.awt.Dimension least = super.getMinimumSize();
        return new java.awt.Dimension(Math.min(least.width, stackedWidth()), least.height);
    }

    /** Puts each label above its field where the form is narrower than label, field and unit side by side. */
    @Override
    public void doLayout() {
        boolean narrow = getWidth() < besideWidth();
        if (narrow != stacked) {
            stacked = narrow;
            place(stacked);
            // the form's height changes, so the scroll pane must ask again; not now: a revalidate() inside this
            // layout pass is lost, as the pass marks the parents valid when it ends, and one validate() could
            // leave the form at its old height. Asked once the pass is over, it takes.
            javax.swing.SwingUtilities.invokeLater(this::revalidate);
        }
        super.doLayout();
        askAgainIfTextsWrapped();
    }

    /**
     * A wrapped text's height follows the width it was just given, which the grid did not know when it shared out
     * the heights: if the form's height no longer fits, it asks its scroll pane again once this pass is over (a
     * few times at most, in case a scroll bar coming and going keeps changing the width).
     */
    private void askAgainIfTextsWrapped() {
        int wanted = getLayout().preferredLayoutSize(this).height;
        if (wanted == getHeight()) {
            heightAsks = 0;
        } else if (heightAsks < MOST_HEIGHT_ASKS) {
            heightAsks++;
            javax.swing.SwingUtilities.invokeLater(this::revalidate);
        }
    }

    /** Sets every labelled row's constraints: each label above its field (stacked) or beside it. */
    private void place(boolean stackedLayout) {
        GridBagLayout layout = (GridBagLayout) getLayout();
        for (JComponent[] labelled : rows) {
            GridBagConstraints labelAt = layout.getConstraints(labelled[0]);
            GridBagConstraints fieldAt = layout.getConstraints(labelled[1]);
            boolean hasUnit = labelled[2] != null;
            labelAt.gridy = stackedLayout ? fieldAt.gridy - 1 : fieldAt.gridy;
            labelAt.gridwidth = stackedLayout ? 3 : 1;
            labelAt.insets = stackedLayout ? new Insets(4, 0, 0, 0) : new Insets(2, 0, 2, 8);
            fieldAt.gridx = stackedLayout ? 0 : 1;
            fieldAt.gridwidth = (stackedLayout ? 1 : 0) + (hasUnit ? 1 : 2);
            ((FormText) labelled[0]).setWraps(stackedLayout);
            layout.setConstraints(labelled[0], labelAt);
            layout.setConstraints(labelled[1], fieldAt);
        }
    }

    /** Makes the component's least width its preferred width at its present font (96 px at the least). */
    private static void keepWhole(JComponent component) {
        component.setMinimumSize(null);
        java.awt.Dimension preferred = component.getPreferredSize();
        component.setMinimumSize(new java.awt.Dimension(Math.max(preferred.width, 96), preferred.height));
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
