package barwright.physics.dynamics;

import java.util.List;

/**
 * A run of the roll model and its figures (model.md 14), SI. A figure that does not apply is NaN here and
 * null in the outputs: overshoot and time to 90 % need a held target (a step), a lift time needs a lift.
 *
 * @param modes             the linearised roll mode straight ahead
 * @param run               the car at each recorded time
 * @param steadyRoll        the steady analysis's roll at the step's target (rad), NaN without a step
 * @param peakRoll          the roll of largest size in the run, with its sign (rad)
 * @param peakRollTime      when (s)
 * @param overshoot         (peak - steady) / steady, NaN without a step
 * @param timeTo90Percent   the first time the roll reaches 90 % of the steady roll (s), NaN without a step or
 *                          where it never does
 * @param frontPeak         the front axle's largest load transfer (N, its size) and when
 * @param rearPeak          the rear's
 * @param leastLoads        each wheel's least load in the run (N)
 */
public record TransientResult(RollModes modes, RollSimulation.Run run, double steadyRoll, double peakRoll,
                              double peakRollTime, double overshoot, double timeTo90Percent, Peak frontPeak,
                              Peak rearPeak, WheelFigures leastLoads) {

    /** A peak value and the time it happens. */
    public record Peak(double value, double time) {
    }

    /** One figure per wheel (N). */
    public record WheelFigures(double leftFront, double rightFront, double leftRear, double rightRear) {
    }

    /** @return the figures of a run; steadyRoll NaN where the input holds no target */
    public static TransientResult of(RollModes modes, RollSimulation.Run run, double steadyRoll) {
        List<RollState> states = run.states();
        RollState first = states.get(0);
        double peakRoll = first.roll();
        double peakTime = first.time();
        double frontPeak = Math.abs(first.frontTransfer());
        double frontTime = first.time();
        double rearPeak = Math.abs(first.rearTransfer());
        double rearTime = first.time();
        double leftFront = first.leftFront();
        double rightFront = first.rightFront();
        double leftRear = first.leftRear();
        double rightRear = first.rightRear();
        double time90 = Double.NaN;
        for (RollState state : states) {
            if (Math.abs(state.roll()) > Math.abs(peakRoll)) {
                peakRoll = state.roll();
                peakTime = state.time();
            }
            if (Math.abs(state.frontTransfer()) > frontPeak) {
                frontPeak = Math.abs(state.frontTransfer());
                frontTime = state.time();
            }
            if (Math.abs(state.rearTransfer()) > rearPeak) {
                rearPeak = Math.abs(state.rearTransfer());
                rearTime = state.time();
            }
            leftFront = Math.min(leftFront, state.leftFront());
            rightFront = Math.min(rightFront, state.rightFront());
            leftRear = Math.min(leftRear, state.leftRear());
            rightRear = Math.min(rightRear, state.rightRear());
            if (Double.isNaN(time90) && steadyRoll != 0 && state.roll() / steadyRoll >= 0.9) {
                time90 = state.time();
            }
        }
        double overshoot = Double.isNaN(steadyRoll) || steadyRoll == 0 ? Double.NaN
                : (peakRoll - steadyRoll) / steadyRoll;
        return new TransientResult(modes, run, steadyRoll, peakRoll, peakTime, overshoot, time90,
                new Peak(frontPeak, frontTime), new Peak(rearPeak, rearTime),
                new WheelFigures(leftFront, rightFront, leftRear, rightRear));
    }
}
