package barwright.ui.sizing;

import barwright.ui.field.NumberText;
import barwright.ui.field.Precision;
import barwright.ui.field.ViewSettings;
import barwright.units.DisplayUnit;
import barwright.units.Quantity;
import barwright.units.UnitSystem;

import javax.swing.JLabel;
import javax.swing.JTextField;
import javax.swing.SwingConstants;
import java.util.OptionalDouble;

/**
 * A number a person types for a search or a study (not a value of the vehicle file): shown in the display unit
 * of the chosen system and read in the user's locale. It keeps its value in SI, so a switch of units shows the
 * same value in the new unit. Event thread.
 */
final class QuantityField extends JTextField {
    private final String label;
    private final Quantity quantity;
    private final ViewSettings view;
    private final double lowest;
    private final double highest;
    private final boolean optional;
    private final JLabel unitLabel = new JLabel();
    private String unitText;
    private String shownText = "";
    private Double shownValue;
    /** The unit system the text is written in: the one of the last {@link #setValue}. */
    private UnitSystem textUnits;

    /**
     * @param label    the field's name in messages, e.g. "Heaviest bar"
     * @param lowest   the least value allowed (SI), inclusive
     * @param highest  the largest value allowed (SI), inclusive
     * @param initial  the starting value (SI), or null for an empty field
     * @param optional true where an empty field means "no limit"
     */
    QuantityField(String name, String label, Quantity quantity, ViewSettings view, double lowest, double highest,
                  Double initial, boolean optional) {
        super(6);
        this.label = label;
        this.quantity = quantity;
        this.view = view;
        this.lowest = lowest;
        this.highest = highest;
        this.optional = optional;
        setName(name);
        unitLabel.setName(name + ".unit");
        setHorizontalAlignment(SwingConstants.RIGHT);
        getAccessibleContext().setAccessibleName(label);
        setValue(initial);
        setMinimumSize(getPreferredSize()); // a narrow column scrolls; the number never shrinks out of sight
        view.addListener(this::unitsChanged);
    }

    /** @return the unit shown beside the field */
    JLabel unitLabel() {
        return unitLabel;
    }

    /** Writes this beside the field instead of the unit's symbol, e.g. "points" for a difference of shares. */
    void setUnitText(String text) {
        unitText = text;
        unitLabel.setText(text);
    }

    /** Shows a value (SI), or empties the field for null. */
    void setValue(Double si) {
        textUnits = view.units();
        unitLabel.setText(unitText != null ? unitText : unit().symbol());
        shownValue = si;
        shownText = si == null ? "" : NumberText.format(unit().fromSi(si), Precision.field(quantity, textUnits) + 1,
                view.locale());
        setText(shownText);
    }

    /**
     * @return the value in SI, or null where the field is optional and empty
     * @throws IllegalArgumentException naming the field, what was typed and the allowed range
     */
    Double value() {
        String text = getText().strip();
        if (text.equals(shownText) && shownValue != null) {
            return shownValue; // untouched: no rounding through the display
        }
        if (text.isEmpty()) {
            if (optional) {
                return null;
            }
            throw new IllegalArgumentException(label + " is empty: give a number from " + range());
        }
        OptionalDouble typed = NumberText.parse(text, view.locale());
        if (typed.isEmpty()) {
            throw new IllegalArgumentException(label + ": '" + text + "' is not a number; give one from " + range());
        }
        double si = unit().toSi(typed.getAsDouble());
        if (!(si >= lowest * (1 - 1e-12) && si <= highest * (1 + 1e-12))) {
            throw new IllegalArgumentException(label + ": " + text + suffix() + " is outside the allowed range, "
                    + range());
        }
        return si;
    }

    private String range() {
        int decimals = Precision.field(quantity, textUnits);
        return NumberText.format(unit().fromSi(lowest), decimals, view.locale()) + " to "
                + NumberText.format(unit().fromSi(highest), decimals, view.locale()) + suffix()
                + (optional ? " (or leave it empty for no limit)" : "");
    }

    private String suffix() {
        return unit().symbol().isEmpty() ? "" : " " + unit().symbol();
    }

    private DisplayUnit unit() {
        return quantity.unit(textUnits);
    }

    private void unitsChanged() {
        Double current;
        try {
            current = value();
        } catch (IllegalArgumentException unreadable) {
            return; // keep what was typed, in the unit it was typed in; the message comes when it is used
        }
        setValue(current);
    }
}
