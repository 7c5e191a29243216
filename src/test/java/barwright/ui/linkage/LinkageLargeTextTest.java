package barwright.ui.linkage;

import barwright.ui.app.Themes;
import barwright.ui.window.WindowFixture;
import org.assertj.swing.edt.GuiActionRunner;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

import javax.swing.AbstractButton;
import javax.swing.JComponent;
import javax.swing.JLabel;
import javax.swing.JSplitPane;
import javax.swing.JViewport;
import javax.swing.SwingUtilities;
import java.awt.Component;
import java.awt.Container;
import java.awt.Rectangle;
import java.util.ArrayList;
import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * The linkage page on a projector or a shop laptop (1024x768, the largest text size), with the editor beside the
 * results and with the editor folded away (the two widths the main window gives its results): on opening, the
 * front-view drawing is in view at a usable size, no label is cut, and every word the drawing writes, its key
 * included, lies inside the drawing (or inside the strip under it that takes the key).
 */
@Tag("window")
class LinkageLargeTextTest {
    /**
     * The least height of the drawing in view, in lines of text: the drawing's own least height
     * ({@link FrontViewDrawing#getMinimumSize()}, nine lines: the heading, the camber labels, the roll centre's
     * label and some picture). Below it the picture shrank to the grey band the 28-point screenshot showed.
     */
    private static final int LEAST_LINES_IN_VIEW = 9;
    /**
     * The least height of the drawn tyre, in lines of text: three lines, so that its pickups (circles some 0.9
     * of a line across at this size) sit apart on a wheel that reads as a wheel; before this change the tyre was
     * under one pixel high (the labels beside the wheels left the figure no width).
     */
    private static final double LEAST_TYRE_LINES = 3;

    private WindowFixture fixture;

    @AfterEach
    void close() {
        if (fixture != null) {
            fixture.close();
        }
    }

    @ParameterizedTest(name = "editor folded away: {0}")
    @ValueSource(booleans = {false, true})
    void atTheLargestTextOnA1024By768ScreenTheDrawingIsInViewAndNoWordIsCut(boolean editorFolded) throws Exception {
        fixture = new WindowFixture(1024, 768, Themes.largestTextSize());
        LinkagePage page = GuiActionRunner.execute(() ->
                (LinkagePage) fixture.robot.finder().findByName(fixture.window, "linkage.page", false));
        GuiActionRunner.execute(() -> {
            if (editorFolded) {
                ((JSplitPane) fixture.robot.finder().findByName(fixture.window, "main.split", false))
                        .setDividerLocation(0);
            }
            var tabs = fixture.window.tabs();
            Component at = page;
            while (at.getParent() != tabs) {
                at = at.getParent();
            }
            tabs.setSelectedComponent(at);
            fixture.window.validate();
        });
        fixture.settle();
        LinkageWindows.settle(fixture.window, page);

        GuiActionRunner.execute(() -> {
            FrontViewDrawing drawing = page.drawing();
            int line = drawing.getFontMetrics(drawing.getFont()).getHeight();
            // guards the test itself: the largest text is on, the club hatchback's struts are drawn
            assertThat(line).isGreaterThan(30);
            assertThat(drawing.drawnText()).anyMatch(text -> text.startsWith("Front axle"));
            assertThat(drawing.isShowing()).isTrue();

            // the drawing whole inside the page's view, and at least nine lines high
            JViewport viewport = (JViewport) SwingUtilities.getAncestorOfClass(JViewport.class, drawing);
            Rectangle inView = SwingUtilities.convertRectangle(drawing.getParent(), drawing.getBounds(), viewport);
            Rectangle view = new Rectangle(0, 0, viewport.getWidth(), viewport.getHeight());
            assertThat(view.contains(inView)).as("drawing %s inside the view %s", inView, view).isTrue();
            assertThat(inView.height).isGreaterThanOrEqualTo(LEAST_LINES_IN_VIEW * line);
            assertThat(FrontViewPainter.DRAWN_TYRE_DIAMETER * drawing.mappingScale())
                    .isGreaterThanOrEqualTo(LEAST_TYRE_LINES * line);

            // every word the drawing writes inside it: heading, situation, cambers, roll centre, the key
            Rectangle bounds = new Rectangle(0, 0, drawing.getWidth(), drawing.getHeight());
            List<String> written = drawing.drawnText();
            List<Rectangle> boxes = drawing.textBoxes();
            assertThat(boxes).hasSameSizeAs(written);
            for (int i = 0; i < boxes.size(); i++) {
                assertThat(bounds.contains(boxes.get(i))).as("\"%s\" at %s in the drawing %s", written.get(i),
                        boxes.get(i), bounds).isTrue();
            }
            assertThat(written).anyMatch(text -> text.startsWith("Roll centre"));
            // the key, in the drawing or in the strip under it, within the one that paints it
            JComponent key = drawing.keyBelow().isVisible() ? drawing.keyBelow() : drawing;
            Rectangle keyBounds = new Rectangle(0, 0, key.getWidth(), key.getHeight());
            assertThat(drawing.keyBoxes()).isNotEmpty()
                    .allSatisfy(box -> assertThat(keyBounds.contains(box)).as("key %s in %s", box, keyBounds).isTrue());

            // no label or button on the page narrower than its text
            assertThat(cutLabels(page)).isEmpty();
            return null;
        });
    }

    /** @return each showing label or button of the page given less width than its text needs */
    private static List<String> cutLabels(Container root) {
        List<String> cut = new ArrayList<>();
        for (Component child : root.getComponents()) {
            if (child.isShowing() && (child instanceof JLabel || child instanceof AbstractButton)
                    && child.getWidth() < child.getPreferredSize().width) {
                String text = child instanceof JLabel label ? label.getText() : ((AbstractButton) child).getText();
                cut.add(text + ": " + child.getWidth() + " px of " + child.getPreferredSize().width);
            }
            if (child instanceof Container container) {
                cut.addAll(cutLabels(container));
            }
        }
        return cut;
    }
}
