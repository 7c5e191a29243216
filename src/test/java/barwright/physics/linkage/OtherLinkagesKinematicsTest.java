package barwright.physics.linkage;

import barwright.model.FrontViewPoint;
import barwright.model.LiveAxlePanhard;
import barwright.model.LiveAxleWatts;
import barwright.model.Point3;
import barwright.model.SemiTrailingArm;
import barwright.model.Strut;
import barwright.model.TrailingArm;
import org.junit.jupiter.api.Test;

import static barwright.physics.linkage.LinkageCars.axle;
import static barwright.physics.linkage.LinkageCars.mm;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

/**
 * Struts, swinging arms and beam axles against hand derivations written in each test and limit cases. All
 * points are invented.
 */
class OtherLinkagesKinematicsTest {
    /** Agreement of two exact constructions in double precision (m). */
    private static final double EXACT = 1e-9;

    private static final Strut STRUT = new Strut(mm(600, 650), mm(660, 300), mm(300, 180), mm(720, 140));

    @Test
    void strutRollCentreByTheInstantCentreConstruction() {
        // hand derivation: the instant centre lies on the line through the top mount T = (0.60, 0.65) square to
        // the strut, 0.06 (y - 0.60) - 0.35 (z - 0.65) = 0, and on the lower arm's line
        // z = 0.18 - (0.04 / 0.42)(y - 0.30). Substituting, with m = 0.04 / 0.42:
        // 0.06 y - 0.036 - 0.35 (0.18 + 0.30 m - m y) + 0.2275 = 0  ->  y (0.06 + 0.35 m) = 0.036 + 0.063 + 0.105 m - 0.2275
        double m = 0.04 / 0.42;
        double icY = (0.036 + 0.063 + 0.105 * m - 0.2275) / (0.06 + 0.35 * m);
        double icZ = 0.18 - m * (icY - 0.30);
        double expectedHeight = icZ * 0.75 / (0.75 - icY);
        AxleKinematics kinematics = AxleKinematics.of(axle(1500, STRUT));
        assertThat(kinematics.travel(0).instantCentre().y()).isCloseTo(icY, within(EXACT));
        assertThat(kinematics.travel(0).instantCentre().z()).isCloseTo(icZ, within(EXACT));
        assertThat(kinematics.atRideHeight().rollCentre().height()).isCloseTo(expectedHeight, within(EXACT));
    }

    @Test
    void theSolvedStrutKeepsItsLinksAndItsAxisThroughTheTopMount() {
        SideSolver solver = new SideSolver(new StrutSide(STRUT, mm(750, 0)));
        double lower = STRUT.lowerInner().distanceTo(STRUT.lowerOuter());
        double jointToStrut = STRUT.lowerOuter().distanceTo(STRUT.strutLower());
        FrontViewPoint top = STRUT.strutTop();
        for (double travelMm = -80; travelMm <= 80; travelMm += 8) {
            SidePose pose = solver.pose(travelMm * 1e-3);
            FrontViewPoint strutLower = pose.joints().get(0);
            FrontViewPoint lo = pose.joints().get(1);
            assertThat(lo.distanceTo(STRUT.lowerInner())).isCloseTo(lower, within(1e-9));
            assertThat(lo.distanceTo(strutLower)).isCloseTo(jointToStrut, within(1e-9));
            // the strut's axis, turned with the upright, still passes through the top mount
            double angle = Math.atan2(STRUT.strutLower().z() - top.z(), STRUT.strutLower().y() - top.y())
                    + pose.uprightRotation();
            double offLine = (top.y() - strutLower.y()) * Math.sin(angle) - (top.z() - strutLower.z()) * Math.cos(angle);
            assertThat(offLine).as("top mount off the axis at %s mm", travelMm).isCloseTo(0, within(1e-9));
            assertThat(pose.contact().z()).isCloseTo(travelMm * 1e-3, within(1e-9));
        }
    }

    @Test
    void strutCamberGainFromItsInstantCentre() {
        AxleKinematics kinematics = AxleKinematics.of(axle(1500, STRUT));
        double h = 1e-5;
        double numeric = (kinematics.travel(h).camber() - kinematics.travel(-h).camber()) / (2 * h);
        assertThat(numeric).isCloseTo(-1 / kinematics.travel(0).swingArmLength(), within(1e-6));
    }

    @Test
    void aPureTrailingArmHasItsRollCentreOnTheGroundAndNoCamberChange() {
        // the pivot axis is square to the car, so it never crosses the wheel's transverse plane: the front-view
        // instant centre is infinitely far inboard at the pivot's height, the lines from the contact points run
        // along the ground and the roll centre is on it (a limit case of the construction)
        TrailingArm arm = new TrailingArm(new Point3(0.40, 0.30, 0.30), new Point3(0.40, 0.70, 0.30));
        AxleKinematics kinematics = AxleKinematics.of(axle(1500, arm));
        assertThat(kinematics.travel(0).instantCentre().atInfinity()).isTrue();
        assertThat(kinematics.atRideHeight().rollCentre().height()).isCloseTo(0, within(EXACT));
        assertThat(kinematics.travel(0.06).camber()).isCloseTo(0, within(1e-12));
        assertThat(kinematics.roll(Math.toRadians(2)).hasRollCentre()).isFalse();
    }

