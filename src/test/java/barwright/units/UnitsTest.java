package barwright.units;

import org.junit.jupiter.api.Test;

import java.util.Locale;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;
import static org.assertj.core.api.Assertions.withinPercentage;

/**
 * Conversion factors against NIST Special Publication 811 (Guide for the Use of the International System of
 * Units), appendix B: 1 in = 0.0254 m and 1 lb = 0.453 592 37 kg exactly; g_n = 9.806 65 m/s^2 exactly; so
 * 1 lbf = 4.448 221 615 260 5 N (the table's figure). Derived values: docs/validation.md, section "Units".
 */
class UnitsTest {
    @Test
    void definingConstantsAreExact() {
        assertThat(Constants.METRES_PER_INCH).isEqualTo(0.0254);
        assertThat(Constants.KILOGRAMS_PER_POUND).isEqualTo(0.45359237);
        assertThat(Constants.STANDARD_GRAVITY).isEqualTo(9.80665);
        assertThat(Constants.METRES_PER_FOOT).isCloseTo(0.3048, within(1e-16));
    }

    @Test
    void poundForceMatchesTheNistTable() {
        // NIST SP 811 B.8/B.9 as recalled (from memory): 1 lbf = 4.448 222 E+00 N, exactly 4.448 221 615 260 5 N,
        // which is also exact arithmetic from the definitions (docs/validation.md, section "Units")
        assertThat(Constants.NEWTONS_PER_POUND_FORCE).isCloseTo(4.4482216152605, within(1e-13));
        // NIST SP 811 B.8: 1 psi = 6.894 757 E+03 Pa (7 figures: half a unit of the last)
        assertThat(Constants.PASCALS_PER_PSI).isCloseTo(6.894757e3, within(0.0005));
    }

    @Test
    void displayUnitsOfTheTradeMatchChecks() {
        // docs/validation.md, "Units" (arithmetic): 1 lbf/in = 0.175 126 835 N/mm; 1 ft lbf/deg = 1.355 817 948 N m/deg (9 figures: 5e-10)
        DisplayUnit rate = Quantity.LINEAR_RATE.unit(UnitSystem.US);
        assertThat(rate.toSi(1) / 1e3).isCloseTo(0.175126835, within(5e-10));
        DisplayUnit roll = Quantity.ROLL_STIFFNESS.unit(UnitSystem.US);
        DisplayUnit rollSi = Quantity.ROLL_STIFFNESS.unit(UnitSystem.SI);
        assertThat(rollSi.fromSi(roll.toSi(1))).isCloseTo(1.355817948, within(5e-10));
        // 1 lb = 0.453 592 37 kg; 1 in = 25.4 mm; 1 ksi = 6.894 757 MPa (NIST SP 811 B.8)
        assertThat(Quantity.MASS.unit(UnitSystem.US).toSi(1)).isEqualTo(0.45359237);
        assertThat(Quantity.LENGTH.unit(UnitSystem.SI).fromSi(Quantity.LENGTH.unit(UnitSystem.US).toSi(1)))
                .isCloseTo(25.4, within(1e-12));
        assertThat(Quantity.STRESS.unit(UnitSystem.US).toSi(1) / 1e6).isCloseTo(6.894757, within(5e-7));
        // 1 lb/in^3 = 27 679.90 kg/m^3 (NIST SP 811 B.8: 2.767 990 E+04)
        assertThat(Quantity.DENSITY.unit(UnitSystem.US).toSi(1)).isCloseTo(2.767990e4, within(0.05));
    }

    @Test
    void siDisplayUnitsAreTheFileUnits() {
        // files.md: mm, N/mm, GPa, MPa, deg, g
        assertThat(Quantity.LENGTH.unit(UnitSystem.SI).toSi(1)).isEqualTo(1e-3);
        assertThat(Quantity.LINEAR_RATE.unit(UnitSystem.SI).toSi(1)).isEqualTo(1e3);
        assertThat(Quantity.MODULUS.unit(UnitSystem.SI).toSi(1)).isEqualTo(1e9);
        assertThat(Quantity.ANGLE.unit(UnitSystem.SI).toSi(180)).isCloseTo(Math.PI, within(1e-15));
        assertThat(Quantity.ACCELERATION.unit(UnitSystem.SI).toSi(1)).isEqualTo(9.80665);
        // deg/g: rad per m/s^2 -> deg per g
        assertThat(Quantity.ROLL_GRADIENT.unit(UnitSystem.SI).fromSi(Math.PI / 180 / 9.80665)).isCloseTo(1, within(1e-15));
        assertThat(Quantity.FORCE_PER_G.unit(UnitSystem.SI).fromSi(1)).isCloseTo(9.80665, withinPercentage(1e-12));
    }

    @Test
    void figuresAreFormattedWithUnitAndADotForDecimals() {
        assertThat(Figures.format(0.0254, Quantity.LENGTH, UnitSystem.US, 2)).isEqualTo("1.00 in");
        assertThat(Figures.format(1234.5e3, Quantity.LINEAR_RATE, UnitSystem.SI, 1)).isEqualTo("1234.5 N/mm");
        assertThat(Figures.format(0.5, Quantity.RATIO, UnitSystem.SI, 2)).isEqualTo("0.50");
        // a comma locale is used only where asked
        assertThat(Figures.format(0.0254, Quantity.LENGTH, UnitSystem.US, 2, Locale.GERMANY)).isEqualTo("1,00 in");
    }

    @Test
    void unitSystemsParseAndRefuse() {
        assertThat(UnitSystem.parse("US")).isEqualTo(UnitSystem.US);
        assertThat(UnitSystem.parse("si")).isEqualTo(UnitSystem.SI);
        assertThatThrownBy(() -> UnitSystem.parse("imperial")).hasMessageContaining("use si or us");
        assertThatThrownBy(() -> new DisplayUnit("x", 0)).isInstanceOf(IllegalArgumentException.class);
    }
}
