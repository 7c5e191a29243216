package barwright.sizing.map;

import barwright.model.AntiRollBar;

import java.util.Locale;

/**
 * One row or column of an adjustment map: a bar in one hole, or no bar.
 *
 * @param barLabel  which bar, e.g. "current" or "24 mm spring steel"
 * @param bar       the bar with its hole selected, or null for no bar
 * @param armLength the effective arm length of the hole (m), NaN for no bar or a shaped bar
 * @param current   true where this is the bar and hole the vehicle has
 */
public record BarOption(String barLabel, AntiRollBar bar, double armLength, boolean current) {
    /** @return the 0-based hole, or -1 for no bar */
    public int hole() {
        return bar == null ? -1 : bar.selectedArm();
    }

    /** @return e.g. "current, hole 2 (210 mm)" or "no bar" */
    public String label() {
        if (bar == null) {
            return "no bar";
        }
        String arm = Double.isNaN(armLength) ? "" : String.format(Locale.ROOT, " (%.0f mm)", armLength * 1e3);
        return barLabel + ", hole " + (hole() + 1) + arm;
    }
}
