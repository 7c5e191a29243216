package barwright.physics.beam;

import barwright.model.AntiRollBar;
import barwright.model.BarCentreline;
import barwright.model.Point3;
import barwright.model.SolidSection;
import barwright.model.TubeSection;
import barwright.model.UBarDimensions;
import barwright.physics.BarAnalysis;
import barwright.physics.bar.BarModel;
import barwright.physics.bar.BarResult;
import barwright.physics.bar.ClosedFormBar;
import barwright.solver.frame.FrameSolution;
import barwright.solver.frame.FrameSolver;
import barwright.solver.frame.NodalForce;
import barwright.solver.frame.Vector3;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

import java.util.ArrayList;
import java.util.List;

import static barwright.physics.beam.BarShapes.STEEL;
import static barwright.physics.beam.BarShapes.sweptBar;
import static barwright.physics.beam.BarShapes.uBar;
import static barwright.physics.beam.BarShapes.withBushingRate;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

/** Bushings, links and the free rotation of the bar: statics and hand derivations. */
class BeamBarSupportTest {
    private static final SolidSection SECTION = new SolidSection(0.0254);
    private static final double TRAVEL = 0.02;

    @ParameterizedTest
    @ValueSource(doubles = {1e6, 5e6, 2e7})
    void elasticBushingsAddTheirRollOfTheTube(double radialRate) {
        // Hand derivation (statics and springs in series): the link couple F L is held by bushing forces
        // R = F L / s, which compress the two bushings by R / k in opposite senses; the bar rolls about x by
        // 2 R / (k s), moving the link points apart by L times that: Delta adds 2 F L^2 / (k s^2). The
        // supports are statically determinate, so this adds exactly to the rigid-bushing compliance of
        // model.md 2. Sharp corners, so the closed form is exact: round-off tolerance 1e-8.
        double length = 1.0;
        double span = 0.8;
        AntiRollBar bar = withBushingRate(uBar(SECTION, length, span, 0.25, 0), radialRate);
        double expected = 1 / (1 / ClosedFormBar.linkRate(bar) + 2 * length * length / (radialRate * span * span));
        assertThat(BeamBar.analyse(bar, TRAVEL).linkRate()).isCloseTo(expected, within(1e-8 * expected));
    }

    @Test
    void reactionsBalanceTheLinkForcesAndTheRotationConstraintCarriesNothing() {
        // equilibrium of the whole bar (statics): link forces plus bushing reactions sum to zero, as force
        // and as moment about the origin; the constraint against turning in the bushings must carry no
        // moment about the bushing axis, or it would be holding a load a real bushing cannot
        for (AntiRollBar bar : List.of(uBar(new TubeSection(0.03, 0.0035), 1.05, 0.75, 0.22, 0.05),
                sweptBar(SECTION, 1.0, 0.8, 0.25, Math.toRadians(25), 0.04),
                withBushingRate(uBar(SECTION, 1.0, 0.7, 0.26, 0.03), 3e6))) {
            BarFrame frame = BeamBar.frameOf(bar, BeamBar.DEFAULT_ELEMENT_LENGTH);
            List<NodalForce> loads = frame.unitLinkLoads();
            FrameSolution unit = FrameSolver.solve(frame.model(), loads);
            List<NodalForce> all = new ArrayList<>(loads);
            for (int node : frame.mesh().bushings()) {
                all.add(unit.reaction(node));
            }
            Vector3 force = Vector3.ZERO;
            Vector3 moment = Vector3.ZERO;
            for (NodalForce nodal : all) {
                force = force.plus(nodal.force());
                moment = moment.plus(nodal.moment()).plus(frame.model().nodes().get(nodal.node()).cross(nodal.force()));
            }
            // 1 N link forces, lever arms ~0.3 m: 1e-9 N and N m is round-off
            assertThat(force.length()).isLessThan(1e-9);
            assertThat(moment.length()).isLessThan(1e-9);
            assertThat(Math.abs(frame.rotationConstraintMoment(unit))).isLessThan(1e-9 * frame.meanLeverArm());
        }
    }

    @Test
    void bushingLoadsOfARoundedBarFollowStatics() {
        // statics of the whole bar: the link couple F L_links (L_links = distance between the link points
        // along y) is held by the bushing pair, R = F L_links / s, whatever the bends
        AntiRollBar bar = uBar(SECTION, 1.1, 0.85, 0.24, 0.05);
        BarResult result = BeamBar.analyse(bar, TRAVEL);
        double expected = result.linkForce() * 1.1 / 0.85;
        assertThat(result.bushingLoads()).hasSize(2).allSatisfy(load ->
                assertThat(load).isCloseTo(expected, within(1e-9 * expected)));
    }

