package barwright.report.fatigue;

import barwright.physics.fatigue.FatigueResult;
import barwright.units.Figures;
import barwright.units.Quantity;
import barwright.units.UnitSystem;

import java.util.Locale;
import java.util.Map;

/** The fatigue check as the command line prints it. */
public final class FatigueText {
    /** The caution printed under every fatigue result. */
    public static final String CAUTION = "Caution: a fatigue life is an estimate with a wide scatter (a factor of "
            + "several on life is usual); it comes from handbook material data, the surface and notch factors "
            + "given, and a model of the stress (the steady model for a spectrum, the roll in motion for a log). Inspect bars, ends and links for cracks, replace on "
            + "the maker's schedule, and follow the car maker's data and your event's rules.";

    private FatigueText() {
    }

    /**
     * @param results        by label ("front", "rear" or "history")
     * @param lapsPerSeason  laps in a season, or 0 where not given
     * @param lapSeconds     the lap time used for hours
     * @param source         one line saying where the stresses came from
     */
    public static String of(Map<String, FatigueResult> results, UnitSystem units, int lapsPerSeason,
                            double lapSeconds, String source) {
        StringBuilder out = new StringBuilder();
        out.append(source).append('\n');
        out.append(String.format(Locale.ROOT, "Lap time %.0f s (used for hours).%n", lapSeconds));
        for (var entry : results.entrySet()) {
            FatigueResult result = entry.getValue();
            out.append('\n').append(capitalised(entry.getKey())).append(" bar\n");
            out.append("  Endurance limit of the bar (after surface and size factors): ")
                    .append(Figures.format(result.curve().enduranceLimit(), Quantity.STRESS, units, 0)).append('\n');
            out.append("  Fatigue safety factor at the check travel (Goodman, fully reversed): ")
                    .append(finite(result.fatigueSafetyFactor(), "%.2f")).append('\n');
            if (result.infiniteLife()) {
                out.append("  No counted cycle reaches the endurance limit: no fatigue damage expected.\n");
            } else {
                out.append(String.format(Locale.ROOT, "  Damage per lap (Miner sum): %.3g%n", result.damagePerLap()));
                out.append(String.format(Locale.ROOT, "  Laps to failure: %s   hours to failure: %s%n",
                        count(result.lapsToFailure()), String.format(Locale.ROOT, "%.3g", result.hoursToFailure())));
                if (lapsPerSeason > 0) {
                    out.append(String.format(Locale.ROOT, "  Seasons of %d laps: %.3g%n", lapsPerSeason,
                            result.lapsToFailure() / lapsPerSeason));
                }
            }
            out.append(String.format(Locale.ROOT, "  Counted cycles: %d kinds; largest range %s%n",
                    result.cycles().size(), Figures.format(result.cycles().stream()
                            .mapToDouble(c -> c.range()).max().orElse(0), Quantity.STRESS, units, 0)));
        }
        out.append('\n').append(CAUTION).append('\n');
        return out.toString();
    }

    private static String finite(double value, String pattern) {
        return Double.isFinite(value) ? String.format(Locale.ROOT, pattern, value) : "no stress at the check travel";
    }

    private static String count(double laps) {
        return laps >= 1e6 ? String.format(Locale.ROOT, "%.3g", laps) : String.format(Locale.ROOT, "%.0f", laps);
    }

    private static String capitalised(String key) {
        return Character.toUpperCase(key.charAt(0)) + key.substring(1);
    }
}
