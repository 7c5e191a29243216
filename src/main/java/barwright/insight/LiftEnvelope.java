package barwright.insight;

import barwright.model.AxlePosition;
import barwright.model.TurnDirection;
import barwright.physics.AnalysisResult;
import barwright.physics.MassProperties;
import barwright.physics.SteadyCornering;
import barwright.physics.VehicleAnalysis;
import barwright.solver.RootFinder;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.TreeSet;
import java.util.function.DoubleUnaryOperator;

import static barwright.units.Constants.STANDARD_GRAVITY;

/**
 * The lift envelope (model.md 7 with a longitudinal acceleration a_x): braking or power moves m a_x h / l of
 * static load between the axles, then the lateral calculation of the analysis finds the a_y at which each
 * inside wheel lifts. Accelerations in m/s^2, a_x forward positive.
 *
 * <p>Each boundary is linear in a_x between the a_x at which the first axle to lift changes (the static inside
 * loads are linear in a_x, the transfer per a_y is not changed by it): those corners are found with a Brent
 * solver and drawn exactly, with a regular grid between them.
 */
public final class LiftEnvelope {
    /** The most braking drawn (m/s^2): 1.2 g, past the grip of road tyres (issue 6). */
    public static final double MOST_BRAKING = -1.2 * STANDARD_GRAVITY;
    /** The most acceleration drawn (m/s^2): 0.6 g (issue 6). */
    public static final double MOST_ACCELERATION = 0.6 * STANDARD_GRAVITY;
    /** The a_x values at which the readable output quotes every wheel's lift (m/s^2): 0.3 g braking, none, 0.3 g power. */
    public static final List<Double> QUOTED = List.of(-0.3 * STANDARD_GRAVITY, 0.0, 0.3 * STANDARD_GRAVITY);
    /** Spacing of the regular grid between the boundary's corners (m/s^2). */
    static final double GRID_STEP = 0.05 * STANDARD_GRAVITY;
    /** Accuracy of the corners and of the crossings with the lateral limit (m/s^2). */
    static final double ACCURACY = 1e-9;
    /** A lift past this counts as "never" when solving for a crossing (m/s^2). */
    private static final double NEVER = 100 * STANDARD_GRAVITY;
    /** Where the first axle to lift changes, to {@link #ACCURACY} within 200 evaluations. */
    private static final RootFinder CORNER = RootFinder.of("the braking or acceleration at which the first axle "
            + "to lift changes", ACCURACY, 200);
    /** Where a lift crosses the lateral limit, to {@link #ACCURACY} within 200 evaluations. */
    private static final RootFinder CROSSING = RootFinder.of("the braking or acceleration at which a wheel's "
            + "lift meets the lateral limit", ACCURACY, 200);

    private final AnalysisResult analysis;

    /** @param analysis the analysed car (a_x = 0) */
    public LiftEnvelope(AnalysisResult analysis) {
        this.analysis = analysis;
    }

    /** @return the envelope of an analysed car */
    public static LiftEnvelopeResult of(AnalysisResult analysis) {
        return new LiftEnvelope(analysis).compute();
    }

    /**
     * @param longitudinalAcceleration a_x, forward positive (m/s^2)
     * @return the a_y at which the wheel lifts (m/s^2), following model.md 7 (a second lift accounts for the
     *     first); {@code Double.POSITIVE_INFINITY} where it never does
     */
    public double lift(Wheel wheel, double longitudinalAcceleration) {
        return cornering(wheel, longitudinalAcceleration).insideLift(wheel.axle());
    }

    private SteadyCornering cornering(Wheel wheel, double longitudinalAcceleration) {
        return VehicleAnalysis.cornering(analysis, wheel.insideIn(), longitudinalAcceleration);
    }

    public LiftEnvelopeResult compute() {
        List<String> notes = new ArrayList<>();
        double braking = Math.max(MOST_BRAKING, -straightLineLimit(AxlePosition.REAR));
        double acceleration = Math.min(MOST_ACCELERATION, straightLineLimit(AxlePosition.FRONT));
        if (braking > MOST_BRAKING) {
            notes.add(String.format(Locale.ROOT, "Under %.2f g braking a rear wheel carries no load even in a straight "
                    + "line: the envelope stops there.", -braking / STANDARD_GRAVITY));
        }
        if (acceleration < MOST_ACCELERATION) {
            notes.add(String.format(Locale.ROOT, "Under %.2f g acceleration a front wheel carries no load even in a "
                    + "straight line: the envelope stops there.", acceleration / STANDARD_GRAVITY));
        }
        notes.add("The lateral limit is marked as found at a_x = 0. Braking and power use up grip (combined slip is "
                + "not modelled), so the real lateral limit away from a_x = 0 is lower.");
        List<LiftBoundary> boundaries = new ArrayList<>();
        for (Wheel wheel : Wheel.values()) {
            boundaries.add(boundary(wheel, abscissae(wheel.insideIn(), braking, acceleration)));
        }
        return new LiftEnvelopeResult(analysis.vehicle().name(), braking, acceleration,
                analysis.turn(TurnDirection.LEFT).limit(), analysis.turn(TurnDirection.RIGHT).limit(), boundaries,
                notes);
    }

