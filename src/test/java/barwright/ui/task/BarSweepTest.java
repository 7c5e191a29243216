package barwright.ui.task;

import barwright.model.AxlePosition;
import barwright.model.Vehicle;
import barwright.physics.AnalysisResult;
import barwright.physics.VehicleAnalysis;
import barwright.ui.document.Samples;
import org.junit.jupiter.api.Test;

import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

class BarSweepTest {
    private final Vehicle car = Samples.load(Samples.CLUB_HATCHBACK).vehicle();

    @Test
    void theDiameterSweepPassesThroughTheCarAsItIs() {
        SweepResult sweep = BarSweep.run(car, new SweepRequest(AxlePosition.FRONT, SweepParameter.DIAMETER));
        AnalysisResult now = VehicleAnalysis.analyse(car);
        assertThat(sweep.current()).isEqualTo(0.022);
        SweepResult.Point middle = sweep.points().get(BarSweep.POINTS / 2);
        // the sweep spans 0.65 D to 1.35 D in 16 equal steps, so its middle point is D itself (to rounding)
        assertThat(middle.parameter()).isCloseTo(0.022, within(1e-15));
        assertThat(middle.frontShare()).isCloseTo(now.frontLoadTransferShare(), within(1e-12));
        assertThat(middle.rollGradient()).isCloseTo(now.rollGradient(), within(1e-15));
    }

    @Test
    void aThickerFrontBarRaisesTheFrontShareAndLowersTheRoll() {
        // common practice (docs/validation.md, section "Facts of the trade"): a stiffer bar at one end takes more of the load
        // transfer there and reduces body roll; J grows with D^4, so both move monotonically
        List<SweepResult.Point> points = BarSweep.run(car,
                new SweepRequest(AxlePosition.FRONT, SweepParameter.DIAMETER)).points();
        assertThat(points).hasSize(BarSweep.POINTS);
        for (int i = 1; i < points.size(); i++) {
            assertThat(points.get(i).frontShare()).isGreaterThan(points.get(i - 1).frontShare());
            assertThat(points.get(i).rollGradient()).isLessThan(points.get(i - 1).rollGradient());
        }
    }

    @Test
    void aLongerRearArmSoftensTheRearBarAndRaisesTheFrontShare() {
        SweepResult sweep = BarSweep.run(car, new SweepRequest(AxlePosition.REAR, SweepParameter.ARM_HOLE));
        // the file's 150, 175, 200, 225 mm, in m (to the rounding of the mm-to-m conversion)
        double[] arms = sweep.points().stream().mapToDouble(SweepResult.Point::parameter).toArray();
        assertThat(arms).containsExactly(new double[]{0.150, 0.175, 0.200, 0.225}, within(1e-15));
        assertThat(sweep.current()).isCloseTo(0.175, within(1e-15));
        for (int i = 1; i < sweep.points().size(); i++) {
            assertThat(sweep.points().get(i).frontShare()).isGreaterThan(sweep.points().get(i - 1).frontShare());
        }
    }

    @Test
    void aSweepThatCannotBeDoneSaysWhy() {
        assertThat(BarSweep.run(car, new SweepRequest(AxlePosition.FRONT, SweepParameter.WALL)).unavailable())
                .contains("solid");
        Vehicle noRearBar = car.withRear(car.rear().withBar(null));
        SweepResult none = BarSweep.run(noRearBar, new SweepRequest(AxlePosition.REAR, SweepParameter.DIAMETER));
        assertThat(none.unavailable()).isEqualTo("There is no rear bar to sweep.");
        assertThat(none.points()).isEmpty();
    }

    @Test
    void theWallSweepStaysInsideTheTube() {
        SweepResult sweep = BarSweep.run(car, new SweepRequest(AxlePosition.REAR, SweepParameter.WALL));
        assertThat(sweep.points()).isNotEmpty();
        assertThat(sweep.points()).allSatisfy(point -> assertThat(point.parameter()).isLessThan(0.0254 / 2));
        assertThat(sweep.current()).isEqualTo(0.003);
    }
}
