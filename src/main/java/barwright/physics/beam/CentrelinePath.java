package barwright.physics.beam;

import barwright.model.Point3;
import barwright.solver.frame.Vector3;

import java.util.ArrayList;
import java.util.List;

/**
 * A bar's centreline as a smooth path: the straight segments of its polyline, each interior vertex rounded
 * by a circular arc of the bend radius tangent to both segments. Positions along it are arc lengths s (m)
 * from the first point.
 */
final class CentrelinePath {
    /** Turns sharper than this (rad) from a straight line cannot be rounded: the bar would fold back. */
    private static final double LARGEST_TURN = Math.PI - 1e-6;
    /** Vertices that turn less than this (rad) are treated as straight. */
    private static final double SMALLEST_TURN = 1e-9;

    private final List<Piece> pieces;
    private final double length;

    private CentrelinePath(List<Piece> pieces) {
        this.pieces = List.copyOf(pieces);
        Piece last = pieces.get(pieces.size() - 1);
        this.length = last.start() + last.length();
    }

    /**
     * @param points     polyline vertices (m), at least two
     * @param bendRadius radius of the arc at each interior vertex (m); 0 leaves sharp corners
     */
    static CentrelinePath of(List<Point3> points, double bendRadius) {
        List<Vector3> vertices = points.stream().map(CentrelinePath::vector).toList();
        int count = vertices.size();
        for (int i = 0; i + 1 < count; i++) {
            if (!(vertices.get(i + 1).minus(vertices.get(i)).length() > 0)) {
                throw new IllegalArgumentException("centreline points " + i + " and " + (i + 1)
                        + " coincide: every segment needs a length");
            }
        }
        double[] setback = new double[count];
        double[] turn = new double[count];
        for (int i = 1; i + 1 < count; i++) {
            Vector3 in = vertices.get(i).minus(vertices.get(i - 1)).unit();
            Vector3 out = vertices.get(i + 1).minus(vertices.get(i)).unit();
            turn[i] = Math.acos(Math.max(-1, Math.min(1, in.dot(out))));
            if (turn[i] > LARGEST_TURN) {
                throw new IllegalArgumentException("the centreline folds back on itself at point " + i);
            }
            setback[i] = turn[i] > SMALLEST_TURN ? bendRadius * Math.tan(turn[i] / 2) : 0;
        }
        List<Piece> pieces = new ArrayList<>();
        double s = 0;
        for (int i = 0; i + 1 < count; i++) {
            Vector3 from = vertices.get(i);
            Vector3 to = vertices.get(i + 1);
            Vector3 direction = to.minus(from).unit();
            double straight = to.minus(from).length() - setback[i] - setback[i + 1];
            if (straight < 0) {
                throw new IllegalArgumentException("segment " + i + " to " + (i + 1) + " is "
                        + LengthText.of(to.minus(from).length()) + " long, too short for bends of radius "
                        + LengthText.of(bendRadius) + " at its ends (they need "
                        + LengthText.of(setback[i] + setback[i + 1]) + ")");
            }
            Vector3 lineStart = from.plus(direction.times(setback[i]));
            pieces.add(new Line(s, lineStart, direction, straight));
            s += straight;
            if (i + 2 < count && setback[i + 1] > 0) {
                Vector3 next = vertices.get(i + 2).minus(to).unit();
                Arc arc = Arc.between(s, to.minus(direction.times(setback[i + 1])), direction, next, bendRadius,
                        turn[i + 1]);
                pieces.add(arc);
                s += arc.length();
            }
        }
        return new CentrelinePath(pieces);
    }

    static Vector3 vector(Point3 point) {
        return new Vector3(point.x(), point.y(), point.z());
    }

    /** @return the length of the whole centreline, arcs included (m) */
    double length() {
        return length;
    }

    /** @return the straight length at the start before the first bend begins (m) */
    double firstStraight() {
        return pieces.get(0).length();
    }

    /** @return the straight length at the end after the last bend ends (m) */
    double lastStraight() {
        return pieces.get(pieces.size() - 1).length();
    }

    /** @return the pieces in order, for meshing */
    List<Piece> pieces() {
        return pieces;
    }

    /** @return the point at arc length s (m) */
    Vector3 position(double s) {
        Piece piece = pieceAt(s);
        return piece.position(s - piece.start());
    }

    /** @return the unit tangent at arc length s (the incoming one at a sharp corner) */
    Vector3 tangent(double s) {
        Piece piece = pieceAt(s);
        return piece.tangent(s - piece.start());
    }

    /** @return the arc length of the point of the centreline nearest to {@code point} (m) */
    double nearest(Vector3 point) {
        double best = 0;
        double bestDistance = Double.POSITIVE_INFINITY;
        for (Piece piece : pieces) {
            double local = piece.nearest(point);
            double distance = piece.position(local).minus(point).length();
            if (distance < bestDistance) {
                bestDistance = distance;
                best = piece.start() + local;
            }
        }
        return best;
    }

    private Piece pieceAt(double s) {
        for (Piece piece : pieces) {
            if (s <= piece.start() + piece.length()) {
                return piece;
            }
        }
        return pieces.get(pieces.size() - 1);
    }

    /** A straight part or an arc, parametrised by the arc length from its own start. */
    sealed interface Piece permits Line, Arc {
        /** @return arc length of the piece's start along the whole path (m) */
        double start();

        /** @return the piece's own length (m) */
        double length();

        Vector3 position(double local);

        Vector3 tangent(double local);

        /** @return the local arc length nearest to {@code point} */
        double nearest(Vector3 point);
    }

    /** A straight part: from {@code from} along the unit {@code direction}. */
    record Line(double start, Vector3 from, Vector3 direction, double length) implements Piece {
        @Override
        public Vector3 position(double local) {
            return from.plus(direction.times(local));
        }

        @Override
        public Vector3 tangent(double local) {
            return direction;
        }

        @Override
        public double nearest(Vector3 point) {
            return Math.max(0, Math.min(length, point.minus(from).dot(direction)));
        }
    }

    /**
     * A circular arc of {@code radius} about {@code centre}, from where the incoming unit direction
     * {@code in} ends, turning by {@code angle} towards the unit {@code inward} normal:
     * p(phi) = centre + radius (-inward cos phi + in sin phi).
     */
    record Arc(double start, Vector3 centre, Vector3 in, Vector3 inward, double radius, double angle)
            implements Piece {
        static Arc between(double start, Vector3 tangentPoint, Vector3 in, Vector3 out, double radius, double angle) {
            Vector3 inward = out.minus(in.times(out.dot(in))).unit();
            return new Arc(start, tangentPoint.plus(inward.times(radius)), in, inward, radius, angle);
        }

        @Override
        public double length() {
            return radius * angle;
        }

        @Override
        public Vector3 position(double local) {
            double phi = local / radius;
            return centre.plus(inward.times(-radius * Math.cos(phi))).plus(in.times(radius * Math.sin(phi)));
        }

        @Override
        public Vector3 tangent(double local) {
            double phi = local / radius;
            return inward.times(Math.sin(phi)).plus(in.times(Math.cos(phi)));
        }

        @Override
        public double nearest(Vector3 point) {
            Vector3 fromCentre = point.minus(centre);
            double phi = Math.atan2(fromCentre.dot(in), -fromCentre.dot(inward));
            return radius * Math.max(0, Math.min(angle, phi));
        }
    }
}
