package barwright.cli;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;

/** Each command's long help, kept as text beside the classes in {@code barwright/cli/help/NAME.txt}. */
final class CommandHelp {
    private CommandHelp() {
    }

    static String text(Command command) {
        String resource = "/barwright/cli/help/" + command.name() + ".txt";
        try (InputStream in = CommandHelp.class.getResourceAsStream(resource)) {
            if (in == null) {
                // every command ships one (CommandHelpTest); say so rather than print nothing
                return command.summary() + "\n";
            }
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        } catch (IOException unreadable) {
            throw new UncheckedIOException(unreadable);
        }
    }
}
