package barwright.physics.linkage;

/**
 * One wheel of an axle moved by a travel from the ride height, the body held still.
 *
 * @param travel         the contact point's rise relative to the body (m), bump positive
 * @param camber         the left wheel's camber to the body (rad), SAE J670 sign
 * @param track          track with both wheels at this travel (m); for a beam axle, its fixed track
 * @param instantCentre  the front-view instant centre: y from the centreline, z from the ground at ride height
 * @param contactY       the contact point's distance from the centreline (m)
 */
public record TravelState(double travel, double camber, double track, InstantCentre instantCentre,
                          double contactY) {

    /** @return the front-view swing-arm length (m), positive where the instant centre lies inboard; infinite at infinity */
    public double swingArmLength() {
        return instantCentre.swingArmLength(contactY);
    }
}
