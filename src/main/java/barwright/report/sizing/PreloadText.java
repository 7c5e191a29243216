package barwright.report.sizing;

import barwright.sizing.preload.CornerLoads;
import barwright.sizing.preload.LinkPreload;
import barwright.sizing.preload.PreloadResult;
import barwright.units.Quantity;
import barwright.units.UnitSystem;

import java.util.Locale;

import static barwright.units.Conversions.perMillimetre;
import static barwright.units.Conversions.toMillimetres;
import static barwright.units.Conversions.toPercent;
import static barwright.units.Conversions.toPoundForceFeet;

/** Link preload as the command line prints it. */
public final class PreloadText {
    private PreloadText() {
    }

    public static String of(PreloadResult result, UnitSystem units) {
        StringBuilder out = new StringBuilder();
        out.append(result.inWords()).append("\n\n");
        double perMm = perMillimetre(result.lockedMomentPerLength());
        out.append(units == UnitSystem.US
                ? String.format(Locale.ROOT, "Locked roll moment: %.2f lbf·ft per mm of link length%n",
                toPoundForceFeet(perMm))
                : String.format(Locale.ROOT, "Locked roll moment: %.1f N·m per mm of link length%n", perMm));
        TextTable table = new TextTable("wheel", "static load", "change per mm",
                String.format(Locale.ROOT, "with the link %+.1f mm", toMillimetres(result.linkChange())));
        CornerLoads change = result.changePerLength().times(1e-3);
        row(table, "left front", result.staticLoads().leftFront(), change.leftFront(), result.loads().leftFront(), units);
        row(table, "right front", result.staticLoads().rightFront(), change.rightFront(), result.loads().rightFront(),
                units);
        row(table, "left rear", result.staticLoads().leftRear(), change.leftRear(), result.loads().leftRear(), units);
        row(table, "right rear", result.staticLoads().rightRear(), change.rightRear(), result.loads().rightRear(), units);
        out.append(table.render());
        out.append(String.format(Locale.ROOT, "Cross weight (left front + right rear): %.2f %% -> %.2f %% (%+.3f "
                        + "percentage points per mm)%n%n", toPercent(result.staticLoads().crossWeight()),
                toPercent(result.loads().crossWeight()),
                toPercent(perMillimetre(result.crossWeightChangePerLength()))));
        out.append(LinkPreload.ADVICE).append('\n');
        return out.toString();
    }

    private static void row(TextTable table, String wheel, double load, double change, double after, UnitSystem units) {
        table.add(wheel, TextTable.figure(load, Quantity.FORCE, units, 0),
                (change >= 0 ? "+" : "") + TextTable.figure(change, Quantity.FORCE, units, 1),
                TextTable.figure(after, Quantity.FORCE, units, 0));
    }
}
