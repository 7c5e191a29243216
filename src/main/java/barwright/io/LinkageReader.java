package barwright.io;

import barwright.model.Axle;
import barwright.model.DoubleWishbone;
import barwright.model.FrontViewPoint;
import barwright.model.Linkage;
import barwright.model.LiveAxlePanhard;
import barwright.model.LiveAxleWatts;
import barwright.model.Point3;
import barwright.model.SemiTrailingArm;
import barwright.model.Strut;
import barwright.model.SuspensionGeometry;
import barwright.model.TrailingArm;
import com.fasterxml.jackson.databind.JsonNode;

import static barwright.io.VehicleKeys.CENTRE_PIVOT_HEIGHT_MM;
import static barwright.io.VehicleKeys.CENTRE_PIVOT_ON;
import static barwright.io.VehicleKeys.DOUBLE_WISHBONE;
import static barwright.io.VehicleKeys.LINKAGE;
import static barwright.io.VehicleKeys.LINKAGE_TYPES;
import static barwright.io.VehicleKeys.LIVE_AXLE_PANHARD;
import static barwright.io.VehicleKeys.LIVE_AXLE_WATTS;
import static barwright.io.VehicleKeys.LOWER_INNER_MM;
import static barwright.io.VehicleKeys.LOWER_OUTER_MM;
import static barwright.io.VehicleKeys.ON_AXLE;
import static barwright.io.VehicleKeys.ON_BODY;
import static barwright.io.VehicleKeys.PANHARD_AXLE_MM;
import static barwright.io.VehicleKeys.PANHARD_BODY_MM;
import static barwright.io.VehicleKeys.PIVOT_INNER_MM;
import static barwright.io.VehicleKeys.PIVOT_OUTER_MM;
import static barwright.io.VehicleKeys.RIDE_HEIGHT_CHANGE_MM;
import static barwright.io.VehicleKeys.SEMI_TRAILING_ARM;
import static barwright.io.VehicleKeys.STATIC_CAMBER_DEG;
import static barwright.io.VehicleKeys.STRUT;
import static barwright.io.VehicleKeys.STRUT_LOWER_MM;
import static barwright.io.VehicleKeys.STRUT_TOP_MM;
import static barwright.io.VehicleKeys.TRAILING_ARM;
import static barwright.io.VehicleKeys.TYPE;
import static barwright.io.VehicleKeys.UPPER_INNER_MM;
import static barwright.io.VehicleKeys.UPPER_OUTER_MM;

/**
 * Reads an axle's {@code linkage}, {@code rideHeightChangeMm} and {@code staticCamberDeg} (file version 2;
 * docs/file-format.md, "Suspension linkages"), refusing points on the wrong side, crossed arms and linkages that
 * cannot be put together or lock near the ride height ({@link LinkageChecks}).
 */
final class LinkageReader {
    private static final Range SIDEWAYS = Range.between(-3000, 3000, "mm");
    private static final Range HEIGHT = Range.between(0, 2000, "mm");
    private static final Range FORE_AFT = Range.between(-3000, 3000, "mm");

    private LinkageReader() {
    }

    /**
     * @param axle the axle as read so far (its track places the contact point)
     * @return the axle's suspension geometry, or null where a problem was recorded
     */
    static SuspensionGeometry read(JsonNode node, String path, NodeReader reader, int version, Axle axle) {
        int before = reader.problems().size();
        boolean allowed = FileVersion.allows(version, FileVersion.LINKAGES, node, path, LINKAGE, reader)
                & FileVersion.allows(version, FileVersion.LINKAGES, node, path, RIDE_HEIGHT_CHANGE_MM, reader)
                & FileVersion.allows(version, FileVersion.LINKAGES, node, path, STATIC_CAMBER_DEG, reader);
        if (!allowed) {
            return null;
        }
        double rideHeightChange = reader.optionalNumber(node, path, RIDE_HEIGHT_CHANGE_MM,
                Range.between(-200, 200, "mm"), 0) * 1e-3;
        double camber = Math.toRadians(reader.optionalNumber(node, path, STATIC_CAMBER_DEG,
                Range.between(-10, 10, "deg"), 0));
        JsonNode linkageNode = reader.object(node, path, LINKAGE, false);
        String linkagePath = NodeReader.child(path, LINKAGE);
        Linkage linkage = linkageNode == null ? null : linkage(linkageNode, linkagePath, reader);
        if (linkageNode == null && rideHeightChange != 0) {
            reader.problem(NodeReader.child(path, RIDE_HEIGHT_CHANGE_MM), "= " + Range.format(rideHeightChange * 1e3)
                    + " mm: a ride-height change needs this axle's linkage, to know where its roll centre goes; "
                    + "give the linkage, or type the new roll-centre height instead");
        }
        if (reader.problems().size() > before) {
            return null;
        }
        SuspensionGeometry suspension = new SuspensionGeometry(linkage, rideHeightChange, camber);
        if (linkage != null) {
            LinkageChecks.check(axle.withSuspension(suspension), path, reader);
        }
        return reader.problems().size() > before ? null : suspension;
    }

