package barwright;

import barwright.cli.Cli;
import barwright.ui.app.DesktopApp;

/**
 * Starts Barwright: with no arguments the desktop program, with a command the command line. The command line
 * never opens a window and runs headless, so it works on machines with no display.
 */
public final class Main {
    private Main() {
    }

    public static void main(String[] args) {
        if (args.length == 0) {
            int status = openWindow();
            if (status != 0) {
                System.exit(status);
            }
            return;
        }
        // a command never opens a window: drawing a chart to a PNG (tyre-fit --plot) then needs no display
        System.setProperty("java.awt.headless", "true");
        System.exit(Cli.run(args, System.out, System.err));
    }

    /** Kept apart so that the window's classes (and AWT) load only when no command is given. */
    private static int openWindow() {
        return DesktopApp.launch();
    }
}
