package barwright.insight;

import static barwright.units.Constants.STANDARD_GRAVITY;

/**
 * Which way a change moves the balance. The model's own answer is the balance at the limit (model.md 8: front
 * limit minus rear limit). Where that hardly moves (for instance when an inside wheel is already off the ground
 * before the limit, so the bars no longer share the load between the axles there), the front share of load
 * transfer below the limit decides, by the rule of the trade that a larger front share means more understeer
 * (common practice).
 */
public enum Tendency {
    TOWARDS_UNDERSTEER("towards understeer"),
    TOWARDS_OVERSTEER("towards oversteer"),
    /** The limit hardly moves; the front share below the limit rises. */
    TOWARDS_UNDERSTEER_BELOW_LIMIT("towards understeer below the limit (the limit balance hardly moves)"),
    TOWARDS_OVERSTEER_BELOW_LIMIT("towards oversteer below the limit (the limit balance hardly moves)"),
    NO_CHANGE("hardly moves the balance");

    /**
     * A change of the limit margin smaller than this hardly moves the limit balance (m/s^2): 0.001 g, a tenth of
     * the 0.01 g band model.md 8 calls neutral.
     */
    public static final double MARGIN_THRESHOLD = 0.001 * STANDARD_GRAVITY;
    /** A change of the front share smaller than this (0.05 percentage points) hardly moves the balance. */
    public static final double SHARE_THRESHOLD = 0.0005;

    private final String words;

    Tendency(String words) {
        this.words = words;
    }

    public String words() {
        return words;
    }

    /** @return true where the limit balance itself moves (not only the share below the limit) */
    public boolean atLimit() {
        return this == TOWARDS_UNDERSTEER || this == TOWARDS_OVERSTEER;
    }

    /**
     * @param marginChange change of front limit minus rear limit (m/s^2)
     * @param shareChange  change of the front share of load transfer
     */
    public static Tendency of(double marginChange, double shareChange) {
        if (Math.abs(marginChange) >= MARGIN_THRESHOLD) {
            // the front axle gaining grip on the rear moves the limit towards oversteer
            return marginChange > 0 ? TOWARDS_OVERSTEER : TOWARDS_UNDERSTEER;
        }
        if (Math.abs(shareChange) >= SHARE_THRESHOLD) {
            return shareChange > 0 ? TOWARDS_UNDERSTEER_BELOW_LIMIT : TOWARDS_OVERSTEER_BELOW_LIMIT;
        }
        return NO_CHANGE;
    }
}
