package barwright.physics.dynamics;

import barwright.solver.OdeIntegration;
import org.apache.commons.math3.ode.FirstOrderDifferentialEquations;
import org.apache.commons.math3.ode.sampling.StepHandler;
import org.apache.commons.math3.ode.sampling.StepInterpolator;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * Runs the roll model through an input (model.md 14) with Commons Math's Dormand-Prince 8(5,3), locating each
 * moment an inside wheel's load reaches zero (or comes back) as an event, and stopping where both wheels of one
 * side are off the ground (the car rolls over).
 */
public final class RollSimulation {
    /**
     * Default accuracy: 1e-10 rad (and rad/s) absolute and 1e-10 relative per step, steps from 1 us to 20 ms,
     * events located to 1 us, at most 20 million evaluations (a 20-minute log needs about 1 million).
     */
    public static final OdeIntegration DEFAULT_INTEGRATION = new OdeIntegration(1e-6, 0.02, 1e-10, 1e-10,
            20_000_000, 1e-6);

    private RollSimulation() {
    }

    /**
     * A run and the instants the integrator found.
     *
     * @param states       the car at each requested time up to the end (or the roll-over)
     * @param firstLift    the first time an inside wheel's load reaches zero (s), NaN where none does
     * @param rolloverTime the time both wheels of one side are off the ground (s), NaN where that never happens
     */
    public record Run(List<RollState> states, double firstLift, double rolloverTime) {
        public Run {
            states = List.copyOf(states);
        }
    }

    /**
     * @param times the times at which to record the car (s), increasing, the first the start of the run at rest
     */
    public static Run run(RollModel model, LateralInput input, double[] times, OdeIntegration integration) {
        double start = times[0];
        double end = times[times.length - 1];
        LateralInput drive = input.forOneThread();
        OdeIntegration settings = integration.withMaximumStep(
                Math.min(integration.maximumStep(), input.finestFeature()));
        double[] state = new double[model.dimension()];
        List<RollState> states = new ArrayList<>(times.length);
        double[] firstLift = {Double.NaN};
        double[] rollover = {Double.NaN};
        RollModel.Evaluation stage = new RollModel.Evaluation();
        FirstOrderDifferentialEquations equations = new FirstOrderDifferentialEquations() {
            @Override
            public int getDimension() {
                return model.dimension();
            }

            @Override
            public void computeDerivatives(double t, double[] y, double[] yDot) {
                model.evaluate(t, y, drive, stage);
                model.derivatives(stage, y, yDot);
            }
        };
        RollModel.Evaluation recorded = new RollModel.Evaluation();
        StepHandler recorder = new StepHandler() {
            private int next;

            @Override
            public void init(double t0, double[] y0, double t) {
                next = 0;
            }

            @Override
            public void handleStep(StepInterpolator step, boolean isLast) {
                double reached = step.getCurrentTime();
                // at the run's end the integrator may stop an ulp short of the last time: it is recorded too
                while (next < times.length && (times[next] <= reached || isLast)) {
                    step.setInterpolatedTime(times[next]);
                    model.evaluate(times[next], step.getInterpolatedState(), drive, recorded);
                    states.add(recorded.state());
                    next++;
                }
            }
        };
        Margins margins = new Margins(model, drive);
        List<OdeIntegration.Event> events = new ArrayList<>();
        for (int i = 0; i < 4; i++) {
            int wheel = i;
            events.add(new OdeIntegration.Event() {
                @Override
                public double value(double time, double[] y) {
                    return margins.at(time, y).liftMargins[wheel];
                }

                @Override
                public boolean occurred(double time, double[] y, boolean increasing) {
                    if (!increasing && Double.isNaN(firstLift[0])) {
                        firstLift[0] = time;
                    }
                    return false;
                }
            });
        }
        for (int side = 0; side < 2; side++) {
            boolean left = side == 0;
            events.add(new OdeIntegration.Event() {
                @Override
                public double value(double time, double[] y) {
                    RollModel.Evaluation at = margins.at(time, y);
                    return left ? at.leftMargin : at.rightMargin;
                }

                @Override
                public boolean occurred(double time, double[] y, boolean increasing) {
                    if (!increasing) {
                        rollover[0] = time;
                        return true;
                    }
                    return false;
                }
            });
        }
        if (end > start) {
            settings.integrate(equations, start, state, input.breakpoints(), end, stateTolerances(model, settings),
                    recorder, events);
        } else {
            model.evaluate(start, state, drive, recorded);
            states.add(recorded.state());
        }
        return new Run(states, firstLift[0], rollover[0]);
    }

    /**
     * The six event functions read one evaluation of the model at each (time, state) the integrator checks:
     * it asks all six at the same point, one after the other.
     */
    private static final class Margins {
        private final RollModel model;
        private final LateralInput drive;
        private final RollModel.Evaluation evaluation = new RollModel.Evaluation();
        private final double[] state;
        private boolean filled;

        Margins(RollModel model, LateralInput drive) {
            this.model = model;
            this.drive = drive;
            this.state = new double[model.dimension()];
        }

        RollModel.Evaluation at(double time, double[] y) {
            if (!filled || time != evaluation.time || !same(y)) {
                model.evaluate(time, y, drive, evaluation);
                System.arraycopy(y, 0, state, 0, state.length);
                filled = true;
            }
            return evaluation;
        }

        private boolean same(double[] y) {
            for (int i = 0; i < state.length; i++) {
                if (y[i] != state[i]) {
                    return false;
                }
            }
            return true;
        }
    }

    /**
     * Each state variable's absolute tolerance: the settings' own for the rolls (rad), and for the rates (rad/s)
     * that times the body's undamped roll frequency sqrt(K_net / I) (1/s), the size a rate has to a roll in the
     * body's motion, so that the two weigh alike in the error control.
     *
     * @return the tolerances in the order of the state; null (the scalar tolerance) where the car has no
     *     positive net roll stiffness
     */
    static double[] stateTolerances(RollModel model, OdeIntegration settings) {
        double frequency = Math.sqrt(model.netRigidStiffness() / model.inertiaAboutAxis());
        if (!(frequency > 0) || Double.isInfinite(frequency)) {
            return null;
        }
        double[] tolerances = new double[model.dimension()];
        Arrays.fill(tolerances, settings.absoluteTolerance());
        tolerances[1] *= frequency;
        if (!model.rigidChassis()) {
            tolerances[3] *= frequency;
        }
        return tolerances;
    }

    /** @return evenly spaced times from 0 to the duration, both included (s) */
    public static double[] evenTimes(double duration, double interval) {
        int count = (int) Math.round(duration / interval);
        double[] times = new double[count + 1];
        for (int i = 0; i <= count; i++) {
            times[i] = duration * i / count;
        }
        return times;
    }
}
