package barwright.report.sizing;

import barwright.report.heading.OutputDocument;
import barwright.sizing.compare.Comparison;
import barwright.sizing.compare.FigureRow;
import barwright.units.UnitSystem;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;

/**
 * A comparison for scripts ({@code compare ... --json}): each figure with its unit, one value per setup and
 * the difference of each from the first.
 */
public final class ComparisonJson {
    public static final String FORMAT = "barwright.comparison";
    public static final int VERSION = 1;

    private ComparisonJson() {
    }

    public static ObjectNode of(Comparison comparison) {
        ObjectNode root = OutputDocument.start(FORMAT, VERSION);
        ArrayNode names = root.putArray("configurations");
        comparison.configurations().forEach(c -> names.add(c.name()));
        ArrayNode balances = root.putArray("limitBalance");
        comparison.balances().forEach(balances::add);
        ArrayNode figures = root.putArray("figures");
        for (FigureRow row : comparison.rows()) {
            var unit = row.quantity().unit(UnitSystem.SI);
            ObjectNode node = figures.addObject();
            node.put("key", row.key());
            node.put("label", row.label());
            node.put("unit", unit.symbol());
            ArrayNode values = node.putArray("values");
            ArrayNode differences = node.putArray("differences");
            for (int i = 0; i < row.values().size(); i++) {
                Double value = row.values().get(i);
                Double difference = row.difference(i);
                if (value == null) {
                    values.addNull();
                } else {
                    values.add(unit.fromSi(value));
                }
                if (difference == null) {
                    differences.addNull();
                } else {
                    differences.add(unit.fromSi(difference));
                }
            }
        }
        return root;
    }
}
