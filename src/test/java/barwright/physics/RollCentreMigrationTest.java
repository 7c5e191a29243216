package barwright.physics;

import barwright.loading.VehicleLoader;
import barwright.io.VehicleFileReader;
import barwright.model.Axle;
import barwright.model.AxlePosition;
import barwright.model.DoubleWishbone;
import barwright.model.FrontViewPoint;
import barwright.model.LiveAxleWatts;
import barwright.model.SuspensionGeometry;
import barwright.model.TurnDirection;
import barwright.model.Vehicle;
import barwright.physics.linkage.AxleKinematics;
import barwright.physics.linkage.RollState;
import org.junit.jupiter.api.Test;

import java.nio.file.Path;

import static barwright.units.Constants.STANDARD_GRAVITY;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * The roll solved together with migrating roll centres (model.md 11, "In the analysis"), against checks from
 * outside the code: a linkage whose roll centre does not move must give the typed-in car at every a_y (a limit
 * case); a fixed-point iteration of the moment balance written here by hand; the overturning moment balance
 * dF_f t_f + dF_r t_r = m a_y h + m_s g h'(phi) phi (statics, model.md 5); the small-a_y slope; the table
 * against the exact kinematics; the report's figures at the limit against the linkage worked out afresh.
 */
class RollCentreMigrationTest {
    /** Agreement of two paths through the same model: round-off and the solver's 1e-12 rad only. */
    private static final double SAME = 1e-9;

    private static Vehicle sample(String name) throws Exception {
        return VehicleLoader.read(Path.of("sample-vehicles", name + ".json")).vehicle();
    }

    /** The same car with a linkage on one axle replaced by its constant roll-centre height typed in. */
    private static Vehicle typed(Vehicle vehicle, AxlePosition position, double height) {
        return vehicle.withAxle(position, vehicle.axle(position).withRollCentreHeight(height)
                .withSuspension(SuspensionGeometry.NONE));
    }

    private static void assertSameTurns(AnalysisResult linked, AnalysisResult typed) {
        for (TurnDirection direction : TurnDirection.values()) {
            TurnResult a = linked.turn(direction);
            TurnResult b = typed.turn(direction);
            assertThat(a.limit()).as("limit").isCloseTo(b.limit(), within(SAME * b.limit()));
            assertThat(a.frontLimit()).isCloseTo(b.frontLimit(), within(SAME * b.frontLimit()));
            assertThat(a.rearLimit()).isCloseTo(b.rearLimit(), within(SAME * b.rearLimit()));
            assertThat(a.frontInsideLift()).isCloseTo(b.frontInsideLift(), within(SAME * b.frontInsideLift()));
            assertThat(a.rearInsideLift()).isCloseTo(b.rearInsideLift(), within(SAME * b.rearInsideLift()));
            for (int i = 1; i <= 30; i++) {
                double accel = 0.05 * i * STANDARD_GRAVITY;
                WheelLoads x = a.cornering().wheelLoads(accel);
                WheelLoads y = b.cornering().wheelLoads(accel);
                assertThat(x.frontOutside()).isCloseTo(y.frontOutside(), within(SAME * y.frontOutside()));
                assertThat(x.frontInside()).isCloseTo(y.frontInside(), within(SAME * y.frontOutside()));
                assertThat(x.rearOutside()).isCloseTo(y.rearOutside(), within(SAME * y.rearOutside()));
                assertThat(x.rearInside()).isCloseTo(y.rearInside(), within(SAME * y.rearOutside()));
                assertThat(a.cornering().rollAngle(accel)).isCloseTo(b.cornering().rollAngle(accel),
                        within(SAME * Math.abs(b.cornering().rollAngle(accel))));
            }
        }
    }

    @Test
    void aWattsPivotOnTheAxleGivesTheTypedInCarAtEveryAcceleration() throws Exception {
        // a Watt's linkage with its centre pivot on the axle: the roll centre is the pivot whatever the roll
        // (model.md 11), so migration has nothing to move: every figure must be the typed-in car's
        Vehicle estate = sample("estate-dropped-rear-bar");
        Vehicle watts = estate.withRear(estate.rear().withSuspension(new SuspensionGeometry(
                new LiveAxleWatts(0.30, LiveAxleWatts.Mount.AXLE), 0, 0)));
        AnalysisResult linked = VehicleAnalysis.analyse(watts);
        assertThat(linked.migration()).isNotNull();
        assertSameTurns(linked, VehicleAnalysis.analyse(typed(watts, AxlePosition.REAR, 0.30)));
    }

