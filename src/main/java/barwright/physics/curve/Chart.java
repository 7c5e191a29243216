package barwright.physics.curve;

import barwright.units.Quantity;

import java.util.List;

/**
 * A chart as plain data: title, the quantity of each axis (values are SI; the quantity gives the display
 * unit), and its lines.
 *
 * @param title  e.g. "Handling curve (left turn)"
 * @param xLabel axis title without the unit
 * @param x      quantity of the abscissae
 * @param yLabel axis title without the unit
 * @param y      quantity of the ordinates
 * @param series the lines
 */
public record Chart(String title, String xLabel, Quantity x, String yLabel, Quantity y, List<Series> series) {
    public Chart {
        series = List.copyOf(series);
    }
}
