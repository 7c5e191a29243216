package barwright.tyrefit;

import barwright.model.LoadPoint;
import barwright.model.LoadTable;
import barwright.model.TyreCamber;
import barwright.solver.LeastSquares;
import barwright.solver.Progress;
import org.apache.commons.math3.fitting.PolynomialCurveFitter;
import org.apache.commons.math3.fitting.WeightedObservedPoints;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.RealMatrix;
import org.apache.commons.math3.util.Pair;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;
import java.util.TreeMap;

import static barwright.units.Constants.RADIANS_PER_DEGREE;

/**
 * Fits a tyre to measured lateral force curves (model.md 8.3). The points with the same load and camber form
 * one curve; each curve gets the Magic Formula by Levenberg-Marquardt; the zero-camber curves give the peak
 * friction and cornering stiffness points; loads measured at three or more cambers give the camber terms.
 */
public final class TyreFitter {
    /** Fewer points than this per curve cannot pin five coefficients with any to spare. */
    public static final int MIN_POINTS_PER_CURVE = 8;
    /** The friction and stiffness points need this many loads (model.Tyre's points). */
    public static final int MIN_LOADS = LoadTable.MIN_POINTS;
    /** The fitted peak must lie inside the measured slip range: the curve reaches this share of D there. */
    static final double PEAK_REACHED_SHARE = 0.995;
    /** A curve whose RMS residual is above this share of its peak is warned about. */
    static final double POOR_FIT_SHARE = 0.05;
    static final double MAX_SLIP = 30 * RADIANS_PER_DEGREE;
    static final double MAX_CAMBER = 10 * RADIANS_PER_DEGREE;
    /**
     * Accuracy and budget of each curve's fit: relative changes of 1e-10 in cost and parameters, far below the
     * 1 % the fit is asked to recover peaks to; 2000 evaluations, where a curve typically needs 10-40.
     */
    static final LeastSquares.Settings SETTINGS = new LeastSquares.Settings(1e-10, 1e-10, 2000, 2000);

    private TyreFitter() {
    }

    public static TyreFit fit(List<TyreMeasurement> data) throws TyreFitException {
        return fit(data, Progress.NONE);
    }

    /**
     * @param progress told of each curve fitted (done and total in curves); checked for a cancel between curves
     * @throws java.util.concurrent.CancellationException where the caller cancels
     */
    public static TyreFit fit(List<TyreMeasurement> data, Progress progress) throws TyreFitException {
        List<String> problems = new ArrayList<>();
        checkRows(data, problems);
        if (!problems.isEmpty()) {
            throw new TyreFitException(problems);
        }
        // curves by load, then by camber; a tree keeps them in order
        TreeMap<Double, TreeMap<Double, List<TyreMeasurement>>> curves = new TreeMap<>();
        for (TyreMeasurement row : data) {
            curves.computeIfAbsent(row.load(), l -> new TreeMap<>())
                    .computeIfAbsent(row.camber(), c -> new ArrayList<>()).add(row);
        }
        List<Double> zeroCamberLoads = curves.entrySet().stream().filter(e -> e.getValue().containsKey(0.0))
                .map(Map.Entry::getKey).toList();
        if (zeroCamberLoads.size() < MIN_LOADS) {
            problems.add(tooFewLoads(data, curves, zeroCamberLoads));
            throw new TyreFitException(problems);
        }
        List<CurveFit> fits = new ArrayList<>();
        long total = curves.values().stream().mapToLong(TreeMap::size).sum();
        long done = 0;
        for (TreeMap<Double, List<TyreMeasurement>> byCamber : curves.values()) {
            for (List<TyreMeasurement> curve : byCamber.values()) {
                progress.checkCancelled();
                fitCurve(curve, problems).ifPresent(fits::add);
                progress.update(++done, total);
            }
        }
        if (!problems.isEmpty()) {
            throw new TyreFitException(problems);
        }
        return assemble(fits);
    }

