package barwright.tyrefit;

import org.junit.jupiter.api.Test;

import java.util.ArrayList;
import java.util.List;

import static barwright.units.Constants.RADIANS_PER_DEGREE;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

/**
 * The tyre fit (model.md 8.3) against data generated from known coefficients with seeded noise
 * ({@link InventedTyreData}): the known values are the generator's inputs, independent of the fit. Tolerances
 * follow from the noise: 0.5 % of the peak per point over 31 points leaves the peak uncertain by about 0.1-0.2 %,
 * so the 1 % is met with room; derived quantities (stiffness, camber terms) get wider, stated bounds.
 */
class TyreFitterTest {
    private static final List<TyreMeasurement> DATA = InventedTyreData.generate(InventedTyreData.SEED);

    @Test
    void recoversThePeakForceAtEachLoadWithinOnePerCent() throws TyreFitException {
        TyreFit fit = TyreFitter.fit(DATA);
        for (double load : InventedTyreData.LOADS) {
            CurveFit curve = fit.curves().stream().filter(c -> c.load() == load && c.camber() == 0).findFirst()
                    .orElseThrow();
            double truePeak = InventedTyreData.curve(load, 0).peak();
            assertThat(curve.formula().peak()).as("peak at %.0f N", load).isCloseTo(truePeak, within(0.01 * truePeak));
            // cornering stiffness B C D: the slope at zero, set by a few points only: 3 %
            double trueStiffness = InventedTyreData.corneringStiffness(load);
            assertThat(curve.formula().corneringStiffness()).isCloseTo(trueStiffness, within(0.03 * trueStiffness));
            // the residuals are the noise: RMS close to 0.5 % of the peak (between 0.3 % and 0.8 %)
            assertThat(curve.rmsShareOfPeak()).isBetween(0.003, 0.008);
        }
        assertThat(fit.shapeFactor()).isCloseTo(InventedTyreData.SHAPE, within(0.05));
        assertThat(fit.curvatureFactor()).isCloseTo(InventedTyreData.CURVATURE, within(0.3));
        assertThat(fit.warnings()).isEmpty();
    }

    @Test
    void thePointsAreTheFrictionAtTheBestCamberAndTheCamberTermsAreRecovered() throws TyreFitException {
        TyreFit fit = TyreFitter.fit(DATA);
        assertThat(fit.camberFitted()).isTrue();
        for (var point : fit.frictionPoints().points()) {
            double expected = InventedTyreData.bestFriction(point.load());
            assertThat(point.value()).isCloseTo(expected, within(0.01 * expected));
        }
        // three cambers plus zero at one load: the quadratic's vertex to 0.5 deg, its curvature to 30 %, the
        // thrust slope to 10 % (each from 4 curves whose peaks carry 0.1-0.2 % noise)
        assertThat(fit.camber().camberForPeakGrip() / RADIANS_PER_DEGREE)
                .isCloseTo(InventedTyreData.BEST_CAMBER_DEG, within(0.5));
        double loss = fit.camber().peakFrictionLossPerRadSquared() * RADIANS_PER_DEGREE * RADIANS_PER_DEGREE;
        assertThat(loss).isCloseTo(InventedTyreData.LOSS_PER_DEG_SQUARED, within(0.3 * InventedTyreData.LOSS_PER_DEG_SQUARED));
        double thrust = fit.camber().camberStiffnessPerLoad() * RADIANS_PER_DEGREE;
        assertThat(thrust).isCloseTo(InventedTyreData.THRUST_PER_DEG, within(0.1 * InventedTyreData.THRUST_PER_DEG));
        assertThat(fit.nominalLoad()).isEqualTo(3500);
    }

    @Test
    void aSingleLoadIsRefusedNamingTheRows() {
        List<TyreMeasurement> oneLoad = DATA.stream().filter(row -> row.load() == 5000).toList();
        assertThatThrownBy(() -> TyreFitter.fit(oneLoad)).isInstanceOf(TyreFitException.class)
                .hasMessage("every row (lines 167 to 197) is at one load, 5000 N: the fit needs curves at 3 or more "
                        + "loads to give friction and stiffness against load");
    }

    @Test
    void curvesThatStopBeforeTheirPeakAreRefusedNamingTheirLines() {
        // only -4 to 4 deg: the force is still rising at the widest slip angle (the invented tyre peaks at
        // about 7 deg at 2000 N)
        List<TyreMeasurement> narrow = DATA.stream().filter(row -> row.camber() == 0
                && Math.abs(row.slipAngle()) <= 4.01 * RADIANS_PER_DEGREE).toList();
        assertThatThrownBy(() -> TyreFitter.fit(narrow)).isInstanceOf(TyreFitException.class)
                .hasMessageContaining("the curve at 2000 N, camber 0 deg (lines 23 to 31) does not reach its peak "
                        + "within the measured slip angles (up to 4.0 deg)");
    }

    @Test
    void duplicateRowsTooFewPointsAndOutOfRangeValuesAreRefusedByLine() {
        List<TyreMeasurement> rows = new ArrayList<>(DATA);
        TyreMeasurement copied = rows.get(3);
        rows.add(new TyreMeasurement(999, copied.load(), copied.slipAngle(), copied.lateralForce(), copied.camber()));
        rows.add(new TyreMeasurement(1000, 4000, 40 * RADIANS_PER_DEGREE, 100, 0));
        assertThatThrownBy(() -> TyreFitter.fit(rows)).isInstanceOf(TyreFitException.class)
                .hasMessageContaining("line 999 repeats line 15 exactly")
                .hasMessageContaining("line 1000, slipAngleDeg = 40: must be between -30 and 30 deg");
        List<TyreMeasurement> sparse = DATA.stream().filter(row -> row.camber() == 0
                && (row.load() != 2000 || Math.round(row.slipAngle() / RADIANS_PER_DEGREE) % 5 == 0)).toList();
        assertThatThrownBy(() -> TyreFitter.fit(sparse))
                .hasMessageContaining("the curve at 2000 N, camber 0 deg (lines 12 to 42) has 7 points: at least 8");
    }

    @Test
    void theShippedDataSetIsWhatTheGeneratorWrites() throws Exception {
        String shipped = java.nio.file.Files.readString(
                java.nio.file.Path.of("sample-vehicles/tyre-data/invented-club-tyre.csv"));
        assertThat(shipped).isEqualTo(InventedTyreData.csv());
    }
}
