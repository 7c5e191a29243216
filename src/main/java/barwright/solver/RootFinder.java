package barwright.solver;

import org.apache.commons.math3.analysis.UnivariateFunction;
import org.apache.commons.math3.analysis.solvers.BrentSolver;
import org.apache.commons.math3.exception.NoBracketingException;
import org.apache.commons.math3.exception.TooManyEvaluationsException;

import java.util.Locale;
import java.util.function.DoubleUnaryOperator;

/**
 * One root-finding call site: Brent's method (Apache Commons Math {@link BrentSolver}) on a bracket whose ends
 * have opposite signs, with the accuracy and evaluation budget that call site needs. Every failure (no sign
 * change, a value that is not finite at an end, the budget spent) is a {@link RootNotFoundException} that
 * says what was being solved, never a library exception. Immutable and thread-safe.
 *
 * @param subject            what the root is, in words a user understands ("the front axle's grip limit")
 * @param absoluteAccuracy   the bracket is closed to this width in x (x's unit)
 * @param relativeAccuracy   ... or to this fraction of |x|, whichever is larger
 * @param functionAccuracy   a point whose |f| is below this is a root (f's unit)
 * @param maxEvaluations     the budget of f evaluations for one solve
 */
public record RootFinder(String subject, double absoluteAccuracy, double relativeAccuracy, double functionAccuracy,
                         int maxEvaluations) {
    /** Commons Math's own default relative accuracy: about a hundred times the double's resolution. */
    public static final double DEFAULT_RELATIVE_ACCURACY = 1e-14;
    /** Commons Math's own default function-value accuracy. */
    public static final double DEFAULT_FUNCTION_ACCURACY = 1e-15;

    public RootFinder {
        if (subject == null || subject.isBlank()) {
            throw new IllegalArgumentException("a root finder needs to say what it solves for");
        }
        if (!(absoluteAccuracy > 0 && relativeAccuracy > 0 && functionAccuracy > 0)) {
            throw new IllegalArgumentException("root-finding accuracies must be positive");
        }
        if (maxEvaluations < 2) {
            throw new IllegalArgumentException("a root search needs a budget of at least 2 evaluations");
        }
    }

    /** @return a finder with the default relative and function accuracies */
    public static RootFinder of(String subject, double absoluteAccuracy, int maxEvaluations) {
        return new RootFinder(subject, absoluteAccuracy, DEFAULT_RELATIVE_ACCURACY, DEFAULT_FUNCTION_ACCURACY,
                maxEvaluations);
    }

    /**
     * @param low  one end of the bracket
     * @param high the other end; f(low) and f(high) must not have the same sign
     * @return x in [low, high] with f(x) = 0 to the accuracies
     * @throws RootNotFoundException where f does not change sign over the bracket, is not finite somewhere the
     *                               search looks, or the budget runs out
     */
    public double solve(DoubleUnaryOperator function, double low, double high) {
        if (!(Double.isFinite(low) && Double.isFinite(high) && low < high)) {
            throw failure(RootNotFoundException.Reason.NO_BRACKET,
                    String.format(Locale.ROOT, "the bracket [%.6g, %.6g] is not an interval", low, high));
        }
        // a NaN or an infinity would silently steer Brent's steps: refuse it where it appears
        UnivariateFunction checked = x -> {
            double value = function.applyAsDouble(x);
            if (!Double.isFinite(value)) {
                throw failure(RootNotFoundException.Reason.NOT_FINITE,
                        String.format(Locale.ROOT, "it has no finite value at %.6g (between %.6g and %.6g)", x,
                                low, high));
            }
            return value;
        };
        try {
            return new BrentSolver(relativeAccuracy, absoluteAccuracy, functionAccuracy)
                    .solve(maxEvaluations, checked, low, high);
        } catch (TooManyEvaluationsException spent) {
            throw failure(RootNotFoundException.Reason.BUDGET_SPENT, String.format(Locale.ROOT,
                    "%d evaluations between %.6g and %.6g did not reach the accuracy asked", maxEvaluations, low,
                    high));
        } catch (NoBracketingException noSignChange) {
            throw failure(RootNotFoundException.Reason.NO_BRACKET, String.format(Locale.ROOT,
                    "it does not change sign between %.6g and %.6g", low, high));
        }
    }

    private RootNotFoundException failure(RootNotFoundException.Reason reason, String detail) {
        return new RootNotFoundException(subject, reason, detail);
    }
}
