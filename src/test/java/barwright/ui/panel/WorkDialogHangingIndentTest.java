package barwright.ui.panel;

import barwright.loading.VehicleLoader;
import barwright.model.AxlePosition;
import barwright.physics.AnalysisResult;
import barwright.physics.VehicleAnalysis;
import barwright.report.work.Derivations;
import barwright.report.work.KeyFigure;
import barwright.report.work.KeyFigure.Kind;
import barwright.report.work.WorkText;
import barwright.ui.app.Themes;
import barwright.units.UnitSystem;
import org.assertj.swing.edt.GuiActionRunner;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import javax.swing.JDialog;
import javax.swing.JTextPane;
import javax.swing.text.BadLocationException;
import javax.swing.text.Element;
import java.awt.Rectangle;
import java.awt.geom.Rectangle2D;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * The show-the-work dialog on a projector (28 pt, a 1024x768 screen): a line too long for the dialog goes on
 * under its own meaning, not back at the left edge, so the symbol, value and meaning columns stay apart; and the
 * text copied is the working as written, without the breaks of the wrapping.
 */
@Tag("window")
class WorkDialogHangingIndentTest {
    /** Half a pixel: a row's first character is placed at a whole or fractional pixel, never further off. */
    private static final double PIXEL = 0.5;

    @Test
    void atTheLargestTextEveryWrappedLineGoesOnUnderItsMeaning() throws Exception {
        AnalysisResult result = VehicleAnalysis.analyse(VehicleLoader.read(
                Path.of("sample-vehicles", "club-hatchback.json")).vehicle());
        List<String> faults = new ArrayList<>();
        int continuations = 0;
        for (KeyFigure figure : List.of(KeyFigure.of(Kind.FRONT_LOAD_TRANSFER_SHARE),
                KeyFigure.of(Kind.ROLL_GRADIENT), KeyFigure.of(Kind.BAR_ROLL_STIFFNESS, AxlePosition.FRONT),
                KeyFigure.of(Kind.BAR_SAFETY_FACTOR, AxlePosition.REAR))) {
            String text = WorkText.of(Derivations.of(result, figure), UnitSystem.SI, Locale.ROOT);
            Object[] seen = GuiActionRunner.execute(() -> laidOut(text));
            @SuppressWarnings("unchecked")
            List<String> found = (List<String>) seen[0];
            faults.addAll(found);
            continuations += (int) seen[1];
            assertThat((String) seen[2]).as("the text copied").isEqualTo(text);
        }
        // guards the test itself: at 28 pt in 1024 px some lines of the working do wrap
        assertThat(continuations).isPositive();
        assertThat(faults).isEmpty();
    }

    /** @return the rows that start left of their line's meaning, the number of continued rows, the text copied */
    private static Object[] laidOut(String text) throws BadLocationException {
        Themes.apply(Themes.Theme.LIGHT, Themes.largestTextSize());
        JDialog dialog = null;
        try {
            JTextPane pane = WorkDialog.pane(text);
            assertThat(pane.getFont().getSize()).isEqualTo(Themes.largestTextSize());
            dialog = TextDialog.make(null, "How it is worked out", "work.dialog", pane);
            TextDialog.fitInside(dialog, new Rectangle(0, 0, 1024, 728));
            dialog.validate();
            assertThat(dialog.getWidth()).isLessThanOrEqualTo(1024);
            List<String> faults = new ArrayList<>();
            int continuations = 0;
            Element root = pane.getDocument().getDefaultRootElement();
            for (int index = 0; index < root.getElementCount(); index++) {
                Element line = root.getElement(index);
                int start = line.getStartOffset();
                int end = line.getEndOffset() - 1; // without its line break
                String words = text.substring(start, Math.min(end, text.length()));
                if (words.isBlank()) {
                    continue;
                }
                Rectangle2D first = pane.modelToView2D(start);
                // where the meaning (or the formula, the note) starts: on the line's first row, as laid out
                Rectangle2D meaning = pane.modelToView2D(start + WorkDialog.meaningColumn(words));
                assertThat(meaning.getY()).as("the meaning starts on the first row: " + words)
                        .isEqualTo(first.getY());
                double rowY = first.getY();
                for (int at = start + 1; at < end; at++) {
                    Rectangle2D place = pane.modelToView2D(at);
                    if (place.getY() > rowY) {
                        rowY = place.getY();
                        continuations++;
                        if (place.getX() < meaning.getX() - PIXEL) {
                            faults.add("\"" + words.strip() + "\" goes on at x " + place.getX() + ", its meaning at "
                                    + meaning.getX());
                        }
                    }
                }
            }
            pane.selectAll();
            return new Object[]{faults, continuations, pane.getSelectedText()};
        } finally {
            if (dialog != null) {
                dialog.dispose();
            }
            Themes.apply(Themes.Theme.LIGHT, 0);
        }
    }
}
