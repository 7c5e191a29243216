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
        double dy = q.y() - p.y();
        double dz = q.z() - p.z();
        double d = Math.hypot(dy, dz);
        if (!(d > 0)) {
            return null;
        }
        double along = (rp * rp - rq * rq + d * d) / (2 * d);
        double across2 = rp * rp - along * along;
        if (!(across2 >= 0)) {
            return null;
        }
        double across = Math.sqrt(across2);
        double y = p.y() + (along * dy - branch * across * dz) / d;
        double z = p.z() + (along * dz + branch * across * dy) / d;
        return new FrontViewPoint(y, z);
    }
}
