package barwright.physics.dynamics;

import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.EigenDecomposition;

/**
 * The linearised roll mode straight ahead (model.md 14): the eigenvalues of the roll model's Jacobian at rest
 * with a_y = 0, where every damper curve is linear. The body's mode is the complex pair of least modulus:
 * omega_n = |lambda| and zeta = -Re(lambda) / |lambda|; with no complex pair (an overdamped body) the two real
 * eigenvalues of least size give omega_n = sqrt(lambda_1 lambda_2) and zeta = -(lambda_1 + lambda_2) /
 * (2 omega_n).
 *
 * @param naturalFrequency the undamped natural frequency omega_n / (2 pi) (Hz)
 * @param dampingRatio     zeta
 */
public record RollModes(double naturalFrequency, double dampingRatio) {
    /** Eigenvalues smaller than this (1/s) belong to states the linear model does not use. */
    private static final double NEGLIGIBLE = 1e-9;
    /** Step of the central differences (rad, rad/s): the model is linear near rest, so any small step is exact. */
    private static final double DIFFERENCE_STEP = 1e-7;

    public static RollModes of(RollModel model) {
        int n = model.dimension();
        LateralInput atRest = new LateralInput.Step(0, 0);
        double[][] jacobian = new double[n][n];
        double[] up = new double[n];
        double[] down = new double[n];
        for (int j = 0; j < n; j++) {
            double[] y = new double[n];
            y[j] = DIFFERENCE_STEP;
            model.derivatives(0, y, atRest, up);
            y[j] = -DIFFERENCE_STEP;
            model.derivatives(0, y, atRest, down);
            for (int i = 0; i < n; i++) {
                jacobian[i][j] = (up[i] - down[i]) / (2 * DIFFERENCE_STEP);
            }
        }
        EigenDecomposition eigen = new EigenDecomposition(new Array2DRowRealMatrix(jacobian, false));
        double[] real = eigen.getRealEigenvalues();
        double[] imaginary = eigen.getImagEigenvalues();
        double bestModulus = Double.POSITIVE_INFINITY;
        double bestReal = 0;
        for (int i = 0; i < n; i++) {
            double modulus = Math.hypot(real[i], imaginary[i]);
            if (Math.abs(imaginary[i]) > NEGLIGIBLE && modulus < bestModulus) {
                bestModulus = modulus;
                bestReal = real[i];
            }
        }
        if (Double.isFinite(bestModulus)) {
            return new RollModes(bestModulus / (2 * Math.PI), -bestReal / bestModulus);
        }
        double first = Double.NEGATIVE_INFINITY;
        double second = Double.NEGATIVE_INFINITY; // the two real eigenvalues nearest zero (negative)
        for (int i = 0; i < n; i++) {
            if (Math.abs(real[i]) > NEGLIGIBLE && real[i] > second) {
                if (real[i] > first) {
                    second = first;
                    first = real[i];
                } else {
                    second = real[i];
                }
            }
        }
        double omega = Math.sqrt(first * second);
        return new RollModes(omega / (2 * Math.PI), -(first + second) / (2 * omega));
    }
}
