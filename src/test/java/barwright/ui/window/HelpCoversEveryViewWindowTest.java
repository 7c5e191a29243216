package barwright.ui.window;

import org.assertj.swing.edt.GuiActionRunner;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import javax.swing.JMenu;
import javax.swing.JMenuItem;
import javax.swing.JTextArea;
import java.awt.event.KeyEvent;
import java.util.ArrayList;
import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;

/** Help (F1) names every tab of the results and every command of the Tools menu, the sizing window's included. */
@Tag("window")
class HelpCoversEveryViewWindowTest {
    @Test
    void helpNamesEveryTabAndEveryTool() {
        try (WindowFixture fixture = new WindowFixture()) {
            check(fixture);
        }
    }

    private static void check(WindowFixture fixture) {
        List<String> views = GuiActionRunner.execute(() -> {
            List<String> names = new ArrayList<>();
            var tabs = fixture.window.tabs();
            for (int i = 0; i < tabs.getTabCount(); i++) {
                names.add(tabs.getTitleAt(i));
            }
            var bar = fixture.window.getJMenuBar();
            for (int m = 0; m < bar.getMenuCount(); m++) {
                JMenu menu = bar.getMenu(m);
                if ("Tools".equals(menu.getText())) {
                    for (int i = 0; i < menu.getItemCount(); i++) {
                        JMenuItem item = menu.getItem(i);
                        if (item != null) {
                            names.add(item.getText().replace("…", ""));
                        }
                    }
                }
            }
            return names;
        });
        // guards the test itself: six result tabs, the contributed pages and the sizing tools
        assertThat(views).contains("Car from behind", "Bar sweep").hasSizeGreaterThan(10);
        fixture.frame.pressAndReleaseKeys(KeyEvent.VK_F1);
        String help = fixture.robot.finder().findByName("help.text", JTextArea.class, false).getText();
        List<String> missing = views.stream().filter(view -> !help.contains(view)).toList();
        assertThat(missing).as("views Help does not name").isEmpty();
        assertThat(help).contains("sizing window");
    }
}
