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
import java.io.IOException;
import java.lang.management.ManagementFactory;
import java.nio.file.Files;
import java.nio.file.Path;
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
 * <p>A shop laptop is never idle. With {@code -Dlatency.busyCores=N} the harness measures twice in one run:
 * first as the machine stands ("idle"), then with N separate OS processes each spinning one core ("loaded"),
 * and prints a summary line for both. The spinning processes are shell loops that end when they are killed at
 * the end of the run, when this JVM exits, or (checked about ten times a second) when this JVM has gone.
 *
 * <p>Run under a display: {@code xvfb-run -a -s "-screen 0 1280x1024x24" mvn -B -q test-compile exec:java
 * -Dexec.classpathScope=test -Dexec.mainClass=barwright.bench.GuiEditLatency -Dlatency.busyCores=1}
 */
public final class GuiEditLatency {
    static final int WARM_UP = 60;
    static final int EDITS_PER_VIEW = 60;
    /** Edits after the spinning processes start and before the loaded figures are taken. */
    static final int LOADED_SETTLE = 20;
    private static final String[] VIEWS = {"car from behind", "wheel loads", "body roll", "load transfer parts",
            "handling", "bar sweep"};

    private GuiEditLatency() {
    }

    /** The figures of one condition. */
    private record Condition(String name, double[] edits, double[] paints, double[] steps, double cpuPerEdit) {
    }

    public static void main(String[] args) throws Exception {
        int busyCores = Integer.getInteger("latency.busyCores", 0);
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
        measure(window, diameter, root, WARM_UP, 0, null);

        List<Condition> conditions = new ArrayList<>();
        conditions.add(run("idle", window, diameter, root));
        if (busyCores > 0) {
            List<Process> spinners = spin(busyCores);
            try {
                Thread.sleep(500);
                measure(window, diameter, root, LOADED_SETTLE, 7, null);
                conditions.add(run("loaded(" + busyCores + (busyCores == 1 ? " core)" : " cores)"), window,
                        diameter, root));
            } finally {
                spinners.forEach(Process::destroyForcibly);
            }
        }
        System.out.println();
        List<String> parts = new ArrayList<>();
        for (Condition condition : conditions) {
            parts.add(String.format(Locale.ROOT, "%s p95 = %.1f ms", condition.name(),
                    percentile(condition.edits(), 95)));
        }
        for (Condition condition : conditions) {
            System.out.printf(Locale.ROOT, "%-16s edits median %6.2f ms  p95 %6.2f ms  (paint alone median %5.2f "
                            + "ms, p95 %5.2f ms; CPU per edit %.1f ms); slider step median %5.2f ms, p95 %5.2f ms%n",
                    condition.name(), percentile(condition.edits(), 50), percentile(condition.edits(), 95),
                    percentile(condition.paints(), 50), percentile(condition.paints(), 95), condition.cpuPerEdit(),
                    percentile(condition.steps(), 50), percentile(condition.steps(), 95));
        }
        System.out.println("ALL VIEWS " + String.join("; ", parts));
        SwingUtilities.invokeAndWait(window::dispose);
        System.exit(0);
    }

