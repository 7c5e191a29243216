package barwright.ui.present;

import barwright.io.KeyPath;
import barwright.model.Vehicle;
import barwright.ui.document.OpenDocument;
import barwright.ui.field.ViewSettings;
import barwright.units.Quantity;
import barwright.units.UnitSystem;
import com.fasterxml.jackson.databind.node.DoubleNode;
import com.fasterxml.jackson.databind.node.IntNode;

import javax.swing.JLabel;
import javax.swing.JSpinner;
import javax.swing.SpinnerNumberModel;
import java.util.function.ToDoubleFunction;
import java.util.function.ToIntFunction;

/**
 * One stepper of the presentation mode (a bar's diameter, an arm hole, a spring rate): arrow keys, the
 * spinner's buttons and the mouse wheel step it; each step is one edit of the open car (undoable), so the
 * main window and the pictures follow. Holes are counted from 1, as everywhere the person sees them.
 */
final class QuickControl {
    private final JSpinner spinner;
    private final KeyPath path;
    private final Quantity quantity;
    private final ViewSettings view;
    private final OpenDocument document;
    private final ToDoubleFunction<Vehicle> read;
    private final ToIntFunction<Vehicle> holes;
    private final double stepSi;
    private final JLabel unit = new JLabel();
    private boolean updating;

    /**
     * @param quantity the quantity shown (null: a hole number, counted from 1)
     * @param read     the value in SI (or the 0-based hole) from the car as it stands; NaN where it has none
     * @param holes    for a hole: how many the bar has; otherwise null
     */
    QuickControl(String name, String keyPath, Quantity quantity, double stepSi, OpenDocument document, ViewSettings view,
                 ToDoubleFunction<Vehicle> read, ToIntFunction<Vehicle> holes) {
        this.path = KeyPath.of(keyPath);
        this.quantity = quantity;
        this.view = view;
        this.document = document;
        this.read = read;
        this.holes = holes;
        spinner = new JSpinner(new SpinnerNumberModel(0.0, -1e9, 1e9, 1.0));
        spinner.setName(name);
        if (spinner.getEditor() instanceof JSpinner.DefaultEditor editor) {
            // the model's wide bounds would otherwise make it screen-wide; a hole number has one or two digits
            editor.getTextField().setColumns(quantity == null ? 2 : 5);
        }
        spinner.addMouseWheelListener(event -> {
            Object next = event.getWheelRotation() < 0 ? spinner.getNextValue() : spinner.getPreviousValue();
            if (next != null) {
                spinner.setValue(next);
            }
        });
        spinner.addChangeListener(event -> changed());
        this.stepSi = stepSi;
    }

    JSpinner component() {
        return spinner;
    }

    /** @return the unit written after the stepper (empty for a hole) */
    JLabel unitLabel() {
        return unit;
    }

    /** Shows the car's value (after an edit anywhere, an undo or a unit switch). */
    void refresh(Vehicle car) {
        double si = car == null ? Double.NaN : read.applyAsDouble(car);
        updating = true;
        unit.setText(quantity == null ? "" : quantity.unit(view.units()).symbol());
        try {
            spinner.setEnabled(Double.isFinite(si));
            SpinnerNumberModel model = (SpinnerNumberModel) spinner.getModel();
            if (quantity == null) {
                model.setMinimum(1.0);
                model.setMaximum(car == null || !Double.isFinite(si) ? 1.0 : (double) holes.applyAsInt(car));
                model.setStepSize(1.0);
                spinner.setValue(Double.isFinite(si) ? si + 1 : 1.0);
            } else {
                double step = quantity.unit(view.units()).fromSi(stepSi);
                double shown = quantity.unit(view.units()).fromSi(si);
                model.setMinimum(step); // never zero or below: the file would refuse it
                model.setMaximum(1e9);
                model.setStepSize(step);
                spinner.setValue(Double.isFinite(shown) ? Math.max(step, shown) : step);
            }
        } finally {
            updating = false;
        }
    }

    private void changed() {
        if (updating) {
            return;
        }
        double shown = ((Number) spinner.getValue()).doubleValue();
        if (quantity == null) {
            document.edit(path, IntNode.valueOf((int) Math.round(shown) - 1), null, this);
        } else {
            // the file keeps SI-prefixed units (mm, N/mm): the unit the SI display uses
            double si = quantity.unit(view.units()).toSi(shown);
            double inFile = quantity.unit(UnitSystem.SI).fromSi(si);
            document.edit(path, DoubleNode.valueOf(Math.round(inFile * 1e4) / 1e4), null, this);
        }
        document.closeEditStep();
    }
}
