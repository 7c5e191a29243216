package barwright.sizing;

/**
 * The least fatigue life a sized bar must have (docs/model.md 13).
 *
 * @param minLaps the least laps to failure
 * @param lap     the lap they are counted on
 */
public record FatigueLimit(double minLaps, FatigueLap lap) {
    public FatigueLimit {
        if (!(minLaps >= 1 && minLaps <= 1e9)) {
            throw new IllegalArgumentException("the least laps must be 1 to 1000000000, was " + minLaps);
        }
        if (lap == null) {
            throw new IllegalArgumentException("a least life needs the lap it is counted on");
        }
    }
}
