package barwright.physics.linkage;

/**
 * An axle with the body rolled by an angle, both tyres on the ground and the wheel travels equal and opposite.
 *
 * @param roll               body roll phi (rad), positive for a left turn (body leaning right)
 * @param rollCentre         the kinematic roll centre, or null where the two lines from the contact points
 *                           through the instant centres are parallel: there is then no roll centre
 * @param loadTransferHeight the height that gives the geometric load transfer of the two lines' slopes with
 *                           equal side forces at the two tyres (m): the roll-centre height where the lines are
 *                           symmetric, finite where they are parallel
 * @param leftCamber         left wheel's camber to the road (rad), SAE J670 sign
 * @param rightCamber        right wheel's camber to the road (rad), SAE J670 sign
 * @param track              distance between the contact points on the ground (m)
 * @param heave              the body's rise from the ride height at this roll (m)
 * @param lateralShift       the body centreline's position from the mid-point of the contact points, to the
 *                           left (m)
 * @param rightTravel        the right wheel's travel from the ride height (m); the left one's is minus this
 */
public record RollState(double roll, RollCentre rollCentre, double loadTransferHeight, double leftCamber,
                        double rightCamber, double track, double heave, double lateralShift, double rightTravel) {

    public boolean hasRollCentre() {
        return rollCentre != null;
    }

    /** @return the state of the opposite roll: the mirror image, left and right exchanged */
    RollState mirrored() {
        RollCentre mirroredCentre = rollCentre == null ? null : new RollCentre(rollCentre.height(), -rollCentre.offset());
        return new RollState(-roll, mirroredCentre, loadTransferHeight, rightCamber, leftCamber, track, heave,
                -lateralShift, -rightTravel);
    }
}