    private static void checkRows(List<TyreMeasurement> data, List<String> problems) {
        if (data.isEmpty()) {
            problems.add("the data has no rows");
        }
        Map<List<Double>, Integer> seen = new HashMap<>();
        for (TyreMeasurement row : data) {
            if (!(row.load() > 0) || row.load() > 100000) {
                problems.add(String.format(Locale.ROOT, "line %d, loadN = %s: must be more than 0 and at most "
                        + "100000 N", row.line(), number(row.load())));
            }
            if (Math.abs(row.slipAngle()) > MAX_SLIP) {
                problems.add(String.format(Locale.ROOT, "line %d, slipAngleDeg = %s: must be between -30 and 30 deg",
                        row.line(), number(row.slipAngle() / RADIANS_PER_DEGREE)));
            }
            if (Math.abs(row.camber()) > MAX_CAMBER) {
                problems.add(String.format(Locale.ROOT, "line %d, camberDeg = %s: must be between -10 and 10 deg",
                        row.line(), number(row.camber() / RADIANS_PER_DEGREE)));
            }
            Integer earlier = seen.putIfAbsent(List.of(row.load(), row.slipAngle(), row.lateralForce(), row.camber()),
                    row.line());
            if (earlier != null) {
                problems.add("line " + row.line() + " repeats line " + earlier + " exactly (the same load, slip "
                        + "angle, force and camber): a row copied twice? Remove one");
            }
        }
    }

    private static String tooFewLoads(List<TyreMeasurement> data,
                                      TreeMap<Double, TreeMap<Double, List<TyreMeasurement>>> curves,
                                      List<Double> zeroCamberLoads) {
        if (curves.size() == 1) {
            return String.format(Locale.ROOT, "every row (lines %d to %d) is at one load, %s N: the fit needs "
                            + "curves at %d or more loads to give friction and stiffness against load",
                    data.get(0).line(), data.get(data.size() - 1).line(), number(curves.firstKey()), MIN_LOADS);
        }
        return String.format(Locale.ROOT, "the data has zero-camber curves at %d load(s) (%s N): the fit needs "
                        + "them at %d or more loads (rows without camberDeg count as zero camber)",
                zeroCamberLoads.size(), zeroCamberLoads.stream().map(TyreFitter::number).toList(), MIN_LOADS);
    }

    private static Optional<CurveFit> fitCurve(List<TyreMeasurement> curve, List<String> problems) {
        double load = curve.get(0).load();
        double camber = curve.get(0).camber();
        int first = curve.get(0).line();
        int last = curve.get(curve.size() - 1).line();
        String name = String.format(Locale.ROOT, "the curve at %s N, camber %s deg (lines %d to %d)", number(load),
                number(camber / RADIANS_PER_DEGREE), first, last);
        if (curve.size() < MIN_POINTS_PER_CURVE) {
            problems.add(name + " has " + curve.size() + " points: at least " + MIN_POINTS_PER_CURVE
                    + " are needed for the Magic Formula's five coefficients");
            return Optional.empty();
        }
        double[] slip = curve.stream().mapToDouble(TyreMeasurement::slipAngle).toArray();
        double[] force = curve.stream().mapToDouble(TyreMeasurement::lateralForce).toArray();
        Optional<LeastSquares.Solution> solution = LeastSquares.fit(point -> model(point.toArray(), slip), force,
                start(slip, force), TyreFitter::keepMeaningful, SETTINGS);
        if (solution.isEmpty()) {
            problems.add(name + ": the Magic Formula fit did not settle within " + SETTINGS.maxEvaluations()
                    + " evaluations; check the curve for stray points");
            return Optional.empty();
        }
        MagicFormula formula = MagicFormula.of(solution.get().parameters());
        double widest = 0;
        for (double s : slip) {
            widest = Math.max(widest, Math.abs(s));
        }
        if (highestWithin(formula, widest) < PEAK_REACHED_SHARE * formula.peak()) {
            problems.add(String.format(Locale.ROOT, "%s does not reach its peak within the measured slip angles "
                    + "(up to %.1f deg): measure to larger slip angles, past the peak of the force",
                    name, widest / RADIANS_PER_DEGREE));
            return Optional.empty();
        }
        double sumSquares = 0;
        double worst = -1;
        int worstLine = first;
        for (int i = 0; i < slip.length; i++) {
            double residual = force[i] - formula.force(slip[i]);
            sumSquares += residual * residual;
            if (Math.abs(residual) > worst) {
                worst = Math.abs(residual);
                worstLine = curve.get(i).line();
            }
        }
        return Optional.of(new CurveFit(load, camber, first, last, curve.size(), formula,
                Math.sqrt(sumSquares / slip.length), worst, worstLine));
    }

