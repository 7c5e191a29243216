package barwright.report.sizing;

import barwright.report.ReportJson;
import barwright.units.Figures;
import barwright.units.Quantity;
import barwright.units.UnitSystem;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import static barwright.units.Conversions.toPercent;

/** A plain-text table with columns padded to their widest cell, for the command line. */
final class TextTable {
    private final List<String[]> rows = new ArrayList<>();

    TextTable(String... header) {
        rows.add(header);
    }

    void add(String... cells) {
        rows.add(cells);
    }

    String render() {
        int columns = rows.get(0).length;
        int[] widths = new int[columns];
        for (String[] row : rows) {
            for (int c = 0; c < columns; c++) {
                widths[c] = Math.max(widths[c], row[c].length());
            }
        }
        StringBuilder text = new StringBuilder();
        for (String[] row : rows) {
            StringBuilder line = new StringBuilder(" ");
            for (int c = 0; c < columns; c++) {
                line.append(' ').append(String.format(Locale.ROOT, "%-" + widths[c] + "s", row[c])).append(' ');
            }
            text.append(line.toString().stripTrailing()).append('\n');
        }
        return text.toString();
    }

    static String percent(double share) {
        return String.format(Locale.ROOT, "%.2f %%", toPercent(share));
    }

    static String figure(double si, Quantity quantity, UnitSystem units, int decimals) {
        return Figures.format(si, quantity, units, decimals);
    }

    /** @return the lift in g, or "-" where the wheel stays down to 3 g */
    static String lift(double accel, UnitSystem units) {
        Double inG = ReportJson.liftInG(accel);
        return inG == null ? "-" : figure(accel, Quantity.ACCELERATION, units, 2);
    }
}
