package barwright.model;

import java.util.List;

/**
 * A bar of any shape, for the beam-element solver: its centreline as a polyline from the left link point to
 * the right link point, with rounded bends and the bushing positions.
 *
 * @param points            polyline vertices (m), vehicle axes, from the left link point to the right one
 * @param bendRadius        radius each interior vertex is rounded with (m)
 * @param bushings          bushing centres on the centreline (m)
 * @param bushingRadialRate radial rate of each bushing (N/m), or null for rigid bushings
 * @param holeSetbacks      for each link hole, how far the link point sits back from the end of the end
 *                          segment (m); 0 is the end itself
 */
public record BarCentreline(List<Point3> points, double bendRadius, List<Point3> bushings,
                            Double bushingRadialRate, List<Double> holeSetbacks) {
    public BarCentreline {
        points = List.copyOf(points);
        bushings = List.copyOf(bushings);
        holeSetbacks = List.copyOf(holeSetbacks);
        if (points.size() < 2) {
            throw new IllegalArgumentException("a centreline needs at least two points");
        }
        Checks.nonNegative("bendRadius", bendRadius);
        if (bushingRadialRate != null) {
            Checks.positive("bushingRadialRate", bushingRadialRate);
        }
        if (holeSetbacks.isEmpty()) {
            throw new IllegalArgumentException("holeSetbacks must hold at least one hole");
        }
        holeSetbacks.forEach(setback -> Checks.nonNegative("holeSetback", setback));
    }
}
