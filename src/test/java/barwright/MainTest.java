package barwright;

import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.file.Files;
import java.nio.file.Path;

import static org.assertj.core.api.Assertions.assertThat;

/** Which arguments open the window on a file rather than run a command. */
class MainTest {
    @TempDir
    Path directory;

    @Test
    void aJsonFileOrAnExistingFileOpensTheWindow() throws Exception {
        assertThat(Main.opensFile(new String[] {"car.json"})).isTrue();
        assertThat(Main.opensFile(new String[] {"My Car.JSON"})).isTrue();
        Path noEnding = Files.writeString(directory.resolve("saloon"), "{}");
        assertThat(Main.opensFile(new String[] {noEnding.toString()})).isTrue();
    }

    @Test
    void commandsOptionsAndSeveralArgumentsDoNot() {
        assertThat(Main.opensFile(new String[] {"analyze"})).isFalse();
        assertThat(Main.opensFile(new String[] {"help"})).isFalse();
        assertThat(Main.opensFile(new String[] {"--version"})).isFalse();
        assertThat(Main.opensFile(new String[] {"analyze", "car.json"})).isFalse();
        assertThat(Main.opensFile(new String[] {directory.resolve("missing").toString()})).isFalse();
    }
}
