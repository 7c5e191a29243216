package barwright.bench;

import barwright.ui.action.Settings;
import barwright.ui.app.DesktopApp;
import barwright.ui.app.MainWindow;
import barwright.ui.document.Samples;
import barwright.ui.dynamics.DynamicsViews;
import barwright.ui.dynamics.TurnInView;
import barwright.units.Conversions;

import javax.swing.JComponent;
import javax.swing.SwingUtilities;
import java.util.Locale;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicLong;

/**
 * Benchmark harness (not a test): the turn-in view's time from a step of its target a_y (as one notch of the
 * slider or the spinner) to the new run drawn, the whole window painted synchronously (paintImmediately). The
 * clock covers the run (3 s of a step through the roll model, off the event thread), the hand-over, the chart,
 * the figures and the car picture. Then a drag: a step every 16 ms for 2 s (superseded runs are dropped), and
 * the time from the drag's last step to its run on screen. Also the event thread's own share: the run on screen
 * redrawn and the window painted, with no new run.
 *
 * <p>Run under a display: {@code xvfb-run -a -s "-screen 0 1280x1024x24" mvn -B -q test-compile exec:java
 * -Dexec.classpathScope=test -Dexec.mainClass=barwright.bench.TurnInDragLatency}
 */
public final class TurnInDragLatency {
    static final int WARM_UP = 20;
    static final int STEPS = 100;

    private TurnInDragLatency() {
    }

    public static void main(String[] args) throws Exception {
        MainWindow[] holder = new MainWindow[1];
        SwingUtilities.invokeAndWait(() -> {
            holder[0] = DesktopApp.open(Settings.inMemory(), () -> { });
            holder[0].setLocation(0, 0);
            holder[0].setSize(1280, 1000);
            holder[0].document().replace(Samples.load(Samples.ALL.get(Samples.ALL.size() - 1)), null, "sample");
            holder[0].tabs().setSelectedComponent(holder[0].contribution(DynamicsViews.class).turnIn());
        });
        MainWindow window = holder[0];
        TurnInView view = window.contribution(DynamicsViews.class).turnIn();
        JComponent root = window.getRootPane();
        Thread.sleep(1500);
        steps(view, root, WARM_UP);
        double[] times = steps(view, root, STEPS);
        System.out.printf(Locale.ROOT, "target step -> run drawn (%d steps)   median %7.2f ms   p95 %7.2f ms   max %7.2f ms%n",
                STEPS, GuiEditLatency.percentile(times, 50), GuiEditLatency.percentile(times, 95),
                GuiEditLatency.percentile(times, 100));
        // the event thread's own part: the run on screen redrawn (chart, figures, picture) and the window painted,
        // with no new run: what each arriving run costs the window
        double[] redraws = new double[100];
        for (int i = 0; i < redraws.length; i++) {
            long start = System.nanoTime();
            SwingUtilities.invokeAndWait(() -> {
                view.redraw();
                root.paintImmediately(0, 0, root.getWidth(), root.getHeight());
            });
            redraws[i] = (System.nanoTime() - start) / 1e6;
        }
        System.out.printf(Locale.ROOT, "run on screen -> redrawn and painted (100)  median %7.2f ms   p95 %7.2f ms%n",
                GuiEditLatency.percentile(redraws, 50), GuiEditLatency.percentile(redraws, 95));
        double[] drags = new double[10];
        for (int d = 0; d < drags.length; d++) {
            drags[d] = drag(view, root, d);
        }
        System.out.printf(Locale.ROOT, "drag end -> last run drawn (10 drags)  median %7.2f ms   p95 %7.2f ms%n",
                GuiEditLatency.percentile(drags, 50), GuiEditLatency.percentile(drags, 95));
        SwingUtilities.invokeAndWait(window::dispose);
        System.exit(0);
    }

    /** @return each step's time from the new target to its run painted (ms) */
    private static double[] steps(TurnInView view, JComponent root, int count) throws Exception {
        double[] times = new double[count];
        for (int i = 0; i < count; i++) {
            double g = 0.30 + (i * 37 % 90) / 100.0; // 0.30-1.19 g, never the one shown
            times[i] = until(view, root, g, () -> view.setTarget(g));
        }
        return times;
    }

    /** @return the time from the drag's last step to its run painted (ms) */
    private static double drag(TurnInView view, JComponent root, int seed) throws Exception {
        double last = 0;
        for (int i = 0; i < 125; i++) {
            double g = 0.30 + ((seed * 13 + i) % 90) / 100.0;
            last = g;
            SwingUtilities.invokeAndWait(() -> view.setTarget(g));
            Thread.sleep(16);
        }
        double g = last == 0.5 ? 0.51 : 0.5;
        return until(view, root, g, () -> view.setTarget(g));
    }

    private static double until(TurnInView view, JComponent root, double g, Runnable change) throws Exception {
        CountDownLatch shown = new CountDownLatch(1);
        AtomicLong end = new AtomicLong();
        long start = System.nanoTime();
        SwingUtilities.invokeAndWait(() -> {
            view.addShownListener(() -> {
                if (shown.getCount() > 0 && Math.abs(view.shownTarget() - Conversions.fromG(g)) < 1e-9) {
                    root.paintImmediately(0, 0, root.getWidth(), root.getHeight());
                    end.set(System.nanoTime());
                    shown.countDown();
                }
            });
            change.run();
        });
        if (!shown.await(60, TimeUnit.SECONDS)) {
            throw new IllegalStateException("the run at " + g + " g never reached the screen");
        }
        return (end.get() - start) / 1e6;
    }
}
