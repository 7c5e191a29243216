package barwright.solver.frame;

/**
 * A vector or a point in the frame's global axes. Components in the unit of what it holds: metres for a
 * position or a translation, newtons for a force, N m for a moment, radians for a small rotation.
 *
 * @param x component along global X
 * @param y component along global Y
 * @param z component along global Z
 */
public record Vector3(double x, double y, double z) {
    public static final Vector3 ZERO = new Vector3(0, 0, 0);
    public static final Vector3 UNIT_X = new Vector3(1, 0, 0);
    public static final Vector3 UNIT_Y = new Vector3(0, 1, 0);
    public static final Vector3 UNIT_Z = new Vector3(0, 0, 1);

    public Vector3 {
        if (!Double.isFinite(x) || !Double.isFinite(y) || !Double.isFinite(z)) {
            throw new IllegalArgumentException("a vector needs finite components, was (" + x + ", " + y + ", " + z + ")");
        }
    }

    /** @param components three components, x first */
    static Vector3 of(double[] components) {
        return new Vector3(components[0], components[1], components[2]);
    }

    /** @return component 0 (x), 1 (y) or 2 (z) */
    public double component(int index) {
        return switch (index) {
            case 0 -> x;
            case 1 -> y;
            case 2 -> z;
            default -> throw new IndexOutOfBoundsException("component " + index + " of a 3-vector");
        };
    }

    public Vector3 plus(Vector3 other) {
        return new Vector3(x + other.x, y + other.y, z + other.z);
    }

    public Vector3 minus(Vector3 other) {
        return new Vector3(x - other.x, y - other.y, z - other.z);
    }

    public Vector3 times(double factor) {
        return new Vector3(x * factor, y * factor, z * factor);
    }

    public double dot(Vector3 other) {
        return x * other.x + y * other.y + z * other.z;
    }

    public Vector3 cross(Vector3 other) {
        return new Vector3(y * other.z - z * other.y, z * other.x - x * other.z, x * other.y - y * other.x);
    }

    public double length() {
        return Math.sqrt(dot(this));
    }

    /** @return a unit vector perpendicular to this one (any of them; the same for the same input) */
    public Vector3 perpendicular() {
        Vector3 unit = unit();
        double ax = Math.abs(unit.x);
        double ay = Math.abs(unit.y);
        double az = Math.abs(unit.z);
        // start from the global axis least aligned with this vector, so the cut is never ill-conditioned
        Vector3 axis = ax <= ay && ax <= az ? UNIT_X : ay <= az ? UNIT_Y : UNIT_Z;
        return axis.minus(unit.times(axis.dot(unit))).unit();
    }

    /** @return this vector scaled to length one */
    public Vector3 unit() {
        double length = length();
        if (!(length > 0)) {
            throw new IllegalArgumentException("a zero-length vector has no direction");
        }
        return times(1 / length);
    }
}
