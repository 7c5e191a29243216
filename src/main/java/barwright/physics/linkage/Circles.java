package barwright.physics.linkage;

import barwright.model.FrontViewPoint;

/** Where two circles meet, in closed form. */
final class Circles {
    private Circles() {
    }

    /**
     * @param p      the first circle's centre
     * @param rp     its radius (m)
     * @param q      the second circle's centre
     * @param rq     its radius (m)
     * @param branch +1 or -1: the meeting point X with sign((q - p) x (X - p)) equal to it
     * @return the meeting point on that branch, or null where the circles do not meet
     */
    static FrontViewPoint meet(FrontViewPoint p, double rp, FrontViewPoint q, double rq, double branch) {
        double[] point = meet(p.y(), p.z(), rp, q.y(), q.z(), rq, branch);
        return point == null ? null : new FrontViewPoint(point[0], point[1]);
    }

    /** As {@link #meet(FrontViewPoint, double, FrontViewPoint, double, double)}, on plain coordinates: {y, z}. */
    static double[] meet(double py, double pz, double rp, double qy, double qz, double rq, double branch) {
        double dy = qy - py;
        double dz = qz - pz;
        double d = Math.sqrt(dy * dy + dz * dz);
        if (!(d > 0)) {
            return null;
        }
        double along = (rp * rp - rq * rq + d * d) / (2 * d);
        double across2 = rp * rp - along * along;
        if (!(across2 >= 0)) {
            return null;
        }
        double across = Math.sqrt(across2);
        return new double[] {py + (along * dy - branch * across * dz) / d, pz + (along * dz + branch * across * dy) / d};
    }
}
