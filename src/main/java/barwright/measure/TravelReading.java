package barwright.measure;

/**
 * One reading of a motion-ratio measurement: the wheel moved, and the spring, damper or bar link moved.
 *
 * @param wheelTravel     the wheel centre's vertical travel from the first reading's position (m)
 * @param componentTravel the component's travel over the same motion (m)
 * @param where           where the reading came from, for messages (e.g. "line 5")
 */
public record TravelReading(double wheelTravel, double componentTravel, String where) {
    public TravelReading {
        if (!Double.isFinite(wheelTravel) || !Double.isFinite(componentTravel)) {
            throw new IllegalArgumentException(where + ": a reading must be two finite numbers");
        }
    }
}
