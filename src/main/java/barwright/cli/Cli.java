package barwright.cli;

import barwright.io.FileWriteException;
import barwright.io.VehicleFileException;
import barwright.physics.ImpossibleVehicleException;
import barwright.report.ProgramVersion;
import barwright.solver.RootNotFoundException;

import java.io.PrintStream;
import java.nio.file.NoSuchFileException;
import java.util.Arrays;
import java.util.List;
import java.util.Optional;

/**
 * The command line: {@code barwright COMMAND ...}. Exit codes: 0 done, 2 refused input (the message on
 * standard error names the key path), 1 internal failure.
 */
public final class Cli {
    public static final int OK = 0;
    public static final int INTERNAL_FAILURE = 1;
    public static final int REFUSED = 2;

    private static final List<Command> COMMANDS = List.of(
            new AnalyzeCommand(),
            new EnvelopeCommand(),
            new SensitivityCommand(),
            new ChassisCommand(),
            new SizeCommand(),
            new MapCommand(),
            new CompareCommand(),
            new PreloadCommand(),
            new FatigueCommand(),
            new MeasureCommand(),
            new SheetCommand(),
            new GeometryCommand(),
            new TyreFitCommand(),
            new TransientCommand());

    private Cli() {
    }

    public static List<Command> commands() {
        return COMMANDS;
    }

    public static int run(String[] args, PrintStream out, PrintStream err) {
        if (args.length == 0 || List.of("help", "--help", "-h").contains(args[0])) {
            return args.length > 1 ? help(args[1], out, err) : printUsage(out);
        }
        if (args[0].equals("--version")) {
            out.println(ProgramVersion.line());
            return OK;
        }
        Optional<Command> command = COMMANDS.stream().filter(c -> c.name().equals(args[0])).findFirst();
        if (command.isEmpty()) {
            err.println("barwright: unknown command '" + args[0] + "'");
            err.print(usage());
            return REFUSED;
        }
        return run(command.get(), Arrays.asList(args).subList(1, args.length), out, err);
    }

    /** Runs one command and turns every refusal into its message and exit code 2. */
    static int run(Command command, List<String> rest, PrintStream out, PrintStream err) {
        try {
            return command.run(rest, out, err);
        } catch (UsageException usage) {
            err.println("barwright " + command.name() + ": " + usage.getMessage());
            err.println("usage: barwright " + command.synopsis());
            return REFUSED;
        } catch (VehicleFileException refused) {
            err.println("barwright: the vehicle file was refused:");
            refused.problems().forEach(problem -> err.println("  " + problem));
            return REFUSED;
        } catch (ImpossibleVehicleException impossible) {
            err.println("barwright: this car cannot be analysed: " + impossible.getMessage());
            return REFUSED;
        } catch (RootNotFoundException unsolved) {
            err.println("barwright: this car cannot be analysed: " + unsolved.getMessage());
            return REFUSED;
        } catch (FileWriteException unwritable) {
            err.println("barwright: " + unwritable.getMessage());
            return REFUSED;
        } catch (NoSuchFileException missing) {
            err.println("barwright: file not found: " + missing.getFile());
            return REFUSED;
        } catch (Exception | Error internal) {
            err.println("barwright: internal failure: " + internal);
            return INTERNAL_FAILURE;
        }
    }

    private static int printUsage(PrintStream out) {
        out.print(usage());
        return OK;
    }

    /** {@code help COMMAND}: the command's form, what it does and each option, from its help text. */
    static int help(String name, PrintStream out, PrintStream err) {
        Optional<Command> command = COMMANDS.stream().filter(c -> c.name().equals(name)).findFirst();
        if (command.isEmpty()) {
            err.println("barwright help: there is no command '" + name + "'; the commands are "
                    + String.join(", ", COMMANDS.stream().map(Command::name).toList()));
            return REFUSED;
        }
        out.println("usage: java -jar target/barwright.jar " + command.get().synopsis());
        out.println();
        out.print(CommandHelp.text(command.get()));
        return OK;
    }

    public static String usage() {
        StringBuilder text = new StringBuilder("Barwright: anti-roll bars and lateral load transfer.\n\n")
                .append("usage: java -jar target/barwright.jar                 open the desktop program\n");
        for (Command command : COMMANDS) {
            text.append(String.format("       java -jar target/barwright.jar %s%n           %s%n",
                    command.synopsis(), command.summary()));
        }
        text.append("\n       java -jar target/barwright.jar help COMMAND       every option of one command\n")
                .append("       java -jar target/barwright.jar --version          the program's version\n")
                .append("       java -jar target/barwright.jar FILE.json          open that car in the desktop program\n");
        text.append("\nExit codes: 0 done, 2 input refused (the message names the key path), 1 internal failure.\n");
        return text.toString();
    }
}
