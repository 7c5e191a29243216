package barwright.ui.task;

import java.util.List;

/**
 * Front share of load transfer and roll gradient as one bar parameter varies, with the car's current value.
 *
 * @param request     what was swept
 * @param points      the sweep, in rising parameter order; empty where the sweep is unavailable
 * @param current     the parameter's value on the car now (m for lengths)
 * @param unavailable why there is no sweep (for example "no rear bar"), or null
 */
public record SweepResult(SweepRequest request, List<Point> points, double current, String unavailable) {
    /**
     * @param parameter    diameter or wall (m), or the arm length of a hole (m)
     * @param frontShare   front share of lateral load transfer
     * @param rollGradient body roll per unit a_y (rad s^2/m)
     */
    public record Point(double parameter, double frontShare, double rollGradient) {
    }

    public SweepResult {
        points = List.copyOf(points);
    }

    static SweepResult unavailable(SweepRequest request, String reason) {
        return new SweepResult(request, List.of(), Double.NaN, reason);
    }
}