    private static Linkage linkage(JsonNode node, String path, NodeReader reader) {
        String type = reader.text(node, path, TYPE, true);
        switch (type) {
            case DOUBLE_WISHBONE:
                return new DoubleWishbone(point(node, path, UPPER_INNER_MM, reader),
                        point(node, path, UPPER_OUTER_MM, reader), point(node, path, LOWER_INNER_MM, reader),
                        point(node, path, LOWER_OUTER_MM, reader));
            case STRUT:
                return new Strut(point(node, path, STRUT_TOP_MM, reader), point(node, path, STRUT_LOWER_MM, reader),
                        point(node, path, LOWER_INNER_MM, reader), point(node, path, LOWER_OUTER_MM, reader));
            case LIVE_AXLE_PANHARD:
                return new LiveAxlePanhard(point(node, path, PANHARD_BODY_MM, reader),
                        point(node, path, PANHARD_AXLE_MM, reader));
            case LIVE_AXLE_WATTS:
                double height = reader.number(node, path, CENTRE_PIVOT_HEIGHT_MM, Range.between(50, 1500, "mm")) * 1e-3;
                String on = reader.text(node, path, CENTRE_PIVOT_ON, true);
                LiveAxleWatts.Mount mount = LiveAxleWatts.Mount.AXLE;
                if (ON_BODY.equals(on)) {
                    mount = LiveAxleWatts.Mount.BODY;
                } else if (!ON_AXLE.equals(on) && !on.isEmpty()) {
                    reader.problem(NodeReader.child(path, CENTRE_PIVOT_ON), "= \"" + on + "\": must be \"axle\" or \"body\"");
                }
                return new LiveAxleWatts(height, mount);
            case TRAILING_ARM:
                return new TrailingArm(point3(node, path, PIVOT_INNER_MM, reader),
                        point3(node, path, PIVOT_OUTER_MM, reader));
            case SEMI_TRAILING_ARM:
                return new SemiTrailingArm(point3(node, path, PIVOT_INNER_MM, reader),
                        point3(node, path, PIVOT_OUTER_MM, reader));
            default:
                if (!type.isEmpty()) {
                    reader.problem(NodeReader.child(path, TYPE), "= \"" + type + "\": must be one of "
                            + String.join(", ", LINKAGE_TYPES.stream().map(t -> "\"" + t + "\"").toList()));
                }
                return null;
        }
    }

    /** @return a front-view point [y, z] given in mm, in m */
    private static FrontViewPoint point(JsonNode node, String path, String key, NodeReader reader) {
        JsonNode array = reader.array(node, path, key, 2, 2, true);
        if (array == null) {
            return new FrontViewPoint(0, 0);
        }
        String at = NodeReader.child(path, key);
        double y = reader.numberAt(array.get(0), at + "[0]", SIDEWAYS);
        double z = reader.numberAt(array.get(1), at + "[1]", HEIGHT);
        return new FrontViewPoint(y * 1e-3, z * 1e-3);
    }

    /** @return a point [x, y, z] given in mm, in m */
    private static Point3 point3(JsonNode node, String path, String key, NodeReader reader) {
        JsonNode array = reader.array(node, path, key, 3, 3, true);
        if (array == null) {
            return new Point3(0, 0, 0);
        }
        String at = NodeReader.child(path, key);
        double x = reader.numberAt(array.get(0), at + "[0]", FORE_AFT);
        double y = reader.numberAt(array.get(1), at + "[1]", SIDEWAYS);
        double z = reader.numberAt(array.get(2), at + "[2]", HEIGHT);
        return new Point3(x * 1e-3, y * 1e-3, z * 1e-3);
    }
}
