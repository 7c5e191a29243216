package barwright.measure;

/**
 * One reading of a bar loaded at a link point, the other end held.
 *
 * @param deflection the loaded link point's travel from where the reading started (m)
 * @param load       the load hung on or pressed onto it (N)
 * @param where      where the reading came from, for messages (e.g. "line 5")
 */
public record BarReading(double deflection, double load, String where) {
    public BarReading {
        if (!Double.isFinite(deflection) || !Double.isFinite(load)) {
            throw new IllegalArgumentException(where + ": a reading must be two finite numbers");
        }
    }
}
