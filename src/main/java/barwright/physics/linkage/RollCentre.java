package barwright.physics.linkage;

/**
 * Where the kinematic roll centre is, seen from the front in the road's axes.
 *
 * @param height height above the ground (m)
 * @param offset lateral offset from the mid-point of the two contact points, positive to the car's left (m)
 */
public record RollCentre(double height, double offset) {
}
