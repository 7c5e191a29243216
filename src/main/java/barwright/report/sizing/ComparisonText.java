package barwright.report.sizing;

import barwright.sizing.compare.Comparison;
import barwright.sizing.compare.FigureRow;
import barwright.units.Figures;
import barwright.units.Quantity;
import barwright.units.UnitSystem;

import java.util.Locale;

import static barwright.units.Conversions.toPercent;

/** A comparison as a text table: each setup's figure, and after the first its difference in brackets. */
public final class ComparisonText {
    private ComparisonText() {
    }

    public static String of(Comparison comparison, UnitSystem units) {
        int count = comparison.configurations().size();
        String[] header = new String[count + 1];
        header[0] = "figure";
        for (int i = 0; i < count; i++) {
            header[i + 1] = comparison.configurations().get(i).name();
        }
        TextTable table = new TextTable(header);
        for (FigureRow row : comparison.rows()) {
            String[] cells = new String[count + 1];
            cells[0] = row.label();
            for (int i = 0; i < count; i++) {
                Double value = row.values().get(i);
                String text = value == null ? "-" : format(value, row, units, false);
                Double difference = row.difference(i);
                if (i > 0 && difference != null) {
                    text += " (" + format(difference, row, units, true) + ")";
                }
                cells[i + 1] = text;
            }
            table.add(cells);
        }
        String[] balance = new String[count + 1];
        balance[0] = "balance at the limit (left / right)";
        for (int i = 0; i < count; i++) {
            balance[i + 1] = comparison.balances().get(i);
        }
        table.add(balance);
        return "Comparison (differences from the first setup in brackets; - where a figure does not apply or a "
                + "wheel stays down to 3 g)\n\n" + table.render();
    }

    private static String format(double value, FigureRow row, UnitSystem units, boolean signed) {
        if (row.quantity() == Quantity.RATIO) {
            boolean share = row.key().endsWith("Share");
            String number = share ? String.format(Locale.ROOT, signed ? "%+.2f" : "%.2f", toPercent(value))
                    : String.format(Locale.ROOT, signed ? "%+.2f" : "%.2f", value);
            return share ? number + (signed ? " pt" : " %") : number;
        }
        int decimals = switch (row.quantity()) {
            case ROLL_STIFFNESS -> 0;
            case ACCELERATION, ROLL_GRADIENT, MASS -> 2;
            default -> 1;
        };
        String text = Figures.format(value, row.quantity(), units, decimals);
        return signed && value >= 0 ? "+" + text : text;
    }
}
