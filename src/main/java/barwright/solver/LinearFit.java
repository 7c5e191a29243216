package barwright.solver;

import java.util.Arrays;
import org.apache.commons.math3.stat.regression.OLSMultipleLinearRegression;
import org.apache.commons.math3.stat.regression.SimpleRegression;

/**
 * Ordinary least squares through Commons Math: a straight line ({@link SimpleRegression}) and a quadratic
 * ({@link OLSMultipleLinearRegression}, QR decomposition). Both are exact solutions of the normal equations,
 * so there is no iteration budget; the callers refuse data that leaves the fit undetermined before calling.
 */
public final class LinearFit {
    private LinearFit() {
    }

    /**
     * y = intercept + slope x.
     *
     * @param slope     dy/dx
     * @param intercept y at x = 0
     * @param rSquared  coefficient of determination, 1 for points exactly on the line
     */
    public record Line(double slope, double intercept, double rSquared) {
        public double at(double x) {
            return intercept + slope * x;
        }
    }

    /**
     * y = c0 + c1 x + c2 x^2.
     *
     * @param c0 constant term
     * @param c1 linear term
     * @param c2 quadratic term
     */
    public record Quadratic(double c0, double c1, double c2) {
    }

    /** @return the least-squares line through at least two points with distinct x */
    public static Line line(double[] x, double[] y) {
        requireSameLength(x, y, 2);
        SimpleRegression regression = new SimpleRegression(true);
        for (int i = 0; i < x.length; i++) {
            regression.addData(x[i], y[i]);
        }
        double slope = regression.getSlope();
        if (!Double.isFinite(slope)) {
            throw new IllegalArgumentException("a line needs at least two different x values");
        }
        double rSquared = regression.getRSquare();
        // all y equal on a line of slope 0: the line explains everything there is
        return new Line(slope, regression.getIntercept(), Double.isFinite(rSquared) ? rSquared : 1);
    }

    /** @return the least-squares quadratic through at least three points with three distinct x */
    public static Quadratic quadratic(double[] x, double[] y) {
        requireSameLength(x, y, 3);
        if (Arrays.stream(x).distinct().count() < 3) {
            throw new IllegalArgumentException("a quadratic needs at least three different x values");
        }
        double[][] design = new double[x.length][];
        for (int i = 0; i < x.length; i++) {
            design[i] = new double[] {x[i], x[i] * x[i]};
        }
        OLSMultipleLinearRegression regression = new OLSMultipleLinearRegression();
        regression.newSampleData(y.clone(), design);
        double[] beta = regression.estimateRegressionParameters();
        return new Quadratic(beta[0], beta[1], beta[2]);
    }

    private static void requireSameLength(double[] x, double[] y, int minimum) {
        if (x.length != y.length) {
            throw new IllegalArgumentException("x and y differ in length: " + x.length + " and " + y.length);
        }
        if (x.length < minimum) {
            throw new IllegalArgumentException("at least " + minimum + " points are needed, got " + x.length);
        }
    }
}
