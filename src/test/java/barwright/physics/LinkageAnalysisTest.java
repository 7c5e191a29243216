package barwright.physics;

import barwright.loading.VehicleLoader;
import barwright.model.Axle;
import barwright.model.AxlePosition;
import barwright.model.LiveAxleWatts;
import barwright.model.SuspensionGeometry;
import barwright.model.TurnDirection;
import barwright.model.Vehicle;
import barwright.physics.linkage.AxleKinematics;
import org.junit.jupiter.api.Test;

import java.nio.file.Path;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * The analysis with linkages (model.md 12) against the analysis with the same roll centres typed in: with the
 * linkage's static roll centre typed in, a_y -> 0 figures agree to 1e-9; a roll centre that does not migrate
 * (a Watt's pivot on the axle) gives the same car at the limit too; a car with no linkage is untouched.
 */
class LinkageAnalysisTest {
    private static final double SAME = 1e-9;

    private static Vehicle sample(String name) throws Exception {
        return VehicleLoader.read(Path.of("sample-vehicles", name + ".json")).vehicle();
    }

    /** The same car with each linkage taken away and its static roll centre typed in instead. */
    private static Vehicle typedIn(Vehicle vehicle) {
        Vehicle typed = vehicle;
        for (AxlePosition position : AxlePosition.values()) {
            Axle axle = vehicle.axle(position);
            if (axle.hasLinkage()) {
                double height = AxleKinematics.of(axle).atRideHeight().rollCentre().height();
                typed = typed.withAxle(position, axle.withRollCentreHeight(height)
                        .withSuspension(SuspensionGeometry.NONE));
            }
        }
        return typed;
    }

    @Test
    void withTheStaticRollCentreTypedInTheSmallAccelerationFiguresAgree() throws Exception {
        for (String name : new String[] {"sprint-roadster", "road-saloon", "club-hatchback", "estate-dropped-rear-bar"}) {
            Vehicle withLinkages = sample(name);
            AnalysisResult linked = VehicleAnalysis.analyse(withLinkages);
            AnalysisResult typed = VehicleAnalysis.analyse(typedIn(withLinkages));
            assertThat(linked.rollGradient()).as(name).isCloseTo(typed.rollGradient(), within(SAME * typed.rollGradient()));
            assertThat(linked.frontLoadTransferShare()).as(name).isCloseTo(typed.frontLoadTransferShare(), within(SAME));
            assertThat(linked.understeerGradient()).as(name).isCloseTo(typed.understeerGradient(), within(SAME));
            assertThat(linked.front().loadTransfer().geometric()).as(name)
                    .isCloseTo(typed.front().loadTransfer().geometric(), within(SAME * 1e3));
            // the limit is not compared: there the roll centres have moved (RollCentreMigrationTest)
        }
    }

    @Test
    void aCarWithoutLinkagesIsAnalysedExactlyAsBefore() throws Exception {
        Vehicle hillclimb = sample("hillclimb-special-swept-bar");
        assertThat(LinkageResolution.atRideHeight(hillclimb)).isSameAs(hillclimb);
    }

    @Test
    void aRollCentreThatDoesNotMoveGivesTheRollOfTheTypedInCar() throws Exception {
        // a Watt's linkage with its pivot on the axle: the roll centre stays at the pivot whatever the roll, so the
        // roll at the limit solved with migrating roll centres is the typed-in car's a_y,limit * roll gradient
        Vehicle estate = sample("estate-dropped-rear-bar");
        Axle rear = estate.rear().withSuspension(new SuspensionGeometry(
                new LiveAxleWatts(0.30, LiveAxleWatts.Mount.AXLE), 0, 0));
        Vehicle watts = estate.withRear(rear);
        AnalysisResult result = VehicleAnalysis.analyse(watts);
        LinkageAtLimit atLimit = LinkageAtLimit.of(result, AxlePosition.REAR);
        TurnDirection turn = atLimit.turn();
        assertThat(atLimit.rollAtLimit()).isCloseTo(result.turn(turn).limit() * result.roll().rollPerAccel(),
                within(1e-9 * atLimit.rollAtLimit()));
        assertThat(atLimit.rollCentreHeightAtLimit()).isCloseTo(0.30, within(1e-12));
        assertThat(atLimit.rollCentreMigrationPerRoll()).isCloseTo(0, within(1e-9));
        // a beam axle keeps its wheels' camber to the road
        assertThat(atLimit.camberChangePerRoll()).isZero();
    }

    @Test
    void theLoweredRoadsterLosesGeometricTransferAndRollsMore() throws Exception {
        AnalysisResult standard = VehicleAnalysis.analyse(sample("sprint-roadster"));
        AnalysisResult lowered = VehicleAnalysis.analyse(sample("sprint-roadster-lowered"));
        // lower roll centres: less load goes through the links, more through springs and bars (model.md 5)
        assertThat(lowered.front().loadTransfer().geometric()).isLessThan(standard.front().loadTransfer().geometric());
        assertThat(lowered.rear().loadTransfer().geometric()).isLessThan(standard.rear().loadTransfer().geometric());
        // the roll centres fall faster than the centre of mass: a longer roll arm, more roll per g
        assertThat(lowered.rollGradient()).isGreaterThan(standard.rollGradient());
        assertThat(lowered.vehicle().cgHeight()).isLessThan(standard.vehicle().cgHeight());
    }
}
