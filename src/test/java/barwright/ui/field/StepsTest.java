package barwright.ui.field;

import barwright.units.Quantity;
import barwright.units.UnitSystem;
import org.junit.jupiter.api.Test;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/** Arrow-key steps: positive for every quantity, and moves that land on whole steps (checked by hand). */
class StepsTest {
    @Test
    void everyQuantityHasAPositiveStepInBothSystems() {
        for (Quantity quantity : Quantity.values()) {
            for (UnitSystem system : UnitSystem.values()) {
                assertThat(Steps.of(quantity, system)).as("%s %s", quantity, system).isPositive();
            }
        }
    }

    @Test
    void aValueOnAStepMovesByWholeSteps() {
        // 22 mm + 1 step of 1 mm = 23; 0.30 in - 1 step of 0.05 in = 0.25 (arithmetic by hand)
        assertThat(Steps.move(22, 1, 1)).isEqualTo(23.0);
        assertThat(Steps.move(0.30, 0.05, -1)).isCloseTo(0.25, within(1e-12));
        assertThat(Steps.move(45, 5, 10)).isEqualTo(95.0);
    }

    @Test
    void aValueBetweenStepsGoesToTheNextWholeStepFirst() {
        // 21.7 mm up one step of 1 mm is 22, down one step is 21 (by hand)
        assertThat(Steps.move(21.7, 1, 1)).isEqualTo(22.0);
        assertThat(Steps.move(21.7, 1, -1)).isEqualTo(21.0);
    }

    @Test
    void repeatedDecimalStepsCarryNoBinaryNoise() {
        double value = 0;
        for (int i = 0; i < 7; i++) {
            value = Steps.move(value, 0.1, 1);
        }
        assertThat(value).isEqualTo(0.7);
    }
}
