package barwright.report.linkage;

import barwright.model.AxlePosition;
import barwright.physics.linkage.InstantCentre;
import barwright.physics.linkage.RollState;
import barwright.physics.linkage.TravelState;
import barwright.report.heading.OutputDocument;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;

/**
 * {@code geometry FILE --json}: {@code {"format": "barwright.geometry", "version": 1, "front": {...},
 * "rear": {...}}}, lengths in mm and angles in degrees as the key names say. A value that does not exist (no
 * roll centre where the lines are parallel, an instant centre at infinity, a row past the linkage's reach) is
 * null, never a made-up number.
 */
public final class GeometryJson {
    public static final String FORMAT = "barwright.geometry";
    public static final int VERSION = 1;
    private static final JsonNodeFactory NODES = JsonNodeFactory.instance;

    private GeometryJson() {
    }

    public static ObjectNode of(GeometryTables front, GeometryTables rear) {
        ObjectNode root = OutputDocument.start(FORMAT, VERSION);
        root.set(key(front.position()), axle(front));
        root.set(key(rear.position()), axle(rear));
        return root;
    }

    private static String key(AxlePosition position) {
        return position == AxlePosition.FRONT ? "front" : "rear";
    }

    private static ObjectNode axle(GeometryTables tables) {
        ObjectNode node = NODES.objectNode();
        putMm(node, "staticRollCentreHeightMm", tables.staticRollCentreHeight());
        ArrayNode roll = node.putArray("roll");
        for (GeometryTables.RollRow row : tables.roll()) {
            ObjectNode entry = roll.addObject();
            entry.put("rollDeg", Math.toDegrees(row.roll()));
            RollState state = row.state();
            boolean centre = state != null && state.hasRollCentre();
            putMm(entry, "rollCentreHeightMm", centre ? state.rollCentre().height() : null);
            putMm(entry, "rollCentreOffsetMm", centre ? state.rollCentre().offset() : null);
            putDeg(entry, "leftCamberDeg", state == null ? null : state.leftCamber());
            putDeg(entry, "rightCamberDeg", state == null ? null : state.rightCamber());
        }
        ArrayNode travel = node.putArray("travel");
        for (GeometryTables.TravelRow row : tables.travel()) {
            ObjectNode entry = travel.addObject();
            entry.put("travelMm", row.travel() * 1e3);
            TravelState state = row.state();
            putDeg(entry, "camberDeg", state == null ? null : state.camber());
            InstantCentre centre = state == null ? null : state.instantCentre();
            if (centre == null || centre.atInfinity()) {
                entry.putNull("instantCentreMm");
            } else {
                entry.putArray("instantCentreMm").add(centre.y() * 1e3).add(centre.z() * 1e3);
            }
        }
        return node;
    }

    private static void putMm(ObjectNode node, String key, Double metres) {
        if (metres == null) {
            node.putNull(key);
        } else {
            node.put(key, metres * 1e3 + 0.0); // + 0.0: no minus zero
        }
    }

    private static void putDeg(ObjectNode node, String key, Double radians) {
        if (radians == null) {
            node.putNull(key);
        } else {
            node.put(key, Math.toDegrees(radians) + 0.0);
        }
    }
}