    @Test
    void parallelEqualArmsGiveTheTypedInCarWithTheRollCentreOnTheGround() throws Exception {
        // parallel equal-length arms: at rest the roll centre is on the ground; in roll the two lines from the
        // contact points stay parallel, one rising towards the centre as much as the other falls, so the
        // load-transfer height stays zero (model.md 11): the car is the one with 0 mm typed in. The sample's
        // tyres have no camber terms, so the camber change in roll cannot move the grip either.
        Vehicle saloon = sample("road-saloon");
        DoubleWishbone parallel = new DoubleWishbone(new FrontViewPoint(0.30, 0.45), new FrontViewPoint(0.60, 0.45),
                new FrontViewPoint(0.30, 0.15), new FrontViewPoint(0.60, 0.15));
        Axle front = saloon.front().withSuspension(new SuspensionGeometry(parallel, 0, 0));
        Vehicle car = saloon.withFront(front);
        assertThat(car.front().tyre().camber().isNone()).isTrue();
        AnalysisResult linked = VehicleAnalysis.analyse(car);
        Vehicle typedFront = typed(car, AxlePosition.FRONT, 0);
        // the rear keeps its own linkage in both cars
        assertSameTurns(linked, VehicleAnalysis.analyse(typedFront));
    }

    @Test
    void theRollSatisfiesAFixedPointOfTheMomentBalanceSolvedByHand() throws Exception {
        // rigid chassis: phi = m_s a_y h'(phi) / (K_f + K_r - m_s g h'(phi)) (model.md 5) with the roll axis
        // through the tabulated heights at phi (model.md 4); iterated here from phi = 0 until it settles
        Vehicle roadster = sample("sprint-roadster-lowered").withChassisTorsionalStiffness(null);
        AnalysisResult result = VehicleAnalysis.analyse(roadster);
        RollCentreMigration migration = result.migration();
        MassProperties masses = result.masses();
        double stiffness = result.front().stiffness().rollStiffness() + result.rear().stiffness().rollStiffness();
        double wheelbase = result.vehicle().wheelbase();
        double accel = 1.1 * STANDARD_GRAVITY;
        double phi = 0;
        for (int i = 0; i < 500; i++) {
            double front = migration.loadTransferHeight(AxlePosition.FRONT, phi);
            double rear = migration.loadTransferHeight(AxlePosition.REAR, phi);
            double arm = masses.sprungCgHeight() - (front + (rear - front) * masses.sprungCgToFrontAxle() / wheelbase);
            phi = masses.sprungMass() * accel * arm / (stiffness - masses.sprungMass() * STANDARD_GRAVITY * arm);
        }
        SteadyCornering cornering = result.leftTurn().cornering();
        assertThat(accel).isLessThan(cornering.insideLift(cornering.firstLiftAxle()));
        assertThat(cornering.rollAngle(accel)).isCloseTo(phi, within(1e-10));
        // and it is not the static-height answer: the lowered roadster's roll centres move in roll
        assertThat(Math.abs(phi - accel * result.rollGradient())).isGreaterThan(1e-5);
    }

    @Test
    void theOverturningMomentBalancesAtEveryAccelerationBeforeLift() throws Exception {
        // statics: the two axles' transfers carry m a_y h plus gravity's moment on the displaced sprung mass,
        // m_s g h'(phi) phi, whatever the roll centres do (model.md 5); flexible chassis included
        for (String name : new String[] {"sprint-roadster", "sprint-roadster-lowered", "road-saloon", "club-hatchback"}) {
            AnalysisResult result = VehicleAnalysis.analyse(sample(name));
            Vehicle car = result.vehicle();
            MassProperties masses = result.masses();
            SteadyCornering cornering = result.leftTurn().cornering();
            double firstLift = cornering.insideLift(cornering.firstLiftAxle());
            for (int i = 1; i <= 40; i++) {
                double accel = 0.04 * i * STANDARD_GRAVITY;
                if (accel > firstLift) {
                    break;
                }
                double roll = cornering.rollAngle(accel);
                double moment = cornering.loadTransfer(AxlePosition.FRONT, accel) * car.front().track()
                        + cornering.loadTransfer(AxlePosition.REAR, accel) * car.rear().track();
                double overturning = masses.mass() * accel * car.cgHeight()
                        + masses.sprungMass() * STANDARD_GRAVITY * result.migration().rollArm(roll) * roll;
                assertThat(moment).as("%s at %.2f g", name, accel / STANDARD_GRAVITY)
                        .isCloseTo(overturning, within(SAME * overturning));
            }
        }
    }

    @Test
    void atSmallAccelerationTheRollIsTheStaticGradientsAndItRisesWithAcceleration() throws Exception {
        for (String name : new String[] {"sprint-roadster", "sprint-roadster-lowered", "road-saloon"}) {
            AnalysisResult result = VehicleAnalysis.analyse(sample(name));
            SteadyCornering cornering = result.leftTurn().cornering();
            // a_y -> 0: the static typed-height analysis. At 1e-3 m/s^2 the roll is some 2e-6 rad: the heights
            // move with phi^2 (they are even in phi), so only the solver's 1e-12 rad shows, 1e-6 of it
            double small = 1e-3;
            assertThat(cornering.rollAngle(small) / small).as(name)
                    .isCloseTo(result.rollGradient(), within(1e-5 * result.rollGradient()));
            double previous = 0;
            for (int i = 1; i <= 30; i++) {
                double roll = cornering.rollAngle(0.05 * i * STANDARD_GRAVITY);
                assertThat(roll).as(name).isGreaterThan(previous);
                previous = roll;
            }
        }
    }

