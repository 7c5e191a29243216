package barwright.ui.present;

import barwright.ui.app.Themes;
import barwright.ui.window.WindowFixture;
import org.assertj.swing.edt.GuiActionRunner;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.CsvSource;

import javax.swing.AbstractButton;
import javax.swing.JComboBox;
import javax.swing.JComponent;
import javax.swing.JLabel;
import javax.swing.JTabbedPane;
import javax.swing.JViewport;
import javax.swing.SwingUtilities;
import javax.swing.text.JTextComponent;
import java.awt.Component;
import java.awt.Container;
import java.awt.FontMetrics;
import java.awt.Insets;
import java.awt.Rectangle;
import java.util.ArrayList;
import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * Issue 13 in presentation mode: no figure, name or stepper is cut (a cut "46.5 …" reads as another number), on
 * a 1024x768 projector with the largest text offered, in both themes, and over a 1920x1080 screen with the
 * system's text. The club hatchback sample (invented) is pinned and its front bar made 2 mm thicker, so the
 * figures are the longer "before -> after" ones.
 */
@Tag("window")
class PresentationTextFitTest {
    @ParameterizedTest(name = "{0}x{1}, text {2} pt (0: the system's), {3}")
    @CsvSource({"1024, 768, -1, LIGHT", "1024, 768, -1, DARK", "1920, 1080, 0, LIGHT"})
    void everyTextIsShownWhole(int width, int height, int points, Themes.Theme theme) {
        int textSize = points < 0 ? Themes.largestTextSize() : points;
        try (WindowFixture fixture = new WindowFixture(width, height, textSize)) {
            PresentationFrame frame = PinnedPresentation.open(fixture, width, height, textSize, theme);
            try {
                List<String> cut = GuiActionRunner.execute(() -> {
                    frame.validate();
                    List<String> found = new ArrayList<>();
                    check(frame.getContentPane(), found);
                    return found;
                });
                List<String> lines = GuiActionRunner.execute(frame::figureLines);
                assertThat(lines).hasSize(6).allSatisfy(line -> assertThat(line).contains(" \u2192 "));
                assertThat(cut).as("texts not shown whole").isEmpty();
            } finally {
                PinnedPresentation.close(frame, textSize);
            }
        }
    }

    /** Adds a line to {@code cut} for each text under {@code root} that is elided, narrower than it needs or off its parent. */
    private static void check(Container root, List<String> cut) {
        for (Component child : root.getComponents()) {
            if (!child.isVisible()) {
                continue;
            }
            if (child instanceof JLabel label && label.getText() != null && !label.getText().isBlank()) {
                String painted = painted(label);
                if (!painted.equals(label.getText()) || label.getWidth() < label.getPreferredSize().width
                        || !wholeInView(label)) {
                    cut.add("label '" + label.getText() + "' painted as '" + painted + "', " + label.getSize()
                            + " of " + label.getPreferredSize());
                }
            } else if (child instanceof AbstractButton button && button.getText() != null
                    && !button.getText().isBlank()) {
                if (button.getWidth() < button.getPreferredSize().width || !wholeInView(button)) {
                    cut.add("button '" + button.getText() + "', " + button.getSize() + " of "
                            + button.getPreferredSize());
                }
            } else if (child instanceof JComboBox<?> box) {
                if (box.getWidth() < box.getPreferredSize().width || !wholeInView(box)) {
                    cut.add("list '" + box.getSelectedItem() + "', " + box.getSize() + " of " + box.getPreferredSize());
                }
            } else if (child instanceof JTextComponent text && !(text.getParent() instanceof JViewport)) {
                // a stepper's number: its whole width of digits inside the field's insets
                Insets insets = text.getInsets();
                int needed = text.getFontMetrics(text.getFont()).stringWidth(text.getText()) + insets.left
                        + insets.right;
                if (text.getWidth() < needed || !wholeInView(text)) {
                    cut.add("field '" + text.getText() + "', " + text.getSize() + ", needs " + needed);
                }
            } else if (child instanceof JTabbedPane tabs) {
                FontMetrics metrics = tabs.getFontMetrics(tabs.getFont());
                for (int i = 0; i < tabs.getTabCount(); i++) {
                    Rectangle tab = tabs.getBoundsAt(i);
                    if (tab == null || tab.width < metrics.stringWidth(tabs.getTitleAt(i))
                            || !new Rectangle(tabs.getSize()).contains(tab) || !wholeInView(tabs)) {
                        cut.add("tab '" + tabs.getTitleAt(i) + "', " + tab);
                    }
                }
            }
            // the caution scrolls where the window is short for it (a text area in a viewport): it is not a number
            // and the rest of it is a scroll away, so it is checked only for being on screen
            if (child instanceof JViewport viewport && !wholeInView(viewport)) {
                cut.add("caution's viewport " + viewport.getSize());
            }
            if (child instanceof Container inner) {
                check(inner, cut);
            }
        }
    }

    /** @return the text as the label's look paints it in the room it has (ends in "..." where it is cut) */
    private static String painted(JLabel label) {
        Insets insets = label.getInsets();
        Rectangle room = new Rectangle(insets.left, insets.top, label.getWidth() - insets.left - insets.right,
                label.getHeight() - insets.top - insets.bottom);
        return SwingUtilities.layoutCompoundLabel(label, label.getFontMetrics(label.getFont()), label.getText(),
                label.getIcon(), label.getVerticalAlignment(), label.getHorizontalAlignment(),
                label.getVerticalTextPosition(), label.getHorizontalTextPosition(), room, new Rectangle(),
                new Rectangle(), label.getIconTextGap());
    }

    /** @return whether none of the component is hidden by the edges of the containers it sits in */
    private static boolean wholeInView(JComponent component) {
        Rectangle visible = component.getVisibleRect();
        return component.getWidth() > 0 && visible.width == component.getWidth()
                && visible.height == component.getHeight();
    }
}
