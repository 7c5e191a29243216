package barwright.report;

import barwright.model.AntiRollBar;
import barwright.model.RateCalibration;
import com.fasterxml.jackson.databind.node.ObjectNode;

import java.util.Locale;

/**
 * How a bar's measured rate factor (model.md 12.1) is shown beside its rate: in the readable summary, the
 * analysis report's JSON and the window's figures.
 */
public final class RateCalibrationOutput {
    private RateCalibrationOutput() {
    }

    /** @return "model" for a bar with no measured factor, else "× 0.870 measured"; "-" for no bar */
    public static String text(AntiRollBar bar) {
        if (bar == null) {
            return "-";
        }
        RateCalibration calibration = bar.rateCalibration();
        return calibration == null ? "model" : String.format(Locale.ROOT, "× %.3f measured",
                calibration.effectiveRateFactor());
    }

    /** @return true where either bar carries a measured factor */
    public static boolean anyMeasured(AntiRollBar front, AntiRollBar rear) {
        return front != null && front.rateCalibration() != null || rear != null && rear.rateCalibration() != null;
    }

    /**
     * Adds {@code barEffectiveRateFactor} (1 for the model alone, null without a bar) and
     * {@code barRateMeasuredOn} (null unless measured) to an axle's report object.
     */
    public static void putJson(ObjectNode axleNode, AntiRollBar bar) {
        if (bar == null) {
            axleNode.putNull("barEffectiveRateFactor");
            axleNode.putNull("barRateMeasuredOn");
            return;
        }
        axleNode.put("barEffectiveRateFactor", bar.effectiveRateFactor());
        if (bar.rateCalibration() == null) {
            axleNode.putNull("barRateMeasuredOn");
        } else {
            axleNode.put("barRateMeasuredOn", bar.rateCalibration().measuredOn().toString());
        }
    }
}
