package barwright.measure;

import barwright.solver.LinearFit;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * A bar's rate from load and deflection readings at one link point, the other end held (model.md 12.1).
 * Readings with a load under {@link #FREE_PLAY_SHARE} of the largest are taken as the free play being taken
 * up and left out; a straight line is fitted by least squares to the rest, readings far off it are flagged
 * by {@link OutlierRule} and left out, and the line is fitted again. The rate is its slope and the free play
 * (lash) the deflection where it crosses zero load. Hanging known weights and reading the travel with a
 * dial gauge is common practice; the fit is ordinary least squares.
 */
public final class BarRateMeasurement {
    /** Readings with a load under this share of the largest load count as free play (the program's choice). */
    public static final double FREE_PLAY_SHARE = 0.05;
    /** A fit explaining less than this share of the scatter gets a warning (the program's choice). */
    public static final double LOW_R_SQUARED = 0.98;
    /** Scatter below this share of the largest load is taken as the scale's resolution, not as scatter. */
    static final double RESOLUTION_SHARE = 1e-3;
    /** A line crossing zero load this far before the first reading's zero gets a warning (m). */
    static final double NEGATIVE_LASH_WARNING = 0.2e-3;

    private BarRateMeasurement() {
    }

    public static BarRateFit fit(List<BarReading> readings) throws MeasurementException {
        if (readings.size() < 3) {
            throw new MeasurementException("a bar rate needs at least 3 readings; there " + (readings.size() == 1
                    ? "is 1" : "are " + readings.size()));
        }
        double largest = readings.stream().mapToDouble(r -> Math.abs(r.load())).max().orElse(0);
        double smallest = readings.stream().mapToDouble(r -> Math.abs(r.load())).min().orElse(0);
        if (largest == 0 || largest - smallest <= 1e-9 * largest) {
            throw new MeasurementException(String.format(Locale.ROOT, "all %d readings have the same load, %s N: "
                    + "load the bar in steps (for example 0, 50, 100, 150, 200 N) and read the deflection at each",
                    readings.size(), plain(readings.get(0).load())));
        }
        double threshold = FREE_PLAY_SHARE * largest;
        List<ReadingRole> roles = new ArrayList<>();
        List<Integer> used = new ArrayList<>();
        for (int i = 0; i < readings.size(); i++) {
            boolean freePlay = Math.abs(readings.get(i).load()) < threshold;
            roles.add(freePlay ? ReadingRole.FREE_PLAY : ReadingRole.FITTED);
            if (!freePlay) {
                used.add(i);
            }
        }
        if (used.size() < 3) {
            throw new MeasurementException(String.format(Locale.ROOT, "only %d readings carry more than %.0f %% of "
                    + "the largest load (%s N); at least 3 are needed past the free play", used.size(),
                    FREE_PLAY_SHARE * 100, plain(largest)));
        }
        if (used.stream().mapToDouble(i -> readings.get(i).deflection()).distinct().count() < 2) {
            throw new MeasurementException("every loaded reading has the same deflection, "
                    + plain(readings.get(used.get(0)).deflection() * 1e3) + " mm: the dial gauge did not move");
        }
        // flag against a line fitted to the readings not flagged so far, until the flags settle: a reading far
        // off tilts the first line and can make a good one look off; three rounds are enough for one or two
        List<Integer> fitted = used;
        for (int round = 0; round < 3; round++) {
            LinearFit.Line trial = line(readings, fitted);
            double[] residuals = used.stream()
                    .mapToDouble(i -> readings.get(i).load() - trial.at(readings.get(i).deflection())).toArray();
            boolean[] far = OutlierRule.flag(residuals, RESOLUTION_SHARE * largest);
            List<Integer> kept = new ArrayList<>();
            for (int k = 0; k < used.size(); k++) {
                if (!far[k]) {
                    kept.add(used.get(k));
                }
            }
            if (kept.size() < 3 || kept.equals(fitted)) {
                break;
            }
            fitted = kept;
        }
        for (int i : used) {
            if (!fitted.contains(i)) {
                roles.set(i, ReadingRole.OUTLIER);
            }
        }
        LinearFit.Line line = line(readings, fitted);
        if (!(line.slope() > 0)) {
            throw new MeasurementException("the load falls as the deflection grows (slope "
                    + plain(line.slope() * 1e-3) + " N/mm): check that the columns are loadN,deflectionMm and "
                    + "that both are measured in the same direction");
        }
        double lash = -line.intercept() / line.slope();
        List<Double> residuals = readings.stream().map(r -> r.load() - line.at(r.deflection())).toList();
        return new BarRateFit(line.slope(), lash, line.rSquared(), readings, residuals, roles,
                warnings(line, lash, readings, roles));
    }

    private static LinearFit.Line line(List<BarReading> readings, List<Integer> which) {
        double[] x = which.stream().mapToDouble(i -> readings.get(i).deflection()).toArray();
        double[] y = which.stream().mapToDouble(i -> readings.get(i).load()).toArray();
        return LinearFit.line(x, y);
    }

    private static List<String> warnings(LinearFit.Line line, double lash, List<BarReading> readings,
                                         List<ReadingRole> roles) {
        List<String> warnings = new ArrayList<>();
        for (int i = 0; i < readings.size(); i++) {
            if (roles.get(i) == ReadingRole.OUTLIER) {
                warnings.add(readings.get(i).where() + " (" + plain(readings.get(i).load()) + " N at "
                        + plain(readings.get(i).deflection() * 1e3) + " mm) is far off the line and was left out: "
                        + "read it again");
            }
        }
        if (line.rSquared() < LOW_R_SQUARED) {
            warnings.add(String.format(Locale.ROOT, "the readings scatter about the line (R² %.3f): check that the "
                    + "held end cannot move and that the gauge reads at the link point", line.rSquared()));
        }
        if (lash < -NEGATIVE_LASH_WARNING) {
            warnings.add(String.format(Locale.ROOT, "the line crosses zero load %.2f mm before the first reading's "
                    + "zero: the bar was already loaded when the gauge was zeroed", -lash * 1e3));
        }
        return warnings;
    }

    static String plain(double value) {
        return String.format(Locale.ROOT, "%.6g", value).replaceAll("\\.?0+$", "")
                .replaceAll("\\.?0+e", "e");
    }
}
