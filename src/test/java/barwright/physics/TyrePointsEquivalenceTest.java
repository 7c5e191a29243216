package barwright.physics;

import barwright.model.Axle;
import barwright.model.LoadPoint;
import barwright.model.LoadTable;
import barwright.model.TurnDirection;
import barwright.model.Tyre;
import barwright.model.Vehicle;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

import java.util.ArrayList;
import java.util.List;
import java.util.Random;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * A tyre given as points sampled from the laws gives the laws' analysis (the check, to 0.1 %). The
 * friction law is a straight line, which the shape-preserving cubic reproduces exactly from collinear points;
 * the stiffness law is a smooth curve, reproduced closely from 60 points. The reference is the analysis with
 * the laws themselves: an independent path through the code for the same car.
 */
class TyrePointsEquivalenceTest {
    /** 0.1 %, the requirement. */
    private static final double SHARE = 1e-3;

    static Tyre asPoints(Tyre law) {
        TyreModel model = new TyreModel(law);
        List<LoadPoint> friction = new ArrayList<>();
        List<LoadPoint> stiffness = new ArrayList<>();
        // 60 loads from 2 % to 4 times the reference load: every load these cars reach lies inside
        for (int i = 0; i < 60; i++) {
            double load = law.nominalLoad() * (0.02 + 3.98 * i / 59);
            friction.add(new LoadPoint(load, model.friction(load)));
            stiffness.add(new LoadPoint(load, model.corneringStiffness(load)));
        }
        return law.withFrictionByLoad(new LoadTable(friction)).withCorneringStiffnessByLoad(new LoadTable(stiffness));
    }

    private static Axle withPoints(Axle axle) {
        return new Axle(axle.track(), axle.rollCentreHeight(), axle.unsprungMass(), axle.unsprungCgHeight(),
                axle.springRate(), axle.springMotionRatio(), axle.tyreVerticalRate(), asPoints(axle.tyre()), axle.bar());
    }

    @ParameterizedTest
    @ValueSource(longs = {0, 1, 2, 3, 4, 5, 6, 7})
    void pointsEqualToTheLawsGiveTheSameAnalysisToOneTenthOfAPerCent(long seed) {
        Vehicle law = seed == 0 ? TestCars.asymmetricClubCar() : TestCars.random(new Random(seed), seed % 2 == 0);
        Vehicle points = law.withFront(withPoints(law.front())).withRear(withPoints(law.rear()));
        AnalysisResult expected = VehicleAnalysis.analyse(law);
        AnalysisResult actual = VehicleAnalysis.analyse(points);
        assertThat(actual.understeerGradient()).isCloseTo(expected.understeerGradient(),
                within(SHARE * Math.abs(expected.understeerGradient()) + 1e-12));
        for (TurnDirection direction : TurnDirection.values()) {
            TurnResult a = actual.turn(direction);
            TurnResult e = expected.turn(direction);
            assertThat(a.frontLimit()).isCloseTo(e.frontLimit(), within(SHARE * e.frontLimit()));
            assertThat(a.rearLimit()).isCloseTo(e.rearLimit(), within(SHARE * e.rearLimit()));
            assertThat(a.balance()).isEqualTo(e.balance());
            int common = Math.min(a.handlingCurve().size(), e.handlingCurve().size());
            assertThat(common).isGreaterThan(VehicleAnalysis.HANDLING_CURVE_POINTS - 3);
            HandlingPoint last = a.handlingCurve().get(common - 1);
            HandlingPoint lastExpected = e.handlingCurve().get(common - 1);
            assertThat(last.frontSlipAngle()).isCloseTo(lastExpected.frontSlipAngle(),
                    within(SHARE * Math.abs(lastExpected.frontSlipAngle())));
            assertThat(last.rearSlipAngle()).isCloseTo(lastExpected.rearSlipAngle(),
                    within(SHARE * Math.abs(lastExpected.rearSlipAngle())));
        }
        assertThat(actual.warnings()).isEqualTo(expected.warnings());
    }
}
