package barwright.report.sizing;

import barwright.physics.MassProperties;
import barwright.sizing.SetupFigures;
import barwright.sizing.map.AdjustmentMap;
import barwright.sizing.map.BarOption;
import barwright.sizing.map.MapCell;
import barwright.units.Quantity;
import barwright.units.UnitSystem;

import java.util.Locale;

import static barwright.units.Conversions.toPercent;

/** The adjustment map as a text grid: front options down, rear options across. */
public final class MapText {
    private MapText() {
    }

    public static String of(AdjustmentMap map, UnitSystem units) {
        StringBuilder out = new StringBuilder();
        double staticFront = MassProperties.of(map.vehicle()).frontMassFraction();
        out.append("Adjustment map: ").append(map.vehicle().name()).append(String.format(Locale.ROOT,
                " (static front weight %.1f %%)%n", toPercent(staticFront)));
        out.append("Each cell: front share of load transfer / roll gradient / balance at the limit; the current "
                + "setting in [brackets].\n\n");
        String[] header = new String[map.columns().size() + 1];
        header[0] = "front \\ rear";
        for (int c = 0; c < map.columns().size(); c++) {
            header[c + 1] = map.columns().get(c).label();
        }
        TextTable table = new TextTable(header);
        for (int r = 0; r < map.rows().size(); r++) {
            String[] row = new String[map.columns().size() + 1];
            BarOption front = map.rows().get(r);
            row[0] = front.label();
            for (int c = 0; c < map.columns().size(); c++) {
                row[c + 1] = cell(map.cell(r, c), units);
            }
            table.add(row);
        }
        out.append(table.render());
        out.append("\nu understeer, o oversteer, n neutral at the limit; !F the inside front, !R the inside rear wheel "
                + "lifts before the limit; \"unstable\": no stable roll position.\n");
        return out.toString();
    }

    private static String cell(MapCell cell, UnitSystem units) {
        SetupFigures figures = cell.figures();
        String text;
        if (figures == null) {
            text = "unstable";
        } else {
            text = String.format(Locale.ROOT, "%.1f%% %s %s%s%s", toPercent(figures.frontLoadTransferShare()),
                    TextTable.figure(figures.rollGradient(), Quantity.ROLL_GRADIENT, units, 2).replace(" deg/g", ""),
                    figures.balance().key().substring(0, 1), figures.frontLiftsBeforeLimit() ? " !F" : "",
                    figures.rearLiftsBeforeLimit() ? " !R" : "");
        }
        return cell.current() ? "[" + text + "]" : " " + text + " ";
    }
}
