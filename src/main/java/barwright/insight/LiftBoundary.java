package barwright.insight;

import java.util.List;

/**
 * Where one wheel lifts in the a_x-a_y plane: beyond the boundary (at higher a_y for its a_x) its load is zero.
 * The boundary is piecewise linear in a_x (model.md 7 with shifted static loads); {@code points} holds its
 * corners and a regular grid between them.
 *
 * @param wheel            the wheel, inside in the turn {@link Wheel#insideIn()}
 * @param points           the boundary, ordered by a_x
 * @param quoted           the boundary at the a_x values of {@link LiftEnvelope#QUOTED}, in that order
 * @param liftsBeforeLimit spans of a_x in which the wheel lifts below the car's lateral limit of that turn
 */
public record LiftBoundary(Wheel wheel, List<EnvelopePoint> points, List<EnvelopePoint> quoted,
                           List<LongitudinalRange> liftsBeforeLimit) {
    public LiftBoundary {
        points = List.copyOf(points);
        quoted = List.copyOf(quoted);
        liftsBeforeLimit = List.copyOf(liftsBeforeLimit);
    }

    /** @return the point at a_x = 0: the lift of the analysis report (m/s^2) */
    public EnvelopePoint straightCornering() {
        return quoted.stream().filter(point -> point.longitudinalAcceleration() == 0).findFirst().orElseThrow();
    }
}
