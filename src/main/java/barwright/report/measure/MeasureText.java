package barwright.report.measure;

import barwright.measure.BarRateFit;
import barwright.measure.CentreOfMassHeight;
import barwright.measure.CornerWeights;
import barwright.measure.MotionRatioFit;
import barwright.measure.MotionRatioMeasurement;
import barwright.measure.TiltMethod;
import barwright.units.Figures;
import barwright.units.Quantity;
import barwright.units.UnitSystem;

import java.util.List;
import java.util.Locale;

/** The measurements as the command line prints them, in the chosen units. */
public final class MeasureText {
    private MeasureText() {
    }

    /** @param modelRate the model's link rate (N/m), or null without a car */
    public static String bar(BarRateFit fit, Double modelRate, UnitSystem units) {
        StringBuilder out = new StringBuilder("Bar rate from load and deflection readings\n");
        out.append(String.format(Locale.ROOT, "  rate                %s%n", f(fit.rate(), Quantity.LINEAR_RATE, units, 2)));
        out.append(String.format(Locale.ROOT, "  free play (lash)    %s%n", f(fit.lash(), Quantity.LENGTH, units, 2)));
        out.append(String.format(Locale.ROOT, "  R²                  %.4f%n", fit.rSquared()));
        if (modelRate != null) {
            out.append(String.format(Locale.ROOT, "  model's rate        %s%n", f(modelRate, Quantity.LINEAR_RATE, units, 2)));
            out.append(String.format(Locale.ROOT, "  measured / model    %.3f%n", fit.rate() / modelRate));
        }
        out.append(String.format(Locale.ROOT, "%n  %-10s %14s %14s %14s  %s%n", "reading", "load", "deflection",
                "residual", "used as"));
        for (int i = 0; i < fit.readings().size(); i++) {
            var reading = fit.readings().get(i);
            out.append(String.format(Locale.ROOT, "  %-10s %14s %14s %14s  %s%n", reading.where(),
                    f(reading.load(), Quantity.FORCE, units, 1), f(reading.deflection(), Quantity.LENGTH, units, 2),
                    f(fit.residuals().get(i), Quantity.FORCE, units, 1), fit.roles().get(i).words()));
        }
        warnings(out, fit.warnings());
        return out.toString();
    }

    public static String motionRatio(MotionRatioFit fit, UnitSystem units) {
        StringBuilder out = new StringBuilder("Motion ratio from travel readings\n");
        out.append(String.format(Locale.ROOT, "  ratio (component / wheel)   %.4f%n", fit.ratio()));
        if (fit.cosineCorrection() != 1) {
            out.append(String.format(Locale.ROOT, "  cosine correction applied   %.4f%n", fit.cosineCorrection()));
        }
        String trend = Math.abs(fit.ratioChangePer100Mm()) < MotionRatioMeasurement.NOTABLE_CHANGE_PER_100_MM
                ? "about constant" : fit.ratioChangePer100Mm() > 0 ? "rising in bump" : "falling in bump";
        out.append(String.format(Locale.ROOT, "  change per 100 mm of travel %+.4f (%s)%n", fit.ratioChangePer100Mm(),
                trend));
        out.append(String.format(Locale.ROOT, "  R²                          %.4f%n", fit.rSquared()));
        out.append(String.format(Locale.ROOT, "%n  %-10s %14s %14s %14s%n", "reading", "wheel", "component", "residual"));
        for (int i = 0; i < fit.readings().size(); i++) {
            var reading = fit.readings().get(i);
            out.append(String.format(Locale.ROOT, "  %-10s %14s %14s %14s%s%n", reading.where(),
                    f(reading.wheelTravel(), Quantity.LENGTH, units, 2),
                    f(reading.componentTravel(), Quantity.LENGTH, units, 2),
                    f(fit.residuals().get(i), Quantity.LENGTH, units, 3), fit.outliers().get(i) ? "  outlier" : ""));
        }
        warnings(out, fit.warnings());
        return out.toString();
    }

    public static String centreOfMass(CentreOfMassHeight height, UnitSystem units) {
        StringBuilder out = new StringBuilder("Centre-of-mass height by raising one axle\n");
        out.append(String.format(Locale.ROOT, "  height above the ground   %s ± %s (about 95 %%)%n",
                f(height.height(), Quantity.LENGTH, units, 0), f(height.uncertainty(), Quantity.LENGTH, units, 0)));
        out.append(String.format(Locale.ROOT, "  above the wheel centres   %s%n",
                f(height.aboveWheelCentres(), Quantity.LENGTH, units, 0)));
        out.append(String.format(Locale.ROOT, "  tilt                      %.2f deg%n", Math.toDegrees(height.tiltAngle())));
        out.append(String.format(Locale.ROOT, "  load moved                %s%n", f(height.loadMoved(), Quantity.MASS, units, 1)));
        warnings(out, height.warnings());
        out.append("\nThe method holds only if:\n");
        TiltMethod.CAUTIONS.forEach(caution -> out.append("  - ").append(caution).append('\n'));
        return out.toString();
    }

    /** Corner weights laid out as the four scales sit under the car. */
    public static String corners(CornerWeights weights, UnitSystem units) {
        StringBuilder out = new StringBuilder("Corner weights (front at the top)\n\n");
        out.append(String.format(Locale.ROOT, "  %16s   %16s%n", "left front", "right front"));
        out.append(String.format(Locale.ROOT, "  %16s   %16s%n%n", f(weights.leftFront(), Quantity.MASS, units, 1),
                f(weights.rightFront(), Quantity.MASS, units, 1)));
        out.append(String.format(Locale.ROOT, "  %16s   %16s%n", "left rear", "right rear"));
        out.append(String.format(Locale.ROOT, "  %16s   %16s%n%n", f(weights.leftRear(), Quantity.MASS, units, 1),
                f(weights.rightRear(), Quantity.MASS, units, 1)));
        out.append(String.format(Locale.ROOT, "  total         %s%n", f(weights.total(), Quantity.MASS, units, 1)));
        out.append(String.format(Locale.ROOT, "  front share   %.2f %%%n", weights.frontShare() * 100));
        out.append(String.format(Locale.ROOT, "  left share    %.2f %%%n", weights.leftShare() * 100));
        out.append(String.format(Locale.ROOT, "  cross weight  %.2f %% (left front + right rear)%n",
                weights.crossWeight() * 100));
        if (weights.linkChange() != null) {
            double change = weights.linkChange();
            out.append(String.format(Locale.ROOT, "%nFor a cross weight of %.2f %%: make the %s bar link %s %s, where "
                            + "making it longer loads the %s wheels.%n", weights.target() * 100, weights.axle().key(),
                    f(Math.abs(change), Quantity.LENGTH, units, 1), change >= 0 ? "longer" : "shorter",
                    weights.diagonal().gains()));
        }
        warnings(out, weights.warnings());
        return out.toString();
    }

    private static String f(double si, Quantity quantity, UnitSystem units, int decimals) {
        return Figures.format(si, quantity, units, decimals);
    }

    private static void warnings(StringBuilder out, List<String> warnings) {
        if (!warnings.isEmpty()) {
            out.append("\nCheck:\n");
            warnings.forEach(w -> out.append("  - ").append(w).append('\n'));
        }
    }
}
