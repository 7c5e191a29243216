package barwright.cli;

import org.junit.jupiter.api.Test;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

import static org.assertj.core.api.Assertions.assertThat;

/** {@code help COMMAND} and {@code --version}: every command documents every option its usage line names. */
class CommandHelpTest {
    private static final Pattern OPTION = Pattern.compile("--[a-z][a-z0-9-]*");

    @Test
    void everyCommandHasHelpNamingEachOptionOfItsUsageLine() {
        for (Command command : Cli.commands()) {
            assertThat(CommandHelp.class.getResource("/barwright/cli/help/" + command.name() + ".txt"))
                    .as("help text of %s", command.name()).isNotNull();
            CommandRun help = CommandRun.of("help", command.name());
            assertThat(help.exitCode()).isZero();
            assertThat(help.out()).startsWith("usage: java -jar target/barwright.jar " + command.synopsis());
            String body = help.out().substring(help.out().indexOf('\n'));
            Matcher option = OPTION.matcher(command.synopsis());
            while (option.find()) {
                assertThat(body).as("%s's help explains %s", command.name(), option.group())
                        .contains(option.group());
            }
        }
    }

    @Test
    void helpForAnUnknownCommandIsRefusedAndListsTheCommands() {
        CommandRun help = CommandRun.of("help", "analyse-everything");
        assertThat(help.exitCode()).isEqualTo(Cli.REFUSED);
        assertThat(help.err()).contains("'analyse-everything'").contains("analyze").contains("transient");
        assertThat(help.out()).isEmpty();
    }

    @Test
    void plainHelpListsHelpVersionAndOpeningAFile() {
        CommandRun help = CommandRun.of("help");
        assertThat(help.exitCode()).isZero();
        assertThat(help.out()).contains("help COMMAND").contains("--version").contains("FILE.json");
    }

    /** The version printed is the one pom.xml gives the project (read here from the file itself). */
    @Test
    void versionIsThePomsProjectVersion() throws Exception {
        String pom = Files.readString(Path.of("pom.xml"));
        Matcher version = Pattern.compile("<artifactId>barwright</artifactId>\\s*<version>([^<]+)</version>")
                .matcher(pom);
        assertThat(version.find()).as("the project's version in pom.xml").isTrue();
        CommandRun run = CommandRun.of("--version");
        assertThat(run.exitCode()).isZero();
        assertThat(run.out().strip()).isEqualTo("Barwright " + version.group(1));
    }
}
