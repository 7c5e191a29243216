package barwright.physics.linkage;

import barwright.model.DoubleWishbone;
import barwright.model.FrontViewPoint;
import org.junit.jupiter.api.Test;

import static barwright.physics.linkage.LinkageCars.axle;
import static barwright.physics.linkage.LinkageCars.mm;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * A double wishbone's loop closure, instant centre, camber gain and roll centre against hand derivations written
 * in each test (straight lines meeting, similar triangles, a rigid body turning about its instant centre) and
 * limit cases. The points are invented.
 */
class DoubleWishboneKinematicsTest {
    /** Link lengths kept by the solve (m): the issue asks for 1e-9. */
    private static final double LENGTH_KEPT = 1e-9;
    /** Agreement of two exact constructions in double precision (m). */
    private static final double EXACT = 1e-9;

    // short upper arm, long lower arm, both sloping down outward a little: an invented race-car front
    private static final DoubleWishbone ARMS = new DoubleWishbone(mm(400, 500), mm(680, 480), mm(300, 200),
            mm(720, 160));

    @Test
    void staticRollCentreByTheInstantCentreConstruction() {
        // hand derivation: upper line z = 0.50 - (y - 0.40) / 14, lower line z = 0.20 - 2 (y - 0.30) / 21;
        // equal where 0.30 = (y - 0.40) / 14 - 2 (y - 0.30) / 21, times 42: 12.6 = -y, so y = -12.6 m and
        // z = 0.50 + 13.0 / 14 = 1.4285714 m. The line from the contact point (0.75, 0) through it crosses the
        // centreline at h = z_ic (t / 2) / (t / 2 - y_ic) = 1.4285714 * 0.75 / 13.35 (similar triangles).
        double icY = -12.6;
        double icZ = 0.50 + 13.0 / 14;
        double expectedHeight = icZ * 0.75 / (0.75 - icY);
        AxleKinematics kinematics = AxleKinematics.of(axle(1500, ARMS));
        TravelState still = kinematics.travel(0);
        assertThat(still.instantCentre().atInfinity()).isFalse();
        assertThat(still.instantCentre().y()).isCloseTo(icY, within(1e-9));
        assertThat(still.instantCentre().z()).isCloseTo(icZ, within(1e-9));
        RollState level = kinematics.atRideHeight();
        assertThat(level.rollCentre().height()).isCloseTo(expectedHeight, within(EXACT));
        assertThat(level.rollCentre().offset()).isCloseTo(0, within(EXACT));
        // symmetric lines: the load-transfer height is the roll-centre height itself
        assertThat(level.loadTransferHeight()).isCloseTo(expectedHeight, within(EXACT));
    }

    @Test
    void theSolvedLinkageKeepsEveryLinksLength() {
        AxleKinematics kinematics = AxleKinematics.of(axle(1500, ARMS));
        DoubleWishboneSide side = new DoubleWishboneSide(ARMS, mm(750, 0));
        SideSolver solver = new SideSolver(side);
        double upper = ARMS.upperInner().distanceTo(ARMS.upperOuter());
        double lower = ARMS.lowerInner().distanceTo(ARMS.lowerOuter());
        double upright = ARMS.lowerOuter().distanceTo(ARMS.upperOuter());
        double toContact = ARMS.lowerOuter().distanceTo(mm(750, 0));
        double upperToContact = ARMS.upperOuter().distanceTo(mm(750, 0));
        for (double travelMm = -90; travelMm <= 90; travelMm += 7.5) {
            SidePose pose = solver.pose(travelMm * 1e-3);
            FrontViewPoint uo = pose.joints().get(0);
            FrontViewPoint lo = pose.joints().get(1);
            assertThat(uo.distanceTo(ARMS.upperInner())).as("upper arm at %s mm", travelMm).isCloseTo(upper, within(LENGTH_KEPT));
            assertThat(lo.distanceTo(ARMS.lowerInner())).as("lower arm").isCloseTo(lower, within(LENGTH_KEPT));
            assertThat(uo.distanceTo(lo)).as("upright").isCloseTo(upright, within(LENGTH_KEPT));
            assertThat(pose.contact().distanceTo(lo)).as("contact to lower joint").isCloseTo(toContact, within(LENGTH_KEPT));
            assertThat(pose.contact().distanceTo(uo)).as("contact to upper joint").isCloseTo(upperToContact, within(LENGTH_KEPT));
            assertThat(pose.contact().z()).as("travel reached").isCloseTo(travelMm * 1e-3, within(LENGTH_KEPT));
        }
        assertThat(kinematics.bumpLimit().travel()).isGreaterThan(0.09);
    }

    @Test
    void finiteDifferenceCamberGainEqualsTheSwingArmOne() {
        // a rigid upright turning about its instant centre by d(beta) moves the contact point up by
        // d(beta) (y_c - y_ic); so d(camber)/ds = -1 / (y_c - y_ic), the front-view swing-arm length
        AxleKinematics kinematics = AxleKinematics.of(axle(1500, ARMS));
        for (double travel : new double[] {-0.05, 0, 0.04}) {
            double h = 1e-5;
            double numeric = (kinematics.travel(travel + h).camber() - kinematics.travel(travel - h).camber()) / (2 * h);
            TravelState here = kinematics.travel(travel);
            double analytic = -1 / here.swingArmLength();
            // central difference: error of order h^2 times the third derivative, far below 1e-6 rad/m here
            assertThat(numeric).as("at %s m", travel).isCloseTo(analytic, within(1e-6));
        }
    }

