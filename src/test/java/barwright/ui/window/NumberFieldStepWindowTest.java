package barwright.ui.window;

import org.assertj.swing.edt.GuiActionRunner;
import org.assertj.swing.fixture.JTextComponentFixture;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import java.awt.event.KeyEvent;

import static org.assertj.core.api.Assertions.assertThat;

/** The arrow keys step a number field by its quantity's step (1 mm for a bar diameter) and edit the car. */
@Tag("window")
class NumberFieldStepWindowTest {
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

    private double diameterInTheDocument() {
        return GuiActionRunner.execute(() ->
                fixture.window.document().tree().at("/front/bar/section/outerDiameterMm").doubleValue());
    }

    @Test
    void upAndDownStepTheFrontBarDiameterByOneMillimetreAndShiftByTen() {
        fixture.frame.tabbedPane("editor.tabs").selectTab("Front bar");
        JTextComponentFixture field = fixture.frame.textBox("front.bar.section.outerDiameterMm");
        double before = diameterInTheDocument();
        field.click();
        field.pressAndReleaseKeys(KeyEvent.VK_UP);
        fixture.settle();
        // the sample's diameter is a whole number of millimetres, so one step up is exactly one more
        assertThat(diameterInTheDocument()).isEqualTo(before + 1);
        field.pressAndReleaseKeys(KeyEvent.VK_DOWN, KeyEvent.VK_DOWN);
        fixture.settle();
        assertThat(diameterInTheDocument()).isEqualTo(before - 1);
        field.pressKey(KeyEvent.VK_SHIFT).pressAndReleaseKeys(KeyEvent.VK_UP).releaseKey(KeyEvent.VK_SHIFT);
        fixture.settle();
        assertThat(diameterInTheDocument()).isEqualTo(before + 9);
        assertThat(field.text()).isEqualTo(String.valueOf((int) (before + 9)));
    }
}
