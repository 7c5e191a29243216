package barwright.ui.window;

import barwright.ui.app.Themes;
import org.assertj.swing.edt.GuiActionRunner;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import javax.swing.AbstractButton;
import javax.swing.JComponent;
import java.awt.Component;
import java.awt.Container;
import java.util.ArrayList;
import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * The window on a projector at 1024x768 with the largest text size offered: no key figure is cut into a
 * different number ("3151 N" shown as "51 N") and the car picture keeps a usable size.
 */
@Tag("window")
class SmallScreenWindowTest {
    private WindowFixture fixture;

    @AfterEach
    void close() {
        if (fixture != null) {
            fixture.close();
        }
    }

    @Test
    void atTheLargestTextOnA1024By768ScreenEveryFigureIsShownAtItsFullWidth() {
        fixture = new WindowFixture(1024, 768, Themes.largestTextSize());
        List<String> clipped = GuiActionRunner.execute(() -> {
            List<String> cut = new ArrayList<>();
            List<AbstractButton> figures = new ArrayList<>();
            collectFigures(fixture.window.figures(), figures);
            // guards the test itself: the figures column holds some thirty figures
            assertThat(figures).hasSizeGreaterThan(20);
            for (AbstractButton figure : figures) {
                // the shown width must hold the whole text, or the label truncates it
                if (figure.getWidth() < figure.getPreferredSize().width) {
                    cut.add(figure.getName() + " \"" + figure.getText() + "\" shown " + figure.getWidth()
                            + " px of " + figure.getPreferredSize().width);
                }
            }
            return cut;
        });
        assertThat(clipped).isEmpty();
    }

    @Test
    void onASmallScreenTheFiguresMoveBelowAndTheCarPictureKeepsItsRoom() {
        fixture = new WindowFixture(1024, 768, Themes.largestTextSize());
        boolean beside = GuiActionRunner.execute(() -> fixture.window.figuresBeside());
        JComponent picture = GuiActionRunner.execute(() ->
                (JComponent) fixture.robot.finder().findByName(fixture.window, "carBehind", false));
        int width = GuiActionRunner.execute(picture::getWidth);
        int height = GuiActionRunner.execute(picture::getHeight);
        assertThat(beside).isFalse();
        // "usable" by judgement of the screenshot: the car, its wheels and the arrows need about 400 x 200 px
        assertThat(width).isGreaterThanOrEqualTo(400);
        assertThat(height).isGreaterThanOrEqualTo(150);
    }

    @Test
    void onAWideScreenAtTheSystemTextTheFiguresStayBesideTheCharts() {
        fixture = new WindowFixture(1280, 880, 0);
        assertThat(GuiActionRunner.execute(() -> fixture.window.figuresBeside())).isTrue();
    }

    private static void collectFigures(Container root, List<AbstractButton> into) {
        for (Component child : root.getComponents()) {
            if (child instanceof AbstractButton button && button.getName() != null
                    && button.getName().startsWith("figure.")) {
                into.add(button);
            } else if (child instanceof Container container) {
                collectFigures(container, into);
            }
        }
    }
}