    /** @return the largest |F_y - S_V| of the fitted curve over slip angles up to the widest measured */
    private static double highestWithin(MagicFormula formula, double widest) {
        double highest = 0;
        for (int k = 0; k <= 400; k++) {
            double slip = widest * k / 400;
            highest = Math.max(highest, Math.abs(formula.force(slip) - formula.verticalShift()));
        }
        return highest;
    }

    private static Pair<org.apache.commons.math3.linear.RealVector, RealMatrix> model(double[] p, double[] slip) {
        MagicFormula formula = MagicFormula.of(p);
        double[] values = new double[slip.length];
        double[][] jacobian = new double[slip.length][];
        for (int i = 0; i < slip.length; i++) {
            values[i] = formula.force(slip[i]);
            jacobian[i] = formula.gradient(slip[i]);
        }
        return new Pair<>(new ArrayRealVector(values, false), new Array2DRowRealMatrix(jacobian, false));
    }

    /** First guess: D the largest force, C 1.5, E 0, B from the slope of the points nearest zero slip. */
    private static double[] start(double[] slip, double[] force) {
        double peak = 0;
        double sxy = 0;
        double sxx = 0;
        double smallest = Double.POSITIVE_INFINITY;
        for (double s : slip) {
            smallest = Math.min(smallest, Math.abs(s));
        }
        double near = Math.max(2 * RADIANS_PER_DEGREE, 3 * smallest);
        double shift = 0;
        int shiftCount = 0;
        for (int i = 0; i < slip.length; i++) {
            peak = Math.max(peak, Math.abs(force[i]));
            if (Math.abs(slip[i]) <= near) {
                sxy += slip[i] * force[i];
                sxx += slip[i] * slip[i];
                shift += force[i];
                shiftCount++;
            }
        }
        double slope = sxx > 0 ? sxy / sxx : peak / (5 * RADIANS_PER_DEGREE);
        double shape = 1.5;
        double stiffness = Math.max(slope, peak) / (shape * peak);
        return new double[]{stiffness, shape, peak, 0, shiftCount > 0 ? 0.5 * shift / shiftCount : 0};
    }

    /** Keeps B and D positive, C within 1 to 2 and E within -10 to 1 (the ranges of the vehicle file). */
    private static org.apache.commons.math3.linear.RealVector keepMeaningful(
            org.apache.commons.math3.linear.RealVector p) {
        double[] v = p.toArray();
        v[0] = Math.max(1e-3, Math.abs(v[0]));
        v[1] = Math.max(1, Math.min(2, v[1]));
        v[2] = Math.max(1e-3, Math.abs(v[2]));
        v[3] = Math.max(-10, Math.min(1, v[3]));
        return new ArrayRealVector(v, false);
    }

