package barwright.solver;

import org.apache.commons.math3.ode.FirstOrderDifferentialEquations;
import org.apache.commons.math3.ode.FirstOrderIntegrator;
import org.apache.commons.math3.ode.events.EventHandler;
import org.apache.commons.math3.ode.nonstiff.DormandPrince853Integrator;
import org.apache.commons.math3.ode.sampling.StepHandler;

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
        FirstOrderIntegrator integrator = new DormandPrince853Integrator(minimumStep, maximumStep,
                absoluteTolerance, relativeTolerance);
        integrator.setMaxEvaluations(maximumEvaluations);
        if (steps != null) {
            integrator.addStepHandler(steps);
        }
        for (Event event : events) {
            integrator.addEventHandler(new EventHandler() {
                @Override
                public void init(double t0, double[] y0, double t) {
                }

                @Override
                public double g(double t, double[] y) {
                    return event.value(t, y);
                }

                @Override
                public Action eventOccurred(double t, double[] y, boolean increasing) {
                    // a kink of the right-hand side: restart the step there so the error control stays honest
                    return event.occurred(t, y, increasing) ? Action.STOP : Action.RESET_DERIVATIVES;
                }

                @Override
                public void resetState(double t, double[] y) {
                }
            }, maximumStep / 2, eventAccuracy, 100);
        }
        return integrator.integrate(equations, start, state, end, state);
    }
}
