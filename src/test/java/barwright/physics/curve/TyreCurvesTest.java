package barwright.physics.curve;

import barwright.loading.VehicleLoader;
import barwright.io.VehicleFileReader;
import barwright.model.AxlePosition;
import barwright.model.LoadPoint;
import barwright.model.TurnDirection;
import barwright.model.Vehicle;
import barwright.physics.AnalysisResult;
import barwright.physics.TyreModel;
import barwright.physics.VehicleAnalysis;
import org.junit.jupiter.api.Test;

import java.nio.file.Path;
import java.util.List;

import static barwright.units.Constants.RADIANS_PER_DEGREE;
import static barwright.units.Constants.STANDARD_GRAVITY;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/** The tyre page's lines on the invented samples, checked against limits and laws outside the producer. */
class TyreCurvesTest {
    private static Vehicle sample(String name) throws Exception {
        return VehicleLoader.read(Path.of("sample-vehicles", name + ".json")).vehicle();
    }

    @Test
    void theWheelLoadsAtTheLimitAddUpToTheWeight() throws Exception {
        Vehicle car = sample("club-hatchback");
        AnalysisResult result = VehicleAnalysis.analyse(car);
        TyreCurves.AxleLoads front = TyreCurves.loads(result, AxlePosition.FRONT, TurnDirection.LEFT);
        TyreCurves.AxleLoads rear = TyreCurves.loads(result, AxlePosition.REAR, TurnDirection.LEFT);
        // vertical equilibrium (a conservation law): the four loads carry m g, at rest and in the turn; the car's
        // mass from the file (1020 kg), g_n by definition; 1e-9 relative is rounding in the sums
        double weight = 1020 * STANDARD_GRAVITY;
        assertThat(front.inside() + front.outside() + rear.inside() + rear.outside()).isCloseTo(weight,
                within(1e-9 * weight));
        assertThat(2 * front.staticLoad() + 2 * rear.staticLoad()).isCloseTo(weight, within(1e-9 * weight));
        // the file's 63 % on the front axle
        assertThat(2 * front.staticLoad() / weight).isCloseTo(0.63, within(1e-9));
        assertThat(front.outside()).isGreaterThan(front.staticLoad()).isGreaterThan(front.inside());
    }

    @Test
    void aPointsTyreIsDrawnThroughItsPointsAndContinuesWithoutAJump() throws Exception {
        Vehicle car = sample("club-hatchback-fitted-tyres");
        TyreModel model = new TyreModel(car.front().tyre());
        TyreCurves.FrictionLine line = TyreCurves.frictionAgainstLoad(model, 9000);
        assertThat(line.fromPoints()).isTrue();
        List<LoadPoint> points = car.front().tyre().frictionByLoad().points();
        double[] within = line.withinData().y();
        // the interpolation passes through its end points (model.md 8.1), and the continuation starts there: no
        // jump; 1e-12 is rounding
        assertThat(within[0]).isCloseTo(points.get(0).value(), within(1e-12));
        assertThat(within[within.length - 1]).isCloseTo(points.get(points.size() - 1).value(), within(1e-12));
        double[] below = line.beyond().get(0).y();
        double[] past = line.beyond().get(1).y();
        assertThat(below[below.length - 1]).isCloseTo(within[0], within(1e-12));
        assertThat(past[0]).isCloseTo(within[within.length - 1], within(1e-12));
        // the axis reaches past the load asked for, so its marker is not on the edge
        double[] pastLoads = line.beyond().get(1).x();
        assertThat(pastLoads[pastLoads.length - 1]).isGreaterThan(9000);
        // the continuation never reaches zero grip (issue 11: never zero or below)
        for (double mu : past) {
            assertThat(mu).isPositive();
        }
        assertThat(line.measured().x()).containsExactly(2000, 3500, 5000, 6500);
    }

    @Test
    void eachForceCurveRisesToItsPeakWithinTheSlipRangeAndNoHigher() throws Exception {
        Vehicle car = sample("club-hatchback");
        TyreModel model = new TyreModel(car.front().tyre());
        double[] loads = {1000, 3000, 5000};
        List<Series> curves = TyreCurves.forceAgainstSlip(model, loads, new String[]{"a", "b", "c"}, 0);
        for (int i = 0; i < loads.length; i++) {
            double highest = 0;
            for (double force : curves.get(i).y()) {
                highest = Math.max(highest, force);
            }
            // D sin(C atan(...)) never exceeds D, and reaches it at the peak slip (sin = 1): a property of the
            // Magic Formula itself. 121 samples over twice the peak slip lie within 1.7 % of the peak in slip,
            // where the curve is flat to far better than 0.5 %
            double peak = model.peakForce(loads[i]);
            assertThat(highest).isLessThanOrEqualTo(peak * (1 + 1e-12)).isGreaterThan(0.995 * peak);
            assertThat(curves.get(i).y()[0]).isEqualTo(0);
        }
    }

    @Test
    void theCamberEffectPeaksAtTheBestCamberAndItsThrustPointsWhereTheTopLeans() throws Exception {
        Vehicle car = sample("club-hatchback-fitted-tyres");
        TyreModel model = new TyreModel(car.front().tyre());
        assertThat(TyreCurves.camberEffect(new TyreModel(sample("club-hatchback").front().tyre()), 3000)).isNull();
        TyreCurves.CamberEffect effect = TyreCurves.camberEffect(model, 3000);
        // the file's best camber, -1.4797 deg
        assertThat(effect.best() / RADIANS_PER_DEGREE).isCloseTo(-1.4797, within(1e-9));
        double[] cambers = effect.friction().x();
        double[] friction = effect.friction().y();
        int highest = 0;
        for (int i = 1; i < friction.length; i++) {
            highest = friction[i] > friction[highest] ? i : highest;
        }
        double step = cambers[1] - cambers[0];
        assertThat(cambers[highest]).isCloseTo(effect.best(), within(step));
        // SAE J670 (model.md 8.2): the thrust acts towards the side the top of the wheel leans to; for the outside
        // wheel a negative camber leans it towards the turn's centre, the positive side. Zero camber: no thrust
        double[] thrust = effect.thrust().y();
        assertThat(thrust[0]).isPositive();
        assertThat(cambers[0]).isNegative();
        assertThat(thrust[thrust.length - 1]).isNegative();
        assertThat(model.camberThrust(3000, 0)).isZero();
    }
}
