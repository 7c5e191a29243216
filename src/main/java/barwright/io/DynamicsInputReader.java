package barwright.io;

import barwright.model.AxlePosition;
import barwright.model.Damper;
import barwright.model.DynamicsInputs;
import com.fasterxml.jackson.databind.JsonNode;

import java.util.ArrayList;
import java.util.List;

/**
 * Reads the roll-dynamics keys of a vehicle file (file-format.md, "Roll dynamics"): {@code
 * vehicle.rollInertiaKgM2} and each axle's optional {@code damper}. All are optional; a file without them
 * means what it always meant.
 */
public final class DynamicsInputReader {
    static final String ROLL_INERTIA = "rollInertiaKgM2";
    static final String DAMPER = "damper";
    static final Range INERTIA_RANGE = Range.between(1, 1e5, "kg·m²");
    static final Range VELOCITY_RANGE = Range.between(-10000, 10000, "mm/s");
    static final Range FORCE_RANGE = Range.between(-100000, 100000, "N");
    static final int MAX_POINTS = 64;

    private DynamicsInputReader() {
    }

    /** @return the roll inertia and dampers of a vehicle file's tree, refused with key paths where wrong */
    public static DynamicsInputs read(JsonNode tree) throws VehicleFileException {
        NodeReader reader = new NodeReader();
        DynamicsInputs inputs = read(tree, reader);
        if (reader.hasProblems()) {
            throw new VehicleFileException(reader.problems());
        }
        return inputs;
    }

    /** Records the problems of the dynamics keys (for the vehicle reader, so a bad damper refuses the file). */
    static DynamicsInputs read(JsonNode tree, NodeReader reader) {
        Double inertia = null;
        JsonNode body = tree.get("vehicle");
        if (body != null && body.isObject() && !NodeReader.isAbsent(body, ROLL_INERTIA)) {
            inertia = reader.number(body, "vehicle", ROLL_INERTIA, INERTIA_RANGE);
        }
        Damper front = damper(tree, AxlePosition.FRONT, reader);
        Damper rear = damper(tree, AxlePosition.REAR, reader);
        return reader.hasProblems() ? null : new DynamicsInputs(inertia, front, rear);
    }

    private static Damper damper(JsonNode tree, AxlePosition position, NodeReader reader) {
        String axlePath = position.key();
        JsonNode axle = tree.get(axlePath);
        if (axle == null || !axle.isObject()) {
            return null;
        }
        JsonNode node = reader.object(axle, axlePath, DAMPER, false);
        if (node == null) {
            return null;
        }
        String path = axlePath + "." + DAMPER;
        int before = reader.problems().size();
        double ratio = reader.number(node, path, "motionRatio", Range.between(0.1, 3, ""));
        JsonNode points = reader.array(node, path, "forceByVelocity", 2, MAX_POINTS, true);
        if (points == null) {
            return null;
        }
        String pointsPath = path + ".forceByVelocity";
        List<Double> velocities = new ArrayList<>();
        List<Double> forces = new ArrayList<>();
        for (int i = 0; i < points.size(); i++) {
            String pointPath = pointsPath + "[" + i + "]";
            JsonNode point = points.get(i);
            if (!point.isArray() || point.size() != 2) {
                reader.problem(pointPath, "= " + NodeReader.shown(point)
                        + ": must be a pair [velocityMmPerS, forceN]");
                continue;
            }
            double velocity = reader.numberAt(point.get(0), pointPath + "[0]", VELOCITY_RANGE);
            double force = reader.numberAt(point.get(1), pointPath + "[1]", FORCE_RANGE);
            velocities.add(velocity * 1e-3);
            forces.add(force);
        }
        if (reader.problems().size() > before) {
            return null;
        }
        return checkedCurve(ratio, velocities, forces, pointsPath, reader);
    }

    /** Adds the point (0, 0) where absent and checks the curve's shape; null with a problem where it is wrong. */
    private static Damper checkedCurve(double ratio, List<Double> velocities, List<Double> forces, String path,
                                       NodeReader reader) {
        boolean hasZero = false;
        for (int i = 0; i < velocities.size(); i++) {
            double velocity = velocities.get(i);
            double force = forces.get(i);
            String at = path + "[" + i + "]";
            if (i > 0 && !(velocity > velocities.get(i - 1))) {
                reader.problem(at, "= [" + Range.format(velocity * 1e3) + ", " + Range.format(force)
                        + "]: velocities must rise from point to point (rebound, negative, first)");
                return null;
            }
            if (i > 0 && !(force > forces.get(i - 1))) {
                reader.problem(at, "= [" + Range.format(velocity * 1e3) + ", " + Range.format(force)
                        + "]: the force must rise with the velocity: a damper always resists the motion");
                return null;
            }
            if (velocity == 0) {
                hasZero = true;
                if (force != 0) {
                    reader.problem(at, "= [0, " + Range.format(force) + "]: the curve passes through zero "
                            + "(force 0 N at 0 mm/s)");
                    return null;
                }
            }
        }
        if (!(velocities.get(0) < 0 && velocities.get(velocities.size() - 1) > 0)) {
            reader.problem(path, "must have a point in rebound (negative velocity) and one in bump (positive)");
            return null;
        }
        if (!hasZero) {
            int at = 0;
            while (velocities.get(at) < 0) {
                at++;
            }
            velocities.add(at, 0.0);
            forces.add(at, 0.0);
            if (!(forces.get(at - 1) < 0 && forces.get(at + 1) > 0)) {
                reader.problem(path, "must have negative forces in rebound and positive in bump: the curve passes "
                        + "through zero");
                return null;
            }
        }
        return new Damper(ratio, velocities, forces);
    }
}
