package barwright.physics.linkage;

import org.apache.commons.math3.analysis.UnivariateFunction;
import org.apache.commons.math3.analysis.solvers.AllowedSolution;
import org.apache.commons.math3.analysis.solvers.BracketingNthOrderBrentSolver;

/**
 * A root of a function of one variable inside a bracket where it changes sign, by Commons Math's bracketing
 * Brent-type solver, with its accuracy and budget stated.
 */
final class BracketedRoot {
    /** Evaluations allowed for one root: a Brent solve to 1e-13 within a small bracket takes some 10 to 20. */
    static final int MAX_EVALUATIONS = 200;

    private BracketedRoot() {
    }

    /**
     * @param function         continuous on [lower, upper], of opposite signs (or zero) at the two ends
     * @param absoluteAccuracy how close to the root the answer must be, in the variable's unit
     * @return the root
     */
    static double solve(UnivariateFunction function, double lower, double upper, double absoluteAccuracy) {
        BracketingNthOrderBrentSolver solver = new BracketingNthOrderBrentSolver(1e-15, absoluteAccuracy, 0, 5);
        return solver.solve(MAX_EVALUATIONS, function, Math.min(lower, upper), Math.max(lower, upper),
                AllowedSolution.ANY_SIDE);
    }

    /**
     * As {@link #solve(UnivariateFunction, double, double, double)}, starting from a close guess: where the function
     * changes sign within 20 % either side of the guess, that narrower bracket is searched.
     */
    static double solve(UnivariateFunction function, double lower, double upper, double absoluteAccuracy,
                        double guess) {
        double low = Math.max(Math.min(lower, upper), guess * 0.8);
        double high = Math.min(Math.max(lower, upper), guess * 1.2);
        if (low < high && function.value(low) * function.value(high) <= 0) {
            return solve(function, low, high, absoluteAccuracy);
        }
        return solve(function, lower, upper, absoluteAccuracy);
    }
}
