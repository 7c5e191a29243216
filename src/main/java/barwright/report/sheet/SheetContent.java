package barwright.report.sheet;

import barwright.physics.AnalysisResult;
import barwright.physics.curve.Chart;
import barwright.sizing.map.AdjustmentMap;
import barwright.units.UnitSystem;

import java.time.LocalDate;
import java.util.List;
import java.util.Objects;

/**
 * What a setup sheet shows.
 *
 * @param result         the car's analysis
 * @param map            its adjustment map
 * @param referenceShare the front share the map's tint is centred on (a target, or the static front weight
 *                       plus 5 points)
 * @param charts         the charts to draw
 * @param date           the date printed on the sheet
 * @param units          the units it is written in
 */
public record SheetContent(AnalysisResult result, AdjustmentMap map, double referenceShare, List<Chart> charts,
                           LocalDate date, UnitSystem units) {
    /**
     * A rule of thumb puts the front share of load transfer near the static front weight fraction plus about
     * 5 percentage points for a slightly understeering balance (Milliken & Milliken, Race Car Vehicle
     * Dynamics, from memory): the default centre of the map's tint.
     */
    public static final double RULE_OF_THUMB_OFFSET = 0.05;

    public SheetContent {
        Objects.requireNonNull(result, "result");
        Objects.requireNonNull(map, "map");
        charts = List.copyOf(charts);
        Objects.requireNonNull(date, "date");
        Objects.requireNonNull(units, "units");
    }
}
