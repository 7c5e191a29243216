package barwright.insight;

import barwright.model.AntiRollBar;
import barwright.model.AxlePosition;
import barwright.model.Material;
import barwright.model.Vehicle;
import barwright.physics.AnalysisResult;
import barwright.physics.ImpossibleVehicleException;
import barwright.physics.LoadTransferParts;
import barwright.physics.RollResponse;
import barwright.physics.VehicleAnalysis;
import barwright.solver.RootFinder;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.function.DoubleUnaryOperator;

import static barwright.units.Constants.RADIANS_PER_DEGREE;

/**
 * What a flexible chassis costs (model.md 6): the front share of load transfer and the roll gradient against
 * the chassis torsional stiffness K_c, and the share of a bar change's rigid-chassis effect on the front share
 * that reaches the tyres. The axles' roll stiffnesses, the unsprung and geometric transfers do not depend on
 * K_c, so each is taken once from a full analysis; only the body's roll (model.md 6, solved by
 * {@link RollResponse}) and the elastic transfer K phi / t are evaluated again at each K_c.
 */
public final class ChassisStudy {
    /** The sweep starts at a tenth of the car's total roll stiffness (issue 6). */
    public static final double LOWEST = 0.1;
    /** ... and ends at ten times it (issue 6). */
    public static final double HIGHEST = 10;
    /** Points of the sweep: 30 a decade. */
    public static final int POINTS = 61;
    /** The share of a bar change's rigid effect the stiffness statement is about (issue 6). */
    public static final double DELIVERED_TARGET = 0.8;
    /** The bar change: the bar's rate raised by this fraction (both elastic moduli of its material raised). */
    public static final double BAR_CHANGE = 0.10;
    /**
     * The target is sought from this multiple of the total roll stiffness, or from just above the stability
     * limit where the body needs a chassis to stand ...
     */
    private static final double SEARCH_LOW = 1e-3;
    /** ... up to this multiple. */
    private static final double SEARCH_HIGH = 1e3;
    /** Points per decade of the scan that brackets the target before it is solved for. */
    private static final int SCAN_PER_DECADE = 20;
    /** The scan starts this fraction above the stability limit, where the two-end equations are still solvable. */
    private static final double ABOVE_LIMIT = 1e-6;
    /** The target to 1e-9 decades of stiffness (a relative 2.3e-9), within 200 evaluations. */
    private static final RootFinder TARGET_STIFFNESS = RootFinder.of("the chassis stiffness at which a bar change "
            + "delivers 80 % of its rigid effect", 1e-9, 200);

    private final AnalysisResult base;
    private final AnalysisResult changed;
    private final String barChange;

    /**
     * @param base    the car analysed as it is
     * @param changed the same car with the bar change
     */
    private ChassisStudy(AnalysisResult base, AnalysisResult changed, String barChange) {
        this.base = base;
        this.changed = changed;
        this.barChange = barChange;
    }

    /** @return the study of a car; its own chassis stiffness, if any, is marked as the current point */
    public static ChassisStudy of(Vehicle vehicle, AnalysisResult analysis) {
        for (AxlePosition position : AxlePosition.values()) {
            AntiRollBar bar = vehicle.axle(position).bar();
            if (bar != null) {
                Vehicle stiffer = vehicle.withAxle(position, vehicle.axle(position).withBar(stiffened(bar)));
                return new ChassisStudy(analysis, VehicleAnalysis.analyse(stiffer),
                        String.format(Locale.ROOT, "a %s bar %.0f %% stiffer", position.key(),
                                BAR_CHANGE * 100));
            }
        }
        // no bar at either end: the same roll stiffness change made with the front springs
        Vehicle stiffer = vehicle.withFront(vehicle.front().withSpringRate(vehicle.front().springRate()
                * (1 + BAR_CHANGE)));
        return new ChassisStudy(analysis, VehicleAnalysis.analyse(stiffer), String.format(Locale.ROOT,
                "front springs %.0f %% stiffer (the car has no bar)", BAR_CHANGE * 100));
    }

    public static ChassisStudyResult compute(Vehicle vehicle) {
        return of(vehicle, VehicleAnalysis.analyse(vehicle)).compute();
    }

