package barwright.ui.panel;

import barwright.io.VehicleFileException;
import barwright.loading.VehicleLoader;
import barwright.ui.app.Themes;
import barwright.ui.fatigue.BarLifeView;
import barwright.ui.window.WindowFixture;
import org.assertj.swing.edt.GuiActionRunner;
import org.assertj.swing.timing.Condition;
import org.assertj.swing.timing.Pause;
import org.assertj.swing.timing.Timeout;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import javax.swing.AbstractButton;
import javax.swing.JComboBox;
import javax.swing.JLabel;
import javax.swing.JScrollPane;
import javax.swing.JTextArea;
import javax.swing.SwingUtilities;
import java.awt.Component;
import java.awt.Container;
import java.awt.FontMetrics;
import java.io.IOException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Stream;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * Every page of the vehicle editor, for every car in sample-vehicles/, on a projector (1024x768, the largest text
 * size, the editor at most 40 % of the window) and at full size (1280x880, the system text): the page fits the
 * editor's width (no sideways scroll), and nothing on it is cut: a number field, choice, button or label is at
 * least as wide as its text, a label beside its field is on one line, and a wrapping text is at least as wide as
 * its longest word with a digit (no figure split across lines) and as tall as its lines at the width it has (no
 * line cut off).
 */
@Tag("window")
class EditorPagesWidthTest {
    private static final Path SAMPLES = Path.of("sample-vehicles");
    private WindowFixture fixture;

    @AfterEach
    void close() {
        if (fixture != null) {
            fixture.close();
        }
    }

    @Test
    void atTheLargestTextOnA1024By768ScreenEveryEditorPageFitsItsWidthAndNothingIsCut() throws Exception {
        fixture = new WindowFixture(1024, 768, Themes.largestTextSize());
        // guards the test itself: the editor is the narrow column of a small screen (the window's 40 % at most)
        int editorWidth = GuiActionRunner.execute(() -> fixture.window.editor().getWidth());
        assertThat(editorWidth).isBetween(300, (int) Math.round(1024 * 0.4));
        assertThat(faultsOnEveryPage()).isEmpty();
    }

    @Test
    void atFullSizeEveryEditorPageStillFitsItsWidthAndNothingIsCut() throws Exception {
        fixture = new WindowFixture(1280, 880, 0);
        assertThat(faultsOnEveryPage()).isEmpty();
    }

    /** @return each fault found on each page of each sample car, as "car, page: what" */
    private List<String> faultsOnEveryPage() throws IOException, VehicleFileException {
        List<Path> cars;
        try (Stream<Path> files = Files.list(SAMPLES)) {
            cars = files.filter(file -> file.toString().endsWith(".json")).sorted().toList();
        }
        // guards the test itself: the shipped samples, shaped bars among them
        assertThat(cars).hasSizeGreaterThanOrEqualTo(3);
        List<String> faults = new ArrayList<>();
        for (Path car : cars) {
            var document = VehicleLoader.read(car);
            GuiActionRunner.execute(() -> {
                fixture.window.document().replace(document, null, "sample");
                return null;
            });
            fixture.settle();
            int pages = GuiActionRunner.execute(() -> fixture.window.editor().getTabCount());
            assertThat(pages).isEqualTo(5);
            for (int page = 0; page < pages; page++) {
                int index = page;
                GuiActionRunner.execute(() -> {
                    fixture.window.editor().setSelectedIndex(index);
                    return null;
                });
                waitForTheFatigueLives();
                String where = car.getFileName() + ", " + GuiActionRunner.execute(() ->
                        fixture.window.editor().getTitleAt(index));
                faults.addAll(GuiActionRunner.execute(() -> faultsOnShownPage(where)));
            }
        }
        return faults;
    }

    /** Waits until the bar pages' fatigue lives are worked out and the pages laid out again with their texts. */
    private void waitForTheFatigueLives() {
        Pause.pause(new Condition("the fatigue lives to be shown") {
            @Override
            public boolean test() {
                return GuiActionRunner.execute(() -> {
                    for (Component life : all(fixture.window.editor())) {
                        if (life instanceof BarLifeView view && view.isShowing()
                                && view.summaryText().startsWith("Working out")) {
                            return false;
                        }
                    }
                    return true;
                });
            }
        }, Timeout.timeout(20_000));
        // the pages ask for their new heights after the pass that wrapped their texts (Form): let those passes run
        for (int pass = 0; pass < 3; pass++) {
            fixture.robot.waitForIdle();
            GuiActionRunner.execute(() -> {
                fixture.window.validate();
                return null;
            });
        }
    }

