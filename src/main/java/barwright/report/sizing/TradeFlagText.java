package barwright.report.sizing;

import barwright.model.AxlePosition;
import barwright.units.Figures;
import barwright.sizing.Candidate;
import barwright.sizing.TradeFlag;
import barwright.sizing.TradeLimits;
import barwright.units.Quantity;
import barwright.units.UnitSystem;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/**
 * The flags of proposals outside what the trade usually fits ({@link TradeLimits}), in words, for the command line
 * and the window alike.
 */
public final class TradeFlagText {
    private TradeFlagText() {
    }

    /** @return the short words of one bar's flags for a table cell ("heavy, thick"), or "" where it has none */
    public static String words(List<TradeFlag> flags, AxlePosition axle) {
        return String.join(", ", flags.stream().filter(flag -> flag.axle() == axle)
                .map(flag -> flag.kind().word()).toList());
    }

    /** @return the short words of every flag of a candidate, "front: heavy; rear: stressed" where both are sized */
    public static String words(Candidate candidate, List<TradeFlag> flags) {
        List<String> parts = new ArrayList<>();
        for (var choice : candidate.bars()) {
            String words = words(flags, choice.axle());
            if (!words.isEmpty()) {
                parts.add(candidate.bars().size() > 1 ? choice.axle().key() + ": " + words : words);
            }
        }
        return String.join("; ", parts);
    }

    /** @return one flag with its figure and where the flag starts, e.g. "heavy: 13.22 kg, above 6.00 kg" */
    public static String describe(TradeFlag flag, UnitSystem units) {
        return switch (flag.kind()) {
            case BAR_MASS -> "heavy: " + Figures.format(flag.value(), Quantity.MASS, units, 2) + ", above the "
                    + Figures.format(flag.limit(), Quantity.MASS, units, 0) + " a road or club car's bar seldom exceeds";
            case OUTER_DIAMETER -> "thick: " + Figures.format(flag.value(), Quantity.LENGTH, units, diameterDecimals(units))
                    + " outside, above the " + Figures.format(flag.limit(), Quantity.LENGTH, units, diameterDecimals(units))
                    + " such cars seldom exceed";
            case STRESS -> String.format(Locale.ROOT, "stressed: safety factor %.2f, under %.2f, so little margin over "
                    + "the least asked for or a peak stress near yield", flag.value(), flag.limit());
        };
    }

    /** @return the caution for a best proposal with flags, naming the bar and each flag; "" where it has none */
    public static String bestCaution(Candidate best, List<TradeFlag> flags, UnitSystem units) {
        if (flags.isEmpty()) {
            return "";
        }
        List<String> parts = new ArrayList<>();
        for (TradeFlag flag : flags) {
            parts.add((best.bars().size() > 1 ? flag.axle().key() + " bar " : "") + describe(flag, units));
        }
        return "Caution: the best proposal is outside what the trade usually fits (" + String.join("; ", parts)
                + "). Check the space, the mounts and the stress with a qualified mechanic, or aim at a target the car "
                + "reaches with a lighter bar.";
    }

    /** @return what the flags mean, with their limits (common practice, docs/sizing.md) */
    public static String legend(TradeLimits limits, UnitSystem units) {
        return "Flags (common practice for a road or club car, not refusals): heavy = above "
                + Figures.format(limits.maxBarMass(), Quantity.MASS, units, 0) + "; thick = a solid bar above "
                + Figures.format(limits.maxSolidDiameter(), Quantity.LENGTH, units, diameterDecimals(units))
                + " or a tube above " + Figures.format(limits.maxTubeDiameter(), Quantity.LENGTH, units,
                diameterDecimals(units)) + " outside; stressed = safety factor below "
                + String.format(Locale.ROOT, "%.2f", limits.stressFlagBelow()) + ".";
    }

    private static int diameterDecimals(UnitSystem units) {
        return units == UnitSystem.US ? 2 : 0;
    }
}
