package barwright.units;

import org.junit.jupiter.api.Test;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * The output files' fixed units, against definitions written out here rather than taken from the code. Exact
 * definitions: 1 in = 25.4 mm and 1 lbf = 4.448 221 615 260 5 N (NIST SP 811, appendix B, as cited in
 * {@link Constants}); 1 MPa = 10^6 Pa and 1 mm = 10^-3 m (NIST web page "SI prefixes", Table 5, read); half a
 * turn is 180 degrees. Tolerance 1e-12 relative: a double holds about 16 digits, a conversion adds a rounding
 * or two.
 */
class ConversionsTest {
    private static final double RELATIVE = 1e-12;

    @Test
    void millimetres_and_per_millimetre() {
        assertThat(Conversions.toMillimetres(0.0254)).isCloseTo(25.4, within(25.4 * RELATIVE));
        // a spring of 25 N/mm is 25 000 N/m
        assertThat(Conversions.perMillimetre(25_000)).isCloseTo(25, within(25 * RELATIVE));
    }

    @Test
    void megapascals() {
        // 1 ksi = 1000 lbf / in^2 = 4448.2216152605 N / 6.4516e-4 m^2 = 6.894757293168361 MPa
        double ksiInPascals = 1000 * 4.4482216152605 / 6.4516e-4;
        assertThat(Conversions.toMegapascals(ksiInPascals)).isCloseTo(6.894757293168361,
                within(6.9 * RELATIVE));
    }

    @Test
    void degrees_and_per_degree() {
        assertThat(Conversions.toDegrees(Math.PI)).isCloseTo(180, within(180 * RELATIVE));
        // a roll stiffness of 180/pi N m/rad is 1 N m per degree
        assertThat(Conversions.perDegree(180 / Math.PI)).isCloseTo(1, within(RELATIVE));
    }

    @Test
    void multiples_of_standard_gravity() {
        assertThat(Conversions.toG(9.80665)).isCloseTo(1, within(RELATIVE));
        assertThat(Conversions.fromG(0.5)).isCloseTo(4.903325, within(4.9 * RELATIVE));
        // 1000 N of load transfer per m/s^2 is 9806.65 N per g
        assertThat(Conversions.perG(1000)).isCloseTo(9806.65, within(9806.65 * RELATIVE));
        // a roll gradient of pi/180 rad per m/s^2 is 9.80665 deg/g
        assertThat(Conversions.toDegreesPerG(Math.PI / 180)).isCloseTo(9.80665, within(9.8 * RELATIVE));
    }

    @Test
    void pound_force_feet() {
        // 1 lbf ft = 4.4482216152605 N x 0.3048 m
        assertThat(Conversions.toPoundForceFeet(4.4482216152605 * 0.3048)).isCloseTo(1, within(RELATIVE));
    }

    @Test
    void percent() {
        assertThat(Conversions.toPercent(0.525)).isCloseTo(52.5, within(52.5 * RELATIVE));
    }
}
