package barwright.io;

import barwright.model.RateCalibration;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ObjectNode;

import java.time.LocalDate;
import java.time.format.DateTimeParseException;

import static barwright.io.VehicleKeys.EFFECTIVE_RATE_FACTOR;
import static barwright.io.VehicleKeys.MEASURED_ON;
import static barwright.io.VehicleKeys.NOTE;
import static barwright.io.VehicleKeys.RATE_CALIBRATION;

/**
 * The optional {@code rateCalibration} object of a bar (file-format.md; its key names in {@link VehicleKeys}):
 * reading it with key paths, and the one tree edit that puts it into a bar.
 */
public final class RateCalibrationKeys {
    /** A note longer than this is refused (characters). */
    public static final int MAX_NOTE = 500;

    private RateCalibrationKeys() {
    }

    /** @return the calibration, null where the key is absent or null or wrong (wrong values are problems) */
    static RateCalibration read(JsonNode bar, String barPath, NodeReader reader) {
        JsonNode node = reader.object(bar, barPath, RATE_CALIBRATION, false);
        if (node == null) {
            return null;
        }
        String path = NodeReader.child(barPath, RATE_CALIBRATION);
        int before = reader.problems().size();
        double factor = reader.number(node, path, EFFECTIVE_RATE_FACTOR,
                Range.between(RateCalibration.LOWEST, RateCalibration.HIGHEST, ""));
        String date = reader.text(node, path, MEASURED_ON, true);
        LocalDate measuredOn = null;
        if (!date.isEmpty()) {
            try {
                measuredOn = LocalDate.parse(date);
            } catch (DateTimeParseException notADate) {
                reader.problem(NodeReader.child(path, MEASURED_ON), "= \"" + date + "\": must be a date written "
                        + "year-month-day, e.g. \"2026-11-30\"");
            }
        }
        String note = reader.text(node, path, NOTE, false);
        if (note.length() > MAX_NOTE) {
            reader.problem(NodeReader.child(path, NOTE), "is " + note.length() + " characters long: at most "
                    + MAX_NOTE);
        }
        if (reader.problems().size() > before || measuredOn == null) {
            return null;
        }
        return new RateCalibration(factor, measuredOn, note);
    }

    /**
     * Puts the calibration into a bar object of an editable tree, or takes it out.
     *
     * @param bar         the bar's object
     * @param calibration the calibration, or null to remove it
     */
    public static void put(ObjectNode bar, RateCalibration calibration) {
        if (calibration == null) {
            bar.remove(RATE_CALIBRATION);
            return;
        }
        ObjectNode node = bar.putObject(RATE_CALIBRATION);
        node.put(EFFECTIVE_RATE_FACTOR, Math.round(calibration.effectiveRateFactor() * 1e4) / 1e4);
        node.put(MEASURED_ON, calibration.measuredOn().toString());
        node.put(NOTE, calibration.note());
    }
}
