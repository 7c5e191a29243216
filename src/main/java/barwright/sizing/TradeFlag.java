package barwright.sizing;

import barwright.model.AxlePosition;

/**
 * One way a proposed bar lies outside what the trade usually fits ({@link TradeLimits}); a caution, not a
 * refusal: the bar met every limit the search was given.
 *
 * @param kind  what is out of the ordinary
 * @param axle  the bar's axle
 * @param value the bar's figure: its mass (kg), outside diameter (m) or static safety factor
 * @param limit where the flag starts, in the same unit: above it for mass and diameter, below it for the
 *              safety factor
 */
public record TradeFlag(Kind kind, AxlePosition axle, double value, double limit) {
    /** What a flag is about; {@link #name()} is the stable key of the JSON output. */
    public enum Kind {
        /** Heavier than a road or club car's bar usually is. */
        BAR_MASS("heavy"),
        /** Thicker than a road or club car's bar usually is (solid or tube). */
        OUTER_DIAMETER("thick"),
        /** Little margin over the least safety factor, or a peak stress near yield. */
        STRESS("stressed");

        private final String word;

        Kind(String word) {
            this.word = word;
        }

        /** @return one short word for a table cell: heavy, thick, stressed */
        public String word() {
            return word;
        }
    }
}
