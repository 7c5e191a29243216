package barwright.physics;

import static barwright.units.Constants.STANDARD_GRAVITY;

/** Which axle reaches its grip limit first as a_y rises (model.md 8). */
public enum Balance {
    UNDERSTEER("understeer"),
    OVERSTEER("oversteer"),
    NEUTRAL("neutral");

    /** Axle limits closer than this are called neutral (m/s^2): 0.01 g, model.md 8. */
    public static final double NEUTRAL_BAND = 0.01 * STANDARD_GRAVITY;

    private final String key;

    Balance(String key) {
        this.key = key;
    }

    /** @return the report value of {@code limitBalance} */
    public String key() {
        return key;
    }

    /** @return the balance for the two axle limits (m/s^2) */
    public static Balance of(double frontLimit, double rearLimit) {
        if (Math.abs(frontLimit - rearLimit) <= NEUTRAL_BAND) {
            return NEUTRAL;
        }
        return frontLimit < rearLimit ? UNDERSTEER : OVERSTEER;
    }
}
