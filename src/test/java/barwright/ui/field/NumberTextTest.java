package barwright.ui.field;

import org.junit.jupiter.api.Test;

import java.util.Locale;

import static org.assertj.core.api.Assertions.assertThat;

class NumberTextTest {
    @Test
    void aCommaDecimalWorksWhereTheLocaleWritesOne() {
        assertThat(NumberText.parse("22,5", Locale.GERMANY)).hasValue(22.5);
        assertThat(NumberText.parse("0,85", Locale.FRANCE)).hasValue(0.85);
        assertThat(NumberText.format(22.5, 2, Locale.GERMANY)).isEqualTo("22,5");
    }

    @Test
    void aPointIsNeverTakenForAThousandsSeparator() {
        // in German "22.5" would be 225 with grouping; Barwright reads no grouping, so a point is a decimal
        assertThat(NumberText.parse("22.5", Locale.GERMANY)).hasValue(22.5);
        assertThat(NumberText.parse("1.200", Locale.GERMANY)).hasValue(1.2);
    }

    @Test
    void aCommaInAPointDecimalLocaleAndOtherTextAreNotNumbers() {
        assertThat(NumberText.parse("1,5", Locale.US)).isEmpty();
        assertThat(NumberText.parse("22 mm", Locale.US)).isEmpty();
        assertThat(NumberText.parse("", Locale.US)).isEmpty();
        assertThat(NumberText.parse("abc", Locale.US)).isEmpty();
        assertThat(NumberText.parse(" -3.5 ", Locale.US)).hasValue(-3.5);
        assertThat(NumberText.parse("\u22123,5", Locale.GERMANY)).hasValue(-3.5);
    }

    @Test
    void formattingDropsTrailingZerosAndValuesForTheFileLoseConversionNoise() {
        assertThat(NumberText.format(70.0, 2, Locale.US)).isEqualTo("70");
        assertThat(NumberText.format(-0.0001, 2, Locale.US)).isEqualTo("0");
        // 0.875 in = 22.225 mm exactly (1 in = 25.4 mm, NIST SP 811); the double product carries noise
        assertThat(NumberText.forFile(0.875 * 0.0254 / 1e-3)).isEqualTo(22.225);
    }
}
