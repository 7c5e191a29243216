package barwright.ui.sizing;

import barwright.ui.panel.PagePanel;

import javax.swing.BorderFactory;
import javax.swing.JComponent;
import javax.swing.JLabel;
import javax.swing.JPanel;
import java.awt.GridBagConstraints;
import java.awt.GridBagLayout;
import java.awt.Insets;

/** The settings column of a view: headings, then label, field and unit on a line, or a component across. */
class Rows extends PagePanel {
    private int row;

    Rows() {
        super(new GridBagLayout());
        setBorder(BorderFactory.createEmptyBorder(4, 8, 8, 8));
    }

    /** A heading over the lines that follow. */
    void heading(String title) {
        JLabel heading = new JLabel(title);
        heading.putClientProperty("FlatLaf.styleClass", "h4");
        place(heading, 0, 3, new Insets(row == 0 ? 2 : 12, 0, 3, 0), 1);
    }

    /** A labelled component with an optional unit after it. */
    void line(String label, JComponent component, JComponent unit) {
        JLabel name = new JLabel(label);
        name.setLabelFor(component);
        name.setToolTipText(component.getToolTipText());
        GridBagConstraints at = constraints(0, 1, new Insets(2, 0, 2, 8), 0);
        add(name, at);
        GridBagConstraints fieldAt = constraints(1, unit == null ? 2 : 1, new Insets(2, 0, 2, 4), 1);
        if (component instanceof javax.swing.JTextField || component instanceof javax.swing.JSpinner) {
            fieldAt.fill = GridBagConstraints.NONE; // numbers keep one width, whatever the column's
        }
        add(component, fieldAt);
        if (unit != null) {
            add(unit, constraints(2, 1, new Insets(2, 0, 2, 0), 0));
        }
        row++;
    }

    /** A labelled quantity field with its unit. */
    void line(String label, QuantityField field) {
        line(label, field, field.unitLabel());
    }

    /** A component across the column. */
    void across(JComponent component) {
        place(component, 0, 3, new Insets(2, 0, 2, 0), 1);
    }

    /** @return the components side by side on one line, e.g. a check box, its field and the unit */
    static JPanel inLine(int indent, JComponent... parts) {
        JPanel line = new JPanel(new java.awt.FlowLayout(java.awt.FlowLayout.LEFT, 4, 0));
        line.setOpaque(false);
        line.setBorder(BorderFactory.createEmptyBorder(0, indent, 0, 0));
        for (JComponent part : parts) {
            line.add(part);
        }
        return line;
    }

    /** Pushes the lines to the top. */
    void end() {
        JPanel filler = new JPanel();
        filler.setOpaque(false);
        GridBagConstraints at = constraints(0, 3, new Insets(0, 0, 0, 0), 1);
        at.weighty = 1;
        add(filler, at);
        row++;
    }

    private void place(JComponent component, int x, int width, Insets insets, double weight) {
        add(component, constraints(x, width, insets, weight));
        row++;
    }

    private GridBagConstraints constraints(int x, int width, Insets insets, double weight) {
        GridBagConstraints at = new GridBagConstraints();
        at.gridx = x;
        at.gridy = row;
        at.gridwidth = width;
        at.fill = GridBagConstraints.HORIZONTAL;
        at.anchor = GridBagConstraints.WEST;
        at.insets = insets;
        at.weightx = weight;
        return at;
    }
}