    private List<String> faultsOnShownPage(String where) {
        List<String> faults = new ArrayList<>();
        JScrollPane scroll = (JScrollPane) fixture.window.editor().getSelectedComponent();
        Component view = scroll.getViewport().getView();
        // guards the test itself: the page is laid out in a real column
        assertThat(scroll.getViewport().getWidth()).as(where).isGreaterThan(200);
        if (scroll.getHorizontalScrollBar().isVisible() || view.getWidth() > scroll.getViewport().getWidth()) {
            faults.add(where + ": scrolls sideways, page " + view.getWidth() + " px in a view of "
                    + scroll.getViewport().getWidth() + " px");
        }
        int checked = 0;
        for (Component part : all((Container) view)) {
            if (!part.isShowing() || part.getWidth() == 0 && part.getHeight() == 0) {
                continue;
            }
            String fault = cut(part);
            if (fault != null) {
                faults.add(where + ": " + part.getClass().getSimpleName() + " " + name(part) + " " + fault);
            }
            checked++;
        }
        // guards the test itself: even the page of an axle with no bar has its box, its label and its words
        assertThat(checked).as(where).isGreaterThanOrEqualTo(3);
        return faults;
    }

    /** @return how the part is cut, or null when it is whole */
    private static String cut(Component part) {
        if (part instanceof FormText label && !label.wraps()) {
            // beside its field a label keeps one line (the form puts it above the field rather than wrap it)
            int line = label.getFontMetrics(label.getFont()).getHeight() + label.getInsets().top
                    + label.getInsets().bottom;
            return label.getHeight() > line || label.getWidth() < label.lineWidth()
                    ? "beside its field but not on one line: " + label.getWidth() + " x " + label.getHeight() + " px"
                    : null;
        }
        if (part instanceof JTextArea text && text.getLineWrap()) {
            int word = longestWordWithFigures(text);
            if (text.getWidth() < word) {
                return "may break a figure: " + text.getWidth() + " px for a word of " + word + " px with digits";
            }
            int lines = text.getPreferredSize().height;
            return text.getHeight() < lines ? "cuts its lines: " + text.getHeight() + " px high of " + lines : null;
        }
        boolean sized = part instanceof NumberField || part instanceof JComboBox || part instanceof AbstractButton
                || part instanceof JLabel;
        if (!sized) {
            return null;
        }
        int needed = part.getPreferredSize().width;
        if (part instanceof JLabel label) {
            if (label.getText() == null || label.getText().isEmpty()) {
                return null;
            }
            // a label's need is its text's own width: the form pads unit labels to line them up
            needed = label.getFontMetrics(label.getFont()).stringWidth(label.getText()) + label.getInsets().left
                    + label.getInsets().right;
        }
        return part.getWidth() < needed ? "shown " + part.getWidth() + " px of " + needed : null;
    }

    /**
     * @return the widest word of the text that holds a digit, borders included (pixels): a text narrower than that
     * word breaks it where the line runs out, which may split a figure ("1234" over "12" and "34"); a long word
     * with no figure, such as a file key in a message, may break at a large text in a narrow column
     */
    private static int longestWordWithFigures(JTextArea text) {
        FontMetrics metrics = text.getFontMetrics(text.getFont());
        int widest = 0;
        for (String word : text.getText().split("\\s+")) {
            if (word.chars().anyMatch(Character::isDigit)) {
                widest = Math.max(widest, metrics.stringWidth(word));
            }
        }
        return widest + text.getInsets().left + text.getInsets().right;
    }

    private static String name(Component part) {
        if (part.getName() != null) {
            return part.getName();
        }
        String text = part instanceof JTextArea area ? area.getText() : part instanceof JLabel label ? label.getText()
                : part instanceof AbstractButton button ? button.getText() : "";
        return "\"" + (text.length() > 40 ? text.substring(0, 40) + "..." : text) + "\"";
    }

    private static List<Component> all(Container root) {
        List<Component> found = new ArrayList<>();
        for (Component child : root.getComponents()) {
            found.add(child);
            if (child instanceof Container container && !(child instanceof JComboBox)) {
                found.addAll(all(container));
            }
        }
        return found;
    }
}
