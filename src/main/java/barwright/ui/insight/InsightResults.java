package barwright.ui.insight;

import barwright.insight.ChassisStudyResult;
import barwright.insight.LiftEnvelopeResult;
import barwright.insight.SensitivityResult;
import barwright.model.Vehicle;

/**
 * The three views' results for one car, computed together off the event thread.
 *
 * @param vehicle     the car
 * @param envelope    where each inside wheel lifts
 * @param sensitivity what moves the balance most
 * @param chassis     what a flexible chassis costs
 */
public record InsightResults(Vehicle vehicle, LiftEnvelopeResult envelope, SensitivityResult sensitivity,
                             ChassisStudyResult chassis) {
}
