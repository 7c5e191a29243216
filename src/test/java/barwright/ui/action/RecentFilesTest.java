package barwright.ui.action;

import org.junit.jupiter.api.Test;

import java.nio.file.Path;

import static org.assertj.core.api.Assertions.assertThat;

class RecentFilesTest {
    @Test
    void newestFirstWithoutRepeatsAndAtMostEight() {
        RecentFiles recent = new RecentFiles(Settings.inMemory());
        for (int i = 0; i < 10; i++) {
            recent.add(Path.of("car" + i + ".json"));
        }
        recent.add(Path.of("car5.json"));
        assertThat(recent.list()).hasSize(RecentFiles.MAX);
        assertThat(recent.list().get(0)).isEqualTo(Path.of("car5.json").toAbsolutePath());
        assertThat(recent.list()).doesNotHaveDuplicates();
        recent.remove(Path.of("car5.json"));
        assertThat(recent.list()).doesNotContain(Path.of("car5.json").toAbsolutePath());
    }
}
