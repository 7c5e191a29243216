package barwright.physics.linkage;

/**
 * How far a side's wheel can travel from where its points were measured, and what stops it.
 *
 * @param travel  the last travel the linkage reaches (m): positive in bump, negative in droop
 * @param reason  in words, what stops it there ("the upper arm and the upright come into line"), or
 *                {@link #BEYOND_RANGE} where it goes on past the range Barwright follows
 */
public record TravelLimit(double travel, String reason) {
    /** The reason of a limit that is only the end of the range followed. */
    public static final String BEYOND_RANGE = "beyond the range followed";

    /** @return true where the linkage itself stops the wheel */
    public boolean locks() {
        return !BEYOND_RANGE.equals(reason);
    }
}
