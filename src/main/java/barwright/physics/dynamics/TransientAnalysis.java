package barwright.physics.dynamics;

import barwright.model.DynamicsInputs;
import barwright.model.LapLog;
import barwright.model.TurnDirection;
import barwright.physics.AnalysisResult;
import barwright.physics.SteadyCornering;
import barwright.physics.VehicleAnalysis;

/** The roll in motion of an analysed car driven by a step, a sine or a log (model.md 14). */
public final class TransientAnalysis {
    /** Spacing of the recorded states of a step or a sine (s): 1 ms, so a peak is found within 0.5 ms. */
    public static final double SAMPLE_INTERVAL = 1e-3;

    private TransientAnalysis() {
    }

    /** @return the run of a step and its figures against the steady analysis at the step's target */
    public static TransientResult step(AnalysisResult result, DynamicsInputs inputs, LateralInput.Step step,
                                       double duration) {
        RollModel model = RollModel.of(result, inputs);
        RollSimulation.Run run = RollSimulation.run(model, step,
                RollSimulation.evenTimes(duration, SAMPLE_INTERVAL), RollSimulation.DEFAULT_INTEGRATION);
        return TransientResult.of(RollModes.of(model), run, steadyRoll(result, step.target()));
    }

    /** @return the run of a sine; no steady roll, overshoot or time to 90 % */
    public static TransientResult sine(AnalysisResult result, DynamicsInputs inputs, LateralInput.Sine sine,
                                       double duration) {
        RollModel model = RollModel.of(result, inputs);
        RollSimulation.Run run = RollSimulation.run(model, sine,
                RollSimulation.evenTimes(duration, SAMPLE_INTERVAL), RollSimulation.DEFAULT_INTEGRATION);
        return TransientResult.of(RollModes.of(model), run, Double.NaN);
    }

    /**
     * @param duration the length replayed from the log's start (s); the whole log where it is longer
     * @return the replay, recorded at the log's own sample times
     */
    public static TransientResult log(AnalysisResult result, DynamicsInputs inputs, LapLog log, double duration) {
        RollModel model = RollModel.of(result, inputs);
        double end = Math.min(log.end(), log.start() + duration);
        double[] all = log.times();
        int count = 0;
        while (count < all.length && all[count] <= end) {
            count++;
        }
        double[] times = java.util.Arrays.copyOf(all, count);
        RollSimulation.Run run = RollSimulation.run(model, new LoggedInput(log), times, RollSimulation.DEFAULT_INTEGRATION);
        return TransientResult.of(RollModes.of(model), run, Double.NaN);
    }

    /** @return the steady analysis's roll at a held a_y, with its sign (rad), the post-lift rule included */
    public static double steadyRoll(AnalysisResult result, double lateral) {
        SteadyCornering cornering = result.turn(lateral >= 0 ? TurnDirection.LEFT : TurnDirection.RIGHT).cornering();
        return Math.signum(lateral) * cornering.rollAngle(Math.abs(lateral));
    }

    /** @return the steady analysis's turn for the direction of a_y */
    public static SteadyCornering steadyTurn(AnalysisResult result, double lateral) {
        return VehicleAnalysis.cornering(result, lateral >= 0 ? TurnDirection.LEFT : TurnDirection.RIGHT, 0);
    }
}