    @Test
    void parallelEqualArmsPutTheRollCentreOnTheGroundAndCamberFollowsTheBody() {
        // a parallelogram: the upright never turns, the lines from the contact points are the ground itself at
        // rest, and parallel (one each side) once the body rolls: no roll centre then
        DoubleWishbone parallel = new DoubleWishbone(mm(350, 450), mm(700, 450), mm(350, 150), mm(700, 150));
        AxleKinematics kinematics = AxleKinematics.of(axle(1500, parallel, 0, -1.5));
        RollState level = kinematics.atRideHeight();
        assertThat(level.rollCentre().height()).isCloseTo(0, within(EXACT));
        double roll = Math.toRadians(2);
        RollState rolled = kinematics.roll(roll);
        assertThat(rolled.hasRollCentre()).isFalse();
        // camber to the road changes by the body's roll: outside (right) gains it, inside (left) loses it
        assertThat(rolled.rightCamber()).isCloseTo(Math.toRadians(-1.5) + roll, within(1e-12));
        assertThat(rolled.leftCamber()).isCloseTo(Math.toRadians(-1.5) - roll, within(1e-12));
        // parallel lines at equal and opposite slopes carry no geometric load transfer
        assertThat(rolled.loadTransferHeight()).isCloseTo(0, within(1e-12));
        // camber against travel does not change at all
        assertThat(kinematics.travel(0.05).camber()).isCloseTo(Math.toRadians(-1.5), within(1e-12));
    }

    @Test
    void armsAimedAtTheCentrelineBehaveLikeASwingAxle() {
        // both arm lines pass through (0, 0.25): like a swing axle pivoting on the centreline. The roll centre is
        // that pivot and the swing arm is half the track: camber gain -1 / 0.75 rad per metre of bump
        double pivotZ = 0.25;
        FrontViewPoint lowerOuter = mm(650, 120);
        FrontViewPoint upperOuter = mm(620, 450);
        FrontViewPoint lowerInner = new FrontViewPoint(0.25, pivotZ + (lowerOuter.z() - pivotZ) * 0.25 / lowerOuter.y());
        FrontViewPoint upperInner = new FrontViewPoint(0.30, pivotZ + (upperOuter.z() - pivotZ) * 0.30 / upperOuter.y());
        AxleKinematics kinematics = AxleKinematics.of(axle(1500,
                new DoubleWishbone(upperInner, upperOuter, lowerInner, lowerOuter)));
        RollState level = kinematics.atRideHeight();
        assertThat(level.rollCentre().height()).isCloseTo(pivotZ, within(EXACT));
        assertThat(kinematics.travel(0).instantCentre().y()).isCloseTo(0, within(EXACT));
        double h = 1e-5;
        double gain = (kinematics.travel(h).camber() - kinematics.travel(-h).camber()) / (2 * h);
        assertThat(gain).isCloseTo(-1 / 0.75, within(1e-6));
    }

    @Test
    void theBodyTurnsAboutTheRollCentreForASmallRoll() {
        // a rigid body turned by d(phi) about a point P at height h on the centreline moves its origin sideways
        // by h d(phi): the kinematic roll's lateral shift over the roll tends to the roll-centre height
        AxleKinematics kinematics = AxleKinematics.of(axle(1500, ARMS));
        double small = Math.toRadians(0.01);
        RollState rolled = kinematics.roll(small);
        double height = kinematics.atRideHeight().rollCentre().height();
        // the neglected terms are of relative order phi (2e-4 rad here) and the roll centre's own migration;
        // allow 0.1 % of the height
        assertThat(rolled.lateralShift() / small).isCloseTo(height, within(1e-3 * height));
        // both contact points stay on the ground: wheel travels equal and opposite, heave second-order
        assertThat(Math.abs(rolled.heave())).isLessThan(1e-6);
    }

    @Test
    void rollToTheOtherSideIsTheMirrorImage() {
        AxleKinematics kinematics = AxleKinematics.of(axle(1500, ARMS, 0, -1));
        RollState left = kinematics.roll(Math.toRadians(3));
        RollState right = kinematics.roll(Math.toRadians(-3));
        assertThat(right.leftCamber()).isCloseTo(left.rightCamber(), within(1e-15));
        assertThat(right.rollCentre().offset()).isCloseTo(-left.rollCentre().offset(), within(1e-15));
        // a left turn: the right (outside) wheel in bump, and the roll centre moves off the centreline
        assertThat(left.rightTravel()).isPositive();
        assertThat(left.rollCentre().offset()).isNotCloseTo(0, within(1e-4));
    }

    @Test
    void loweringTheBodyLowersThisRollCentre() {
        // with the lower arm sloping down outward, lowering raises the outer end relative to the inner: the arm
        // flattens and the instant centre line drops; a lowered car's roll centre falls (more than the body)
        double standard = AxleKinematics.of(axle(1500, ARMS)).atRideHeight().rollCentre().height();
        double lowered = AxleKinematics.of(axle(1500, ARMS, -25, 0)).atRideHeight().rollCentre().height();
        assertThat(lowered).isLessThan(standard - 0.025);
    }
}
