package barwright.sizing;

/** Why a search left a candidate out; counted so that an empty result can say what to relax. */
public enum Rejection {
    OUTER_DIAMETER("outside diameter above the limit"),
    BAR_MASS("bar heavier than the limit"),
    SAFETY_FACTOR("safety factor below the limit at the check travel"),
    NO_STABLE_ROLL("no stable roll position"),
    FRONT_LIFT("inside front wheel lifts before the limit"),
    REAR_LIFT("inside rear wheel lifts before the limit"),
    FATIGUE_LIFE("fatigue life shorter than the least laps"),
    NO_FATIGUE_DATA("no fatigue data for the material (give ultimateStrengthMPa and enduranceLimitMPa)");

    private final String words;

    Rejection(String words) {
        this.words = words;
    }

    /** @return the reason in words */
    public String words() {
        return words;
    }
}
