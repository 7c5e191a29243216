package barwright.bench;

import barwright.ui.action.Settings;
import barwright.ui.app.DesktopApp;

import javax.swing.SwingUtilities;
import java.lang.management.ManagementFactory;
import java.util.Locale;

/**
 * Benchmark harness (not a test): from the start of the JVM to the first painted window, and to the first
 * paint with the sample's results on it. Run it in a fresh JVM each time, under a display:
 * {@code xvfb-run -a -s "-screen 0 1280x1024x24" bash -c 'for i in 1 2 3 4 5; do java -cp
 * target/barwright.jar:target/test-classes barwright.bench.GuiColdStart; done'}
 */
public final class GuiColdStart {
    private GuiColdStart() {
    }

    public static void main(String[] args) {
        long jvmStart = ManagementFactory.getRuntimeMXBean().getStartTime();
        SwingUtilities.invokeLater(() -> {
            var window = DesktopApp.open(Settings.inMemory(), () -> { });
            window.whenFirstPainted(() -> {
                long painted = System.currentTimeMillis();
                System.out.printf(Locale.ROOT, "JVM start -> first painted window: %d ms%n", painted - jvmStart);
                Runnable[] waiting = new Runnable[1];
                waiting[0] = () -> {
                    if (window.results().shown() != null) {
                        window.getRootPane().paintImmediately(window.getRootPane().getBounds());
                        System.out.printf(Locale.ROOT, "JVM start -> window painted with results: %d ms%n",
                                System.currentTimeMillis() - jvmStart);
                        System.exit(0);
                    }
                };
                if (window.results().shown() != null) {
                    waiting[0].run();
                } else {
                    window.results().addListener(waiting[0]);
                }
            });
        });
    }
}
