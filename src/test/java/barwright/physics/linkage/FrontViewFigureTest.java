package barwright.physics.linkage;

import barwright.model.DoubleWishbone;
import barwright.model.FrontViewPoint;
import barwright.model.LiveAxlePanhard;
import barwright.model.Strut;
import barwright.physics.linkage.FrontViewFigure.ConstructionLine;
import barwright.physics.linkage.FrontViewFigure.Figure;
import barwright.physics.linkage.FrontViewFigure.Member;
import barwright.physics.linkage.FrontViewFigure.Side;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

import java.util.List;

import static barwright.physics.linkage.LinkageCars.axle;
import static barwright.physics.linkage.LinkageCars.mm;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * The drawing's figure of a rolled axle against the conditions any assembled linkage must meet, checked in the
 * road's axes independently of how the figure was built: every rigid link keeps its measured length, both tyres
 * stand on the ground, each side's construction lines pass through its instant centre, and the roll centre lies on
 * both lines from the contact points through the instant centres (the instant-centre construction, Milliken and
 * Milliken, Race Car Vehicle Dynamics, ch. 17, from memory). The axles are invented (LinkageCars).
 */
class FrontViewFigureTest {
    /** Lengths and distances in road axes (m): the solves are to 1e-12 m of travel, so 1e-9 m is rounding only. */
    private static final double GEOMETRY = 1e-9;

    private static final DoubleWishbone WISHBONES = new DoubleWishbone(mm(330, 330), mm(600, 350), mm(250, 125),
            mm(640, 120));
    private static final Strut STRUT = new Strut(mm(640, 700), mm(700, 350), mm(330, 165), mm(730, 150));

    @ParameterizedTest
    @ValueSource(doubles = {-4, -1.5, 0, 0.7, 2, 4})
    void doubleWishbonesKeepTheirArmsAndTyresOnTheGround(double rollDeg) {
        Figure figure = FrontViewFigure.of(axle(1410, WISHBONES, -25, -2)).at(Math.toRadians(rollDeg));
        List<Member> members = figure.members();
        assertThat(members).hasSize(4);
        for (int side = 0; side < 2; side++) {
            assertThat(length(members.get(2 * side))).isCloseTo(WISHBONES.upperInner().distanceTo(WISHBONES.upperOuter()),
                    within(GEOMETRY));
            assertThat(length(members.get(2 * side + 1))).isCloseTo(WISHBONES.lowerInner().distanceTo(
                    WISHBONES.lowerOuter()), within(GEOMETRY));
        }
        // the upright: the two ball joints keep their distance on each side
        double upright = WISHBONES.upperOuter().distanceTo(WISHBONES.lowerOuter());
        assertThat(members.get(0).to().distanceTo(members.get(1).to())).isCloseTo(upright, within(GEOMETRY));
        assertThat(members.get(2).to().distanceTo(members.get(3).to())).isCloseTo(upright, within(GEOMETRY));
        onTheGroundWithTheConstruction(figure);
    }

    @ParameterizedTest
    @ValueSource(doubles = {-3, 0, 1, 3})
    void strutsKeepTheirArmAndTheirTopMountOnTheBody(double rollDeg) {
        Figure figure = FrontViewFigure.of(axle(1545, STRUT)).at(Math.toRadians(rollDeg));
        double arm = STRUT.lowerInner().distanceTo(STRUT.lowerOuter());
        double onUpright = STRUT.strutLower().distanceTo(STRUT.lowerOuter());
        for (int side = 0; side < 2; side++) {
            Member strut = figure.members().get(2 * side);
            Member lower = figure.members().get(2 * side + 1);
            assertThat(length(lower)).isCloseTo(arm, within(GEOMETRY));
            assertThat(strut.to().distanceTo(lower.to())).isCloseTo(onUpright, within(GEOMETRY));
            // the top mount is fixed in the body: where the body's place puts its measured point
            FrontViewPoint top = side == 0 ? STRUT.strutTop() : new FrontViewPoint(-STRUT.strutTop().y(),
                    STRUT.strutTop().z());
            assertThat(strut.from().distanceTo(figure.body().toRoad(top))).isLessThan(GEOMETRY);
        }
        onTheGroundWithTheConstruction(figure);
    }

    @ParameterizedTest
    @ValueSource(doubles = {-3, 0, 2.5})
    void aPanhardRodKeepsItsLengthAndCrossesTheCentrelineAtTheRollCentre(double rollDeg) {
        LiveAxlePanhard rod = new LiveAxlePanhard(mm(-560, 120), mm(520, 100));
        Figure figure = FrontViewFigure.of(axle(1500, rod)).at(Math.toRadians(rollDeg));
        Member drawn = figure.members().get(0);
        assertThat(length(drawn)).isCloseTo(rod.bodyEnd().distanceTo(rod.axleEnd()), within(GEOMETRY));
        RollCentre centre = figure.state().rollCentre();
        FrontViewPoint rc = new FrontViewPoint(centre.offset(), centre.height());
        assertThat(distanceToLine(rc, drawn.from(), drawn.to())).isLessThan(GEOMETRY);
        // ... and on the body's centreline, the body's (0, 0) to (0, 1 m) as it sits on the road
        FrontViewFigure.BodyPlace body = figure.body();
        assertThat(distanceToLine(rc, body.toRoad(new FrontViewPoint(0, 0)), body.toRoad(new FrontViewPoint(0, 1))))
                .isLessThan(GEOMETRY);
    }

    private static void onTheGroundWithTheConstruction(Figure figure) {
        RollCentre centre = figure.state().rollCentre();
        for (Side side : List.of(figure.left(), figure.right())) {
            assertThat(side.contact().z()).isCloseTo(0, within(GEOMETRY));
            InstantCentre ic = side.instantCentre();
            assertThat(ic.atInfinity()).isFalse();
            FrontViewPoint icPoint = new FrontViewPoint(ic.y(), ic.z());
            for (ConstructionLine line : side.construction()) {
                FrontViewPoint along = new FrontViewPoint(line.anchor().y() + line.directionY(),
                        line.anchor().z() + line.directionZ());
                assertThat(distanceToLine(icPoint, line.anchor(), along)).isLessThan(1e-7);
            }
            if (centre != null) {
                FrontViewPoint rc = new FrontViewPoint(centre.offset(), centre.height());
                assertThat(distanceToLine(rc, side.contact(), icPoint)).isLessThan(1e-7);
            }
        }
        // the contact points are a track apart, either side of the origin
        assertThat(figure.left().contact().y() - figure.right().contact().y())
                .isCloseTo(figure.state().track(), within(GEOMETRY));
        assertThat(figure.left().contact().y() + figure.right().contact().y()).isCloseTo(0, within(GEOMETRY));
    }

    private static double length(Member member) {
        return member.from().distanceTo(member.to());
    }

    private static double distanceToLine(FrontViewPoint p, FrontViewPoint a, FrontViewPoint b) {
        double dy = b.y() - a.y();
        double dz = b.z() - a.z();
        return Math.abs(dy * (p.z() - a.z()) - dz * (p.y() - a.y())) / Math.hypot(dy, dz);
    }
}