    private static TyreFit assemble(List<CurveFit> fits) throws TyreFitException {
        List<String> warnings = new ArrayList<>();
        for (CurveFit fit : fits) {
            if (fit.rmsShareOfPeak() > POOR_FIT_SHARE) {
                warnings.add(String.format(Locale.ROOT, "the curve at %s N, camber %s deg (lines %d to %d) is "
                                + "followed poorly: RMS residual %.1f %% of its peak; check it for stray points",
                        number(fit.load()), number(fit.camber() / RADIANS_PER_DEGREE), fit.firstLine(),
                        fit.lastLine(), 100 * fit.rmsShareOfPeak()));
            }
        }
        CamberTerms camber = CamberTerms.of(fits, warnings);
        List<CurveFit> zero = fits.stream().filter(f -> f.camber() == 0).toList();
        List<LoadPoint> friction = new ArrayList<>();
        List<LoadPoint> stiffness = new ArrayList<>();
        double shape = 0;
        double curvature = 0;
        double lossAtZero = camber.terms().peakFrictionLossPerRadSquared() * camber.terms().camberForPeakGrip()
                * camber.terms().camberForPeakGrip();
        for (CurveFit fit : zero) {
            // the points are the friction at the best camber: the zero-camber peak plus the loss from there
            friction.add(new LoadPoint(fit.load(), fit.peakFriction() + lossAtZero));
            stiffness.add(new LoadPoint(fit.load(), fit.formula().corneringStiffness()));
            shape += fit.formula().shapeFactor() / zero.size();
            curvature += fit.formula().curvatureFactor() / zero.size();
        }
        double middle = 0.5 * (zero.get(0).load() + zero.get(zero.size() - 1).load());
        double nominal = zero.stream().mapToDouble(CurveFit::load)
                .reduce((a, b) -> Math.abs(a - middle) <= Math.abs(b - middle) ? a : b).orElseThrow();
        return new TyreFit(fits, nominal, new LoadTable(friction), new LoadTable(stiffness), shape, curvature,
                camber.terms(), camber.fitted(), warnings);
    }

    static String number(double value) {
        if (value == Math.rint(value) && Math.abs(value) < 1e15) {
            return Long.toString((long) value);
        }
        return String.format(Locale.ROOT, "%.4g", value);
    }

    /** The camber terms from loads measured at three or more cambers (model.md 8.3). */
    record CamberTerms(TyreCamber terms, boolean fitted) {
        static CamberTerms of(List<CurveFit> fits, List<String> warnings) {
            Map<Double, List<CurveFit>> byLoad = new TreeMap<>();
            fits.forEach(f -> byLoad.computeIfAbsent(f.load(), l -> new ArrayList<>()).add(f));
            double best = 0;
            double loss = 0;
            double thrust = 0;
            int loads = 0;
            int lossLoads = 0;
            for (List<CurveFit> atLoad : byLoad.values()) {
                if (atLoad.size() == 2) {
                    warnings.add(String.format(Locale.ROOT, "the load %s N is measured at only two cambers: the "
                            + "camber terms need three or more, so it is left out of them", number(atLoad.get(0).load())));
                }
                if (atLoad.size() < 3) {
                    continue;
                }
                WeightedObservedPoints friction = new WeightedObservedPoints();
                double sxy = 0;
                double sxx = 0;
                for (CurveFit fit : atLoad) {
                    friction.add(fit.camber(), fit.peakFriction());
                    // camber thrust at zero slip, per N of load: -k_gamma gamma (model.md 8.2)
                    sxy += fit.camber() * fit.formula().force(0) / fit.load();
                    sxx += fit.camber() * fit.camber();
                }
                double[] quadratic = PolynomialCurveFitter.create(2).fit(friction.toList());
                double curvature = quadratic[2];
                if (curvature >= 0) {
                    warnings.add(String.format(Locale.ROOT, "at %s N the peak friction does not fall away either "
                            + "side of a best camber: no camber loss is fitted there", number(atLoad.get(0).load())));
                } else {
                    best += -quadratic[1] / (2 * curvature);
                    loss += -curvature;
                    lossLoads++;
                }
                thrust += -sxy / sxx;
                loads++;
            }
            if (loads == 0) {
                return new CamberTerms(TyreCamber.NONE, false);
            }
            double bestCamber = lossLoads == 0 ? 0 : Math.max(-MAX_CAMBER, Math.min(MAX_CAMBER, best / lossLoads));
            if (Math.abs(bestCamber) == MAX_CAMBER) {
                warnings.add("the best camber comes out at the edge of the allowed range, 10 deg: the measured "
                        + "cambers do not bracket it");
            }
            if (thrust < 0) {
                warnings.add("the camber thrust comes out against the lean of the tyre: check the sign of "
                        + "camberDeg (negative when the top leans towards the side the force points to); no "
                        + "camber thrust is fitted");
            }
            return new CamberTerms(new TyreCamber(bestCamber, lossLoads == 0 ? 0 : loss / lossLoads,
                    Math.max(0, thrust / loads)), true);
        }
    }
}
