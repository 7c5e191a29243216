package barwright.report.sizing;

import barwright.sizing.ShareReach;

import java.util.Locale;

/**
 * The words for a front share target the sized bars cannot reach, the same in the window and on the command line.
 */
public final class ReachText {
    private ReachText() {
    }

    /**
     * @param bars        the sized bars in words: "front bar", "rear bar" or "front and rear bars"
     * @param staticFront the static front weight fraction, or NaN where the target was given outright
     * @param wanted      the front share wanted (fraction)
     * @param reach       what the bars reach
     * @return e.g. "static front weight 63.0 % + 5.0 points = 68.0 % is out of reach for the front bar on this car
     *         (reachable 55.1 % to 62.9 %)"
     */
    public static String outOfReach(String bars, double staticFront, double wanted, ShareReach reach, Locale locale) {
        String target = Double.isNaN(staticFront) ? "a front share of " + percent(wanted, locale)
                : "static front weight " + percent(staticFront, locale) + " " + points(wanted - staticFront, locale)
                + " = " + percent(wanted, locale);
        return target + " is out of reach for the " + bars + " on this car (reachable " + range(reach, locale) + ")";
    }

    /** @return the range in words, e.g. "55.1 % to 62.9 %" */
    public static String range(ShareReach reach, Locale locale) {
        return percent(reach.lowest(), locale) + " to " + percent(reach.highest(), locale);
    }

    /** @return a share as a percentage with one decimal, e.g. "62.9 %" */
    public static String percent(double share, Locale locale) {
        return String.format(locale, "%.1f %%", 100 * share);
    }

    /** @return a difference of shares in points with its sign, e.g. "+ 5.0 points" */
    private static String points(double difference, Locale locale) {
        return (difference < 0 ? "- " : "+ ") + String.format(locale, "%.1f points", 100 * Math.abs(difference));
    }
}
