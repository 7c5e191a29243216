package barwright.ui.task;

import barwright.model.AxlePosition;

/**
 * Which bar to sweep, and what on it.
 *
 * @param axle      the bar's axle
 * @param parameter what varies
 */
public record SweepRequest(AxlePosition axle, SweepParameter parameter) {
}
