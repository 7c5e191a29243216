package barwright.model;

/**
 * A point of a suspension linkage seen from the front, at static ride height (m): {@code y} outward from the
 * car's centreline on the car's left side (a point across the centreline has a negative y), {@code z} up from
 * the ground. The right side is the mirror image.
 */
public record FrontViewPoint(double y, double z) {
    public FrontViewPoint {
        Checks.finite("y", y);
        Checks.finite("z", z);
    }

    public double distanceTo(FrontViewPoint other) {
        return Math.hypot(y - other.y, z - other.z);
    }
}
