package barwright.ui.field;

import barwright.units.DisplayUnit;
import barwright.units.Quantity;
import barwright.units.UnitSystem;

/**
 * One number of the vehicle file as a person edits it: its key (below its group, e.g. {@code section.wallMm}),
 * its label, what kind of quantity it is, the file's unit, and a help text saying what it is and how to
 * measure it.
 *
 * @param key           the key below the group's path
 * @param label         a short label in plain words
 * @param quantity      what it measures, which sets its display unit
 * @param siPerFileUnit the size of the file's unit in SI (mm: 1e-3; N/mm: 1e3; GPa: 1e9)
 * @param optional      true where an empty field means "not given" (the key is written as null)
 * @param help          what it is and how to measure it
 */
public record FieldSpec(String key, String label, Quantity quantity, double siPerFileUnit, boolean optional,
                        String help) {

    /** @return the value as the file holds it, shown in the display unit of the system */
    public double toDisplay(double fileValue, UnitSystem system) {
        return quantity.unit(system).fromSi(fileValue * siPerFileUnit);
    }

    /** @return the value typed in the display unit of the system, in the file's unit, rounded for the file */
    public double toFile(double displayValue, UnitSystem system) {
        return NumberText.forFile(quantity.unit(system).toSi(displayValue) / siPerFileUnit);
    }

    /** @return the unit symbol shown beside the field */
    public String unitSymbol(UnitSystem system) {
        DisplayUnit unit = quantity.unit(system);
        return unit.symbol();
    }

    /** @return the same field under another key (one entry of a list) with its own label */
    public FieldSpec withKey(String newKey, String newLabel) {
        return new FieldSpec(newKey, newLabel, quantity, siPerFileUnit, optional, help);
    }
}
