package barwright.solver;

import org.apache.commons.math3.exception.TooManyEvaluationsException;
import org.apache.commons.math3.ode.FirstOrderDifferentialEquations;
import org.apache.commons.math3.ode.events.EventHandler;
import org.apache.commons.math3.ode.nonstiff.AdaptiveStepsizeIntegrator;
import org.apache.commons.math3.ode.nonstiff.DormandPrince853Integrator;
import org.apache.commons.math3.ode.sampling.StepHandler;
import org.apache.commons.math3.ode.sampling.StepInterpolator;

import java.util.Arrays;

/**
 * An explicit ODE integration with error control: Commons Math's Dormand-Prince 8(5,3) with the accuracy,
 * step bounds and evaluation budget stated by the caller, and event detection.
 *
 * @param minimumStep       the smallest step the integrator may take (s)
 * @param maximumStep       the largest step (s): no wider than the finest feature of the input
 * @param absoluteTolerance the allowed local error of each state variable, in its unit
 * @param relativeTolerance the allowed local error relative to the state's size
 * @param maximumEvaluations budget of right-hand-side evaluations; past it the integration fails
 * @param eventAccuracy     how closely an event's time is located (s)
 */
public record OdeIntegration(double minimumStep, double maximumStep, double absoluteTolerance,
                             double relativeTolerance, int maximumEvaluations, double eventAccuracy) {
    public OdeIntegration {
        if (!(minimumStep > 0 && maximumStep >= minimumStep && absoluteTolerance > 0 && relativeTolerance > 0
                && maximumEvaluations > 0 && eventAccuracy > 0)) {
            throw new IllegalArgumentException("ODE settings must be positive, with the maximum step at least the "
                    + "minimum");
        }
    }

    /** An event: a function of time and state whose zero crossings the integrator locates. */
    public interface Event {
        double value(double time, double[] state);

        /**
         * Called where the value crosses zero.
         *
         * @param increasing true where it crosses from negative to positive
         * @return true to stop the integration here
         */
        default boolean occurred(double time, double[] state, boolean increasing) {
            return false;
        }
    }

    /** @return the same settings with another step ceiling (s) */
    public OdeIntegration withMaximumStep(double step) {
        return new OdeIntegration(Math.min(minimumStep, step), step, absoluteTolerance, relativeTolerance,
                maximumEvaluations, eventAccuracy);
    }

    /**
     * Integrates from start to end; the state array holds the initial state and receives the final one.
     *
     * @return the time reached: the end, or the time of a stopping event
     */
    public double integrate(FirstOrderDifferentialEquations equations, double start, double[] state, double end,
                            StepHandler steps, Iterable<Event> events) {
        return integrate(equations, start, state, new double[0], end, null, steps, events);
    }

    /**
     * Integrates from start to end in pieces that end at the breakpoints inside (start, end), the corners of an
     * input, so that no step straddles one and the error control never fights a kink it cannot resolve. One
     * integrator serves every piece, with its step handler (told of the start once, and of the last step only at
     * the end) and its events; each piece's first step is tried at the piece's length, no wider than the step
     * ceiling, and the evaluation budget counts over the whole run. A breakpoint closer than the smallest step to
     * the previous one is passed over. The state array holds the initial state and receives the final one.
     *
     * @param breakpoints        times (s), increasing; those outside (start, end) are passed over
     * @param absoluteTolerances each state variable's allowed local error, in its own unit; null for the scalar
     *                           {@link #absoluteTolerance} on every one
     * @return the time reached: the end, or the time of a stopping event
     */
    public double integrate(FirstOrderDifferentialEquations equations, double start, double[] state,
                            double[] breakpoints, double end, double[] absoluteTolerances, StepHandler steps,
                            Iterable<Event> events) {
        AdaptiveStepsizeIntegrator integrator;
        if (absoluteTolerances == null) {
            integrator = new DormandPrince853Integrator(minimumStep, maximumStep, absoluteTolerance,
                    relativeTolerance);
        } else {
            double[] relative = new double[absoluteTolerances.length];
            Arrays.fill(relative, relativeTolerance);
            integrator = new DormandPrince853Integrator(minimumStep, maximumStep, absoluteTolerances.clone(),
                    relative);
        }
        Pieces pieces = new Pieces(steps);
        for (Event event : events) {
            integrator.addEventHandler(handler(event, pieces), maximumStep / 2, eventAccuracy, 100);
        }
        if (steps != null) {
            integrator.addStepHandler(pieces);
        }
        int used = 0;
        double reached = start;
        int next = 0;
        while (reached < end && !pieces.stopped) {
            while (next < breakpoints.length && breakpoints[next] < reached + minimumStep) {
                next++;
            }
            double pieceEnd = next < breakpoints.length && breakpoints[next] < end - minimumStep
                    ? breakpoints[next] : end;
            pieces.last = pieceEnd == end;
            if (used >= maximumEvaluations) {
                throw new TooManyEvaluationsException(maximumEvaluations);
            }
            integrator.setMaxEvaluations(maximumEvaluations - used);
            integrator.setInitialStepSize(Math.min(pieceEnd - reached, maximumStep));
            double got = integrator.integrate(equations, reached, state, pieceEnd, state);
            // unless an event stopped it, the integrator has reached the piece's end, even where it hands back a
            // time an ulp short (it counts an event within an ulp of the end as the end)
            reached = pieces.stopped ? got : pieceEnd;
            used += integrator.getEvaluations();
        }
        return reached;
    }

    private static EventHandler handler(Event event, Pieces pieces) {
        return new EventHandler() {
            @Override
            public void init(double t0, double[] y0, double t) {
            }

            @Override
            public double g(double t, double[] y) {
                return event.value(t, y);
            }

            @Override
            public Action eventOccurred(double t, double[] y, boolean increasing) {
                if (event.occurred(t, y, increasing)) {
                    pieces.stopped = true;
                    return Action.STOP;
                }
                // a kink of the right-hand side: restart the step there so the error control stays honest
                return Action.RESET_DERIVATIVES;
            }

            @Override
            public void resetState(double t, double[] y) {
            }
        };
    }

    /**
     * Passes the steps of every piece to one handler as the steps of one run: told of the start once, and of
     * the last step only at the end of the last piece (not at a stopping event).
     */
    private static final class Pieces implements StepHandler {
        private final StepHandler steps;
        private boolean started;
        private boolean last;
        private boolean stopped;

        Pieces(StepHandler steps) {
            this.steps = steps;
        }

        @Override
        public void init(double t0, double[] y0, double t) {
            if (!started) {
                started = true;
                steps.init(t0, y0, t);
            }
        }

        @Override
        public void handleStep(StepInterpolator interpolator, boolean isLast) {
            steps.handleStep(interpolator, isLast && last && !stopped);
        }
    }
}
