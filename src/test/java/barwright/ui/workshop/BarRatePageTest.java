package barwright.ui.workshop;

import barwright.physics.BarAnalysis;
import barwright.ui.Display;
import barwright.ui.NamedComponents;
import barwright.ui.document.OpenDocument;
import barwright.ui.document.Samples;
import barwright.ui.field.ViewSettings;
import barwright.units.UnitSystem;
import org.assertj.swing.edt.GuiActionRunner;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import javax.swing.JButton;
import javax.swing.JFrame;
import javax.swing.text.JTextComponent;
import java.util.Locale;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * The workshop page on the club hatchback sample (invented): readings pasted as from a spreadsheet are
 * fitted off the event thread, the model's rate is the core's, and "Use this in the car" is one undoable edit.
 */
@Tag("window")
class BarRatePageTest {
    /** Invented readings: 30 N/mm past 1 mm of free play, tab-separated as a spreadsheet copies them. */
    private static final String PASTED = "0\t0\n0\t0.5\n60\t3\n120\t5\n180\t7\n240\t9\n300\t11\n";

    @Test
    void pastedReadingsAreFittedComparedAndPutIntoTheCarAsOneUndoableEdit() throws Exception {
        Display.require();
        OpenDocument document = GuiActionRunner.execute(() -> Samples.open(Samples.CLUB_HATCHBACK));
        BarRatePage page = GuiActionRunner.execute(() -> {
            BarRatePage created = new BarRatePage(document, new ViewSettings(UnitSystem.SI, Locale.ROOT));
            JFrame frame = new JFrame("workshop");
            frame.add(created);
            frame.setSize(1024, 700);
            return created;
        });
        GuiActionRunner.execute(() -> page.paste(PASTED));
        JTextComponent summary = (JTextComponent) NamedComponents.find(page, "workshop.summary");
        JButton use = (JButton) NamedComponents.find(page, "workshop.use");
        long deadline = System.currentTimeMillis() + 20_000;
        while (!GuiActionRunner.execute(use::isEnabled) && System.currentTimeMillis() < deadline) {
            Thread.sleep(50);
        }
        String text = GuiActionRunner.execute(() -> summary.getText());
        // 60 N per 2 mm past the free play: 30 N/mm, crossing zero load at 1 mm (the readings' own numbers)
        assertThat(text).contains("Rate 30.0 N/mm").contains("free play 1.00 mm");
        double model = BarAnalysis.model(document.lastValid().vehicle().front().bar(), 0).linkRate();
        assertThat(text).contains(String.format(Locale.ROOT, "measured / model %.3f", 30e3 / model));

        GuiActionRunner.execute(page::useInCar);
        assertThat(document.tree().path("front").path("bar").path("rateCalibration").path("effectiveRateFactor")
                .asDouble()).isEqualTo(Math.round(30e3 / model * 1e4) / 1e4);
        assertThat(document.lastValid().vehicle().front().bar().effectiveRateFactor()).isNotEqualTo(1.0);
        GuiActionRunner.execute(document::undo);
        assertThat(document.tree().path("front").path("bar").has("rateCalibration")).isFalse();
    }

}
