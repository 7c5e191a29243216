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
import org.apache.commons.math3.analysis.UnivariateFunction;
import org.apache.commons.math3.analysis.solvers.BrentSolver;

import java.util.ArrayList;
import java.util.List;

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
    /** The target is sought between these multiples of the total roll stiffness. */
    private static final double SEARCH_LOW = 1e-3;
    private static final double SEARCH_HIGH = 1e3;
    /** Accuracy of the target search, in decades of stiffness: 1e-9 is a relative 2.3e-9. */
    private static final double SEARCH_ACCURACY = 1e-9;

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
                        String.format(java.util.Locale.ROOT, "a %s bar %.0f %% stiffer", position.key(),
                                BAR_CHANGE * 100));
            }
        }
        // no bar at either end: the same roll stiffness change made with the front springs
        Vehicle stiffer = vehicle.withFront(vehicle.front().withSpringRate(vehicle.front().springRate()
                * (1 + BAR_CHANGE)));
        return new ChassisStudy(analysis, VehicleAnalysis.analyse(stiffer), String.format(java.util.Locale.ROOT,
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

    public ChassisStudyResult compute() {
        List<String> notes = new ArrayList<>();
        double total = totalRollStiffness();
        List<ChassisPoint> sweep = new ArrayList<>(POINTS);
        int unstable = 0;
        for (int i = 0; i < POINTS; i++) {
            double decades = Math.log10(LOWEST) + (Math.log10(HIGHEST) - Math.log10(LOWEST)) * i / (POINTS - 1);
            try {
                sweep.add(point(total * Math.pow(10, decades)));
            } catch (ImpossibleVehicleException noStableRoll) {
                unstable++;
            }
        }
        if (unstable > 0) {
            notes.add("At the lowest chassis stiffnesses of the sweep the body has no stable roll position: "
                    + unstable + " points are left out.");
        }
        ChassisPoint rigid = new ChassisPoint(Double.POSITIVE_INFINITY, frontShare(null), rollGradient(null), 1.0);
        ChassisPoint decoupled = null;
        try {
            decoupled = point(0.0);
        } catch (ImpossibleVehicleException noStableRoll) {
            notes.add("With no chassis stiffness at all one body end could not hold its share of the sprung mass.");
        }
        Double ownStiffness = base.vehicle().chassisTorsionalStiffness();
        ChassisPoint current = ownStiffness == null ? null : point(ownStiffness);
        Double target = stiffnessForTarget(total);
        if (target == null) {
            notes.add(String.format(java.util.Locale.ROOT, "No chassis stiffness between %.0e and %.0e times the "
                    + "total roll stiffness lets the bar change deliver %.0f %% of its rigid effect.",
                    SEARCH_LOW, SEARCH_HIGH, DELIVERED_TARGET * 100));
        }
        return new ChassisStudyResult(base.vehicle().name(), total, barChange, sweep, rigid, decoupled, current,
                target, notes);
    }

    /**
     * @return K_c at which the delivered share is {@link #DELIVERED_TARGET} (N m/rad), by a Brent solver on the
     *     logarithm of K_c; null where it is not bracketed in the search range
     */
    private Double stiffnessForTarget(double total) {
        UnivariateFunction shortfall = decades -> deliveredShare(total * Math.pow(10, decades)) - DELIVERED_TARGET;
        double high = Math.log10(SEARCH_HIGH);
        for (double low : new double[]{Math.log10(SEARCH_LOW), Math.log10(LOWEST)}) {
            try {
                if (!(shortfall.value(low) < 0 && shortfall.value(high) > 0)) {
                    return null;
                }
                double decades = new BrentSolver(SEARCH_ACCURACY).solve(200, shortfall, low, high);
                return total * Math.pow(10, decades);
            } catch (ImpossibleVehicleException noStableRoll) {
                // so soft a chassis cannot hold the body: search again from the start of the sweep
            }
        }
        return null;
    }
}
