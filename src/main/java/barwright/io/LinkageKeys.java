package barwright.io;

import com.fasterxml.jackson.databind.JsonNode;

import java.util.List;

/**
 * The measured points of each linkage type as the vehicle file names them (docs/file-format.md, "Suspension
 * linkages"), in the order {@code physics.linkage.FrontViewFigure} numbers its pickups: the window's linkage page
 * edits these keys by key path.
 */
public final class LinkageKeys {
    /**
     * One measured point of a linkage.
     *
     * @param key        the key inside {@code front.linkage} or {@code rear.linkage}
     * @param label      what a person calls it
     * @param dimensions 2 for a front-view {@code [y, z]}, 3 for {@code [x, y, z]}, 1 for a height alone
     */
    public record PointKey(String key, String label, int dimensions) {
        /** @return the index of the point's lateral coordinate y in its array, or -1 where it has none */
        public int yIndex() {
            return dimensions == 1 ? -1 : dimensions - 2;
        }

        /** @return the index of the point's height z in its array, or -1 where the key is a number alone */
        public int zIndex() {
            return dimensions == 1 ? -1 : dimensions - 1;
        }
    }

    private static final List<PointKey> DOUBLE_WISHBONE = List.of(
            new PointKey("upperInnerMm", "Upper arm, body pivot", 2),
            new PointKey("upperOuterMm", "Upper ball joint", 2),
            new PointKey("lowerInnerMm", "Lower arm, body pivot", 2),
            new PointKey("lowerOuterMm", "Lower ball joint", 2));
    private static final List<PointKey> STRUT = List.of(
            new PointKey("strutTopMm", "Strut top mount", 2),
            new PointKey("strutLowerMm", "Strut axis, on the upright", 2),
            new PointKey("lowerInnerMm", "Lower arm, body pivot", 2),
            new PointKey("lowerOuterMm", "Lower ball joint", 2));
    private static final List<PointKey> PANHARD = List.of(
            new PointKey("panhardBodyMm", "Panhard rod, body end", 2),
            new PointKey("panhardAxleMm", "Panhard rod, axle end", 2));
    private static final List<PointKey> WATTS = List.of(
            new PointKey("centrePivotHeightMm", "Watt's centre pivot height", 1));
    private static final List<PointKey> SWINGING_ARM = List.of(
            new PointKey("pivotInnerMm", "Arm pivot axis, inner point", 3),
            new PointKey("pivotOuterMm", "Arm pivot axis, outer point", 3));

    private LinkageKeys() {
    }

    /** @return the key of the linkage object inside an axle */
    public static String linkage() {
        return LinkageReader.LINKAGE;
    }

    /** @return the linkage's type as the file writes it, or "" where the node has none */
    public static String type(JsonNode linkage) {
        return linkage == null ? "" : linkage.path(LinkageReader.TYPE).asText("");
    }

    /** @return the measured points of a linkage type, in the figure's order; empty for a type the file does not know */
    public static List<PointKey> points(String type) {
        return switch (type) {
            case LinkageReader.DOUBLE_WISHBONE -> DOUBLE_WISHBONE;
            case LinkageReader.STRUT -> STRUT;
            case LinkageReader.LIVE_AXLE_PANHARD -> PANHARD;
            case LinkageReader.LIVE_AXLE_WATTS -> WATTS;
            case LinkageReader.TRAILING_ARM, LinkageReader.SEMI_TRAILING_ARM -> SWINGING_ARM;
            default -> List.of();
        };
    }

    /** @return where a point's coordinate sits, e.g. {@code front.linkage.upperInnerMm[1]} */
    public static KeyPath path(String axleKey, PointKey point, int coordinate) {
        KeyPath key = KeyPath.of(axleKey).child(LinkageReader.LINKAGE).child(point.key());
        return point.dimensions() == 1 ? key : key.index(coordinate);
    }
}
