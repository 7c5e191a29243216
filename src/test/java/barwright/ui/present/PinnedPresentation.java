package barwright.ui.present;

import barwright.io.KeyPath;
import barwright.ui.app.Themes;
import barwright.ui.window.WindowFixture;
import com.fasterxml.jackson.databind.node.DoubleNode;
import org.assertj.swing.edt.GuiActionRunner;

/**
 * Presentation mode as the window tests see it: over a screen of the given size, in a theme and a text size,
 * the open car (the club hatchback sample, invented) pinned and then its front bar made 2 mm thicker, so that
 * the figures are the longer "before -> after" ones and the two pictures differ.
 */
final class PinnedPresentation {
    private PinnedPresentation() {
    }

    /** @return the frame shown and settled; close it with {@link #close} */
    static PresentationFrame open(WindowFixture fixture, int width, int height, int textSize, Themes.Theme theme) {
        PresentationFrame frame = GuiActionRunner.execute(() -> {
            Themes.apply(theme, textSize);
            PresentationFrame shown = new PresentationFrame(fixture.window.document(), fixture.window.view(),
                    fixture.window.results());
            shown.setBounds(0, 0, width, height);
            shown.setVisible(true);
            shown.togglePin();
            double diameter = fixture.window.document().tree().path("front").path("bar").path("section")
                    .path("outerDiameterMm").asDouble();
            fixture.window.document().edit(KeyPath.of("front.bar.section.outerDiameterMm"),
                    DoubleNode.valueOf(diameter + 2), null, null);
            return shown;
        });
        fixture.settle();
        fixture.robot.waitForIdle();
        return frame;
    }

    /** Closes the frame and puts the light theme back for the next test. */
    static void close(PresentationFrame frame, int textSize) {
        GuiActionRunner.execute(() -> {
            frame.close();
            Themes.apply(Themes.Theme.LIGHT, textSize);
        });
    }
}
