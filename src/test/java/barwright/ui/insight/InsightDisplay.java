package barwright.ui.insight;

import org.junit.jupiter.api.Assumptions;

import java.awt.GraphicsEnvironment;

import static org.junit.jupiter.api.Assertions.fail;

/**
 * The insight window tests need a display, as the main window's do: with -Dgui.required=true (CI) a missing one
 * fails the test, elsewhere the test is skipped saying why.
 */
final class InsightDisplay {
    private InsightDisplay() {
    }

    static void require() {
        boolean headless = GraphicsEnvironment.isHeadless();
        String display = System.getenv("DISPLAY");
        boolean unix = !System.getProperty("os.name", "").toLowerCase(java.util.Locale.ROOT).contains("win")
                && !System.getProperty("os.name", "").toLowerCase(java.util.Locale.ROOT).contains("mac");
        String problem = headless ? "the JVM is headless"
                : unix && (display == null || display.isBlank()) ? "DISPLAY is not set" : unusable();
        if (problem == null) {
            return;
        }
        if (Boolean.getBoolean("gui.required")) {
            fail("gui.required is true but " + problem + ": run under xvfb-run -a -s \"-screen 0 1280x1024x24\"");
        }
        Assumptions.abort(problem + " (set -Dgui.required=true to make this a failure)");
    }

    /** @return why the display named cannot be reached, or null where it can */
    private static String unusable() {
        try {
            GraphicsEnvironment.getLocalGraphicsEnvironment().getDefaultScreenDevice();
            return null;
        } catch (Throwable unreachable) {
            return "the display cannot be used (" + unreachable + ")";
        }
    }
}
