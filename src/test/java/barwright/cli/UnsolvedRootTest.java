package barwright.cli;

import barwright.solver.RootFinder;
import org.junit.jupiter.api.Test;

import java.io.ByteArrayOutputStream;
import java.io.PrintStream;
import java.nio.charset.StandardCharsets;
import java.util.List;

import static org.assertj.core.api.Assertions.assertThat;

/** A root that cannot be found reaches the command line as a refusal (exit 2) naming it, not as an internal failure. */
class UnsolvedRootTest {
    @Test
    void anUnsolvedRootIsARefusalThatSaysWhatCouldNotBeSolved() {
        Command failing = new Command() {
            @Override
            public String name() {
                return "probe";
            }

            @Override
            public String synopsis() {
                return "probe";
            }

            @Override
            public String summary() {
                return "asks for a root that does not exist";
            }

            @Override
            public int run(List<String> args, PrintStream out, PrintStream err) {
                RootFinder.of("the probe's root", 1e-9, 50).solve(x -> x * x + 1, -1, 1);
                return Cli.OK;
            }
        };
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        int code = Cli.run(failing, List.of(), new PrintStream(new ByteArrayOutputStream(), true,
                StandardCharsets.UTF_8), new PrintStream(err, true, StandardCharsets.UTF_8));
        assertThat(code).isEqualTo(Cli.REFUSED);
        assertThat(err.toString(StandardCharsets.UTF_8))
                .contains("Could not solve for the probe's root: it does not change sign")
                .doesNotContain("internal failure");
    }
}
