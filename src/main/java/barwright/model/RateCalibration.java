package barwright.model;

import java.time.LocalDate;
import java.util.Objects;

/**
 * A bar's measured rate against the model's (model.md 12.1): the link rate the model gives for the bar is
 * multiplied by {@code effectiveRateFactor} everywhere it is used, so that free play, bushings, links, arm
 * bending and a bar that is not quite its drawing are carried by one measured number.
 *
 * @param effectiveRateFactor measured link rate / the model's link rate, {@link #LOWEST} to {@link #HIGHEST}
 * @param measuredOn          the day of the measurement
 * @param note                how and where it was measured, in the person's words ("" for none)
 */
public record RateCalibration(double effectiveRateFactor, LocalDate measuredOn, String note) {
    /** Factors outside these are refused: the model's inputs would be wrong, not the bushings (the program's choice). */
    public static final double LOWEST = 0.2;
    public static final double HIGHEST = 2.0;

    public RateCalibration {
        if (!(effectiveRateFactor >= LOWEST && effectiveRateFactor <= HIGHEST)) {
            throw new IllegalArgumentException("effectiveRateFactor must lie from " + LOWEST + " to " + HIGHEST
                    + ", was " + effectiveRateFactor);
        }
        Objects.requireNonNull(measuredOn, "measuredOn");
        note = note == null ? "" : note;
    }
}
