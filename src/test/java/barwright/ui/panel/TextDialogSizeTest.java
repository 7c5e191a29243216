package barwright.ui.panel;

import org.assertj.swing.edt.GuiActionRunner;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import javax.swing.JDialog;
import javax.swing.JScrollPane;
import javax.swing.JTextArea;
import javax.swing.SwingUtilities;
import java.awt.Font;
import java.awt.Rectangle;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * The show-the-work dialog on a 1024x768 screen with the largest text (28 pt): its text asks for some 1700x1200
 * pixels, and the dialog must still lie inside the screen's usable part, the text scrolling inside it.
 */
@Tag("window")
class TextDialogSizeTest {
    @Test
    void aDialogWhoseTextIsLargerThanTheScreenFitsInsideItAndScrolls() {
        // a 1024x768 screen with a 40 px task bar at the bottom
        Rectangle usable = new Rectangle(0, 0, 1024, 728);
        Object[] seen = GuiActionRunner.execute(() -> {
            JTextArea area = new JTextArea("A line of the working, long enough to need wrapping on a small screen. "
                    .repeat(200));
            // as the show-the-work dialog sizes it (WorkDialog), at 28 pt
            area.setFont(new Font(Font.MONOSPACED, Font.PLAIN, 28));
            area.setColumns(96);
            area.setRows(34);
            JDialog dialog = TextDialog.make(null, "How it is worked out", "work.dialog", area);
            Rectangle packed = dialog.getBounds();
            TextDialog.fitInside(dialog, usable);
            dialog.setLocation(600, 500); // as if centred on an owner near the screen's corner
            TextDialog.keepInside(dialog, usable);
            JScrollPane scroll = (JScrollPane) SwingUtilities.getAncestorOfClass(JScrollPane.class, area);
            Object[] result = {packed, dialog.getBounds(), area.getPreferredSize().height,
                    scroll.getViewport().getExtentSize().height, area.getWidth(), scroll.getViewport().getWidth()};
            dialog.dispose();
            return result;
        });
        Rectangle packed = (Rectangle) seen[0];
        Rectangle fitted = (Rectangle) seen[1];
        // guards the test itself: the text alone asks for more than the screen
        assertThat(packed.width).isGreaterThan(usable.width);
        assertThat(packed.height).isGreaterThan(usable.height);
        assertThat(usable.contains(fitted)).as(fitted + " inside " + usable).isTrue();
        // the text scrolls up and down inside, and wraps to the narrower width instead of scrolling sideways
        assertThat((int) seen[2]).isGreaterThan((int) seen[3]);
        assertThat((int) seen[4]).isLessThanOrEqualTo((int) seen[5]);
    }

    @Test
    void theUsableScreenIsNoLargerThanTheScreen() {
        Rectangle[] both = GuiActionRunner.execute(() -> new Rectangle[]{TextDialog.usableBounds(null),
                java.awt.GraphicsEnvironment.getLocalGraphicsEnvironment().getDefaultScreenDevice()
                        .getDefaultConfiguration().getBounds()});
        assertThat(both[1].contains(both[0])).isTrue();
        assertThat(both[0].width).isPositive();
        assertThat(both[0].height).isPositive();
    }
}
