package barwright.report.tyre;

import barwright.tyrefit.CurveFit;
import barwright.tyrefit.MagicFormula;
import barwright.tyrefit.TyreFit;

import java.util.Locale;

import static barwright.units.Constants.RADIANS_PER_DEGREE;

/** The readable summary of a tyre fit, for {@code tyre-fit} without {@code --json}. */
public final class TyreFitText {
    private TyreFitText() {
    }

    public static String of(TyreFit fit, String source) {
        StringBuilder text = new StringBuilder();
        text.append("Tyre fitted from ").append(source).append('\n');
        text.append("Magic Formula F = D sin(C atan(B a - E (B a - atan(B a)))) + Sv per curve, by least squares.\n\n");
        text.append(String.format(Locale.ROOT, "%8s %7s %6s %8s %6s %8s %6s %7s %7s %11s %8s %9s %7s%n", "load N",
                "camber", "points", "B /deg", "C", "D N", "E", "Sv N", "mu", "stiff N/deg", "RMS N", "worst N", "line"));
        for (CurveFit curve : fit.curves()) {
            MagicFormula f = curve.formula();
            text.append(String.format(Locale.ROOT, "%8.0f %7.1f %6d %8.4f %6.3f %8.0f %6.2f %7.1f %7.3f %11.0f "
                            + "%8.1f %9.1f %7d%n", curve.load(), curve.camber() / RADIANS_PER_DEGREE, curve.rows(),
                    f.stiffnessFactor() * RADIANS_PER_DEGREE, f.shapeFactor(), f.peak(), f.curvatureFactor(),
                    f.verticalShift(), curve.peakFriction(), f.corneringStiffness() * RADIANS_PER_DEGREE,
                    curve.rmsResidual(), curve.worstResidual(), curve.worstLine()));
        }
        double worstRms = fit.curves().stream().mapToDouble(CurveFit::rmsShareOfPeak).max().orElse(0);
        double worst = fit.curves().stream().mapToDouble(CurveFit::worstShareOfPeak).max().orElse(0);
        text.append(String.format(Locale.ROOT, "Residuals: RMS at most %.2f %% of a curve's peak, worst point "
                + "%.2f %%.%n%n", 100 * worstRms, 100 * worst));
        text.append("For the vehicle file (points at the best camber, zero-camber curves):\n");
        text.append(String.format(Locale.ROOT, "  reference load %.0f N, shape factor C %.3f, curvature factor E "
                + "%.3f%n", fit.nominalLoad(), fit.shapeFactor(), fit.curvatureFactor()));
        for (int i = 0; i < fit.frictionPoints().points().size(); i++) {
            var friction = fit.frictionPoints().points().get(i);
            var stiffness = fit.stiffnessPoints().points().get(i);
            text.append(String.format(Locale.ROOT, "  %6.0f N: peak friction %.3f, cornering stiffness %.0f N/deg%n",
                    friction.load(), friction.value(), stiffness.value() * RADIANS_PER_DEGREE));
        }
        if (fit.camberFitted()) {
            text.append(String.format(Locale.ROOT, "  camber: best %.2f deg, friction loss %.5f per deg², "
                            + "camber thrust %.4f per deg per N of load%n",
                    fit.camber().camberForPeakGrip() / RADIANS_PER_DEGREE,
                    fit.camber().peakFrictionLossPerRadSquared() * RADIANS_PER_DEGREE * RADIANS_PER_DEGREE,
                    fit.camber().camberStiffnessPerLoad() * RADIANS_PER_DEGREE));
        } else {
            text.append("  camber: not fitted (the data needs one load at three or more cambers)\n");
        }
        for (String warning : fit.warnings()) {
            text.append("Warning: ").append(warning).append('\n');
        }
        text.append("\nCaution: a fitted tyre is only as good as the test behind it. Check the fit against the "
                + "measured points (--plot) before you rely on it, and test changes to a car with care.\n");
        return text.toString();
    }
}
