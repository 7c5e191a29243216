package barwright.physics.beam;

import barwright.io.VehicleDocument;
import barwright.loading.VehicleLoader;
import barwright.model.AntiRollBar;
import barwright.model.BarCentreline;
import barwright.model.Point3;
import barwright.model.Vehicle;
import barwright.physics.AnalysisResult;
import barwright.physics.BarAnalysis;
import barwright.physics.VehicleAnalysis;
import barwright.physics.bar.BarModel;
import barwright.physics.bar.BarResult;
import org.junit.jupiter.api.Test;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * The two shipped sample vehicles with shaped bars (invented data, sample-vehicles/), read through the
 * vehicle file reader and analysed end to end.
 */
class ShapedSampleVehicleTest {
    private static final Path SWEPT = Path.of("sample-vehicles", "hillclimb-special-swept-bar.json");
    private static final Path DROPPED = Path.of("sample-vehicles", "estate-dropped-rear-bar.json");

    @Test
    void theSweptFrontBarIsAnalysedByTheBeamModel() throws Exception {
        Vehicle vehicle = read(SWEPT);
        AntiRollBar bar = vehicle.front().bar();
        assertThat(bar.isShaped()).isTrue();
        BarResult result = BarAnalysis.analyse(bar, vehicle.differentialWheelTravel());
        checkAgainstStatics(bar, result);

        // expected sign: lower than the same bar with its arms straight back (same reach, torsion length
        // and bends): the swept arm is longer and its link sits outboard (see BeamBarShapeTest)
        List<Point3> points = bar.centreline().points();
        List<Point3> straightArms = List.of(new Point3(points.get(0).x(), points.get(1).y(), 0), points.get(1),
                points.get(2), new Point3(points.get(3).x(), points.get(2).y(), 0));
        AntiRollBar straight = withPoints(bar, straightArms);
        assertThat(result.linkRate()).isLessThan(BeamBar.analyse(straight, 0.01).linkRate());

        AnalysisResult analysis = VehicleAnalysis.analyse(vehicle);
        assertThat(analysis.front().bar().model()).isEqualTo(BarModel.BEAM);
        assertThat(analysis.rear().bar().model()).isEqualTo(BarModel.CLOSED_FORM);
    }

    @Test
    void theDroppedRearBarOnRubberBushingsIsAnalysedByTheBeamModel() throws Exception {
        Vehicle vehicle = read(DROPPED);
        AntiRollBar bar = vehicle.rear().bar();
        assertThat(bar.isShaped()).isTrue();
        assertThat(bar.centreline().bushingRadialRate()).isEqualTo(4000e3);
        BarResult result = BarAnalysis.analyse(bar, vehicle.differentialWheelTravel());
        checkAgainstStatics(bar, result);

        // expected sign: lower than the same bar without the drop (the doglegs, BeamBarShapeTest)
        List<Point3> points = bar.centreline().points();
        AntiRollBar flat = withPoints(bar, List.of(points.get(0), points.get(1), points.get(6), points.get(7)));
        assertThat(result.linkRate()).isLessThan(BeamBar.analyse(flat, 0.01).linkRate());

        AnalysisResult analysis = VehicleAnalysis.analyse(vehicle);
        assertThat(analysis.rear().bar().model()).isEqualTo(BarModel.BEAM);
        assertThat(analysis.front().bar().model()).isEqualTo(BarModel.CLOSED_FORM);
    }

    /** Checks any shaped bar's result against geometry and statics worked out here, apart from the model. */
    private static void checkAgainstStatics(AntiRollBar bar, BarResult result) {
        BarCentreline line = bar.centreline();
        assertThat(result.model()).isEqualTo(BarModel.BEAM);
        assertThat(result.linkRate()).isPositive().isFinite();
        assertThat(result.safetyFactor()).isPositive().isFinite();
        // mass = density * area * length (model.md 1); the length of a polyline whose corners are rounded
        // with radius r: the segments, less 2 r tan(theta / 2) per corner, plus the arc r theta (hand geometry)
        double length = 0;
        List<Point3> points = line.points();
        for (int i = 1; i < points.size(); i++) {
            length += points.get(i).distanceTo(points.get(i - 1));
        }
        for (int i = 1; i + 1 < points.size(); i++) {
            Point3 in = points.get(i).minus(points.get(i - 1)).unit();
            Point3 out = points.get(i + 1).minus(points.get(i)).unit();
            double turn = Math.acos(Math.max(-1, Math.min(1, in.dot(out))));
            length += line.bendRadius() * (turn - 2 * Math.tan(turn / 2));
        }
        double mass = bar.material().density() * bar.section().area() * length;
        assertThat(result.mass()).isCloseTo(mass, within(1e-9 * mass));
        // bushing loads by statics: the vertical link pair, F at the left link and -F at the right, is a
        // couple F (y_left - y_right) about x, held by the two bushings on their axis along y:
        // R = F (y_left - y_right) / (y_first - y_last), whatever the shape or the bushing rate
        double setback = line.holeSetbacks().get(bar.selectedArm());
        double leftY = pointBack(points.get(0), points.get(1), setback).y();
        double rightY = pointBack(points.get(points.size() - 1), points.get(points.size() - 2), setback).y();
        double span = line.bushings().get(0).y() - line.bushings().get(1).y();
        double expected = result.linkForce() * (leftY - rightY) / span;
        assertThat(result.bushingLoads()).hasSize(2).allSatisfy(load ->
                assertThat(load).isCloseTo(expected, within(1e-8 * expected)));
    }

    private static Point3 pointBack(Point3 end, Point3 next, double distance) {
        return end.plus(next.minus(end).unit().times(distance));
    }

    private static AntiRollBar withPoints(AntiRollBar bar, List<Point3> points) {
        BarCentreline line = bar.centreline();
        BarCentreline changed = new BarCentreline(new ArrayList<>(points), line.bendRadius(), line.bushings(),
                line.bushingRadialRate(), line.holeSetbacks());
        return new AntiRollBar(bar.material(), bar.section(), null, changed, bar.selectedArm(), bar.linkMotionRatio());
    }

    private static Vehicle read(Path file) throws Exception {
        VehicleDocument document = VehicleLoader.read(file);
        return document.vehicle();
    }
}
