package barwright.physics.linkage;

import barwright.model.FrontViewPoint;

/** Front-view geometry in homogeneous coordinates (y, z, w): lines through points, their intersections. */
final class Plane {
    private Plane() {
    }

    static double[] point(FrontViewPoint p) {
        return new double[] {p.y(), p.z(), 1};
    }

    static double[] cross(double[] a, double[] b) {
        return new double[] {a[1] * b[2] - a[2] * b[1], a[2] * b[0] - a[0] * b[2], a[0] * b[1] - a[1] * b[0]};
    }

    /** @return the line through two points, scaled so that its normal (first two terms) has length one */
    static double[] line(double[] a, double[] b) {
        double[] line = cross(a, b);
        double norm = Math.sqrt(line[0] * line[0] + line[1] * line[1]);
        return new double[] {line[0] / norm, line[1] / norm, line[2] / norm};
    }

    /** @return the line through a point with a direction (dy, dz), normalised as {@link #line} */
    static double[] lineThrough(FrontViewPoint p, double dy, double dz) {
        return line(point(p), new double[] {dy, dz, 0});
    }

    /** @return where two normalised lines meet: w is the sine of the angle between them (0: parallel) */
    static double[] meet(double[] a, double[] b) {
        return cross(a, b);
    }

    /** @return the point rotated by an angle about the origin (positive: y towards z) */
    static FrontViewPoint rotate(FrontViewPoint p, double angle) {
        double c = Math.cos(angle);
        double s = Math.sin(angle);
        return new FrontViewPoint(c * p.y() - s * p.z(), s * p.y() + c * p.z());
    }

    /** @return p + (q rotated by angle) */
    static FrontViewPoint plusRotated(FrontViewPoint p, double qy, double qz, double angle) {
        double c = Math.cos(angle);
        double s = Math.sin(angle);
        return new FrontViewPoint(p.y() + c * qy - s * qz, p.z() + s * qy + c * qz);
    }

    /** @return {y, z} of p + (q rotated by angle) */
    static double[] plusRotated(double py, double pz, double qy, double qz, double angle) {
        double c = Math.cos(angle);
        double s = Math.sin(angle);
        return new double[] {py + c * qy - s * qz, pz + s * qy + c * qz};
    }

    /** @return the z component of (a x b) for front-view vectors */
    static double crossZ(double ay, double az, double by, double bz) {
        return ay * bz - az * by;
    }

    /** @return the angle wrapped into (-pi, pi] */
    static double wrap(double angle) {
        double wrapped = Math.IEEEremainder(angle, 2 * Math.PI);
        return wrapped <= -Math.PI ? wrapped + 2 * Math.PI : wrapped;
    }
}