    @Test
    void theTableFollowsTheExactKinematicsBetweenItsStates() throws Exception {
        // half-way between the table's states (the worst place for an interpolant) the table against the
        // linkage solved afresh at that roll: within the accuracy claimed in AxleRollGeometry
        for (String name : new String[] {"sprint-roadster", "sprint-roadster-lowered", "road-saloon", "club-hatchback"}) {
            AnalysisResult result = VehicleAnalysis.analyse(sample(name));
            for (AxlePosition position : AxlePosition.values()) {
                AxleRollGeometry geometry = result.migration().geometry(position);
                if (geometry == null) {
                    continue;
                }
                AxleKinematics exact = AxleKinematics.of(sample(name).axle(position));
                for (double deg = 0.5; deg < Math.toDegrees(geometry.endRoll()) - 1; deg += 1) {
                    double roll = Math.toRadians(deg);
                    RollState state = exact.roll(roll);
                    assertThat(geometry.loadTransferHeight(roll)).as("%s %s %.1f deg", name, position, deg)
                            .isCloseTo(state.loadTransferHeight(), within(0.05e-3));
                    assertThat(geometry.outsideCamber(roll)).isCloseTo(state.rightCamber(),
                            within(Math.toRadians(0.002)));
                    assertThat(geometry.insideCamber(roll)).isCloseTo(state.leftCamber(),
                            within(Math.toRadians(0.002)));
                }
            }
        }
    }

    @Test
    void theReportsFiguresAtTheLimitAreTheSolvedMigrations() throws Exception {
        for (String name : new String[] {"sprint-roadster", "sprint-roadster-lowered", "road-saloon"}) {
            Vehicle given = sample(name);
            AnalysisResult result = VehicleAnalysis.analyse(given);
            for (AxlePosition position : AxlePosition.values()) {
                LinkageAtLimit atLimit = LinkageAtLimit.of(result, position);
                TurnResult turn = result.turn(atLimit.turn());
                SteadyCornering cornering = turn.cornering();
                // the roll is the one the limits were found with
                assertThat(atLimit.rollAtLimit()).isEqualTo(cornering.rollAngle(turn.limit()));
                double geometryRoll = cornering.geometryRoll(turn.limit());
                // the roll centre there: the linkage worked out afresh from the file at that roll
                RollState exact = AxleKinematics.of(given.axle(position)).roll(geometryRoll);
                assertThat(atLimit.rollCentreHeightAtLimit()).as(name)
                        .isCloseTo(exact.rollCentre().height(), within(1e-9));
                assertThat(atLimit.outsideCamberAtLimit()).isCloseTo(exact.rightCamber(), within(Math.toRadians(0.002)));
                if (geometryRoll == atLimit.rollAtLimit()) {
                    // before any lift the axle's transfer is its three parts at the reported height (model.md 5);
                    // a rigid-chassis check: with a flexible one the end's roll differs from the mean
                    if (result.vehicle().chassisTorsionalStiffness() == null) {
                        Axle axle = result.vehicle().axle(position);
                        double sprung = position == AxlePosition.FRONT ? result.masses().frontSprungMass()
                                : result.masses().rearSprungMass();
                        double stiffness = result.axle(position).stiffness().rollStiffness();
                        double limit = turn.limit();
                        double expected = (axle.unsprungMass() * axle.unsprungCgHeight() * limit
                                + sprung * atLimit.loadTransferHeightAtLimit() * limit
                                + stiffness * atLimit.rollAtLimit()) / axle.track();
                        assertThat(cornering.loadTransfer(position, limit)).isCloseTo(expected,
                                within(SAME * expected));
                    }
                }
            }
        }
    }

    @Test
    void theLoweredRoadstersRollCentresMoveAndChangeItsLimit() throws Exception {
        // the lowered roadster's roll centres move in roll: the solved limit is no longer the static-height one
        Vehicle lowered = sample("sprint-roadster-lowered");
        AnalysisResult migrating = VehicleAnalysis.analyse(lowered);
        Vehicle staticHeights = lowered;
        for (AxlePosition position : AxlePosition.values()) {
            staticHeights = typed(staticHeights, position, migrating.vehicle().axle(position).rollCentreHeight());
        }
        staticHeights = staticHeights.withCgHeight(migrating.vehicle().cgHeight());
        AnalysisResult typedIn = VehicleAnalysis.analyse(staticHeights);
        assertThat(migrating.rollGradient()).isCloseTo(typedIn.rollGradient(), within(SAME * typedIn.rollGradient()));
        assertThat(Math.abs(migrating.leftTurn().limit() - typedIn.leftTurn().limit())).isGreaterThan(1e-6);
    }
}
