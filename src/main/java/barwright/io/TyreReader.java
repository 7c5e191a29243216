package barwright.io;

import barwright.model.LoadPoint;
import barwright.model.LoadTable;
import barwright.model.Tyre;
import barwright.model.TyreCamber;
import com.fasterxml.jackson.databind.JsonNode;

import java.util.ArrayList;
import java.util.List;

import static barwright.units.Constants.RADIANS_PER_DEGREE;

/**
 * Reads a tyre object (file-format.md, "The tyre"): the friction and cornering stiffness each as a law or as
 * points against load (not both), and the optional camber terms. Every problem is recorded with its key path.
 */
final class TyreReader {
    static final String FRICTION_POINTS = VehicleKeys.PEAK_FRICTION_BY_LOAD;
    static final String STIFFNESS_POINTS = VehicleKeys.CORNERING_STIFFNESS_BY_LOAD;
    static final String CAMBER_FOR_PEAK_GRIP = VehicleKeys.CAMBER_FOR_PEAK_GRIP_DEG;
    static final String FRICTION_LOSS = VehicleKeys.PEAK_FRICTION_LOSS_PER_DEG_SQUARED;
    static final String CAMBER_STIFFNESS = VehicleKeys.CAMBER_STIFFNESS_PER_LOAD;
    /** The keys that file version 2 added to the tyre. */
    static final List<String> VERSION_2_KEYS = List.of(FRICTION_POINTS, STIFFNESS_POINTS, CAMBER_FOR_PEAK_GRIP,
            FRICTION_LOSS, CAMBER_STIFFNESS);
    /** More points than this are refused: a tyre test at more loads than this is not a vehicle file's job. */
    static final int MAX_POINTS = 50;

    // a point below 1 N, or a stiffness below 1 N/deg, is no tyre measurement (common practice): a
    // number just above zero would leave the law's stand-in values at 0 (fuzzing found one)
    private static final Range LOAD = Range.between(1, 100000, "N");
    private static final Range FRICTION = Range.between(0.1, 5, "");
    private static final Range STIFFNESS_PER_DEG = Range.between(1, 200000, "N/deg");

    private TyreReader() {
    }

    static Tyre read(JsonNode node, String path, NodeReader reader) {
        int before = reader.problems().size();
        double nominal = reader.number(node, path, VehicleKeys.NOMINAL_LOAD_N, Range.between(100, 100000, "N"));
        boolean frictionPoints = !NodeReader.isAbsent(node, FRICTION_POINTS);
        boolean stiffnessPoints = !NodeReader.isAbsent(node, STIFFNESS_POINTS);
        double friction = 1;
        double sensitivity = 0;
        if (frictionPoints) {
            refuseWith(node, path, FRICTION_POINTS, reader, VehicleKeys.FRICTION_AT_NOMINAL_LOAD,
                    VehicleKeys.FRICTION_LOAD_SENSITIVITY);
        } else {
            friction = reader.number(node, path, VehicleKeys.FRICTION_AT_NOMINAL_LOAD, Range.between(0.1, 5, ""));
            sensitivity = reader.number(node, path, VehicleKeys.FRICTION_LOAD_SENSITIVITY, Range.between(-1, 0.5, ""));
        }
        double stiffness = 10;
        double peakRatio = 2;
        if (stiffnessPoints) {
            refuseWith(node, path, STIFFNESS_POINTS, reader, VehicleKeys.CORNERING_STIFFNESS_PER_LOAD,
                    VehicleKeys.CORNERING_STIFFNESS_PEAK_LOAD_RATIO);
        } else {
            stiffness = reader.number(node, path, VehicleKeys.CORNERING_STIFFNESS_PER_LOAD,
                    Range.between(1, 100, "per rad"));
            peakRatio = reader.number(node, path, VehicleKeys.CORNERING_STIFFNESS_PEAK_LOAD_RATIO,
                    Range.between(0.5, 10, ""));
        }
        double shape = reader.number(node, path, VehicleKeys.SHAPE_FACTOR, Range.between(1, 2, ""));
        double curvature = reader.number(node, path, VehicleKeys.CURVATURE_FACTOR, Range.between(-10, 1, ""));
        LoadTable frictionTable = frictionPoints
                ? points(node, path, FRICTION_POINTS, VehicleKeys.PEAK_FRICTION, FRICTION, 1, reader) : null;
        LoadTable stiffnessTable = stiffnessPoints
                ? points(node, path, STIFFNESS_POINTS, VehicleKeys.CORNERING_STIFFNESS_N_PER_DEG, STIFFNESS_PER_DEG,
                1 / RADIANS_PER_DEGREE, reader) : null;
        TyreCamber camber = camber(node, path, reader);
        if (reader.problems().size() > before) {
            return null;
        }
        Tyre tyre = new Tyre(nominal, friction, sensitivity, stiffness, peakRatio, shape, curvature)
                .withCamber(camber);
        if (frictionTable != null) {
            tyre = tyre.withFrictionByLoad(frictionTable);
        }
        if (stiffnessTable != null) {
            tyre = tyre.withCorneringStiffnessByLoad(stiffnessTable);
        }
        return tyre;
    }

