package barwright.report.insight;

import barwright.insight.BalanceFigures;
import barwright.insight.InputChange;
import barwright.insight.SensitivityResult;
import barwright.insight.SensitivityRow;
import barwright.report.Cautions;
import barwright.report.ReportJson;
import barwright.report.heading.TextHeading;
import barwright.units.DisplayUnit;
import barwright.units.Figures;
import barwright.units.Quantity;
import barwright.units.UnitSystem;

import java.util.Locale;

import static barwright.units.Conversions.toPercent;

/** What moves the balance most, in words and figures, for the command line and the window. */
public final class SensitivityText {
    private final UnitSystem units;

    public SensitivityText(UnitSystem units) {
        this.units = units;
    }

    public String of(SensitivityResult result) {
        StringBuilder out = new StringBuilder();
        out.append(TextHeading.of("sensitivity", result.vehicleName(), units)).append('\n');
        out.append("Each change is made to the car and the changed car analysed in full; the figures are the "
                + "differences, for the turn to the ").append(result.turn().word()).append(".\n");
        out.append("The car as it is: ").append(base(result.base())).append("\n\n");
        int number = 1;
        for (SensitivityRow row : result.rows()) {
            out.append(String.format(Locale.ROOT, "%2d. %s%n", number++, headline(row)));
            out.append("    step: ").append(step(row.change())).append('\n');
            out.append("    ").append(row.analysed() ? changes(row) : "cannot be analysed: " + row.refusal())
                    .append('\n');
        }
        if (!result.notApplicable().isEmpty()) {
            out.append("\nLeft out for this car:\n");
            result.notApplicable().forEach(reason -> out.append("  ").append(reason).append('\n'));
        }
        out.append("\nLimit margin: the front axle's limit minus the rear axle's; negative is understeer at the "
                + "limit. Where it hardly moves (under 0.001 g), the front share of load transfer gives the "
                + "direction: a larger front share means more understeer (common practice).\n");
        out.append('\n').append(Cautions.SHORT).append('\n');
        return out.toString();
    }

    /** @return e.g. "stiffer rear bar (shorter arm): towards oversteer" */
    public String headline(SensitivityRow row) {
        return row.change().effect() + ": " + (row.analysed() ? row.tendency().words() : "not analysed");
    }

    /** @return e.g. "rear bar arm length (next hole) 175 mm -> 150 mm" */
    public String step(InputChange change) {
        return change.subject() + " " + value(change.quantity(), change.from()) + " → "
                + value(change.quantity(), change.to());
    }

    private String value(Quantity quantity, double si) {
        if (quantity == Quantity.RATIO) {
            return String.format(Locale.ROOT, "%.0f", si);
        }
        DisplayUnit unit = quantity.unit(units);
        double shown = Math.abs(unit.fromSi(si));
        int decimals = shown >= 100 ? 1 : shown >= 1 ? 2 : 3;
        return Figures.format(si, quantity, units, decimals);
    }

    /** @return the four figures' changes in one line */
    public String changes(SensitivityRow row) {
        String lift = row.insideLiftChange().isPresent()
                ? signed(row.insideLiftChange().getAsDouble(), Quantity.ACCELERATION, 3)
                : "no lift below 3 g to compare";
        return String.format(Locale.ROOT, "front share %+.2f pt, roll gradient %s, limit margin %s, first inside "
                        + "lift %s", toPercent(row.frontShareChange()),
                signed(row.rollGradientChange(), Quantity.ROLL_GRADIENT, 3),
                signed(row.limitMarginChange(), Quantity.ACCELERATION, 4), lift);
    }

    private String base(BalanceFigures figures) {
        Double lift = ReportJson.liftInG(figures.insideLift());
        String liftWords = lift == null ? "no inside wheel lifts below 3 g"
                : "the inside " + figures.insideLiftAxle().key() + " wheel lifts first, at "
                + Figures.format(figures.insideLift(), Quantity.ACCELERATION, units, 3);
        return String.format(Locale.ROOT, "front share %.1f %%, roll gradient %s, limit margin %s (%s), %s.",
                toPercent(figures.frontLoadTransferShare()),
                Figures.format(figures.rollGradient(), Quantity.ROLL_GRADIENT, units, 2),
                Figures.format(figures.limitMargin(), Quantity.ACCELERATION, units, 3),
                figures.limitMargin() < 0 ? "understeer" : "oversteer", liftWords);
    }

    private String signed(double si, Quantity quantity, int decimals) {
        String text = Figures.format(si, quantity, units, decimals);
        return text.startsWith("-") ? text : "+" + text;
    }
}
