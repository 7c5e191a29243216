package barwright.ui.window;

import barwright.ui.panel.NumberField;
import org.assertj.swing.edt.GuiActionRunner;
import org.assertj.swing.fixture.JTextComponentFixture;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import java.awt.event.KeyEvent;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * A value typed key by key is applied when it is complete (Enter, the focus leaving, or a pause), never at
 * each key: typing 2000 must not make a 200 mm bar the accepted car on the way.
 */
@Tag("window")
class TypedValueWindowTest {
    private WindowFixture fixture;

    @BeforeEach
    void open() {
        fixture = new WindowFixture();
        fixture.frame.tabbedPane("editor.tabs").selectTab("Front bar");
    }

    @AfterEach
    void close() {
        if (fixture != null) {
            fixture.close();
        }
    }

    private String torsionLengthInTheDocument() {
        return GuiActionRunner.execute(() ->
                fixture.window.document().tree().at("/front/bar/torsionLengthMm").asText());
    }

    @Test
    void keysTypedOneByOneChangeNothingUntilEnter() {
        JTextComponentFixture field = fixture.frame.textBox("front.bar.torsionLengthMm");
        String before = torsionLengthInTheDocument();
        field.selectAll();
        field.focus();
        // the three keys and the look at the document in one event-thread task, so the pause cannot end
        // between them however busy the machine is (the robot's key presses took longer than the pause
        // on a loaded two-core machine)
        String[] seen = GuiActionRunner.execute(() -> {
            javax.swing.JTextField target = (javax.swing.JTextField) field.target();
            for (char key : "199".toCharArray()) {
                target.dispatchEvent(new KeyEvent(target, KeyEvent.KEY_TYPED, System.currentTimeMillis(), 0,
                        KeyEvent.VK_UNDEFINED, key));
            }
            String inDocument = fixture.window.document().tree().at("/front/bar/torsionLengthMm").asText();
            return new String[] {target.getText(), inDocument, String.valueOf(NumberField.anyTypingPending())};
        });
        assertThat(seen[0]).as("the field shows what was typed").isEqualTo("199");
        assertThat(seen[1]).as("the document still holds the sample's value").isEqualTo(before);
        assertThat(seen[2]).isEqualTo("true");
        field.pressAndReleaseKeys(KeyEvent.VK_ENTER);
        fixture.settle();
        assertThat(torsionLengthInTheDocument()).isEqualTo("199");
        // one typing session is one undo step, as before
        GuiActionRunner.execute(() -> fixture.window.document().undo());
        assertThat(torsionLengthInTheDocument()).isEqualTo(before);
    }

    @Test
    void aPauseAppliesTheTypedValue() {
        JTextComponentFixture field = fixture.frame.textBox("front.bar.torsionLengthMm");
        field.selectAll();
        field.pressAndReleaseKeys(KeyEvent.VK_6, KeyEvent.VK_5, KeyEvent.VK_0);
        // settle waits for the pause (NumberField.TYPING_PAUSE_MS) to end and the analysis to finish
        fixture.settle();
        assertThat(torsionLengthInTheDocument()).isEqualTo("650");
    }

    @Test
    void aTypedValueOutsideItsRangeIsStillRefusedWithItsKeyAndRange() {
        JTextComponentFixture field = fixture.frame.textBox("front.bar.torsionLengthMm");
        field.selectAll();
        field.pressAndReleaseKeys(KeyEvent.VK_0, KeyEvent.VK_ENTER);
        fixture.settle();
        String problem = GuiActionRunner.execute(() -> fixture.robot.finder().findByName(fixture.window,
                "front.bar.torsionLengthMm.problem", javax.swing.text.JTextComponent.class, false).getText());
        assertThat(problem).contains("front.bar.torsionLengthMm").contains("0");
        assertThat(GuiActionRunner.execute(() -> fixture.window.results().isStale())).isTrue();
    }
}
