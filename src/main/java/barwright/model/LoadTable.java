package barwright.model;

import java.util.List;

/**
 * A tyre property given as points against vertical load (peak friction, or cornering stiffness), to be
 * interpolated by a shape-preserving cubic (model.md 8.1).
 *
 * @param points at least {@link #MIN_POINTS} points, loads strictly increasing, values positive
 */
public record LoadTable(List<LoadPoint> points) {
    /** Fewer points cannot show a curve: two points are a straight line, which the linear law already is. */
    public static final int MIN_POINTS = 3;

    public LoadTable {
        points = List.copyOf(points);
        if (points.size() < MIN_POINTS) {
            throw new IllegalArgumentException("a load table needs at least " + MIN_POINTS + " points, had "
                    + points.size());
        }
        for (int i = 1; i < points.size(); i++) {
            if (!(points.get(i).load() > points.get(i - 1).load())) {
                throw new IllegalArgumentException("loads must increase: point " + i + " at "
                        + points.get(i).load() + " N follows " + points.get(i - 1).load() + " N");
            }
        }
    }

    /** @return the lowest load of the table (N) */
    public double lowestLoad() {
        return points.get(0).load();
    }

    /** @return the highest load of the table (N) */
    public double highestLoad() {
        return points.get(points.size() - 1).load();
    }

    /** @return the smallest value in the table */
    public double smallestValue() {
        return points.stream().mapToDouble(LoadPoint::value).min().orElseThrow();
    }

    /**
     * @return the straight line between the two points around the load, or the end value beyond the ends: a
     *     plain stand-in for display, not the model's interpolation (model.md 8.1)
     */
    public double linearAt(double load) {
        if (load <= lowestLoad()) {
            return points.get(0).value();
        }
        if (load >= highestLoad()) {
            return points.get(points.size() - 1).value();
        }
        int i = segmentOf(load);
        LoadPoint a = points.get(i);
        return a.value() + linearSlopeAt(load) * (load - a.load());
    }

    /** @return the slope of the straight line between the two points nearest the load (value per N) */
    public double linearSlopeAt(double load) {
        int i = segmentOf(load);
        LoadPoint a = points.get(i);
        LoadPoint b = points.get(i + 1);
        return (b.value() - a.value()) / (b.load() - a.load());
    }

    private int segmentOf(double load) {
        int i = 0;
        while (i < points.size() - 2 && load > points.get(i + 1).load()) {
            i++;
        }
        return i;
    }
}
