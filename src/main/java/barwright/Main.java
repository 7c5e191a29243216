package barwright;

import barwright.cli.Cli;

/**
 * Starts Barwright: with no arguments the desktop program, with a command the command line. The command line
 * never touches AWT, so it runs on machines with no display.
 */
public final class Main {
    private Main() {
    }

    public static void main(String[] args) {
        if (args.length == 0) {
            System.out.print(Cli.usage()); // the desktop program is being built (issue 4)
            return;
        }
        System.exit(Cli.run(args, System.out, System.err));
    }
}
