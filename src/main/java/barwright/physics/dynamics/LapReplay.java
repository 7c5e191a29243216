package barwright.physics.dynamics;

import barwright.physics.AnalysisResult;
import barwright.physics.AxleGrip;
import barwright.physics.TyreModel;

import java.util.List;

/**
 * A logged lap replayed through the roll model (model.md 14): along the lap each axle's grip used (the
 * lateral force it must give, m a_y b/l or m a_y a/l, over its capacity at that instant's wheel loads), and
 * over the lap the time each wheel spends lifted or near it.
 *
 * @param result          the run and its figures
 * @param frontGripUsed   the front axle's grip used at each recorded state (1 = at its limit)
 * @param rearGripUsed    the rear's
 * @param secondsLifted   each wheel's time with no load (s)
 * @param secondsNearLift each wheel's time below {@link #NEAR_LIFT} of its static load, lifted included (s)
 */
public record LapReplay(TransientResult result, double[] frontGripUsed, double[] rearGripUsed,
                        TransientResult.WheelFigures secondsLifted, TransientResult.WheelFigures secondsNearLift) {
    /** A wheel below this share of its static load is "near lift" (common practice for a warning margin). */
    public static final double NEAR_LIFT = 0.10;

    public static LapReplay of(AnalysisResult analysis, TransientResult result) {
        List<RollState> states = result.run().states();
        AxleGrip front = new AxleGrip(new TyreModel(analysis.vehicle().front().tyre()));
        AxleGrip rear = new AxleGrip(new TyreModel(analysis.vehicle().rear().tyre()));
        double frontMass = analysis.masses().mass() * analysis.masses().frontMassFraction();
        double rearMass = analysis.masses().mass() - frontMass;
        var statics = analysis.masses().staticLoads();
        double[] staticLoads = {statics.leftFront(), statics.rightFront(), statics.leftRear(), statics.rightRear()};
        double[] frontUsed = new double[states.size()];
        double[] rearUsed = new double[states.size()];
        double[] lifted = new double[4];
        double[] near = new double[4];
        for (int i = 0; i < states.size(); i++) {
            RollState state = states.get(i);
            double accel = Math.abs(state.lateral());
            frontUsed[i] = frontMass * accel / front.capacity(state.leftFront(), state.rightFront());
            rearUsed[i] = rearMass * accel / rear.capacity(state.leftRear(), state.rightRear());
            if (i > 0) {
                double step = state.time() - states.get(i - 1).time();
                double[] loads = {state.leftFront(), state.rightFront(), state.leftRear(), state.rightRear()};
                for (int wheel = 0; wheel < 4; wheel++) {
                    if (loads[wheel] <= 0) {
                        lifted[wheel] += step;
                    }
                    if (loads[wheel] < NEAR_LIFT * staticLoads[wheel]) {
                        near[wheel] += step;
                    }
                }
            }
        }
        return new LapReplay(result, frontUsed, rearUsed, wheels(lifted), wheels(near));
    }

    private static TransientResult.WheelFigures wheels(double[] values) {
        return new TransientResult.WheelFigures(values[0], values[1], values[2], values[3]);
    }

    /** @return the most grip the front axle used anywhere on the lap */
    public double peakFrontGripUsed() {
        return max(frontGripUsed);
    }

    public double peakRearGripUsed() {
        return max(rearGripUsed);
    }

    private static double max(double[] values) {
        double most = 0;
        for (double value : values) {
            most = Math.max(most, value);
        }
        return most;
    }
}
