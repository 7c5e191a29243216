package barwright.ui.window;

import barwright.loading.VehicleLoader;
import barwright.physics.AnalysisResult;
import barwright.physics.VehicleAnalysis;
import barwright.ui.document.Samples;
import org.assertj.swing.edt.GuiActionRunner;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import javax.swing.JLabel;

import static barwright.units.Constants.RADIANS_PER_DEGREE;
import static barwright.units.Constants.STANDARD_GRAVITY;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/** The key figures say what they are: both roll gradients labelled, the static understeer gradient, tyres in series. */
@Tag("window")
class FigureMeaningWindowTest {
    private WindowFixture fixture;

    @BeforeEach
    void open() {
        fixture = new WindowFixture();
    }

    @AfterEach
    void close() {
        if (fixture != null) {
            fixture.close();
        }
    }

    private static double number(String text) {
        return Double.parseDouble(text.trim().split(" ")[0].replace(',', '.'));
    }

    private JLabel label(String text) {
        return GuiActionRunner.execute(() -> (JLabel) fixture.robot.finder().find(fixture.window.figures(),
                component -> component instanceof JLabel label && text.equals(label.getText())));
    }

    @Test
    void bothRollGradientsAreShownLabelledWithTheCoresValues() throws Exception {
        AnalysisResult expected = VehicleAnalysis.analyse(
                VehicleLoader.fromTree(Samples.load(Samples.CLUB_HATCHBACK).editableTree()).vehicle());
        double perG = STANDARD_GRAVITY / RADIANS_PER_DEGREE;
        assertThat(number(fixture.figure("figure.rollGradient"))).isCloseTo(expected.rollGradient() * perG,
                within(0.005));
        assertThat(number(fixture.figure("figure.suspensionRollGradient")))
                .isCloseTo(expected.suspensionRollGradient() * perG, within(0.005));
        // limit case: rigid tyres add no roll, so springs and bars alone roll less than with the tyres
        assertThat(expected.suspensionRollGradient()).isLessThan(expected.rollGradient());
        assertThat(label("Roll gradient, tyres included")).isNotNull();
        assertThat(label("Roll gradient, springs and bars")).isNotNull();
    }

    @Test
    void theUndersteerGradientAndTheAxleStiffnessSayWhatTheyAre() {
        assertThat(GuiActionRunner.execute(() -> label("Understeer gradient, static").getToolTipText()))
                .contains("a bar does not move it");
        assertThat(GuiActionRunner.execute(() -> label("Axle, tyres in series").getToolTipText()))
                .contains("can be below the bar alone");
    }
}
