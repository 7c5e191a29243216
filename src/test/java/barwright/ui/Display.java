package barwright.ui;

import org.junit.jupiter.api.Assumptions;

import java.awt.GraphicsEnvironment;
import java.util.Locale;

import static org.junit.jupiter.api.Assertions.fail;

/**
 * Window tests need a display; tests that only use Swing's event thread or draw into images do not, and do not
 * call this (the JVM decides headless from DISPLAY, so they run in a plain {@code mvn test} anywhere). Where the
 * system property gui.required is true (CI passes it) a missing display fails a window test; elsewhere the test is
 * skipped and says why.
 */
public final class Display {
    private Display() {
    }

    public static void require() {
        String problem = missing();
        if (problem == null) {
            return;
        }
        if (Boolean.getBoolean("gui.required")) {
            fail("gui.required is true but " + problem + ": run the window tests under a display, e.g. "
                    + "xvfb-run -a -s \"-screen 0 1280x1024x24\" mvn -B verify");
        }
        Assumptions.abort(problem + " (set -Dgui.required=true to make this a failure)");
    }

    /** @return why there is no usable display, or null when there is one */
    private static String missing() {
        if (GraphicsEnvironment.isHeadless()) {
            return "the JVM is headless";
        }
        String os = System.getProperty("os.name", "").toLowerCase(Locale.ROOT);
        String display = System.getenv("DISPLAY");
        if ((os.contains("linux") || os.contains("bsd")) && (display == null || display.isBlank())) {
            return "there is no X display (DISPLAY is not set)";
        }
        try {
            GraphicsEnvironment.getLocalGraphicsEnvironment().getDefaultScreenDevice();
            return null;
        } catch (Throwable unusable) {
            return "the display cannot be used (" + unusable + ")";
        }
    }
}
