package barwright.cli;

import java.io.PrintStream;
import java.util.List;

/** One command-line command, e.g. {@code analyze}. */
public interface Command {
    /** @return the word that picks this command */
    String name();

    /** @return one line for the usage text, e.g. "analyze FILE [--json] [--units si|us]" */
    String synopsis();

    /** @return what it does, in a sentence */
    String summary();

    /**
     * @param args the arguments after the command's name
     * @return the exit code: 0 done, 2 refused input (message on err), 1 internal failure
     * @throws UsageException where the arguments are not of the command's form
     */
    int run(List<String> args, PrintStream out, PrintStream err) throws Exception;
}
