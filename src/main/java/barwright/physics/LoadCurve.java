package barwright.physics;

import barwright.model.LoadPoint;
import barwright.model.LoadTable;
import barwright.solver.MonotoneCubic;

/**
 * A tyre property given as points against load, at any load (model.md 8.1): the shape-preserving cubic
 * through the points, and beyond them a continuation that starts with the cubic's value and slope (no jump,
 * no kink) and never reaches the floor:
 * <ul>
 *   <li>where the curve falls going outwards, it approaches the floor exponentially,
 *       v = floor + (v_end - floor) exp(-|m| u / (v_end - floor)), u the distance past the end: its slope at
 *       the end is the cubic's m and it stays above the floor for every load;</li>
 *   <li>where it rises going to higher loads, it holds the last value (no grip is invented past the data);</li>
 *   <li>where it rises going to lower loads, it follows the end tangent, which is bounded because a load is
 *       never below zero.</li>
 * </ul>
 */
public final class LoadCurve {
    /** The floor is this share of the smallest value given: half the grip (or stiffness) of any point. */
    public static final double FLOOR_SHARE = 0.5;

    private final MonotoneCubic cubic;
    private final double floor;
    private final double lowestLoad;
    private final double highestLoad;

    public LoadCurve(LoadTable table) {
        int n = table.points().size();
        double[] loads = new double[n];
        double[] values = new double[n];
        for (int i = 0; i < n; i++) {
            LoadPoint point = table.points().get(i);
            loads[i] = point.load();
            values[i] = point.value();
        }
        this.cubic = new MonotoneCubic(loads, values);
        this.floor = FLOOR_SHARE * table.smallestValue();
        this.lowestLoad = table.lowestLoad();
        this.highestLoad = table.highestLoad();
    }

    /** @return the value at a load (N); never at or below {@link #floor()} */
    public double value(double load) {
        if (load > highestLoad) {
            double slope = cubic.endSlope(true);
            return slope < 0 ? approachFloor(cubic.endValue(true), -slope, load - highestLoad)
                    : cubic.endValue(true);
        }
        if (load < lowestLoad) {
            double slope = cubic.endSlope(false);
            return slope > 0 ? approachFloor(cubic.endValue(false), slope, lowestLoad - load)
                    : cubic.endValue(false) - slope * (lowestLoad - load);
        }
        return cubic.value(load);
    }

    private double approachFloor(double endValue, double fallRate, double distance) {
        double height = endValue - floor;
        return floor + height * Math.exp(-fallRate * distance / height);
    }

    /** @return the level the continuation approaches but never reaches */
    public double floor() {
        return floor;
    }

    public double lowestLoad() {
        return lowestLoad;
    }

    public double highestLoad() {
        return highestLoad;
    }
}
