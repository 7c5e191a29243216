package barwright.insight;

import barwright.model.TurnDirection;

import java.util.List;

/**
 * The lift envelope of one car: for each wheel, the a_y beyond which it lifts, against a_x. Accelerations in
 * m/s^2, a_x forward positive, a_y positive in the turn in which the wheel is inside.
 *
 * @param vehicleName      the car's name
 * @param mostBraking      the most negative a_x drawn (m/s^2)
 * @param mostAcceleration the most positive a_x drawn (m/s^2)
 * @param leftTurnLimit    the car's lateral limit turning left, at a_x = 0 (m/s^2)
 * @param rightTurnLimit   the same turning right (m/s^2)
 * @param boundaries       one per wheel, in the order of {@link Wheel#values()}
 * @param notes            what a reader must know to use the figures
 */
public record LiftEnvelopeResult(String vehicleName, double mostBraking, double mostAcceleration,
                                 double leftTurnLimit, double rightTurnLimit, List<LiftBoundary> boundaries,
                                 List<String> notes) {
    public LiftEnvelopeResult {
        boundaries = List.copyOf(boundaries);
        notes = List.copyOf(notes);
    }

    public LiftBoundary boundary(Wheel wheel) {
        return boundaries.get(wheel.ordinal());
    }

    /** @return the lateral limit at a_x = 0 in a turn (m/s^2) */
    public double limit(TurnDirection turn) {
        return turn == TurnDirection.LEFT ? leftTurnLimit : rightTurnLimit;
    }
}