    /**
     * @return the a_x magnitude at which the lightest wheel of an axle has no static load left (m/s^2):
     *     W - m |a_x| h / (2 l) = 0 per wheel
     */
    private double straightLineLimit(AxlePosition axle) {
        MassProperties masses = analysis.masses();
        MassProperties.StaticWheelLoads loads = masses.staticLoads();
        double lightest = axle == AxlePosition.FRONT ? Math.min(loads.leftFront(), loads.rightFront())
                : Math.min(loads.leftRear(), loads.rightRear());
        return lightest * 2 * wheelbase() / (masses.mass() * analysis.vehicle().cgHeight());
    }

    private double wheelbase() {
        return analysis.masses().cgToFrontAxle() + analysis.masses().cgToRearAxle();
    }

    /** The grid, the quoted values and the corners where the first axle to lift changes, in one turn. */
    private List<Double> abscissae(TurnDirection turn, double braking, double acceleration) {
        TreeSet<Double> values = new TreeSet<>();
        int first = (int) Math.ceil(braking / GRID_STEP - 1e-9);
        int last = (int) Math.floor(acceleration / GRID_STEP + 1e-9);
        values.add(braking);
        for (int i = first; i <= last; i++) {
            values.add(i * GRID_STEP);
        }
        values.add(acceleration);
        QUOTED.stream().filter(value -> value >= braking && value <= acceleration).forEach(values::add);
        // the first axle to lift is the one whose inside wheel would lift first alone: where the two are
        // equal the boundaries have a corner
        DoubleUnaryOperator difference = ax -> aloneLift(turn, AxlePosition.FRONT, ax)
                - aloneLift(turn, AxlePosition.REAR, ax);
        List<Double> grid = new ArrayList<>(values);
        for (int i = 1; i < grid.size(); i++) {
            double low = difference.applyAsDouble(grid.get(i - 1));
            double high = difference.applyAsDouble(grid.get(i));
            if (Double.isFinite(low) && Double.isFinite(high) && low * high < 0) {
                values.add(CORNER.solve(difference, grid.get(i - 1), grid.get(i)));
            }
        }
        // a grid value and a quoted or solved one that differ by round-off only are one point
        List<Double> distinct = new ArrayList<>();
        for (double value : values) {
            if (distinct.isEmpty() || value - distinct.get(distinct.size() - 1) > ACCURACY) {
                distinct.add(value);
            }
        }
        return distinct;
    }

    /**
     * @return the a_y at which an axle's inside wheel would lift were it the first (m/s^2): its static load
     *     with a_x over the axle's transfer per a_y (model.md 7); infinite where the transfer is not positive
     */
    private double aloneLift(TurnDirection turn, AxlePosition axle, double longitudinalAcceleration) {
        MassProperties.StaticWheelLoads loads = analysis.masses()
                .withLongitudinalAcceleration(longitudinalAcceleration, analysis.vehicle().cgHeight()).staticLoads();
        double inside = axle == AxlePosition.FRONT ? loads.frontInside(turn) : loads.rearInside(turn);
        double transfer = analysis.axle(axle).loadTransfer().total();
        return transfer > 0 ? inside / transfer : Double.POSITIVE_INFINITY;
    }

    private LiftBoundary boundary(Wheel wheel, List<Double> abscissae) {
        List<EnvelopePoint> points = new ArrayList<>(abscissae.size());
        for (double ax : abscissae) {
            points.add(point(wheel, ax));
        }
        List<EnvelopePoint> quoted = new ArrayList<>();
        for (double ax : QUOTED) {
            quoted.add(point(wheel, ax));
        }
        return new LiftBoundary(wheel, points, quoted, liftsBeforeLimit(wheel, points));
    }

    private EnvelopePoint point(Wheel wheel, double longitudinalAcceleration) {
        SteadyCornering cornering = cornering(wheel, longitudinalAcceleration);
        double lift = cornering.insideLift(wheel.axle());
        boolean second = cornering.firstLiftAxle() != wheel.axle() && Double.isFinite(lift);
        return new EnvelopePoint(longitudinalAcceleration, lift, second);
    }

    /** The spans of a_x in which the wheel lifts below the lateral limit; the crossings found with Brent. */
    private List<LongitudinalRange> liftsBeforeLimit(Wheel wheel, List<EnvelopePoint> points) {
        double limit = analysis.turn(wheel.insideIn()).limit();
        DoubleUnaryOperator margin = ax -> Math.min(lift(wheel, ax), NEVER) - limit;
        List<LongitudinalRange> ranges = new ArrayList<>();
        Double start = margin.applyAsDouble(points.get(0).longitudinalAcceleration()) < 0
                ? points.get(0).longitudinalAcceleration() : null;
        for (int i = 1; i < points.size(); i++) {
            double low = points.get(i - 1).longitudinalAcceleration();
            double high = points.get(i).longitudinalAcceleration();
            boolean liftsLow = margin.applyAsDouble(low) < 0;
            boolean liftsHigh = margin.applyAsDouble(high) < 0;
            if (liftsLow == liftsHigh) {
                continue;
            }
            double crossing = CROSSING.solve(margin, low, high);
            if (liftsHigh) {
                start = crossing;
            } else {
                ranges.add(new LongitudinalRange(start, crossing));
                start = null;
            }
        }
        if (start != null) {
            ranges.add(new LongitudinalRange(start, points.get(points.size() - 1).longitudinalAcceleration()));
        }
        return ranges;
    }
}