    /** A bar whose rate is {@link #BAR_CHANGE} higher: E and G raised alike scale every compliance of model.md 2. */
    private static AntiRollBar stiffened(AntiRollBar bar) {
        Material material = bar.material();
        return bar.withMaterial(new Material(material.name(), material.youngsModulus() * (1 + BAR_CHANGE),
                material.shearModulus() * (1 + BAR_CHANGE), material.density(), material.yieldStrength()));
    }

    /**
     * @return the chassis stiffness above which the body of that car has a stable roll position (N m/rad): 0
     *     where each body end can hold its share of the sprung mass on its own axle (model.md 6)
     */
    private static double stabilityLimit(AnalysisResult result) {
        return RollResponse.chassisStabilityLimit(result.masses(), result.front().stiffness().rollStiffness(),
                result.rear().stiffness().rollStiffness());
    }

    /** @return K_f + K_r of the car as it is (N m/rad) */
    public double totalRollStiffness() {
        return base.front().stiffness().rollStiffness() + base.rear().stiffness().rollStiffness();
    }

    /**
     * @param chassisStiffness K_c (N m/rad), or null for a rigid chassis
     * @return the front share of lateral load transfer
     * @throws ImpossibleVehicleException where the body has no stable roll position with that chassis
     */
    public double frontShare(Double chassisStiffness) {
        return frontShare(base, chassisStiffness);
    }

    /** @return the sprung-mass-weighted roll per a_y (rad s^2/m) with that chassis */
    public double rollGradient(Double chassisStiffness) {
        return roll(base, chassisStiffness).rollPerAccel();
    }

    /** @return the change of front share the bar change makes with this chassis over the change with a rigid one */
    public double deliveredShare(Double chassisStiffness) {
        double rigidEffect = frontShare(changed, null) - frontShare(base, null);
        return (frontShare(changed, chassisStiffness) - frontShare(base, chassisStiffness)) / rigidEffect;
    }

    private static RollResponse roll(AnalysisResult result, Double chassisStiffness) {
        return RollResponse.of(result.masses(), result.front().stiffness().rollStiffness(),
                result.rear().stiffness().rollStiffness(), chassisStiffness);
    }

    private static double frontShare(AnalysisResult result, Double chassisStiffness) {
        RollResponse roll = roll(result, chassisStiffness);
        double front = transfer(result, AxlePosition.FRONT, roll.frontRollPerAccel());
        double rear = transfer(result, AxlePosition.REAR, roll.rearRollPerAccel());
        return front / (front + rear);
    }

    /** @return unsprung + geometric + elastic K phi / t per a_y (model.md 5 and 6) (N s^2/m) */
    private static double transfer(AnalysisResult result, AxlePosition axle, double endRollPerAccel) {
        LoadTransferParts parts = result.axle(axle).loadTransfer();
        double elastic = result.axle(axle).stiffness().rollStiffness() * endRollPerAccel
                / result.vehicle().axle(axle).track();
        return parts.unsprung() + parts.geometric() + elastic;
    }

    private ChassisPoint point(double chassisStiffness) {
        return new ChassisPoint(chassisStiffness, frontShare(chassisStiffness), rollGradient(chassisStiffness),
                deliveredShare(chassisStiffness));
    }

    private static boolean finite(ChassisPoint point) {
        return Double.isFinite(point.frontShare()) && Double.isFinite(point.rollGradient())
                && Double.isFinite(point.deliveredShare());
    }

