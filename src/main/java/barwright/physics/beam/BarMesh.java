package barwright.physics.beam;

import barwright.model.BarCentreline;
import barwright.model.Point3;
import barwright.solver.frame.Vector3;

import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;

/**
 * The nodes of a bar's frame along its centreline, numbered from the left end to the right end (so the
 * equations stay banded). Every link point, bushing centre and bend end is a node; straight parts are cut
 * into elements no longer than the element length, each arc into at least {@value #ELEMENTS_PER_ARC}
 * straight chords.
 */
final class BarMesh {
    /** The fewest chords an arc is cut into (the issue asks for at least 8). */
    static final int ELEMENTS_PER_ARC = 8;
    /** How far from the centreline (m) a bushing centre may sit and still be taken as on it. */
    static final double ON_CENTRELINE_TOLERANCE = 1e-3;
    /**
     * Key positions closer than this along the centreline (m) share one node. An element's bending stiffness
     * grows as 1/L^3, so a sliver of an element between two nearly coincident key positions (a hole set back
     * by a ten-thousandth of a millimetre) makes the frame's matrix lose positive definiteness in floating
     * point; 0.1 mm is far below any dimension of a bar that matters and far above round-off.
     */
    private static final double SAME_STATION = 1e-4;

    private final CentrelinePath path;
    private final double[] stations;
    private final List<Vector3> nodes;
    private final int leftLink;
    private final int rightLink;
    private final int[] bushings;

    private BarMesh(CentrelinePath path, double[] stations, int leftLink, int rightLink, int[] bushings) {
        this.path = path;
        this.stations = stations;
        this.nodes = Arrays.stream(stations).mapToObj(path::position).toList();
        this.leftLink = leftLink;
        this.rightLink = rightLink;
        this.bushings = bushings;
    }

    /**
     * @param path             the rounded centreline
     * @param centreline       the bar's centreline input (bushings and link holes)
     * @param hole             index of the link hole in use
     * @param maxElementLength the longest element allowed on a straight part (m)
     */
    static BarMesh build(CentrelinePath path, BarCentreline centreline, int hole, double maxElementLength) {
        if (!(maxElementLength > 0) || Double.isInfinite(maxElementLength)) {
            throw new IllegalArgumentException("element length must be positive and finite, was " + maxElementLength);
        }
        double setback = centreline.holeSetbacks().get(hole);
        if (setback >= path.firstStraight() || setback >= path.lastStraight()) {
            throw new IllegalArgumentException("hole setback " + LengthText.of(setback) + " reaches into a bend:"
                    + " the straight ends of the arms are " + LengthText.of(path.firstStraight()) + " (left) and "
                    + LengthText.of(path.lastStraight()) + " (right)");
        }
        double leftLink = setback;
        double rightLink = path.length() - setback;
        double[] bushingStations = new double[centreline.bushings().size()];
        for (int i = 0; i < bushingStations.length; i++) {
            bushingStations[i] = bushingStation(path, centreline.bushings().get(i), i);
        }
        List<Double> breaks = new ArrayList<>();
        for (CentrelinePath.Piece piece : path.pieces()) {
            breaks.add(piece.start());
        }
        breaks.add(path.length());
        breaks.add(leftLink);
        breaks.add(rightLink);
        Arrays.stream(bushingStations).forEach(breaks::add);
        double[] stations = stations(path, breaks, maxElementLength);
        int[] bushingNodes = Arrays.stream(bushingStations).mapToInt(s -> nodeAt(stations, s)).toArray();
        return new BarMesh(path, stations, nodeAt(stations, leftLink), nodeAt(stations, rightLink), bushingNodes);
    }

    private static double bushingStation(CentrelinePath path, Point3 bushing, int index) {
        Vector3 centre = CentrelinePath.vector(bushing);
        double s = path.nearest(centre);
        double offset = path.position(s).minus(centre).length();
        if (offset > ON_CENTRELINE_TOLERANCE) {
            throw new IllegalArgumentException("bushing " + index + " at "
                    + LengthText.point(bushing.x(), bushing.y(), bushing.z()) + " is " + LengthText.of(offset)
                    + " from the bar's centreline; it must lie on it (within " + LengthText.of(ON_CENTRELINE_TOLERANCE)
                    + ")");
        }
        return s;
    }

    private static double[] stations(CentrelinePath path, List<Double> breaks, double maxElementLength) {
        double[] sorted = breaks.stream().mapToDouble(Double::doubleValue).sorted().toArray();
        List<Double> stations = new ArrayList<>();
        stations.add(sorted[0]);
        for (int i = 1; i < sorted.length; i++) {
            double from = stations.get(stations.size() - 1);
            double to = sorted[i];
            if (to - from <= SAME_STATION) {
                continue;
            }
            int count = (int) Math.ceil((to - from) / maxElementLength);
            CentrelinePath.Piece piece = pieceHolding(path, (from + to) / 2);
            if (piece instanceof CentrelinePath.Arc arc) {
                count = Math.max(count, (int) Math.ceil(ELEMENTS_PER_ARC * (to - from) / arc.length() - 1e-9));
            }
            for (int k = 1; k <= count; k++) {
                stations.add(k == count ? to : from + (to - from) * k / count);
            }
        }
        return stations.stream().mapToDouble(Double::doubleValue).toArray();
    }

    private static CentrelinePath.Piece pieceHolding(CentrelinePath path, double s) {
        for (CentrelinePath.Piece piece : path.pieces()) {
            if (s >= piece.start() && s <= piece.start() + piece.length()) {
                return piece;
            }
        }
        throw new IllegalStateException("station " + s + " m is beyond the centreline's " + path.length() + " m");
    }

    private static int nodeAt(double[] stations, double s) {
        int nearest = 0;
        for (int node = 1; node < stations.length; node++) {
            if (Math.abs(stations[node] - s) < Math.abs(stations[nearest] - s)) {
                nearest = node;
            }
        }
        return nearest;
    }

    CentrelinePath path() {
        return path;
    }

    /** @return node positions (m), left end first */
    List<Vector3> nodes() {
        return nodes;
    }

    /** @return arc length of node {@code node} from the left end of the bar (m) */
    double station(int node) {
        return stations[node];
    }

    int leftLink() {
        return leftLink;
    }

    int rightLink() {
        return rightLink;
    }

    /** @return the bushing nodes, in the order the bushings were given */
    int[] bushings() {
        return bushings.clone();
    }

    /** @return the centreline's unit tangent at a node */
    Vector3 tangent(int node) {
        return path.tangent(stations[node]);
    }

    int elementCount() {
        return stations.length - 1;
    }
}
