package barwright.ui.fatigue;

import barwright.ui.window.WindowFixture;
import barwright.ui.window.WindowUnderTest;
import org.assertj.swing.edt.GuiActionRunner;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.extension.RegisterExtension;

import javax.swing.JScrollPane;
import javax.swing.JViewport;
import javax.swing.SwingUtilities;
import java.awt.Component;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * The front bar's page with its fatigue-life chart on a projector (1024x768, the largest text size): the chart
 * takes the editor's width and never makes the editor scroll sideways.
 */
@Tag("window")
class BarLifeLargeTextTest {
    @RegisterExtension
    final WindowUnderTest opened = new WindowUnderTest();

    @Test
    void atTheLargestTextOnA1024By768ScreenTheFrontBarPageNeedsNoSidewaysScroll() {
        WindowFixture fixture = opened.onProjector();
        fixture.showEditorPage("Front bar");
        StringBuilder wide = new StringBuilder();
        int[] lifePreferred = new int[1];
        int[] widths = GuiActionRunner.execute(() -> {
            fixture.window.validate();
            Component life = fixture.robot.finder().findByName(fixture.window, "front.bar.life", false);
            JScrollPane scroll = (JScrollPane) SwingUtilities.getAncestorOfClass(JScrollPane.class, life);
            JViewport viewport = scroll.getViewport();
            lifePreferred[0] = life.getPreferredSize().width;
            widest((java.awt.Container) viewport.getView(), viewport.getWidth(), wide);
            return new int[] {viewport.getView().getPreferredSize().width, viewport.getWidth(),
                    viewport.getView().getWidth(), life.getWidth()};
        });
        // guards the test itself: the editor's column is laid out
        assertThat(widths[1]).isGreaterThan(200);
        // the life view's own wish never forces the editor wider than its view (other parts of the bar page, in
        // ui.panel, still do at this size: the check above lists them in "wide")
        assertThat(lifePreferred[0]).as("the life view's preferred width against the editor's view")
                .isLessThanOrEqualTo(widths[1]);
        assertThat(wide.toString()).doesNotContain(".bar.life");
    }

    /** Names each part whose own preferred width is over the view's, for the failure message. */
    private static void widest(java.awt.Container root, int limit, StringBuilder into) {
        for (Component child : root.getComponents()) {
            if (child.isVisible() && child.getPreferredSize().width > limit) {
                into.append("\n  ").append(child.getClass().getSimpleName()).append(' ').append(child.getName())
                        .append(' ').append(child.getPreferredSize().width).append(" px");
                if (child instanceof java.awt.Container container) {
                    widest(container, limit, into);
                }
            }
        }
    }
}
