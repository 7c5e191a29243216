package barwright.units;

import java.util.Locale;

/** Formats SI values for people in the chosen unit system. */
public final class Figures {
    private Figures() {
    }

    /** @return e.g. "812.4 N·m/deg": the SI value converted, with the given decimals and the unit symbol */
    public static String format(double si, Quantity quantity, UnitSystem system, int decimals, Locale locale) {
        DisplayUnit unit = quantity.unit(system);
        String number = String.format(locale, "%." + decimals + "f", unit.fromSi(si));
        return unit.symbol().isEmpty() ? number : number + " " + unit.symbol();
    }

    /** @return {@link #format} in the root locale (a dot for the decimal point), as the command line prints */
    public static String format(double si, Quantity quantity, UnitSystem system, int decimals) {
        return format(si, quantity, system, decimals, Locale.ROOT);
    }
}
