package barwright.model;

/**
 * A point in vehicle axes: x forward, y to the left, z up (m).
 */
public record Point3(double x, double y, double z) {
    public Point3 {
        Checks.finite("x", x);
        Checks.finite("y", y);
        Checks.finite("z", z);
    }

    public Point3 minus(Point3 other) {
        return new Point3(x - other.x, y - other.y, z - other.z);
    }

    public Point3 plus(Point3 other) {
        return new Point3(x + other.x, y + other.y, z + other.z);
    }

    public Point3 times(double factor) {
        return new Point3(x * factor, y * factor, z * factor);
    }

    public double dot(Point3 other) {
        return x * other.x + y * other.y + z * other.z;
    }

    public Point3 cross(Point3 other) {
        return new Point3(y * other.z - z * other.y, z * other.x - x * other.z, x * other.y - y * other.x);
    }

    public double length() {
        return Math.sqrt(dot(this));
    }

    public double distanceTo(Point3 other) {
        return minus(other).length();
    }

    /** @return this vector scaled to length one */
    public Point3 unit() {
        double length = length();
        if (!(length > 0)) {
            throw new IllegalArgumentException("a zero-length vector has no direction");
        }
        return times(1 / length);
    }
}
