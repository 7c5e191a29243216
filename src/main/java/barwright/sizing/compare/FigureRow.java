package barwright.sizing.compare;

import barwright.units.Quantity;

import java.util.ArrayList;
import java.util.Collections;
import java.util.List;

/**
 * One figure across the configurations compared, SI.
 *
 * @param key      a stable name for scripts, e.g. "rollGradient"
 * @param label    the figure in words
 * @param quantity its kind, for the display unit
 * @param values   one per configuration; null where it does not apply (no bar, a wheel that stays down)
 */
public record FigureRow(String key, String label, Quantity quantity, List<Double> values) {
    public FigureRow {
        values = Collections.unmodifiableList(new ArrayList<>(values));
    }

    /** @return the value of configuration i minus the first configuration's, or null where either is absent */
    public Double difference(int i) {
        Double first = values.get(0);
        Double value = values.get(i);
        return first == null || value == null ? null : value - first;
    }
}
