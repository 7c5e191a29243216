package barwright.physics;

import barwright.model.LoadPoint;
import barwright.model.LoadTable;
import org.junit.jupiter.api.Test;

import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * The continuation of points past their ends (model.md 8.1): no jump and no kink at the ends, never at or
 * below the floor, and it holds where the points rise. Checked by finite differences and limits, not by the
 * continuation's own formula.
 */
class LoadCurveTest {
    // invented friction points that fall with load, steeply at the top end
    private static final LoadTable FALLING = new LoadTable(List.of(new LoadPoint(1000, 1.35),
            new LoadPoint(3000, 1.25), new LoadPoint(5000, 1.10), new LoadPoint(7000, 0.90)));

    @Test
    void noJumpAndNoKinkAtEitherEnd() {
        LoadCurve curve = new LoadCurve(FALLING);
        for (double end : new double[]{1000, 7000}) {
            double h = 1e-3;
            // value: continuous to rounding; slope: one-sided differences agree to 1e-6 per N of a slope of
            // order 1e-4 per N (finite-difference error of O(h) times the curvature, far smaller)
            assertThat(curve.value(end + h)).isCloseTo(curve.value(end - h), within(1e-6));
            double slopeOutside = (curve.value(end + 2 * h) - curve.value(end + h)) / h;
            double slopeInside = (curve.value(end - h) - curve.value(end - 2 * h)) / h;
            assertThat(slopeOutside).isCloseTo(slopeInside, within(1e-6));
        }
    }

    @Test
    void beyondTheDataTheFrictionNeverReachesTheFloor() {
        LoadCurve curve = new LoadCurve(FALLING);
        assertThat(curve.floor()).isEqualTo(0.45); // half the smallest point, 0.90
        double previous = curve.value(7000);
        for (double load = 7000; load <= 1e7; load *= 1.1) {
            double value = curve.value(load);
            // at or above the floor (in doubles the exponential comes down to it exactly, far out) and falling
            assertThat(value).isGreaterThanOrEqualTo(curve.floor()).isLessThanOrEqualTo(previous);
            previous = value;
        }
        assertThat(curve.value(21000)).isGreaterThan(curve.floor() + 0.01); // three times the last load
        // far past the data it has come down to the floor (within 1e-9: the approach is exponential)
        assertThat(curve.value(1e7)).isCloseTo(0.45, within(1e-9));
    }

    @Test
    void towardsZeroLoadAFallingCurveRisesAlongItsTangentAndStaysFinite() {
        LoadCurve curve = new LoadCurve(FALLING);
        double slope = (curve.value(1000) - curve.value(1000 + 1e-2)) / 1e-2;
        // the end tangent: straight line, so the value at zero load is v0 + |m| * 1000 N
        assertThat(curve.value(0)).isCloseTo(1.35 + slope * 1000, within(1e-6));
        assertThat(curve.value(0)).isGreaterThan(1.35).isLessThan(2);
    }

    @Test
    void aCurveRisingWithLoadHoldsItsLastValueAndFallsToTheFloorTowardsZeroLoad() {
        // cornering stiffness rises with load: it does not grow past the last point
        LoadCurve curve = new LoadCurve(new LoadTable(List.of(new LoadPoint(1000, 20000),
                new LoadPoint(3000, 50000), new LoadPoint(5000, 60000))));
        assertThat(curve.value(9000)).isEqualTo(60000);
        assertThat(curve.value(500)).isLessThan(20000).isGreaterThan(curve.floor());
        assertThat(curve.value(0)).isGreaterThan(10000); // the floor, half the smallest point
    }
}
