package barwright;

import barwright.cli.Cli;
import barwright.ui.app.DesktopApp;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.Locale;

/**
 * Starts Barwright: with no arguments the desktop program, with a command the command line. The command line
 * never opens a window and runs headless, so it works on machines with no display.
 */
public final class Main {
    private Main() {
    }

    public static void main(String[] args) {
        if (args.length == 0 || opensFile(args)) {
            int status = openWindow(args.length == 0 ? null : Path.of(args[0]));
            if (status != 0) {
                System.exit(status);
            }
            return;
        }
        // a command never opens a window: drawing a chart to a PNG (tyre-fit --plot) then needs no display
        System.setProperty("java.awt.headless", "true");
        System.exit(Cli.run(args, System.out, System.err));
    }

    /**
     * {@code java -jar barwright.jar car.json}: one argument that names no command but a vehicle file (by its
     * ending, or because it is a file) opens that car in the window.
     */
    static boolean opensFile(String[] args) {
        if (args.length != 1 || args[0].startsWith("-") || Cli.commands().stream().anyMatch(c -> c.name().equals(args[0]))
                || args[0].equals("help")) {
            return false;
        }
        return args[0].toLowerCase(Locale.ROOT).endsWith(".json") || Files.isRegularFile(Path.of(args[0]));
    }

    /** Kept apart so that the window's classes (and AWT) load only when no command is given. */
    private static int openWindow(Path file) {
        return DesktopApp.launch(file);
    }
}
