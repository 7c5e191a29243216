package barwright.physics;

import barwright.loading.VehicleLoader;
import barwright.io.VehicleFileReader;
import barwright.model.Axle;
import barwright.model.AxlePosition;
import barwright.model.TyreCamber;
import barwright.model.Vehicle;
import org.junit.jupiter.api.Test;

import java.nio.file.Path;

import static barwright.units.Constants.STANDARD_GRAVITY;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * Each wheel's camber to the road from its linkage reaches the tyres' grip at the limit (model.md 8.2 and 11):
 * SAE J670 cambers (top leaning away from the car positive), the inside wheel's entering with its sign turned.
 */
class LinkageCamberGripTest {
    private static final double DEG = Math.toRadians(1);
    /** Camber terms for the test, invented: best camber -2 deg, 0.004 of friction per deg^2, 0.01 thrust/deg. */
    private static final TyreCamber TERMS = new TyreCamber(-2 * DEG, 0.004 / (DEG * DEG), 0.01 / DEG);

    private static Vehicle roadsterWithCamberTerms() throws Exception {
        Vehicle roadster = VehicleLoader.read(Path.of("sample-vehicles", "sprint-roadster.json")).vehicle();
        return roadster.withFront(withCamberTerms(roadster.front())).withRear(withCamberTerms(roadster.rear()));
    }

    private static Axle withCamberTerms(Axle axle) {
        return new Axle(axle.track(), axle.rollCentreHeight(), axle.unsprungMass(), axle.unsprungCgHeight(),
                axle.springRate(), axle.springMotionRatio(), axle.tyreVerticalRate(), axle.tyre().withCamber(TERMS),
                axle.bar(), axle.suspension());
    }

    @Test
    void anAxlesCapacityForAPairOfCambersIsTheHandSum() throws Exception {
        // model.md 8, 8.2 by hand: mu(F) = mu_0 (1 + s (F/F_0 - 1)); each tyre loses L (gamma - gamma*)^2, the
        // inside one seen from its own side (camber sign turned)
        var tyre = roadsterWithCamberTerms().front().tyre();
        AxleGrip grip = new AxleGrip(new TyreModel(tyre));
        double outsideLoad = 3600;
        double insideLoad = 1500;
        double outsideCamber = -3.1 * DEG;
        double insideCamber = 0.4 * DEG;
        double mu0 = tyre.frictionAtNominalLoad();
        double s = tyre.frictionLoadSensitivity();
        double f0 = tyre.nominalLoad();
        double loss = 0.004;
        double expected = (mu0 * (1 + s * (outsideLoad / f0 - 1)) - loss * Math.pow(-3.1 + 2, 2)) * outsideLoad
                + (mu0 * (1 + s * (insideLoad / f0 - 1)) - loss * Math.pow(-0.4 + 2, 2)) * insideLoad;
        assertThat(grip.capacity(outsideLoad, insideLoad, outsideCamber, insideCamber)).isCloseTo(expected,
                within(1e-9 * expected));
        // at the best camber on both wheels (inside mirrored: +2 deg J670) nothing is lost
        double best = mu0 * (1 + s * (outsideLoad / f0 - 1)) * outsideLoad
                + mu0 * (1 + s * (insideLoad / f0 - 1)) * insideLoad;
        assertThat(grip.capacity(outsideLoad, insideLoad, -2 * DEG, 2 * DEG)).isCloseTo(best, within(1e-9 * best));
        // the same loss a degree either side of the best camber
        assertThat(grip.capacity(outsideLoad, 0, -1 * DEG, 0)).isCloseTo(grip.capacity(outsideLoad, 0, -3 * DEG, 0),
                within(1e-9 * best));
    }

    @Test
    void theLimitIsWhereTheAxleGripAtTheLinkagesCambersMeetsTheForceNeeded() throws Exception {
        AnalysisResult result = VehicleAnalysis.analyse(roadsterWithCamberTerms());
        TurnResult turn = result.leftTurn();
        SteadyCornering cornering = turn.cornering();
        double limit = turn.limit();
        AxlePosition axle = turn.frontLimit() <= turn.rearLimit() ? AxlePosition.FRONT : AxlePosition.REAR;
        double accel = axle == AxlePosition.FRONT ? turn.frontLimit() : turn.rearLimit();
        assertThat(accel).isEqualTo(limit);
        // the cambers of the linkage at that roll, from the table (J670): the outside wheel leans out with the body
        AxleRollGeometry geometry = result.migration().geometry(axle);
        double roll = cornering.geometryRoll(accel);
        double outsideCamber = geometry.outsideCamber(roll);
        double insideCamber = geometry.insideCamber(roll);
        assertThat(cornering.outsideCamber(axle, accel)).isEqualTo(outsideCamber);
        WheelLoads loads = cornering.wheelLoads(accel);
        double outside = axle == AxlePosition.FRONT ? loads.frontOutside() : loads.rearOutside();
        double inside = axle == AxlePosition.FRONT ? loads.frontInside() : loads.rearInside();
        var tyre = result.vehicle().axle(axle).tyre();
        double expected = hand(tyre, outside, Math.toDegrees(outsideCamber))
                + hand(tyre, inside, -Math.toDegrees(insideCamber));
        double share = axle == AxlePosition.FRONT ? result.masses().frontMassFraction()
                : 1 - result.masses().frontMassFraction();
        // at the limit the capacity equals the force the axle must give, m a_y share (model.md 8)
        assertThat(result.masses().mass() * share * accel).isCloseTo(expected, within(1e-6 * expected));
        // and the cambers cost grip: without camber terms the same car goes faster
        Vehicle plain = VehicleLoader.read(Path.of("sample-vehicles", "sprint-roadster.json")).vehicle();
        assertThat(VehicleAnalysis.analyse(plain).leftTurn().limit()).isGreaterThan(limit);
        assertThat(limit / STANDARD_GRAVITY).isBetween(0.8, 1.6);
    }

    /** A tyre's peak force by hand, model.md 8 and 8.2: (mu(F) - L (gamma - gamma*)^2) F, gamma in degrees. */
    private static double hand(barwright.model.Tyre tyre, double load, double camberDeg) {
        if (load <= 0) {
            return 0;
        }
        double mu = tyre.frictionAtNominalLoad() * (1 + tyre.frictionLoadSensitivity() * (load / tyre.nominalLoad() - 1));
        return (mu - 0.004 * Math.pow(camberDeg + 2, 2)) * load;
    }
}
