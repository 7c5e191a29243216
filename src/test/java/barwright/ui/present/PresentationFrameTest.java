package barwright.ui.present;

import barwright.ui.NamedComponents;
import barwright.ui.window.WindowFixture;
import org.assertj.swing.edt.GuiActionRunner;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import javax.swing.JMenu;
import javax.swing.JMenuBar;
import javax.swing.JSpinner;
import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * Presentation mode on the club hatchback sample (invented): a stepper edits the open car (one undo step),
 * the pinned setup stays beside it with the figures written "before -> after", and Escape's action closes it.
 */
@Tag("window")
class PresentationFrameTest {
    @Test
    void aStepOfTheFrontBarMovesTheShareAgainstThePinnedSetup() {
        try (WindowFixture fixture = new WindowFixture()) {
            PresentationFrame frame = GuiActionRunner.execute(() -> new PresentationFrame(fixture.window.document(),
                    fixture.window.view(), fixture.window.results()));
            GuiActionRunner.execute(frame::togglePin);
            assertThat(GuiActionRunner.execute(frame::hasPinned)).isTrue();
            JSpinner diameter = (JSpinner) GuiActionRunner.execute(() ->
                    NamedComponents.find(frame.getContentPane(), "presentation.front.diameter"));
            double before = fixture.window.document().tree().path("front").path("bar").path("section")
                    .path("outerDiameterMm").asDouble();
            GuiActionRunner.execute(() -> diameter.setValue(diameter.getNextValue()));
            fixture.settle();
            // one step of 0.5 mm on the bar, written in the file's mm
            assertThat(fixture.window.document().tree().path("front").path("bar").path("section")
                    .path("outerDiameterMm").asDouble()).isEqualTo(before + 0.5);
            List<String> lines = GuiActionRunner.execute(frame::figureLines);
            String share = lines.get(0);
            assertThat(share).startsWith("Front share: ").contains(" \u2192 ");
            String[] parts = share.substring(share.indexOf(": ") + 2).replace(" %", "").split(" \u2192 ");
            // a stiffer front bar moves load transfer to the front (model.md 6: the share follows K_f)
            assertThat(Double.parseDouble(parts[1])).isGreaterThan(Double.parseDouble(parts[0]));

            GuiActionRunner.execute(() -> fixture.window.document().undo());
            fixture.settle();
            assertThat(fixture.window.document().tree().path("front").path("bar").path("section")
                    .path("outerDiameterMm").asDouble()).isEqualTo(before);
            assertThat(GuiActionRunner.execute(() -> (Double) diameter.getValue())).isEqualTo(before);

            GuiActionRunner.execute(frame::close);
            assertThat(GuiActionRunner.execute(frame::isDisplayable)).isFalse();
        }
    }

    @Test
    void theToolsMenuOffersPresentationModeOnF11() {
        try (WindowFixture fixture = new WindowFixture()) {
            String accelerator = GuiActionRunner.execute(() -> {
                JMenuBar bar = fixture.window.getJMenuBar();
                for (int m = 0; m < bar.getMenuCount(); m++) {
                    JMenu menu = bar.getMenu(m);
                    for (int i = 0; i < menu.getItemCount(); i++) {
                        if (menu.getItem(i) != null && "Presentation mode".equals(menu.getItem(i).getText())) {
                            return menu.getText() + " " + menu.getItem(i).getAccelerator();
                        }
                    }
                }
                return "none";
            });
            assertThat(accelerator).isEqualTo("Tools pressed F11");
        }
    }
}
