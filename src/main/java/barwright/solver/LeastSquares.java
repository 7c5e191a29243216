package barwright.solver;

import org.apache.commons.math3.exception.TooManyEvaluationsException;
import org.apache.commons.math3.exception.TooManyIterationsException;
import org.apache.commons.math3.fitting.leastsquares.LeastSquaresBuilder;
import org.apache.commons.math3.fitting.leastsquares.LeastSquaresOptimizer;
import org.apache.commons.math3.fitting.leastsquares.LevenbergMarquardtOptimizer;
import org.apache.commons.math3.fitting.leastsquares.MultivariateJacobianFunction;
import org.apache.commons.math3.fitting.leastsquares.ParameterValidator;
import org.apache.commons.math3.linear.ArrayRealVector;

import java.util.Optional;

/**
 * Non-linear least squares by Commons Math's Levenberg-Marquardt optimiser, with its accuracy and budget
 * stated by the caller.
 */
public final class LeastSquares {
    /**
     * @param costRelativeTolerance      stop when the sum of squares improves by less than this share
     * @param parameterRelativeTolerance stop when the parameters move by less than this share
     * @param maxEvaluations             budget of model evaluations
     * @param maxIterations              budget of iterations
     */
    public record Settings(double costRelativeTolerance, double parameterRelativeTolerance, int maxEvaluations,
                           int maxIterations) {
    }

    /**
     * @param parameters the best parameters found
     * @param rms        root mean square of the residuals, in the observations' unit
     * @param evaluations model evaluations used
     */
    public record Solution(double[] parameters, double rms, int evaluations) {
    }

    private LeastSquares() {
    }

    /**
     * @param model     values and Jacobian of the model at a parameter vector, one row per observation
     * @param observed  the measured values
     * @param start     the first guess
     * @param validator keeps parameters within their meaningful range (or null)
     * @return the solution, or empty where the budget ran out before the tolerances were met
     */
    public static Optional<Solution> fit(MultivariateJacobianFunction model, double[] observed, double[] start,
                                         ParameterValidator validator, Settings settings) {
        LeastSquaresBuilder builder = new LeastSquaresBuilder()
                .model(model)
                .target(observed)
                .start(new ArrayRealVector(start))
                .maxEvaluations(settings.maxEvaluations())
                .maxIterations(settings.maxIterations())
                .lazyEvaluation(false);
        if (validator != null) {
            builder.parameterValidator(validator);
        }
        LevenbergMarquardtOptimizer optimizer = new LevenbergMarquardtOptimizer()
                .withCostRelativeTolerance(settings.costRelativeTolerance())
                .withParameterRelativeTolerance(settings.parameterRelativeTolerance());
        try {
            LeastSquaresOptimizer.Optimum optimum = optimizer.optimize(builder.build());
            return Optional.of(new Solution(optimum.getPoint().toArray(), optimum.getRMS(), optimum.getEvaluations()));
        } catch (TooManyEvaluationsException | TooManyIterationsException outOfBudget) {
            return Optional.empty();
        }
    }
}
