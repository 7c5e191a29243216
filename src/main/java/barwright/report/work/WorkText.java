package barwright.report.work;

import barwright.units.DisplayUnit;
import barwright.units.UnitSystem;

import java.util.Locale;

/** A derivation as plain text for people, in their unit system and locale. */
public final class WorkText {
    /** Numbers in a derivation are shown with this many significant digits. */
    static final int SIGNIFICANT_DIGITS = 4;

    private WorkText() {
    }

    public static String of(Derivation derivation, UnitSystem units, Locale locale) {
        StringBuilder text = new StringBuilder();
        text.append(derivation.title()).append("\n\n");
        text.append("Formula\n    ").append(derivation.formula()).append("\n\n");
        if (!derivation.inputs().isEmpty()) {
            text.append("Numbers put in\n");
            derivation.inputs().forEach(value -> text.append(line(value, units, locale)));
            text.append('\n');
        }
        if (!derivation.steps().isEmpty()) {
            text.append("Steps\n");
            derivation.steps().forEach(step -> text.append("    ").append(step.formula()).append('\n')
                    .append(line(step.value(), units, locale)));
            text.append('\n');
        }
        text.append("Result\n").append(line(derivation.result(), units, locale)).append('\n');
        if (!derivation.note().isEmpty()) {
            text.append(derivation.note()).append("\n\n");
        }
        text.append("Source: ").append(derivation.source()).append('\n');
        return text.toString();
    }

    private static String line(WorkValue value, UnitSystem units, Locale locale) {
        return String.format(locale, "    %-10s = %-18s %s%n", value.symbol(), number(value, units, locale),
                value.meaning());
    }

    /** @return the value in its display unit with four significant digits, e.g. "1151 N·m/deg" */
    public static String number(WorkValue value, UnitSystem units, Locale locale) {
        if (Double.isInfinite(value.value())) {
            return "never reached";
        }
        DisplayUnit unit = value.quantity().unit(units);
        double shown = unit.fromSi(value.value());
        String number = significant(shown, locale);
        return unit.symbol().isEmpty() ? number : number + " " + unit.symbol();
    }

    static String significant(double value, Locale locale) {
        int magnitude = value == 0 ? 0 : (int) Math.floor(Math.log10(Math.abs(value)));
        int decimals = Math.max(0, Math.min(8, SIGNIFICANT_DIGITS - 1 - magnitude));
        String text = String.format(locale, "%." + decimals + "f", value); // no grouping, as Figures.format
        return text.matches("-0([.,]0*)?") ? text.substring(1) : text;
    }
}
