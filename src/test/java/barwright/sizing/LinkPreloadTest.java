package barwright.sizing;

import barwright.model.AxlePosition;
import barwright.model.SolidSection;
import barwright.model.Vehicle;
import barwright.physics.VehicleAnalysis;
import barwright.physics.AxleStiffness;
import barwright.sizing.preload.GainingDiagonal;
import barwright.sizing.preload.LinkPreload;
import barwright.sizing.preload.PreloadResult;
import org.apache.commons.math3.linear.Array2DRowRealMatrix;
import org.apache.commons.math3.linear.ArrayRealVector;
import org.apache.commons.math3.linear.LUDecomposition;
import org.apache.commons.math3.linear.RealVector;
import org.junit.jupiter.api.Test;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

/**
 * Link preload against model.md 9, against an equilibrium derived here independently, and against its limits.
 *
 * <p>The independent derivation: axle X's suspension (springs K_s and the bar K_b, whose neutral position is
 * turned by phi_0) sits in series with its tyres K_t; the body rolls by theta, the axle (tyre deflection)
 * by psi; the other axle holds the body with K_Y'. Unknowns theta, psi, M (the moment X's tyres carry):
 * <pre>
 *   K_t psi - M = 0                                  (tyres of X)
 *   (K_s + K_b)(theta - psi) - K_b phi_0 - M = 0     (suspension of X carries the same moment)
 *   K_Y' theta + M = 0                               (the body at rest: no net roll moment)
 * </pre>
 * solved with an LU decomposition (Apache Commons Math), not with the closed form under test.
 */
class LinkPreloadTest {
    private static final double DELTA = 1e-3;

    private static double equilibriumMoment(double spring, double bar, double tyre, double other, double phi0) {
        Array2DRowRealMatrix matrix = new Array2DRowRealMatrix(new double[][]{
                {0, tyre, -1},
                {spring + bar, -(spring + bar), -1},
                {other, 0, 1}});
        RealVector solution = new LUDecomposition(matrix).getSolver()
                .solve(new ArrayRealVector(new double[]{0, bar * phi0, 0}));
        return Math.abs(solution.getEntry(2));
    }

    @Test
    void theLockedMomentMatchesAnIndependentEquilibrium() throws Exception {
        Vehicle vehicle = SizingFixtures.hatchback().vehicle();
        PreloadResult result = LinkPreload.of(vehicle, AxlePosition.FRONT, GainingDiagonal.LEFT_FRONT_RIGHT_REAR, DELTA);
        var analysis = VehicleAnalysis.analyse(vehicle);
        AxleStiffness front = analysis.front().stiffness();
        double phi0 = DELTA / (vehicle.front().bar().linkMotionRatio() * vehicle.front().track());
        double expected = equilibriumMoment(front.springRollStiffness(), front.barRollStiffness(),
                front.tyreRollStiffness(), analysis.rear().stiffness().rollStiffness(), phi0);
        // 1e-9 relative: a 3x3 solve against the closed form, both in double precision
        assertThat(result.lockedMoment()).isCloseTo(expected, within(expected * 1e-9));
    }

    @Test
    void cornerLoadsBalanceAndTheCrossWeightFollows() throws Exception {
        Vehicle vehicle = SizingFixtures.hatchback().vehicle();
        PreloadResult result = LinkPreload.of(vehicle, AxlePosition.REAR, GainingDiagonal.RIGHT_FRONT_LEFT_REAR, DELTA);
        var change = result.changePerLength();
        double frontTrack = vehicle.front().track();
        double rearTrack = vehicle.rear().track();
        double moment = result.lockedMomentPerLength();
        // no net vertical force, and a roll couple M on each axle with opposite signs (model.md 9)
        assertThat(change.total()).isCloseTo(0, within(1e-9 * moment));
        assertThat(change.rightFront()).isCloseTo(moment / frontTrack, within(1e-9 * moment));
        assertThat(change.leftFront()).isCloseTo(-moment / frontTrack, within(1e-9 * moment));
        assertThat(change.leftRear()).isCloseTo(moment / rearTrack, within(1e-9 * moment));
        assertThat(change.rightRear()).isCloseTo(-moment / rearTrack, within(1e-9 * moment));
        double weight = result.staticLoads().total();
        assertThat(result.crossWeightChangePerLength())
                .isCloseTo(-(moment / frontTrack + moment / rearTrack) / weight, within(1e-12));
        assertThat(result.loads().crossWeight()).isLessThan(result.staticLoads().crossWeight());
        assertThat(result.inWords()).contains("rear bar link", "right front and left rear");
    }

