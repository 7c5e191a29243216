package barwright.physics.fatigue;

/**
 * One counted cycle (or half cycle) of a stress history.
 *
 * @param range max - min stress of the cycle (Pa), never negative
 * @param mean  (max + min) / 2 (Pa)
 * @param count 1 for a full cycle, 0.5 for a half cycle (or the sum of several equal ones)
 */
public record StressCycle(double range, double mean, double count) {
    /** @return half the range (Pa) */
    public double amplitude() {
        return range / 2;
    }
}