    /** Measures every view and the slider under the present load of the machine, printing as it goes. */
    private static Condition run(String name, MainWindow window, NumberField diameter, JComponent root)
            throws Exception {
        System.out.printf(Locale.ROOT, "%n== %s, load average before: %s%n", name, loadAverage());
        List<Double> all = new ArrayList<>();
        List<Double> paints = new ArrayList<>();
        long cpuAtStart = processCpuNanos();
        for (int view = 0; view < VIEWS.length; view++) {
            int tab = view;
            SwingUtilities.invokeAndWait(() -> window.tabs().setSelectedIndex(tab));
            List<Double> paintTimes = new ArrayList<>();
            double[] times = measure(window, diameter, root, EDITS_PER_VIEW, 1000 * (view + 1), paintTimes);
            Arrays.stream(times).forEach(all::add);
            paints.addAll(paintTimes);
            System.out.printf(Locale.ROOT, "%s: edit -> repainted, %-20s median %6.2f ms   p95 %6.2f ms   max %6.2f ms%n",
                    name, VIEWS[view], percentile(times, 50), percentile(times, 95), percentile(times, 100));
        }
        double[] every = all.stream().mapToDouble(Double::doubleValue).toArray();
        // the work itself, which the load of the machine stretches less than the wall-clock figures: all of this
        // program's threads (event thread, analysis, compiler, collector), not the display server's
        double cpuPerEdit = (processCpuNanos() - cpuAtStart) / 1e6 / every.length;
        System.out.printf(Locale.ROOT, "%s: edit -> repainted, all views (%d edits)  median %6.2f ms   p95 %6.2f ms"
                        + "   (CPU of this program per edit %.1f ms)%n",
                name, every.length, percentile(every, 50), percentile(every, 95), cpuPerEdit);

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
        System.out.printf(Locale.ROOT, "%s: slider step -> repainted (201 steps)    median %6.2f ms   p95 %6.2f ms   max %6.2f ms%n",
                name, percentile(steps, 50), percentile(steps, 95), percentile(steps, 100));
        System.out.printf(Locale.ROOT, "%s: load average after: %s%n", name, loadAverage());
        return new Condition(name, every, paints.stream().mapToDouble(Double::doubleValue).toArray(), steps,
                cpuPerEdit);
    }

    /**
     * @param paintTimes receives the time of each edit's full paint alone (ms), or null
     * @return the latency of each edit (ms)
     */
    private static double[] measure(MainWindow window, NumberField diameter, JComponent root, int edits, int seed,
                                    List<Double> paintTimes) throws Exception {
        double[] times = new double[edits];
        for (int i = 0; i < edits; i++) {
            // diameters between 18 and 28 mm, never the one shown, so every edit changes the car
            double millimetres = 18 + ((seed + i) * 37 % 100) / 10.0;
            CountDownLatch shown = new CountDownLatch(1);
            AtomicLong painting = new AtomicLong();
            AtomicLong end = new AtomicLong();
            Runnable[] listener = new Runnable[1];
            long start = System.nanoTime();
            SwingUtilities.invokeAndWait(() -> {
                listener[0] = () -> {
                    var outcome = window.results().shown();
                    if (shown.getCount() > 0 && outcome != null && !window.results().isStale()
                            && Math.abs(outcome.vehicle().front().bar().section().outerDiameter() * 1e3
                            - millimetres) < 1e-9) {
                        painting.set(System.nanoTime());
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
            SwingUtilities.invokeAndWait(() -> window.results().removeListener(listener[0]));
            times[i] = (end.get() - start) / 1e6;
            if (paintTimes != null) {
                paintTimes.add((end.get() - painting.get()) / 1e6);
            }
        }
        return times;
    }

    /**
     * Starts processes that each keep one core busy: a shell loop doing arithmetic, which checks about ten times
     * a second that this JVM is still there and stops when it is not.
     */
    private static List<Process> spin(int cores) throws IOException {
        long self = ProcessHandle.current().pid();
        String loop = "while kill -0 " + self + " 2>/dev/null; do i=0; while [ $i -lt 100000 ]; do i=$((i+1)); done; done";
        List<Process> spinners = new ArrayList<>();
        for (int i = 0; i < cores; i++) {
            Process process = new ProcessBuilder("sh", "-c", loop).redirectErrorStream(true)
                    .redirectOutput(ProcessBuilder.Redirect.DISCARD).start();
            spinners.add(process);
            Runtime.getRuntime().addShutdownHook(new Thread(process::destroyForcibly));
        }
        return spinners;
    }

    /** @return the CPU time this JVM has used so far, all threads (ns) */
    private static long processCpuNanos() {
        return ((com.sun.management.OperatingSystemMXBean) ManagementFactory.getOperatingSystemMXBean())
                .getProcessCpuTime();
    }

    /** @return the first three figures of /proc/loadavg, or "unknown" off Linux */
    private static String loadAverage() {
        try {
            String[] figures = Files.readString(Path.of("/proc/loadavg")).trim().split("\\s+");
            return String.join(" ", Arrays.copyOf(figures, 3));
        } catch (IOException | RuntimeException unreadable) {
            return "unknown";
        }
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
