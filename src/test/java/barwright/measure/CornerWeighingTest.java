package barwright.measure;

import barwright.model.AxlePosition;
import barwright.model.Vehicle;
import barwright.physics.TestCars;
import barwright.sizing.preload.CornerLoads;
import barwright.sizing.preload.GainingDiagonal;
import barwright.sizing.preload.LinkPreload;
import barwright.units.Constants;
import org.junit.jupiter.api.Test;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

/** Corner weights by hand and the link change against the link preload model (docs/validation.md, "Workshop measurements"). */
class CornerWeighingTest {
    @Test
    void sharesAndCrossWeightByHand() throws MeasurementException {
        // 250 + 230 + 210 + 240 = 930 kg; front 480/930, left 460/930, cross (250 + 240)/930 (worked by hand)
        CornerWeights weights = CornerWeighing.of(250, 230, 210, 240);
        assertThat(weights.frontShare()).isCloseTo(0.516129, within(1e-6));
        assertThat(weights.leftShare()).isCloseTo(0.494624, within(1e-6));
        assertThat(weights.crossWeight()).isCloseTo(0.526882, within(1e-6));
    }

    @Test
    void theLinkChangeBringsTheCrossWeightToTheTargetInThePreloadModel() throws MeasurementException {
        Vehicle car = TestCars.clubCar();
        double mass = car.mass();
        double lf = 0.27 * mass;
        double rf = 0.24 * mass;
        double lr = 0.23 * mass;
        double rr = 0.26 * mass;
        for (GainingDiagonal diagonal : GainingDiagonal.values()) {
            CornerWeights weights = CornerWeighing.of(lf, rf, lr, rr, car, 0.50, AxlePosition.FRONT, diagonal);
            assertThat(weights.linkChange()).isNotNull();
            // apply that change through the preload model itself and read the cross weight off the new loads
            CornerLoads change = LinkPreload.of(car, AxlePosition.FRONT, diagonal, weights.linkChange())
                    .changePerLength().times(weights.linkChange());
            double g = Constants.STANDARD_GRAVITY;
            CornerLoads after = new CornerLoads(lf * g, rf * g, lr * g, rr * g).plus(change);
            assertThat(after.crossWeight()).as(diagonal.name()).isCloseTo(0.50, within(1e-9));
        }
        // the sign follows the diagonal: to unload left front and right rear, lengthen the link that loads the other
        double one = CornerWeighing.of(lf, rf, lr, rr, car, 0.50, AxlePosition.FRONT,
                GainingDiagonal.LEFT_FRONT_RIGHT_REAR).linkChange();
        double other = CornerWeighing.of(lf, rf, lr, rr, car, 0.50, AxlePosition.FRONT,
                GainingDiagonal.RIGHT_FRONT_LEFT_REAR).linkChange();
        assertThat(one).isNegative();
        assertThat(other).isCloseTo(-one, within(1e-12));
    }

    @Test
    void readingsThatDoNotAddUpToTheCarAreWarnedOrRefused() throws MeasurementException {
        Vehicle car = TestCars.clubCar();
        double quarter = car.mass() / 4;
        CornerWeights heavier = CornerWeighing.of(quarter * 1.03, quarter * 1.03, quarter * 1.03, quarter * 1.03, car,
                null, AxlePosition.FRONT, GainingDiagonal.LEFT_FRONT_RIGHT_REAR);
        assertThat(heavier.warnings()).anyMatch(w -> w.contains("+3.0 %"));
        double pounds = quarter / 0.45359237; // the scales read in lb
        assertThatThrownBy(() -> CornerWeighing.of(pounds, pounds, pounds, pounds, car, null, AxlePosition.FRONT,
                GainingDiagonal.LEFT_FRONT_RIGHT_REAR)).isInstanceOf(MeasurementException.class)
                .hasMessageContaining("do the scales read in kg");
    }

    @Test
    void aScaleReadingOfNothingIsRefusedByName() {
        assertThatThrownBy(() -> CornerWeighing.of(250, 0, 210, 240)).isInstanceOf(MeasurementException.class)
                .hasMessageContaining("right front scale 0 kg");
    }
}
