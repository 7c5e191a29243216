package barwright.insight;

/**
 * The car at one chassis torsional stiffness.
 *
 * @param chassisStiffness K_c (N m/rad); {@code Double.POSITIVE_INFINITY} for the rigid chassis
 * @param frontShare       front share of lateral load transfer (model.md 6)
 * @param rollGradient     sprung-mass-weighted body roll per a_y (rad s^2/m)
 * @param deliveredShare   the change of the front share a bar change makes with this chassis, over the change it
 *                         makes with a rigid one
 */
public record ChassisPoint(double chassisStiffness, double frontShare, double rollGradient, double deliveredShare) {
}
