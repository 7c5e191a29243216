package barwright.model;

import java.util.List;

/**
 * One axle's dampers (one per wheel, both alike), in SI.
 *
 * @param motionRatio damper travel / wheel travel
 * @param velocities  damper velocities of the curve's points, strictly increasing, bump positive (m/s); one of
 *                    them is 0
 * @param forces      the damper force at each velocity (N), strictly increasing, 0 at velocity 0: a damper
 *                    always resists the motion
 */
public record Damper(double motionRatio, List<Double> velocities, List<Double> forces) {
    public Damper {
        Checks.positive("motionRatio", motionRatio);
        velocities = List.copyOf(velocities);
        forces = List.copyOf(forces);
        if (velocities.size() != forces.size() || velocities.size() < 3) {
            throw new IllegalArgumentException("a damper curve needs at least 3 points with a force each");
        }
        boolean throughZero = false;
        for (int i = 0; i < velocities.size(); i++) {
            Checks.finite("velocity", velocities.get(i));
            Checks.finite("force", forces.get(i));
            if (i > 0 && !(velocities.get(i) > velocities.get(i - 1) && forces.get(i) > forces.get(i - 1))) {
                throw new IllegalArgumentException("damper velocities and forces must both rise from point to point");
            }
            if (velocities.get(i) == 0) {
                throwIfNonZero(forces.get(i));
                throughZero = true;
            }
        }
        if (!throughZero) {
            throw new IllegalArgumentException("a damper curve passes through velocity 0, force 0");
        }
    }

    private static void throwIfNonZero(double force) {
        if (force != 0) {
            throw new IllegalArgumentException("a damper's force at velocity 0 must be 0, was " + force);
        }
    }

    /** @return a linear damper of coefficient c (N s/m) at the damper, drawn through -1, 0 and 1 m/s */
    public static Damper linear(double motionRatio, double coefficient) {
        return new Damper(motionRatio, List.of(-1.0, 0.0, 1.0), List.of(-coefficient, 0.0, coefficient));
    }
}
