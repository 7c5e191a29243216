package barwright.io;

import java.util.Locale;

/**
 * An allowed range of a number in a file, in the file's unit.
 *
 * @param min          lower bound
 * @param minInclusive whether the bound itself is allowed
 * @param max          upper bound
 * @param maxInclusive whether the bound itself is allowed
 * @param unit         the unit printed after numbers ("mm", "N/mm", or "" for a plain number)
 */
public record Range(double min, boolean minInclusive, double max, boolean maxInclusive, String unit) {

    /** @return a closed range [min, max] */
    public static Range between(double min, double max, String unit) {
        return new Range(min, true, max, true, unit);
    }

    /** @return a range (min, max]: more than min and at most max */
    public static Range above(double min, double max, String unit) {
        return new Range(min, false, max, true, unit);
    }

    public boolean contains(double value) {
        boolean aboveMin = minInclusive ? value >= min : value > min;
        boolean belowMax = maxInclusive ? value <= max : value < max;
        return aboveMin && belowMax;
    }

    /** @return e.g. "must be between 0.5 and 2000 N/mm" */
    public String describe() {
        String low = minInclusive ? "at least " : "more than ";
        String high = maxInclusive ? "at most " : "less than ";
        if (minInclusive && maxInclusive) {
            return "must be between " + format(min) + " and " + format(max) + suffix();
        }
        return "must be " + low + format(min) + " and " + high + format(max) + suffix();
    }

    private String suffix() {
        return unit.isEmpty() ? "" : " " + unit;
    }

    /** @return a number as a person would write it: no trailing zeros, no exponent for everyday sizes */
    public static String format(double value) {
        if (Double.isNaN(value) || Double.isInfinite(value)) {
            return Double.toString(value);
        }
        if (value == Math.rint(value) && Math.abs(value) < 1e15) {
            return Long.toString((long) value);
        }
        return String.format(Locale.ROOT, "%.6g", value).replaceAll("(\\.\\d*?)0+($|e)", "$1$2")
                .replaceAll("\\.($|e)", "$1");
    }
}
