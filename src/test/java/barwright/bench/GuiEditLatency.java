package barwright.bench;

import barwright.ui.action.Settings;
import barwright.ui.app.DesktopApp;
import barwright.ui.app.MainWindow;
import barwright.ui.panel.NumberField;

import javax.swing.JComponent;
import javax.swing.JSlider;
import javax.swing.SwingUtilities;
import java.awt.Component;
import java.awt.Container;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.Locale;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicLong;

/**
 * Benchmark harness (not a test): the time from an edit of the front bar's diameter to every visible figure
 * and chart repainted, and the time the event thread needs per step of the lateral-acceleration slider.
 * Each edit sets the field's text on the event thread (as a paste does); the clock stops when the analysis
 * for that edit has been applied and the whole window has been painted synchronously (paintImmediately), so
 * the figure includes the background analysis, the hand-over, the chart updates and a full paint.
 *
 * <p>Run under a display: {@code xvfb-run -a -s "-screen 0 1280x1024x24" mvn -B -q test-compile exec:java
 * -Dexec.classpathScope=test -Dexec.mainClass=barwright.bench.GuiEditLatency}
 */
public final class GuiEditLatency {
    static final int WARM_UP = 60;
    static final int EDITS_PER_VIEW = 60;

    private GuiEditLatency() {
    }

    public static void main(String[] args) throws Exception {
        MainWindow[] holder = new MainWindow[1];
        SwingUtilities.invokeAndWait(() -> {
            holder[0] = DesktopApp.open(Settings.inMemory(), () -> { });
            holder[0].setLocation(0, 0);
            holder[0].setSize(1280, 880);
            holder[0].editor().setSelectedIndex(2);
        });
        MainWindow window = holder[0];
        Thread.sleep(1500);
        NumberField diameter = (NumberField) find(window, "front.bar.section.outerDiameterMm");
        JComponent root = window.getRootPane();
        String[] views = {"car from behind", "wheel loads", "body roll", "load transfer parts", "handling", "bar sweep"};

        measure(window, diameter, root, WARM_UP, 0);
        List<Double> all = new ArrayList<>();
        for (int view = 0; view < views.length; view++) {
            int tab = view;
            SwingUtilities.invokeAndWait(() -> window.tabs().setSelectedIndex(tab));
            double[] times = measure(window, diameter, root, EDITS_PER_VIEW, 1000 * (view + 1));
            Arrays.stream(times).forEach(all::add);
            System.out.printf(Locale.ROOT, "edit -> repainted, %-20s median %6.2f ms   p95 %6.2f ms   max %6.2f ms%n",
                    views[view], percentile(times, 50), percentile(times, 95), percentile(times, 100));
        }
        double[] every = all.stream().mapToDouble(Double::doubleValue).toArray();
        System.out.printf(Locale.ROOT, "edit -> repainted, all views (%d edits)  median %6.2f ms   p95 %6.2f ms%n",
                every.length, percentile(every, 50), percentile(every, 95));

        JSlider slider = (JSlider) find(window, "probe.slider");
        SwingUtilities.invokeAndWait(() -> window.tabs().setSelectedIndex(0));
        double[] steps = new double[201];
        for (int i = 0; i < steps.length; i++) {
            int value = i <= 100 ? i : 200 - i;
            long start = System.nanoTime();
            SwingUtilities.invokeAndWait(() -> {
                slider.setValue(value);
                root.paintImmediately(0, 0, root.getWidth(), root.getHeight());
            });
            steps[i] = (System.nanoTime() - start) / 1e6;
        }
        System.out.printf(Locale.ROOT, "slider step -> repainted (201 steps)    median %6.2f ms   p95 %6.2f ms   max %6.2f ms%n",
                percentile(steps, 50), percentile(steps, 95), percentile(steps, 100));
        SwingUtilities.invokeAndWait(window::dispose);
        System.exit(0);
    }

    /** @return the latency of each edit (ms) */
    private static double[] measure(MainWindow window, NumberField diameter, JComponent root, int edits, int seed)
            throws Exception {
        double[] times = new double[edits];
        for (int i = 0; i < edits; i++) {
            // diameters between 18 and 28 mm, never the one shown, so every edit changes the car
            double millimetres = 18 + ((seed + i) * 37 % 100) / 10.0;
            CountDownLatch shown = new CountDownLatch(1);
            AtomicLong end = new AtomicLong();
            Runnable[] listener = new Runnable[1];
            long start = System.nanoTime();
            SwingUtilities.invokeAndWait(() -> {
                listener[0] = () -> {
                    var outcome = window.results().shown();
                    if (shown.getCount() > 0 && outcome != null && !window.results().isStale()
                            && Math.abs(outcome.vehicle().front().bar().section().outerDiameter() * 1e3
                            - millimetres) < 1e-9) {
                        root.paintImmediately(0, 0, root.getWidth(), root.getHeight());
                        end.set(System.nanoTime());
                        shown.countDown();
                    }
                };
                window.results().addListener(listener[0]);
                diameter.setText(String.format(Locale.ROOT, "%.1f", millimetres).replace('.',
                        barwright.ui.field.NumberText.decimalSeparator(window.view().locale())));
            });
            if (!shown.await(10, TimeUnit.SECONDS)) {
                throw new IllegalStateException("the edit to " + millimetres + " mm never reached the screen");
            }
            times[i] = (end.get() - start) / 1e6;
        }
        return times;
    }

    static double percentile(double[] values, double percent) {
        double[] sorted = values.clone();
        Arrays.sort(sorted);
        int index = (int) Math.ceil(percent / 100 * sorted.length) - 1;
        return sorted[Math.max(0, Math.min(sorted.length - 1, index))];
    }

    static Component find(Container root, String name) {
        for (Component child : root.getComponents()) {
            if (name.equals(child.getName())) {
                return child;
            }
            if (child instanceof Container container) {
                Component found = find(container, name);
                if (found != null) {
                    return found;
                }
            }
        }
        return null;
    }
}
