package barwright.physics.curve;

import barwright.model.AxlePosition;
import barwright.model.LoadPoint;
import barwright.model.LoadTable;
import barwright.model.Tyre;
import barwright.model.TurnDirection;
import barwright.physics.AnalysisResult;
import barwright.physics.TurnResult;
import barwright.physics.TyreModel;
import barwright.physics.WheelLoads;

import java.util.ArrayList;
import java.util.List;

import static barwright.units.Constants.RADIANS_PER_DEGREE;

/**
 * The tyre page's lines, in SI, from the public tyre model (model.md 8): peak friction against load (the law, or
 * the interpolation between the points and the continuation past them, apart), the lateral force against slip
 * angle at an axle's static, inside and outside loads at the limit, and the camber effect. The one producer of
 * these lines for the window.
 */
public final class TyreCurves {
    /** Samples along each line: enough for a smooth curve at any window size. */
    static final int POINTS = 121;
    /** The load axis runs this far past the highest load of interest, so the last marker is not on the edge. */
    static final double LOAD_MARGIN = 1.25;
    /** The slip axis runs to this multiple of the largest peak slip angle of the three curves. */
    static final double SLIP_MARGIN = 2.0;
    /** The camber axis runs this far either side of the best camber (rad): about 5 deg. */
    static final double CAMBER_SPAN = 5 * RADIANS_PER_DEGREE;

    private TyreCurves() {
    }

    /**
     * An axle's wheel loads at the limit of a turn (N).
     *
     * @param staticLoad the mean of the axle's two static wheel loads
     * @param inside     the inside wheel's load at the grip limit (zero once lifted)
     * @param outside    the outside wheel's load at the grip limit
     */
    public record AxleLoads(double staticLoad, double inside, double outside) {
        /** @return the three loads in the order static, inside, outside */
        public double[] all() {
            return new double[]{staticLoad, inside, outside};
        }
    }

    /** @return the axle's static, inside and outside wheel loads at the limit of the turn */
    public static AxleLoads loads(AnalysisResult result, AxlePosition axle, TurnDirection direction) {
        TurnResult turn = result.turn(direction);
        WheelLoads rest = turn.cornering().wheelLoads(0);
        WheelLoads limit = turn.cornering().wheelLoads(turn.limit());
        return axle == AxlePosition.FRONT
                ? new AxleLoads(0.5 * (rest.frontOutside() + rest.frontInside()), limit.frontInside(),
                limit.frontOutside())
                : new AxleLoads(0.5 * (rest.rearOutside() + rest.rearInside()), limit.rearInside(),
                limit.rearOutside());
    }

    /**
     * The peak friction against load. For a law tyre {@code measured} and {@code beyond} are empty and the line
     * covers every load; for a tyre given as points, {@code withinData} runs from the lowest to the highest
     * point, {@code beyond} is the model's continuation below the lowest point and past the highest (two series,
     * so that nothing joins them across the data) and {@code measured} the points themselves.
     *
     * @param withinData the law, or the interpolation between the points
     * @param beyond     the continuation past the points, each stretch a series (empty for a law tyre)
     * @param measured   the given points (empty for a law tyre)
     * @param lowestData the lowest load of the points (N), NaN for a law tyre
     * @param highestData the highest load of the points (N), NaN for a law tyre
     */
    public record FrictionLine(Series withinData, List<Series> beyond, Series measured, double lowestData,
                               double highestData) {
        public FrictionLine {
            beyond = List.copyOf(beyond);
        }

        public boolean fromPoints() {
            return !Double.isNaN(lowestData);
        }
    }

    /**
     * @param upToLoad the highest load the chart must show (N), e.g. the outside wheel's at the limit
     * @return the peak friction against load from zero to past the loads of interest and the points
     */
    public static FrictionLine frictionAgainstLoad(TyreModel model, double upToLoad) {
        Tyre tyre = model.tyre();
        if (!tyre.hasFrictionPoints()) {
            double top = LOAD_MARGIN * Math.max(upToLoad, tyre.nominalLoad());
            return new FrictionLine(sample("peak friction", model::friction, 0, top), List.of(),
                    new Series("measured points", new double[0], new double[0]), Double.NaN, Double.NaN);
        }
        LoadTable table = tyre.frictionByLoad();
        double lowest = table.lowestLoad();
        double highest = table.highestLoad();
        double top = LOAD_MARGIN * Math.max(upToLoad, highest);
        List<Series> beyond = new ArrayList<>();
        beyond.add(sample("below the points", model::friction, 0, lowest));
        beyond.add(sample("past the points", model::friction, highest, top));
        double[] loads = table.points().stream().mapToDouble(LoadPoint::load).toArray();
        double[] values = table.points().stream().mapToDouble(LoadPoint::value).toArray();
        return new FrictionLine(sample("between the points", model::friction, lowest, highest), beyond,
                new Series("measured points", loads, values), lowest, highest);
    }

    /**
     * @param loads  the wheel loads (N), one curve each; an unloaded wheel gives a flat zero line
     * @param camber the wheels' camber to the road (rad), J670 sense of the outside wheel
     * @return the lateral force (N) against slip angle (rad) from zero to past the highest curve's peak
     */
    public static List<Series> forceAgainstSlip(TyreModel model, double[] loads, String[] names, double camber) {
        double widest = 0;
        List<TyreModel.LoadedCurve> curves = new ArrayList<>();
        for (double load : loads) {
            TyreModel.LoadedCurve curve = model.atLoad(load, camber);
            curves.add(curve);
            if (curve.peak() > 0) {
                widest = Math.max(widest, curve.peakSlipAngle() + curve.slipShift());
            }
        }
        double top = Math.max(2 * RADIANS_PER_DEGREE, SLIP_MARGIN * widest);
        List<Series> lines = new ArrayList<>();
        for (int i = 0; i < curves.size(); i++) {
            lines.add(sample(names[i], curves.get(i)::lateralForce, 0, top));
        }
        return lines;
    }

    /**
     * The camber effect at one load (model.md 8.2).
     *
     * @param friction the peak friction against camber (rad)
     * @param thrust   the camber thrust at zero slip (N) against camber (rad)
     * @param best     the camber of the highest peak friction (rad)
     */
    public record CamberEffect(Series friction, Series thrust, double best) {
    }

    /** @return the camber effect at the load over the best camber +-5 deg (and zero), or null for no camber terms */
    public static CamberEffect camberEffect(TyreModel model, double load) {
        if (model.tyre().camber().isNone()) {
            return null;
        }
        double best = model.tyre().camber().camberForPeakGrip();
        double from = Math.min(best - CAMBER_SPAN, -RADIANS_PER_DEGREE);
        double to = Math.max(best + CAMBER_SPAN, RADIANS_PER_DEGREE);
        return new CamberEffect(sample("peak friction", camber -> model.friction(load, camber), from, to),
                sample("camber thrust at zero slip", camber -> model.camberThrust(load, camber), from, to), best);
    }

    private static Series sample(String name, java.util.function.DoubleUnaryOperator f, double from, double to) {
        double[] x = new double[POINTS];
        double[] y = new double[POINTS];
        for (int i = 0; i < POINTS; i++) {
            x[i] = from + (to - from) * i / (POINTS - 1);
            y[i] = f.applyAsDouble(x[i]);
        }
        return new Series(name, x, y);
    }
}
