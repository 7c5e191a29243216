package barwright.ui.task;

import barwright.model.Vehicle;
import barwright.physics.AnalysisResult;

/**
 * What one background analysis produced: the result and the sweep, or why the car cannot be analysed.
 *
 * @param revision which request this answers; higher is newer
 * @param vehicle  the car analysed
 * @param result   the analysis, or null where it failed
 * @param sweep    the bar sweep, or null where none was asked for or the analysis failed
 * @param withoutBars the same car with both bars taken off, or null where it has no stable roll position
 * @param failure  a message for people where the car cannot be analysed, else null
 */
public record AnalysisOutcome(long revision, Vehicle vehicle, AnalysisResult result, SweepResult sweep,
                              AnalysisResult withoutBars, String failure) {
    public boolean succeeded() {
        return result != null;
    }
}
