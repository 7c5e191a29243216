package barwright.measure;

import org.junit.jupiter.api.Test;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

/**
 * The bar rate fit against readings generated from a known rate and free play (docs/validation.md, "Workshop measurements", lists
 * the values). The generator is this test's own: a bar of rate k with free play s carries no load up to s and
 * k (d - s) past it; noise is seeded so the test is repeatable.
 */
class BarRateMeasurementTest {
    private static final double RATE = 25e3;     // N/m: 25 N/mm, invented
    private static final double LASH = 1.5e-3;   // m, invented
    /** Scatter of the generated loads (N): a hanging-weight rig read to a few newtons (the program's choice). */
    private static final double NOISE = 2.0;

    private static List<BarReading> generated(long seed, double noise) {
        Random random = new Random(seed);
        List<BarReading> readings = new ArrayList<>();
        int line = 2;
        for (double d = 0; d <= 1.0e-3; d += 0.5e-3) {   // the free play being taken up: no load
            readings.add(new BarReading(d, 0, "line " + line++));
        }
        for (int step = 1; step <= 10; step++) {
            double load = 50.0 * step;
            double deflection = LASH + load / RATE;
            readings.add(new BarReading(deflection, load + noise * random.nextGaussian(), "line " + line++));
        }
        return readings;
    }

    @Test
    void exactReadingsGiveTheRateAndFreePlayExactly() throws MeasurementException {
        // limit case: no noise, the line through the loaded readings is the generator's own
        BarRateFit fit = BarRateMeasurement.fit(generated(1, 0));
        assertThat(fit.rate()).isCloseTo(RATE, within(1e-6 * RATE));
        assertThat(fit.lash()).isCloseTo(LASH, within(1e-9));
        assertThat(fit.rSquared()).isCloseTo(1, within(1e-12));
        assertThat(fit.roles().subList(0, 3)).containsOnly(ReadingRole.FREE_PLAY);
        assertThat(fit.outliers()).isEmpty();
    }

    @Test
    void noisyReadingsGiveTheRateWithinOnePercentAndTheFreePlayWithinATenthOfAMillimetre() throws MeasurementException {
        // the acceptance: rate within 1 %, lash within 0.2 mm, for several seeds
        for (long seed = 1; seed <= 20; seed++) {
            BarRateFit fit = BarRateMeasurement.fit(generated(seed, NOISE));
            assertThat(fit.rate()).as("seed %d", seed).isCloseTo(RATE, within(0.01 * RATE));
            assertThat(fit.lash()).as("seed %d", seed).isCloseTo(LASH, within(0.2e-3));
        }
    }

    @Test
    void aReadingFarOffTheLineIsFlaggedAndLeftOut() throws MeasurementException {
        List<BarReading> readings = new ArrayList<>(generated(7, NOISE));
        BarReading bad = readings.get(8);
        readings.set(8, new BarReading(bad.deflection(), bad.load() + 60, bad.where())); // a weight miscounted
        BarRateFit fit = BarRateMeasurement.fit(readings);
        assertThat(fit.outliers()).extracting(BarReading::where).containsExactly(bad.where());
        assertThat(fit.warnings()).anyMatch(w -> w.startsWith(bad.where()));
        assertThat(fit.rate()).isCloseTo(RATE, within(0.01 * RATE));
        assertThat(fit.residuals().get(8)).isGreaterThan(50);
    }

    @Test
    void tooFewReadingsAreRefused() {
        List<BarReading> two = List.of(new BarReading(1e-3, 10, "line 2"), new BarReading(2e-3, 20, "line 3"));
        assertThatThrownBy(() -> BarRateMeasurement.fit(two)).isInstanceOf(MeasurementException.class)
                .hasMessageContaining("at least 3 readings").hasMessageContaining("are 2");
    }

    @Test
    void readingsAllAtOneLoadAreRefusedWithTheLoad() {
        List<BarReading> same = List.of(new BarReading(1e-3, 100, "line 2"), new BarReading(2e-3, 100, "line 3"),
                new BarReading(3e-3, 100, "line 4"));
        assertThatThrownBy(() -> BarRateMeasurement.fit(same)).isInstanceOf(MeasurementException.class)
                .hasMessageContaining("same load, 100 N");
    }

    @Test
    void loadsFallingWithDeflectionAreRefused() {
        List<BarReading> swapped = List.of(new BarReading(1e-3, 300, "line 2"), new BarReading(2e-3, 200, "line 3"),
                new BarReading(3e-3, 100, "line 4"));
        assertThatThrownBy(() -> BarRateMeasurement.fit(swapped)).isInstanceOf(MeasurementException.class)
                .hasMessageContaining("load falls as the deflection grows");
    }
}
