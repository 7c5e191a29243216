package barwright.ui.chart;

import barwright.ui.field.ViewSettings;
import barwright.units.Quantity;

/** Axis labels with their units in the chosen system. */
final class Axes {
    private Axes() {
    }

    /** @return e.g. "Lateral acceleration a_y (g)" */
    static String label(String words, Quantity quantity, ViewSettings view) {
        String symbol = quantity.unit(view.units()).symbol();
        return symbol.isEmpty() ? words : words + " (" + symbol + ")";
    }

    /** @return the SI value in the display unit of the chosen system */
    static double shown(double si, Quantity quantity, ViewSettings view) {
        return quantity.unit(view.units()).fromSi(si);
    }
}
