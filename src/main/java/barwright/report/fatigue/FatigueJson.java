package barwright.report.fatigue;

import barwright.physics.fatigue.FatigueResult;
import barwright.physics.fatigue.StressCycle;
import barwright.report.heading.OutputDocument;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;

import java.util.Map;

import static barwright.units.Conversions.toMegapascals;

/**
 * {@code fatigue FILE --json}: {@code {"format": "barwright.fatigue", "version": 1, "front": {...}, "rear":
 * {...}}} or one {@code "history"} object. An infinite life (no cycle reaches the endurance limit) is written as
 * {@code null}, never as Infinity (docs/file-format.md).
 */
public final class FatigueJson {
    public static final String FORMAT = "barwright.fatigue";
    public static final int VERSION = 1;

    private FatigueJson() {
    }

    /** @param results by key ("front", "rear" or "history"), in order */
    public static ObjectNode of(Map<String, FatigueResult> results) {
        ObjectNode root = OutputDocument.start(FORMAT, VERSION);
        results.forEach((key, result) -> root.set(key, bar(result)));
        return root;
    }

    private static ObjectNode bar(FatigueResult result) {
        ObjectNode node = JsonNodeFactory.instance.objectNode();
        node.put("damagePerLap", result.damagePerLap());
        putFinite(node, "lapsToFailure", result.lapsToFailure());
        putFinite(node, "hoursToFailure", result.hoursToFailure());
        putFinite(node, "fatigueSafetyFactor", result.fatigueSafetyFactor());
        ArrayNode cycles = node.putArray("cycles");
        for (StressCycle cycle : result.cycles()) {
            ObjectNode row = cycles.addObject();
            row.put("rangeMPa", toMegapascals(cycle.range()));
            row.put("meanMPa", toMegapascals(cycle.mean()));
            row.put("count", cycle.count());
        }
        return node;
    }

    private static void putFinite(ObjectNode node, String key, double value) {
        if (Double.isFinite(value)) {
            node.put(key, value);
        } else {
            node.putNull(key);
        }
    }
}
