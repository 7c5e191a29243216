package barwright.io;

import barwright.model.AxlePosition;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;

import java.util.ArrayList;
import java.util.List;

/**
 * The one tree edit of a damper curve (file-format.md, "Roll dynamics"): one point of an axle's {@code
 * damper.forceByVelocity} replaced, with the refusal the file reader would give for the result, so that a view
 * can refuse a point before it reaches the open document.
 */
public final class DamperEdits {
    private DamperEdits() {
    }

    /** @return the key path of an axle's damper curve, e.g. {@code front.damper.forceByVelocity} */
    public static KeyPath curvePath(AxlePosition axle) {
        return KeyPath.of(axle.key() + "." + DynamicsInputReader.DAMPER + ".forceByVelocity");
    }

    /**
     * Puts one point of an axle's damper curve into an editable tree.
     *
     * @param index    the point's place in the list, from 0
     * @param velocity the damper velocity (m/s), bump positive; the file keeps mm/s
     * @param force    the damper force (N)
     */
    public static void putPoint(ObjectNode tree, AxlePosition axle, int index, double velocity, double force) {
        // a figure typed in other units is kept to a thousandth of the file's unit (mm/s, N)
        double millimetresPerSecond = Math.round(velocity * 1e6) / 1e3;
        double newtons = Math.round(force * 1e3) / 1e3;
        JsonNode curve = curvePath(axle).get(tree);
        if (!(curve instanceof ArrayNode points) || index < 0 || index >= points.size()) {
            throw new IllegalArgumentException("the " + axle.key() + " damper has no point " + index);
        }
        ArrayNode point = points.arrayNode();
        point.add(number(points, millimetresPerSecond));
        point.add(number(points, newtons));
        points.set(index, point);
    }

    /** @return a whole number as an integer, as the samples write them; others as they are */
    private static JsonNode number(ArrayNode factory, double value) {
        return value == Math.rint(value) && Math.abs(value) < 1e15 ? factory.numberNode((long) value)
                : factory.numberNode(value);
    }

    /**
     * @return the curve's points in the file's order, in SI: {velocity (m/s), force (N)}; empty where the axle
     *         has no damper or a point is not a pair of numbers (the file reader words that problem)
     */
    public static List<double[]> points(JsonNode tree, AxlePosition axle) {
        JsonNode curve = curvePath(axle).get(tree);
        List<double[]> points = new ArrayList<>();
        if (curve == null || !curve.isArray()) {
            return points;
        }
        for (JsonNode point : curve) {
            if (!point.isArray() || point.size() != 2 || !point.get(0).isNumber() || !point.get(1).isNumber()) {
                return new ArrayList<>();
            }
            points.add(new double[] {point.get(0).asDouble() * 1e-3, point.get(1).asDouble()});
        }
        return points;
    }
}