    @Test
    void theDeflectedShapeMovesTheLinksApartByTheCheckTravel() {
        AntiRollBar bar = uBar(SECTION, 1.0, 0.8, List.of(0.25, 0.2), 0.04, 1);
        BeamBarSolution solution = BeamBar.solve(bar, TRAVEL);
        BarFrame frame = BeamBar.frameOf(bar, BeamBar.DEFAULT_ELEMENT_LENGTH);
        List<Point3> shape = solution.result().deflectedShape();
        assertThat(shape).hasSize(frame.model().nodes().size());
        double left = shape.get(frame.mesh().leftLink()).z();
        double right = shape.get(frame.mesh().rightLink()).z();
        // the definition of the link rate (model.md 2): Delta = w_left - w_right at F = k Delta
        assertThat(left - right).isCloseTo(TRAVEL, within(1e-9 * TRAVEL));
        // the bushing axis itself does not move with rigid bushings
        for (int node : frame.mesh().bushings()) {
            assertThat(shape.get(node).z()).isCloseTo(0, within(1e-12));
        }
    }

    @Test
    void barAnalysisSendsShapedBarsToTheBeamModel() {
        AntiRollBar bar = uBar(SECTION, 1.0, 0.8, 0.25, 0.03);
        double wheelTravel = 0.05;
        BarResult result = BarAnalysis.analyse(bar, wheelTravel);
        assertThat(result.model()).isEqualTo(BarModel.BEAM);
        // model.md 2: the relative link displacement is the motion ratio times the differential wheel travel
        assertThat(result.relativeLinkTravel()).isCloseTo(BarShapes.LINK_MOTION_RATIO * wheelTravel, within(1e-15));
    }

    @Test
    void unequalLeverArmsAreRefused() {
        List<Point3> points = List.of(new Point3(-0.25, 0.5, 0), new Point3(0, 0.5, 0), new Point3(0, -0.5, 0),
                new Point3(-0.20, -0.5, 0));
        AntiRollBar lopsided = shaped(points, List.of(new Point3(0, 0.4, 0), new Point3(0, -0.4, 0)));
        assertThatThrownBy(() -> BeamBar.analyse(lopsided, TRAVEL))
                .isInstanceOf(IllegalArgumentException.class)
                .hasMessageContaining("unequal lever arms")
                .hasMessageContaining("left 250.0 mm")
                .hasMessageContaining("right 200.0 mm");
    }

    @Test
    void misplacedBushingsAndHolesAreRefusedWithTheirValues() {
        List<Point3> points = List.of(new Point3(-0.25, 0.5, 0), new Point3(0, 0.5, 0), new Point3(0, -0.5, 0),
                new Point3(-0.25, -0.5, 0));
        assertThatThrownBy(() -> BeamBar.analyse(shaped(points, List.of(new Point3(0.01, 0.4, 0),
                new Point3(0, -0.4, 0))), TRAVEL))
                .hasMessageContaining("bushing 0 at (10.0, 400.0, 0.0) mm is 10.0 mm from the bar's centreline");
        assertThatThrownBy(() -> BeamBar.analyse(shaped(points, List.of(new Point3(0, 0.4, 0))), TRAVEL))
                .hasMessageContaining("at least two bushings");
        BarCentreline deepHole = new BarCentreline(points, 0.05, List.of(new Point3(0, 0.4, 0),
                new Point3(0, -0.4, 0)), null, List.of(0.21));
        assertThatThrownBy(() -> BeamBar.analyse(new AntiRollBar(STEEL, SECTION, null, deepHole, 0, 0.7), TRAVEL))
                .hasMessageContaining("hole setback 210.0 mm");
        BarCentreline tightBends = new BarCentreline(List.of(new Point3(-0.25, 0.5, 0), new Point3(0, 0.5, 0),
                new Point3(0, 0.45, 0.05), new Point3(0, -0.5, 0)), 0.1, List.of(new Point3(0, 0.2, 0.05),
                new Point3(0, -0.2, 0.05)), null, List.of(0.0));
        assertThatThrownBy(() -> BeamBar.analyse(new AntiRollBar(STEEL, SECTION, null, tightBends, 0, 0.7), TRAVEL))
                .hasMessageContaining("too short for bends of radius 100.0 mm");
        AntiRollBar closedFormOnly = new AntiRollBar(STEEL, SECTION, new UBarDimensions(1, 0.8, List.of(0.25)),
                null, 0, 0.7);
        assertThatThrownBy(() -> BeamBar.analyse(closedFormOnly, TRAVEL)).hasMessageContaining("centreline");
    }

    private static AntiRollBar shaped(List<Point3> points, List<Point3> bushings) {
        return new AntiRollBar(STEEL, SECTION, null, new BarCentreline(points, 0, bushings, null, List.of(0.0)), 0, 0.7);
    }
}
