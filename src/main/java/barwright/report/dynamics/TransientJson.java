package barwright.report.dynamics;

import barwright.physics.dynamics.RollState;
import barwright.physics.dynamics.TransientResult;
import barwright.report.heading.OutputDocument;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;

import java.util.List;

import static barwright.units.Conversions.toDegrees;
import static barwright.units.Conversions.toPercent;

/**
 * The {@code transient} command's JSON (file-format.md, "barwright.transient"): format and version, the
 * figures, then the series. A figure that does not apply (overshoot of a sine, a lift that never happens) is
 * null, never NaN.
 */
public final class TransientJson {
    public static final String FORMAT = "barwright.transient";
    public static final int VERSION = 1;
    /** The series lists every this many recorded states at most: a step's 1 ms states every 10 ms. */
    private static final int MAX_SERIES = 2000;

    private TransientJson() {
    }

    public static ObjectNode of(TransientResult result) {
        ObjectNode node = OutputDocument.start(FORMAT, VERSION);
        number(node, "rollNaturalFrequencyHz", result.modes().naturalFrequency());
        number(node, "rollDampingRatio", result.modes().dampingRatio());
        number(node, "steadyRollDeg", toDegrees(result.steadyRoll()));
        number(node, "peakRollDeg", toDegrees(result.peakRoll()));
        number(node, "overshootPercent", toPercent(result.overshoot()));
        number(node, "timeTo90PercentS", result.timeTo90Percent());
        peak(node.putObject("front"), result.frontPeak());
        peak(node.putObject("rear"), result.rearPeak());
        ObjectNode least = node.putObject("leastWheelLoadN");
        least.put("leftFront", result.leastLoads().leftFront());
        least.put("rightFront", result.leastLoads().rightFront());
        least.put("leftRear", result.leastLoads().leftRear());
        least.put("rightRear", result.leastLoads().rightRear());
        number(node, "firstLiftTimeS", result.run().firstLift());
        number(node, "rolloverTimeS", result.run().rolloverTime());
        ArrayNode series = node.putArray("series");
        List<RollState> states = result.run().states();
        int every = Math.max(1, (int) Math.ceil(states.size() / (double) MAX_SERIES));
        for (int i = 0; i < states.size(); i += every) {
            RollState state = states.get(i);
            ObjectNode entry = series.addObject();
            entry.put("timeS", state.time());
            entry.put("rollDeg", toDegrees(state.roll()));
            entry.put("leftFrontN", state.leftFront());
            entry.put("rightFrontN", state.rightFront());
            entry.put("leftRearN", state.leftRear());
            entry.put("rightRearN", state.rightRear());
        }
        return node;
    }

    private static void peak(ObjectNode node, TransientResult.Peak peak) {
        node.put("peakLoadTransferN", peak.value());
        node.put("peakLoadTransferTimeS", peak.time());
    }

    /** Puts a finite number, or null where the figure does not apply. */
    static void number(ObjectNode node, String key, double value) {
        if (Double.isFinite(value)) {
            node.put(key, value);
        } else {
            node.putNull(key);
        }
    }
}
