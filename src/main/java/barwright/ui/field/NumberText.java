package barwright.ui.field;

import java.math.BigDecimal;
import java.math.MathContext;
import java.text.DecimalFormat;
import java.text.DecimalFormatSymbols;
import java.text.NumberFormat;
import java.text.ParsePosition;
import java.util.Locale;
import java.util.OptionalDouble;
import java.util.regex.Pattern;

/**
 * Numbers as people type and read them in their locale: "22,5" where the locale writes a decimal comma.
 * Grouping separators are neither written nor read, so "22.5" can never be taken for 225; a plain
 * point-decimal number is accepted in every locale, because it is unambiguous without grouping.
 */
public final class NumberText {
    private static final Pattern PLAIN = Pattern.compile("[-+]?(\\d+\\.?\\d*|\\.\\d+)([eE][-+]?\\d+)?");
    /** Values written to a file keep this many significant digits: far below any measuring accuracy. */
    private static final MathContext FILE_DIGITS = new MathContext(12);

    private NumberText() {
    }

    /** @return the number the whole text stands for, or empty where it is not one number */
    public static OptionalDouble parse(String text, Locale locale) {
        String trimmed = text.strip().replace('\u2212', '-');
        if (trimmed.isEmpty()) {
            return OptionalDouble.empty();
        }
        if (trimmed.startsWith("+")) {
            trimmed = trimmed.substring(1);
        }
        NumberFormat format = NumberFormat.getNumberInstance(locale);
        format.setGroupingUsed(false);
        ParsePosition position = new ParsePosition(0);
        Number number = format.parse(trimmed, position);
        if (number != null && position.getIndex() == trimmed.length()) {
            return finite(number.doubleValue());
        }
        if (PLAIN.matcher(trimmed).matches()) {
            return finite(Double.parseDouble(trimmed));
        }
        return OptionalDouble.empty();
    }

    private static OptionalDouble finite(double value) {
        return Double.isFinite(value) ? OptionalDouble.of(value) : OptionalDouble.empty();
    }

    /** @return the value with at most maxDecimals decimals, trailing zeros dropped, in the locale */
    public static String format(double value, int maxDecimals, Locale locale) {
        DecimalFormat format = new DecimalFormat("0", DecimalFormatSymbols.getInstance(locale));
        format.setMaximumFractionDigits(maxDecimals);
        format.setGroupingUsed(false);
        String text = format.format(value);
        return text.equals("-0") ? "0" : text;
    }

    /** @return the value rounded to 12 significant digits, so that unit conversions leave no 0.1+0.2 noise */
    public static double forFile(double value) {
        return value == 0 ? 0 : new BigDecimal(value).round(FILE_DIGITS).doubleValue();
    }

    /** @return the decimal separator people of this locale write */
    public static char decimalSeparator(Locale locale) {
        return DecimalFormatSymbols.getInstance(locale).getDecimalSeparator();
    }
}
