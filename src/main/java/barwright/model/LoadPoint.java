package barwright.model;

/**
 * One measured point of a tyre property against vertical load.
 *
 * @param load  vertical load F_z (N), positive
 * @param value the property at that load (peak friction coefficient, or cornering stiffness in N/rad),
 *              positive
 */
public record LoadPoint(double load, double value) {
    public LoadPoint {
        Checks.positive("load", load);
        Checks.positive("value", value);
    }
}