    @Test
    void aVeryStiffOtherAxleLocksTheWholeBarShareOfAxleX() throws Exception {
        Vehicle vehicle = SizingFixtures.hatchback().vehicle();
        Vehicle stiffRear = vehicle.withRear(vehicle.rear().withSpringRate(1e12).withTyreVerticalRate(1e12));
        PreloadResult result = LinkPreload.of(stiffRear, AxlePosition.FRONT, GainingDiagonal.LEFT_FRONT_RIGHT_REAR, DELTA);
        AxleStiffness front = VehicleAnalysis.analyse(stiffRear).front().stiffness();
        double phi0 = DELTA / (vehicle.front().bar().linkMotionRatio() * vehicle.front().track());
        // K_Y' -> infinity: M -> K_X (K_bar / K_susp) phi_0 (the limit of model.md 9)
        double limit = front.rollStiffness() * front.barRollStiffness() / front.suspensionRollStiffness() * phi0;
        assertThat(result.lockedMoment()).isCloseTo(limit, within(limit * 1e-5));
    }

    @Test
    void noBarLocksNothingAndASofterBarLocksProportionallyLess() throws Exception {
        Vehicle vehicle = SizingFixtures.hatchback().vehicle();
        assertThatThrownBy(() -> LinkPreload.of(vehicle.withFront(vehicle.front().withBar(null)), AxlePosition.FRONT,
                GainingDiagonal.LEFT_FRONT_RIGHT_REAR, DELTA)).hasMessageContaining("no bar");
        // a bar of a tenth of a millimetre: K_bar scales with d^4, (0.1 / 22)^4 = 4e-10 of the real bar's, and
        // with it M (K_bar << K_susp makes M proportional to K_bar in model.md 9)
        Vehicle thread = vehicle.withFront(vehicle.front().withBar(vehicle.front().bar()
                .withSection(new SolidSection(1e-4))));
        PreloadResult result = LinkPreload.of(thread, AxlePosition.FRONT, GainingDiagonal.LEFT_FRONT_RIGHT_REAR, DELTA);
        PreloadResult normal = LinkPreload.of(vehicle, AxlePosition.FRONT, GainingDiagonal.LEFT_FRONT_RIGHT_REAR, DELTA);
        assertThat(result.lockedMoment()).isLessThan(normal.lockedMoment() * 1e-9);
    }

    @Test
    void aFlexibleChassisIsInSeriesWithTheOtherAxle() throws Exception {
        Vehicle vehicle = SizingFixtures.hatchback().vehicle().withChassisTorsionalStiffness(3000 / (Math.PI / 180));
        PreloadResult result = LinkPreload.of(vehicle, AxlePosition.FRONT, GainingDiagonal.LEFT_FRONT_RIGHT_REAR, DELTA);
        var analysis = VehicleAnalysis.analyse(vehicle);
        AxleStiffness front = analysis.front().stiffness();
        double otherInSeries = AxleStiffness.inSeries(analysis.rear().stiffness().rollStiffness(),
                vehicle.chassisTorsionalStiffness());
        double phi0 = DELTA / (vehicle.front().bar().linkMotionRatio() * vehicle.front().track());
        double expected = equilibriumMoment(front.springRollStiffness(), front.barRollStiffness(),
                front.tyreRollStiffness(), otherInSeries, phi0);
        assertThat(result.lockedMoment()).isCloseTo(expected, within(expected * 1e-9));
    }
}
