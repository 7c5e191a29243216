package barwright.solver;

import org.apache.commons.math3.analysis.polynomials.PolynomialFunction;
import org.apache.commons.math3.analysis.polynomials.PolynomialSplineFunction;

/**
 * A shape-preserving piecewise cubic through points: between two points it never goes past them, and where
 * the points rise (or fall) it rises (or falls) too. It is a cubic Hermite interpolant whose slopes follow
 * Fritsch and Carlson's monotone scheme (SIAM J. Numer. Anal. 17, 1980; abstract and introduction read): at an
 * inner point the weighted harmonic mean of the two neighbouring chord slopes (Fritsch and Butland, 1984, as
 * described by the libtsp MSfIntMC documentation; the weights as a question-and-answer page quotes them),
 * zero where the chords change sign; at an end the three-point one-sided slope, kept to the end chord's sign
 * and within three times it (the usual end rule of this scheme, from memory). model.md 8.1 says why.
 *
 * <p>The pieces are Commons Math polynomials in a {@link PolynomialSplineFunction}; outside the points it is
 * not defined (the caller continues it, see {@link #endSlope(boolean)}).
 */
public final class MonotoneCubic {
    private final double[] x;
    private final double[] y;
    private final double[] slopes;
    private final PolynomialSplineFunction spline;
    private final PolynomialSplineFunction slope;

    /**
     * @param x abscissae, at least 3, strictly increasing and finite
     * @param y ordinates, finite, one per abscissa
     */
    public MonotoneCubic(double[] x, double[] y) {
        if (x.length != y.length || x.length < 3) {
            throw new IllegalArgumentException("need at least 3 points, as many x as y");
        }
        for (int i = 0; i < x.length; i++) {
            if (!Double.isFinite(x[i]) || !Double.isFinite(y[i]) || (i > 0 && !(x[i] > x[i - 1]))) {
                throw new IllegalArgumentException("points must be finite with x strictly increasing, at " + i);
            }
        }
        this.x = x.clone();
        this.y = y.clone();
        this.slopes = slopes(this.x, this.y);
        PolynomialFunction[] pieces = new PolynomialFunction[x.length - 1];
        for (int i = 0; i < pieces.length; i++) {
            double h = x[i + 1] - x[i];
            double chord = (y[i + 1] - y[i]) / h;
            double m0 = slopes[i];
            double m1 = slopes[i + 1];
            // the cubic Hermite piece in t = x - x_i: value y_i, slope m0 at t = 0; y_{i+1}, m1 at t = h
            pieces[i] = new PolynomialFunction(new double[]{y[i], m0, (3 * chord - 2 * m0 - m1) / h,
                    (m0 + m1 - 2 * chord) / (h * h)});
        }
        this.spline = new PolynomialSplineFunction(this.x, pieces);
        this.slope = spline.polynomialSplineDerivative();
    }

    private static double[] slopes(double[] x, double[] y) {
        int n = x.length;
        double[] h = new double[n - 1];
        double[] chord = new double[n - 1];
        for (int i = 0; i < n - 1; i++) {
            h[i] = x[i + 1] - x[i];
            chord[i] = (y[i + 1] - y[i]) / h[i];
        }
        double[] m = new double[n];
        for (int i = 1; i < n - 1; i++) {
            if (chord[i - 1] * chord[i] <= 0) {
                m[i] = 0; // a turning point (or a flat piece): a level tangent keeps both pieces within the points
            } else {
                double w1 = 2 * h[i] + h[i - 1];
                double w2 = h[i] + 2 * h[i - 1];
                m[i] = (w1 + w2) / (w1 / chord[i - 1] + w2 / chord[i]);
            }
        }
        m[0] = endSlope(h[0], h[1], chord[0], chord[1]);
        m[n - 1] = endSlope(h[n - 2], h[n - 3], chord[n - 2], chord[n - 3]);
        return m;
    }

    /** The one-sided three-point slope at an end, kept to the sign of the end chord and within 3 times it. */
    private static double endSlope(double hEnd, double hNext, double chordEnd, double chordNext) {
        double slope = ((2 * hEnd + hNext) * chordEnd - hEnd * chordNext) / (hEnd + hNext);
        if (Math.signum(slope) != Math.signum(chordEnd)) {
            return 0;
        }
        if (Math.signum(chordEnd) != Math.signum(chordNext) && Math.abs(slope) > 3 * Math.abs(chordEnd)) {
            return 3 * chordEnd;
        }
        return slope;
    }

    /** @return the interpolated value; the argument is clamped to the points' range */
    public double value(double at) {
        return spline.value(Math.max(x[0], Math.min(x[x.length - 1], at)));
    }

    /** @return the slope of the interpolant; the argument is clamped to the points' range */
    public double derivative(double at) {
        return slope.value(Math.max(x[0], Math.min(x[x.length - 1], at)));
    }

    /** @return the first (false) or last (true) abscissa */
    public double end(boolean last) {
        return last ? x[x.length - 1] : x[0];
    }

    /** @return the value at the first (false) or last (true) point */
    public double endValue(boolean last) {
        return last ? y[y.length - 1] : y[0];
    }

    /** @return the interpolant's slope at the first (false) or last (true) point */
    public double endSlope(boolean last) {
        return last ? slopes[slopes.length - 1] : slopes[0];
    }
}