    public ChassisStudyResult compute() {
        List<String> notes = new ArrayList<>();
        double total = totalRollStiffness();
        double limit = stabilityLimit(base);
        List<ChassisPoint> sweep = new ArrayList<>(POINTS);
        int leftOut = 0;
        for (int i = 0; i < POINTS; i++) {
            double decades = Math.log10(LOWEST) + (Math.log10(HIGHEST) - Math.log10(LOWEST)) * i / (POINTS - 1);
            try {
                ChassisPoint point = point(total * Math.pow(10, decades));
                if (finite(point)) {
                    sweep.add(point);
                } else {
                    leftOut++;
                }
            } catch (ImpossibleVehicleException noStableRoll) {
                leftOut++;
            }
        }
        if (limit > 0) {
            notes.add(String.format(Locale.ROOT, "One body end cannot hold its share of the sprung mass on its own "
                    + "axle: the body has a stable roll position only with a chassis stiffer than %.1f N·m/deg "
                    + "(the stability limit of model.md 6).", limit * RADIANS_PER_DEGREE));
        }
        if (leftOut > 0) {
            notes.add(String.format(Locale.ROOT, "%d points of the sweep lie at or below the stability limit, where "
                    + "the body has no stable roll position, and are left out.", leftOut));
        }
        ChassisPoint rigid = new ChassisPoint(Double.POSITIVE_INFINITY, frontShare(null), rollGradient(null), 1.0);
        ChassisPoint decoupled = null;
        try {
            decoupled = point(0.0);
        } catch (ImpossibleVehicleException noStableRoll) {
            // the stability limit's note above already says that an end cannot stand alone
        }
        Double ownStiffness = base.vehicle().chassisTorsionalStiffness();
        ChassisPoint current = ownStiffness == null ? null : point(ownStiffness);
        Double target = stiffnessForTarget(total, notes);
        return new ChassisStudyResult(base.vehicle().name(), total, barChange, sweep, rigid, decoupled, current,
                target, notes);
    }

    /**
     * The delivered share is scanned on a logarithmic grid from the lowest stiffness at which both the car and
     * the changed car stand (their stability limits, else {@link #SEARCH_LOW} times the total roll stiffness) to
     * {@link #SEARCH_HIGH} times it; the last rise through {@link #DELIVERED_TARGET} is then solved for on the
     * logarithm of K_c, so every stiffness of the scan above the answer delivers at least the target.
     *
     * @return K_c at which the delivered share is {@link #DELIVERED_TARGET} (N m/rad); null where the scan finds
     *     no rise through it, with a note that says why
     */
    private Double stiffnessForTarget(double total, List<String> notes) {
        double standing = Math.max(stabilityLimit(base), stabilityLimit(changed));
        double low = standing > 0 ? Math.log10(standing * (1 + ABOVE_LIMIT)) : Math.log10(SEARCH_LOW * total);
        double high = Math.log10(SEARCH_HIGH * total);
        DoubleUnaryOperator shortfall = decades -> deliveredShare(Math.pow(10, decades)) - DELIVERED_TARGET;
        int steps = Math.max(1, (int) Math.ceil((high - low) * SCAN_PER_DECADE));
        double risingFrom = Double.NaN;
        double risingTo = Double.NaN;
        boolean anyBelow = false;
        double previous = Double.NaN;
        double previousX = Double.NaN;
        for (int i = 0; i <= steps && low < high; i++) {
            double x = low + (high - low) * i / steps;
            double value;
            try {
                value = shortfall.applyAsDouble(x);
            } catch (ImpossibleVehicleException noStableRoll) {
                value = Double.NaN;
            }
            if (!Double.isFinite(value)) {
                previous = Double.NaN;
                continue;
            }
            anyBelow |= value < 0;
            if (previous < 0 && value >= 0) {
                risingFrom = previousX;
                risingTo = x;
            }
            previous = value;
            previousX = x;
        }
        if (!Double.isNaN(risingFrom)) {
            return Math.pow(10, TARGET_STIFFNESS.solve(shortfall, risingFrom, risingTo));
        }
        String from = standing > 0
                ? String.format(Locale.ROOT, "just above the stability limit of %.1f N·m/deg",
                        standing * RADIANS_PER_DEGREE)
                : String.format(Locale.ROOT, "%.0e times the total roll stiffness", SEARCH_LOW);
        notes.add(String.format(Locale.ROOT, "%s chassis stiffness from %s up to %.0e times the total roll stiffness "
                + "lets the bar change deliver %s%.0f %% of its rigid effect.", anyBelow ? "No" : "Every", from,
                SEARCH_HIGH, anyBelow ? "" : "at least ", DELIVERED_TARGET * 100));
        return null;
    }
}
