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
            new PointKey(VehicleKeys.UPPER_INNER_MM, "Upper arm, body pivot", 2),
            new PointKey(VehicleKeys.UPPER_OUTER_MM, "Upper ball joint", 2),
            new PointKey(VehicleKeys.LOWER_INNER_MM, "Lower arm, body pivot", 2),
            new PointKey(VehicleKeys.LOWER_OUTER_MM, "Lower ball joint", 2));
    private static final List<PointKey> STRUT = List.of(
            new PointKey(VehicleKeys.STRUT_TOP_MM, "Strut top mount", 2),
            new PointKey(VehicleKeys.STRUT_LOWER_MM, "Strut axis, on the upright", 2),
            new PointKey(VehicleKeys.LOWER_INNER_MM, "Lower arm, body pivot", 2),
            new PointKey(VehicleKeys.LOWER_OUTER_MM, "Lower ball joint", 2));
    private static final List<PointKey> PANHARD = List.of(
            new PointKey(VehicleKeys.PANHARD_BODY_MM, "Panhard rod, body end", 2),
            new PointKey(VehicleKeys.PANHARD_AXLE_MM, "Panhard rod, axle end", 2));
    private static final List<PointKey> WATTS = List.of(
            new PointKey(VehicleKeys.CENTRE_PIVOT_HEIGHT_MM, "Watt's centre pivot height", 1));
    private static final List<PointKey> SWINGING_ARM = List.of(
            new PointKey(VehicleKeys.PIVOT_INNER_MM, "Arm pivot axis, inner point", 3),
            new PointKey(VehicleKeys.PIVOT_OUTER_MM, "Arm pivot axis, outer point", 3));

    private LinkageKeys() {
    }

    /** @return the key of the linkage object inside an axle */
    public static String linkage() {
        return VehicleKeys.LINKAGE;
    }

    /** @return the linkage's type as the file writes it, or "" where the node has none */
    public static String type(JsonNode linkage) {
        return linkage == null ? "" : linkage.path(VehicleKeys.TYPE).asText("");
    }

    /** @return the measured points of a linkage type, in the figure's order; empty for a type the file does not know */
    public static List<PointKey> points(String type) {
        return switch (type) {
            case VehicleKeys.DOUBLE_WISHBONE -> DOUBLE_WISHBONE;
            case VehicleKeys.STRUT -> STRUT;
            case VehicleKeys.LIVE_AXLE_PANHARD -> PANHARD;
            case VehicleKeys.LIVE_AXLE_WATTS -> WATTS;
            case VehicleKeys.TRAILING_ARM, VehicleKeys.SEMI_TRAILING_ARM -> SWINGING_ARM;
            default -> List.of();
        };
    }

    /** @return where a point's coordinate sits, e.g. {@code front.linkage.upperInnerMm[1]} */
    public static KeyPath path(String axleKey, PointKey point, int coordinate) {
        KeyPath key = KeyPath.of(axleKey).child(VehicleKeys.LINKAGE).child(point.key());
        return point.dimensions() == 1 ? key : key.index(coordinate);
    }
}
