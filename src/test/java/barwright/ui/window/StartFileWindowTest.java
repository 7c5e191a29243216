package barwright.ui.window;

import barwright.ui.Display;
import barwright.ui.action.RecentFiles;
import barwright.ui.action.Settings;
import barwright.ui.app.DesktopApp;
import barwright.ui.app.MainWindow;
import barwright.ui.app.Themes;
import org.assertj.swing.edt.GuiActionRunner;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import javax.swing.UIManager;
import java.awt.Color;
import java.nio.file.Files;
import java.nio.file.Path;

import static org.assertj.core.api.Assertions.assertThat;

/** The window opens the file named on the command line, else the last file that still exists, else the sample. */
class StartFileWindowTest {
    @TempDir
    Path directory;

    private Path copyOfSample(String name) throws Exception {
        return Files.copy(Path.of("sample-vehicles/road-saloon.json"), directory.resolve(name));
    }

    private static String openAndReadTitle(Settings settings, Path file) {
        Display.require();
        return GuiActionRunner.execute(() -> {
            MainWindow window = DesktopApp.open(settings, () -> { }, file);
            try {
                return window.getTitle();
            } finally {
                window.dispose();
            }
        });
    }

    @Test
    void theFileNamedOnTheCommandLineIsOpened() throws Exception {
        Path car = copyOfSample("weekend-car.json");
        assertThat(openAndReadTitle(Settings.inMemory(), car)).startsWith("weekend-car.json");
    }

    @Test
    void withNoFileTheLastFileThatStillExistsIsOpened() throws Exception {
        Settings settings = Settings.inMemory();
        RecentFiles recent = new RecentFiles(settings);
        recent.add(copyOfSample("older.json"));
        recent.add(directory.resolve("deleted-since.json")); // newest, but gone: skipped
        assertThat(openAndReadTitle(settings, null)).startsWith("older.json");
    }

    /** Units, theme and text size chosen in one run are there in the next (the same settings store). */
    @Test
    void theUnitsThemeAndTextSizeChosenLastTimeAreUsed() {
        Display.require();
        Settings settings = Settings.inMemory();
        settings.put("units", "us");
        settings.put("theme", "dark");
        settings.put("textSize", "18");
        String seen = GuiActionRunner.execute(() -> {
            MainWindow window = DesktopApp.open(settings, () -> { }, null);
            try {
                Color background = UIManager.getColor("Panel.background");
                boolean dark = background.getRed() + background.getGreen() + background.getBlue() < 3 * 128;
                return window.view().units() + " " + UIManager.getFont("defaultFont").getSize() + " " + dark;
            } finally {
                window.dispose();
                Themes.apply(Themes.Theme.LIGHT, 0);
            }
        });
        assertThat(seen).isEqualTo("US 18 true");
    }

    @Test
    void withNothingRememberedTheSampleIsOpened() {
        assertThat(openAndReadTitle(Settings.inMemory(), null)).startsWith("Untitled (");
    }
}
