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

import java.util.List;

/**
 * Reads an axle's {@code linkage}, {@code rideHeightChangeMm} and {@code staticCamberDeg} (file version 2;
 * docs/file-format.md, "Suspension linkages"), refusing points on the wrong side, crossed arms and linkages that
 * cannot be put together or lock near the ride height ({@link LinkageChecks}).
 */
final class LinkageReader {
    static final String LINKAGE = "linkage";
    static final String RIDE_HEIGHT_CHANGE = "rideHeightChangeMm";
    static final String STATIC_CAMBER = "staticCamberDeg";
    static final String TYPE = "type";
    static final String DOUBLE_WISHBONE = "double-wishbone";
    static final String STRUT = "strut";
    static final String LIVE_AXLE_PANHARD = "live-axle-panhard";
    static final String LIVE_AXLE_WATTS = "live-axle-watts";
    static final String TRAILING_ARM = "trailing-arm";
    static final String SEMI_TRAILING_ARM = "semi-trailing-arm";
    static final List<String> TYPES = List.of(DOUBLE_WISHBONE, STRUT, LIVE_AXLE_PANHARD, LIVE_AXLE_WATTS, TRAILING_ARM,
            SEMI_TRAILING_ARM);

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
                & FileVersion.allows(version, FileVersion.LINKAGES, node, path, RIDE_HEIGHT_CHANGE, reader)
                & FileVersion.allows(version, FileVersion.LINKAGES, node, path, STATIC_CAMBER, reader);
        if (!allowed) {
            return null;
        }
        double rideHeightChange = reader.optionalNumber(node, path, RIDE_HEIGHT_CHANGE,
                Range.between(-200, 200, "mm"), 0) * 1e-3;
        double camber = Math.toRadians(reader.optionalNumber(node, path, STATIC_CAMBER,
                Range.between(-10, 10, "deg"), 0));
        JsonNode linkageNode = reader.object(node, path, LINKAGE, false);
        String linkagePath = NodeReader.child(path, LINKAGE);
        Linkage linkage = linkageNode == null ? null : linkage(linkageNode, linkagePath, reader);
        if (linkageNode == null && rideHeightChange != 0) {
            reader.problem(NodeReader.child(path, RIDE_HEIGHT_CHANGE), "= " + Range.format(rideHeightChange * 1e3)
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
                return new DoubleWishbone(point(node, path, "upperInnerMm", reader),
                        point(node, path, "upperOuterMm", reader), point(node, path, "lowerInnerMm", reader),
                        point(node, path, "lowerOuterMm", reader));
            case STRUT:
                return new Strut(point(node, path, "strutTopMm", reader), point(node, path, "strutLowerMm", reader),
                        point(node, path, "lowerInnerMm", reader), point(node, path, "lowerOuterMm", reader));
            case LIVE_AXLE_PANHARD:
                return new LiveAxlePanhard(point(node, path, "panhardBodyMm", reader),
                        point(node, path, "panhardAxleMm", reader));
            case LIVE_AXLE_WATTS:
                double height = reader.number(node, path, "centrePivotHeightMm", Range.between(50, 1500, "mm")) * 1e-3;
                String on = reader.text(node, path, "centrePivotOn", true);
                LiveAxleWatts.Mount mount = LiveAxleWatts.Mount.AXLE;
                if ("body".equals(on)) {
                    mount = LiveAxleWatts.Mount.BODY;
                } else if (!"axle".equals(on) && !on.isEmpty()) {
                    reader.problem(NodeReader.child(path, "centrePivotOn"), "= \"" + on + "\": must be \"axle\" or \"body\"");
                }
                return new LiveAxleWatts(height, mount);
            case TRAILING_ARM:
                return new TrailingArm(point3(node, path, "pivotInnerMm", reader),
                        point3(node, path, "pivotOuterMm", reader));
            case SEMI_TRAILING_ARM:
                return new SemiTrailingArm(point3(node, path, "pivotInnerMm", reader),
                        point3(node, path, "pivotOuterMm", reader));
            default:
                if (!type.isEmpty()) {
                    reader.problem(NodeReader.child(path, TYPE), "= \"" + type + "\": must be one of "
                            + String.join(", ", TYPES.stream().map(t -> "\"" + t + "\"").toList()));
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
