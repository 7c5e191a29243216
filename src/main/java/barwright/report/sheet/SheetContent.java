package barwright.report.sheet;

import barwright.physics.AnalysisResult;
import barwright.physics.curve.Chart;
import barwright.sizing.map.AdjustmentMap;
import barwright.units.UnitSystem;

import java.time.LocalDate;
import java.util.List;
import java.util.Locale;
import java.util.Objects;

import static barwright.units.Conversions.toPercent;

/**
 * What a setup sheet shows.
 *
 * @param result         the car's analysis
 * @param map            its adjustment map
 * @param referenceShare the front share of load transfer the map's tint is centred on: a target, or the static
 *                       front weight when none is given
 * @param charts         the charts to draw
 * @param date           the date printed on the sheet
 * @param units          the units it is written in
 */
public record SheetContent(AnalysisResult result, AdjustmentMap map, double referenceShare, List<Chart> charts,
                           LocalDate date, UnitSystem units) {
    /**
     * A rule of thumb puts the front share of load transfer near the static front weight fraction plus about
     * 5 percentage points for a slightly understeering balance (Milliken & Milliken, Race Car Vehicle
     * Dynamics, from memory): the default target of the window's search, which it passes to the sheet.
     */
    public static final double RULE_OF_THUMB_OFFSET = 0.05;

    public SheetContent {
        Objects.requireNonNull(result, "result");
        Objects.requireNonNull(map, "map");
        charts = List.copyOf(charts);
        Objects.requireNonNull(date, "date");
        Objects.requireNonNull(units, "units");
    }

    /**
     * @return what the map is tinted against, in words: "the static front weight 61.0 %" where the reference is
     * that weight, else "the target 66.0 % (static front weight 61.0 % plus 5.0 points)"
     */
    public String referenceText() {
        double weight = result.masses().frontMassFraction();
        if (Math.abs(referenceShare - weight) < 1e-9) {
            return String.format(Locale.ROOT, "the static front weight %.1f %%", toPercent(weight));
        }
        double points = toPercent(referenceShare - weight);
        return String.format(Locale.ROOT, "the target %.1f %% (static front weight %.1f %% %s %.1f points)",
                toPercent(referenceShare), toPercent(weight), points >= 0 ? "plus" : "minus", Math.abs(points));
    }
}