    /** A law's keys next to the points that replace it: each one present is a problem at its own key path. */
    private static void refuseWith(JsonNode node, String path, String pointsKey, NodeReader reader,
                                   String... lawKeys) {
        for (String key : lawKeys) {
            if (!NodeReader.isAbsent(node, key)) {
                reader.problem(NodeReader.child(path, key), "cannot be given together with " + pointsKey
                        + ": give the law or the points, not both (leave this key out to use the points)");
            }
        }
    }

    /**
     * @param scale multiplies each value from the file's unit into SI
     * @return the points, or null (with problems recorded) where any is bad
     */
    private static LoadTable points(JsonNode node, String path, String key, String valueKey, Range valueRange,
                                    double scale, NodeReader reader) {
        JsonNode array = reader.array(node, path, key, LoadTable.MIN_POINTS, MAX_POINTS, true);
        if (array == null) {
            return null;
        }
        int before = reader.problems().size();
        String arrayPath = NodeReader.child(path, key);
        List<LoadPoint> points = new ArrayList<>(array.size());
        double previousLoad = Double.NEGATIVE_INFINITY;
        for (int i = 0; i < array.size(); i++) {
            String pointPath = arrayPath + "[" + i + "]";
            JsonNode point = array.get(i);
            if (point == null || !point.isObject()) {
                reader.problem(pointPath, "= " + NodeReader.shown(point) + ": must be an object {\"loadN\": ..., \""
                        + valueKey + "\": ...}");
                continue;
            }
            int beforePoint = reader.problems().size();
            double load = reader.number(point, pointPath, VehicleKeys.LOAD_N, LOAD);
            double value = reader.number(point, pointPath, valueKey, valueRange);
            if (reader.problems().size() > beforePoint) {
                continue;
            }
            if (!(load > previousLoad)) {
                reader.problem(pointPath + ".loadN", "= " + Range.format(load) + " N: loads must increase from "
                        + "one point to the next (the point before is at " + Range.format(previousLoad) + " N)");
            }
            previousLoad = load;
            points.add(new LoadPoint(load, value * scale));
        }
        return reader.problems().size() > before ? null : new LoadTable(points);
    }

    private static TyreCamber camber(JsonNode node, String path, NodeReader reader) {
        double best = reader.optionalNumber(node, path, CAMBER_FOR_PEAK_GRIP, Range.between(-10, 10, "deg"), 0);
        double loss = reader.optionalNumber(node, path, FRICTION_LOSS, Range.between(0, 0.05, "per deg²"), 0);
        double thrust = reader.optionalNumber(node, path, CAMBER_STIFFNESS, Range.between(0, 0.1, "per deg"), 0);
        return new TyreCamber(best * RADIANS_PER_DEGREE, loss / (RADIANS_PER_DEGREE * RADIANS_PER_DEGREE),
                thrust / RADIANS_PER_DEGREE);
    }

    /** Version-1 files know none of the keys of version 2: one there is refused rather than silently ignored. */
    static void refuseNewKeysInVersion1(JsonNode tree, NodeReader reader) {
        JsonNode version = tree.get("version");
        if (version == null || !version.isNumber() || version.doubleValue() != 1) {
            return;
        }
        for (String axle : List.of("front", "rear")) {
            JsonNode tyre = tree.path(axle).path("tyre");
            for (String key : VERSION_2_KEYS) {
                if (tyre.isObject() && tyre.has(key)) {
                    reader.problem(axle + ".tyre." + key, "needs file version 2 (this file says \"version\": 1): "
                            + "set \"version\": 2 to use it");
                }
            }
        }
    }
}
