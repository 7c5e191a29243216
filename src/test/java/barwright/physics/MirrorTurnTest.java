package barwright.physics;

import barwright.model.TurnDirection;
import barwright.model.Vehicle;
import org.junit.jupiter.api.Test;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * A car that is the same on both sides turns right exactly as it turns left (mirror symmetry), so the analysis
 * reuses the left turn's limits and curve; a car weighed heavier on one side does not.
 */
class MirrorTurnTest {
    @Test
    void symmetricCarsRightTurnIsItsLeftTurnNumberForNumber() {
        Vehicle car = TestCars.clubCar();
        AnalysisResult result = VehicleAnalysis.analyse(car);
        TurnResult right = result.rightTurn();
        assertThat(right.cornering().turn()).isEqualTo(TurnDirection.RIGHT);
        // computed afresh for the right turn, the figures are the same, bit for bit
        TurnResult computed = TurnAnalysis.analyse(right.cornering(), result.masses().mass(),
                result.masses().frontMassFraction(), new AxleGrip(new TyreModel(car.front().tyre())),
                new AxleGrip(new TyreModel(car.rear().tyre())), VehicleAnalysis.HANDLING_CURVE_POINTS);
        assertThat(right.frontLimit()).isEqualTo(computed.frontLimit());
        assertThat(right.rearLimit()).isEqualTo(computed.rearLimit());
        assertThat(right.frontInsideLift()).isEqualTo(computed.frontInsideLift());
        assertThat(right.rollover()).isEqualTo(computed.rollover());
        assertThat(right.balance()).isEqualTo(computed.balance());
        assertThat(right.handlingCurve()).isEqualTo(computed.handlingCurve());
        assertThat(right.handlingCurve()).isEqualTo(result.leftTurn().handlingCurve());
    }

    @Test
    void asymmetricCarsTurnsDiffer() {
        AnalysisResult result = VehicleAnalysis.analyse(TestCars.asymmetricClubCar());
        assertThat(result.rightTurn().frontLimit()).isNotEqualTo(result.leftTurn().frontLimit());
        assertThat(result.rightTurn().handlingCurve()).isNotEqualTo(result.leftTurn().handlingCurve());
    }
}