    @Test
    void semiTrailingArmInstantCentreWhereItsAxisCrossesTheWheelPlane() {
        // hand derivation: from the inner pivot (0.12, 0.15, 0.26) along (outer - inner) = (0.18, 0.45, 0.04),
        // x reaches 0 after -0.12 / 0.18 = -2/3 of it: y = 0.15 - 0.30 = -0.15, z = 0.26 - 0.04 * 2 / 3
        SemiTrailingArm arm = new SemiTrailingArm(new Point3(0.12, 0.15, 0.26), new Point3(0.30, 0.60, 0.30));
        double icY = -0.15;
        double icZ = 0.26 - 0.04 * 2 / 3;
        AxleKinematics kinematics = AxleKinematics.of(axle(1500, arm));
        assertThat(kinematics.travel(0).instantCentre().y()).isCloseTo(icY, within(EXACT));
        assertThat(kinematics.travel(0).instantCentre().z()).isCloseTo(icZ, within(EXACT));
        assertThat(kinematics.atRideHeight().rollCentre().height()).isCloseTo(icZ * 0.75 / (0.75 - icY), within(EXACT));
        // the wheel turns with the arm about a swept axis: camber changes with travel (negative in bump)
        assertThat(kinematics.travel(0.05).camber()).isNegative();
    }

    @Test
    void panhardRodRollCentreAtItsCrossingHeight() {
        // hand derivation: the rod from (-0.55, 0.36) to (0.50, 0.30) crosses y = 0 at
        // z = 0.36 + (0.30 - 0.36) * 0.55 / 1.05 (straight-line interpolation)
        LiveAxlePanhard rod = new LiveAxlePanhard(mm(-550, 360), mm(500, 300));
        AxleKinematics kinematics = AxleKinematics.of(axle(1500, rod, 0, 0));
        RollState level = kinematics.atRideHeight();
        assertThat(level.rollCentre().height()).isCloseTo(0.36 - 0.06 * 0.55 / 1.05, within(EXACT));
        assertThat(level.rollCentre().offset()).isCloseTo(0, within(EXACT));
        // a beam axle keeps its wheels' camber to the road in roll
        RollState rolled = kinematics.roll(Math.toRadians(3));
        assertThat(rolled.leftCamber()).isZero();
        assertThat(rolled.rightCamber()).isZero();
        // wheel travels equal and opposite: the right one rises (t / 2) sin(phi) give or take the sideways shift
        assertThat(rolled.rightTravel()).isCloseTo(0.75 * Math.sin(Math.toRadians(3)), within(0.002));
        // hand derivation: lowering the body 30 mm puts the body's end at (-0.55 + Y, 0.33); the rod keeps its
        // length, (1.05 - Y)^2 + 0.03^2 = 1.05^2 + 0.06^2, so the body moves Y = 1.05 - sqrt(1.1052) sideways
        // and the rod's line crosses the body's centreline (y = Y) at z = 0.33 - 0.03 * 0.55 / (1.05 - Y)
        double shift = 1.05 - Math.sqrt(1.05 * 1.05 + 0.06 * 0.06 - 0.03 * 0.03);
        RollState lowered = AxleKinematics.of(axle(1500, rod, -30, 0)).atRideHeight();
        assertThat(lowered.lateralShift()).isCloseTo(shift, within(EXACT));
        assertThat(lowered.rollCentre().height()).isCloseTo(0.33 - 0.03 * 0.55 / (1.05 - shift), within(EXACT));
    }

    @Test
    void wattsPivotOnTheAxleStaysPut() {
        // the roll centre is the centre pivot; carried by the axle it stays at its height whatever the roll
        AxleKinematics onAxle = AxleKinematics.of(axle(1500, new LiveAxleWatts(0.32, LiveAxleWatts.Mount.AXLE)));
        assertThat(onAxle.roll(Math.toRadians(4)).rollCentre().height()).isCloseTo(0.32, within(1e-15));
        // carried by the body it moves with the body: lowering the body 20 mm lowers it 20 mm
        AxleKinematics onBody = AxleKinematics.of(axle(1500, new LiveAxleWatts(0.32, LiveAxleWatts.Mount.BODY), -20, 0));
        assertThat(onBody.atRideHeight().rollCentre().height()).isCloseTo(0.30, within(1e-12));
    }

    @Test
    void aTravelPastTheLockIsRefusedInWords() {
        // a very short upper arm runs out of reach early in bump
        var arms = new barwright.model.DoubleWishbone(mm(560, 480), mm(640, 470), mm(300, 200), mm(720, 160));
        AxleKinematics kinematics = AxleKinematics.of(axle(1500, arms));
        assertThat(kinematics.bumpLimit().locks()).isTrue();
        double beyond = kinematics.bumpLimit().travel() + 0.005;
        assertThatThrownBy(() -> kinematics.travel(beyond)).isInstanceOf(LinkageLimitException.class)
                .hasMessageContaining("bump").hasMessageContaining("come into line");
    }
}
