package barwright.physics;

import barwright.model.Axle;
import barwright.model.LoadPoint;
import barwright.model.LoadTable;
import barwright.model.TurnDirection;
import barwright.model.Tyre;
import barwright.model.Vehicle;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;
import org.junit.jupiter.api.Test;

import java.util.List;
import java.util.Random;

import static barwright.units.Constants.STANDARD_GRAVITY;
import static org.assertj.core.api.Assertions.assertThat;

/**
 * Grip past the tyre's data (model.md 8.1): whatever the car's mass, no limit of 0 g, no friction at or below
 * zero, and a warning wherever the loads at the limit leave the points or push a law below its floor. These
 * are limit-case properties of the model, not numbers from a source.
 */
class TyreLimitsTest {
    /** Invented friction and stiffness points, 1000 to 6000 N (a road tyre's range). */
    static final Tyre POINTS = TestCars.tyre()
            .withFrictionByLoad(new LoadTable(List.of(new LoadPoint(1000, 1.32), new LoadPoint(2500, 1.26),
                    new LoadPoint(4000, 1.17), new LoadPoint(6000, 1.02))))
            .withCorneringStiffnessByLoad(new LoadTable(List.of(new LoadPoint(1000, 20000),
                    new LoadPoint(3500, 56000), new LoadPoint(6000, 68000))));

    private static Vehicle withTyres(Vehicle car, Tyre tyre) {
        return car.withFront(withTyre(car.front(), tyre)).withRear(withTyre(car.rear(), tyre));
    }

    private static Axle withTyre(Axle axle, Tyre tyre) {
        return new Axle(axle.track(), axle.rollCentreHeight(), axle.unsprungMass(), axle.unsprungCgHeight(),
                axle.springRate(), axle.springMotionRatio(), axle.tyreVerticalRate(), tyre, axle.bar());
    }

    private static Vehicle heavy(Tyre tyre) {
        // the club car at ten times its mass: about 25 kN static per front wheel, seven times the law's F_z0
        Vehicle car = TestCars.clubCar();
        return withTyres(car.withMassDistribution(10500, 0.60), tyre);
    }

    @Test
    void aHeavyCarOnTheLinearLawHasAPositiveLimitAndIsWarned() {
        // the law gives mu = 1.2 (1 - 0.15 (F_z/3500 - 1)) < 0.6 past 13.3 kN: held at 0.6, with the warning
        AnalysisResult result = VehicleAnalysis.analyse(heavy(TestCars.tyre()));
        assertThat(result.turn(TurnDirection.LEFT).limit()).isGreaterThan(0.3 * STANDARD_GRAVITY);
        assertThat(result.warnings()).anySatisfy(warning -> {
            assertThat(warning.code()).isEqualTo("TYRE_FRICTION_AT_FLOOR");
            assertThat(warning.message()).startsWith("The front tyres' friction law falls below 0.60");
        });
    }

    @Test
    void aLightInsideWheelBelowThePointsIsWarnedAsMatteringLess() {
        AnalysisResult result = VehicleAnalysis.analyse(withTyres(TestCars.clubCar(), POINTS));
        assertThat(result.warnings()).anySatisfy(warning -> assertThat(warning.message())
                .contains("rear tyres' loads at the limit lie outside").contains("inside tyre 294 N in a left turn")
                .contains("a lightly loaded inside tyre adds little grip"));
    }

    @Test
    void aHeavyCarOnPointsIsWarnedThatItsLoadsLeaveTheData() {
        AnalysisResult result = VehicleAnalysis.analyse(heavy(POINTS));
        assertThat(result.turn(TurnDirection.LEFT).limit()).isGreaterThan(0.3 * STANDARD_GRAVITY);
        assertThat(result.warnings()).anySatisfy(warning -> {
            assertThat(warning.code()).isEqualTo("TYRE_LOAD_OUTSIDE_DATA");
            assertThat(warning.message()).contains("front tyres' loads at the limit lie outside their measured "
                    + "points (1000 to 6000 N)").contains("outside tyre");
        });
    }

    @Test
    void theClubCarOnPointsWithinItsDataIsNotWarned() {
        // the points from 200 N: the club car's lightest inside wheel at the limit carries about 290 N
        Tyre wide = POINTS.withFrictionByLoad(new LoadTable(List.of(new LoadPoint(200, 1.36),
                new LoadPoint(2500, 1.26), new LoadPoint(4000, 1.17), new LoadPoint(6000, 1.02))))
                .withCorneringStiffnessByLoad(new LoadTable(List.of(new LoadPoint(200, 4000),
                        new LoadPoint(3500, 56000), new LoadPoint(6000, 68000))));
        AnalysisResult result = VehicleAnalysis.analyse(withTyres(TestCars.clubCar(), wide));
        assertThat(result.warnings()).noneSatisfy(w -> assertThat(w.code()).startsWith("TYRE_"));
    }

    @ParameterizedTest
    @ValueSource(longs = {11, 12, 13, 14, 15, 16, 17, 18, 19, 20})
    void acrossTheAllowedMassesThereIsNoZeroLimitNoNegativeGripAndAWarningWheneverLoadsLeaveTheData(long seed) {
        Random random = new Random(seed);
        for (int i = 0; i < 20; i++) {
            // masses 300 to 20000 kg (the file allows 50: below 300 the test car's 150 kg unsprung leaves no
            // sprung mass); either tyre
            double mass = 300 * Math.pow(20000 / 300.0, random.nextDouble());
            Tyre tyre = random.nextBoolean() ? POINTS : TestCars.tyre();
            Vehicle car = withTyres(TestCars.clubCar().withMassDistribution(mass, 0.45 + 0.2 * random.nextDouble()),
                    tyre);
            AnalysisResult result = VehicleAnalysis.analyse(car);
            TyreModel model = new TyreModel(tyre);
            boolean leaves = false;
            for (TurnDirection direction : TurnDirection.values()) {
                TurnResult turn = result.turn(direction);
                assertThat(turn.limit()).as("limit of a %.0f kg car", mass).isGreaterThan(0.05 * STANDARD_GRAVITY);
                WheelLoads loads = turn.cornering().wheelLoads(turn.limit());
                for (double load : new double[]{loads.frontOutside(), loads.frontInside(), loads.rearOutside(),
                        loads.rearInside()}) {
                    assertThat(model.friction(load)).isGreaterThan(0);
                    assertThat(model.peakForce(load)).isGreaterThanOrEqualTo(0);
                    leaves |= load > 0 && (tyre.hasFrictionPoints() ? load > 6600 || load < 900
                            : model.unfloredFriction(load) < 0.6);
                }
            }
            boolean warned = result.warnings().stream().anyMatch(w -> w.code().startsWith("TYRE_"));
            assertThat(warned).as("a tyre warning for a %.0f kg car", mass).isEqualTo(leaves);
        }
    }
}
