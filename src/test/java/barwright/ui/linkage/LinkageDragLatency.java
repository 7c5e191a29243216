package barwright.ui.linkage;

import barwright.loading.VehicleLoader;
import barwright.model.AxlePosition;
import barwright.ui.action.Settings;
import barwright.ui.app.DesktopApp;
import barwright.ui.app.MainWindow;

import javax.swing.SwingUtilities;
import java.awt.event.InputEvent;
import java.awt.event.MouseEvent;
import java.nio.file.Path;
import java.util.Arrays;
import java.util.Locale;

/**
 * Benchmark harness (not a test): the time from a mouse drag step on the linkage drawing to the drawing repainted
 * with the linkage solved for that step, while a pickup point is dragged up and down. Each step posts a real
 * MOUSE_DRAGGED event to the drawing on the event thread; the clock stops when the scene of that step's request
 * has arrived from the background solve and the drawing has been painted synchronously (paintImmediately). It also
 * reports how long the event thread spends on each drag event itself. The main window, the sprint roadster
 * (sample-vehicles, invented), its front double wishbones, the slider at 80 % of the grip limit.
 *
 * <p>Run under a display: {@code xvfb-run -a -s "-screen 0 1280x1024x24" mvn -B -q test-compile exec:java
 * -Dexec.classpathScope=test -Dexec.mainClass=barwright.ui.linkage.LinkageDragLatency}
 */
public final class LinkageDragLatency {
    static final int WARM_UP = 100;
    static final int STEPS = 400;

    private LinkageDragLatency() {
    }

    public static void main(String[] args) throws Exception {
        MainWindow[] holder = new MainWindow[1];
        var car = VehicleLoader.read(Path.of("sample-vehicles", "sprint-roadster.json"));
        SwingUtilities.invokeAndWait(() -> {
            holder[0] = DesktopApp.open(Settings.inMemory(), () -> { });
            holder[0].setLocation(0, 0);
            holder[0].setSize(1280, 1000);
            holder[0].document().replace(car, null, "sample: sprint-roadster");
        });
        MainWindow window = holder[0];
        LinkagePage page = window.contribution(LinkageViews.class).page();
        SwingUtilities.invokeAndWait(() -> {
            window.tabs().setSelectedComponent(page);
            page.showAxle(AxlePosition.FRONT);
            window.probe().setFractionOfLimit(0.8);
        });
        LinkageWindows.settle(window, page);
        FrontViewDrawing drawing = page.drawing();
        FrontViewPainter.Handle held = onEdt(() -> drawing.handles().stream()
                .filter(handle -> handle.pickup().index() == 2 && handle.pickup().left()).findFirst().orElseThrow());
        int x = (int) Math.round(held.at().x);
        int y = (int) Math.round(held.at().y);
        SwingUtilities.invokeAndWait(() -> drawing.dispatchEvent(event(drawing, MouseEvent.MOUSE_PRESSED, x, y)));

        measure(drawing, page, x, y, WARM_UP);
        double[][] times = measure(drawing, page, x, y, STEPS);
        SwingUtilities.invokeAndWait(() -> drawing.dispatchEvent(event(drawing, MouseEvent.MOUSE_RELEASED, x, y)));
        System.out.printf(Locale.ROOT, "drag step -> repainted (%d steps)   median %6.2f ms   p95 %6.2f ms   max %6.2f ms%n",
                STEPS, percentile(times[0], 50), percentile(times[0], 95), percentile(times[0], 100));
        System.out.printf(Locale.ROOT, "event thread per drag event         median %6.3f ms   p95 %6.3f ms   max %6.3f ms%n",
                percentile(times[1], 50), percentile(times[1], 95), percentile(times[1], 100));
        System.out.println("load average: " + java.nio.file.Files.readString(Path.of("/proc/loadavg")).trim());
        SwingUtilities.invokeAndWait(window::dispose);
        System.exit(0);
    }

    /** @return {step to repainted, event thread per event} in ms, one a step */
    private static double[][] measure(FrontViewDrawing drawing, LinkagePage page, int x, int y, int steps)
            throws Exception {
        double[] repainted = new double[steps];
        double[] onEventThread = new double[steps];
        for (int i = 0; i < steps; i++) {
            int offset = (int) Math.round(40 * Math.sin(i * 0.3)); // up and down by 40 pixels
            long start = System.nanoTime();
            long[] request = new long[1];
            long[] eventNanos = new long[1];
            SwingUtilities.invokeAndWait(() -> {
                long before = System.nanoTime();
                drawing.dispatchEvent(event(drawing, MouseEvent.MOUSE_DRAGGED, x, y - offset));
                request[0] = page.revision();
                eventNanos[0] = System.nanoTime() - before;
            });
            onEventThread[i] = eventNanos[0] / 1e6;
            boolean[] done = new boolean[1];
            while (!done[0]) {
                SwingUtilities.invokeAndWait(() -> {
                    LinkageScene shown = drawing.scene();
                    if (shown != null && shown.revision() >= request[0]) {
                        drawing.paintImmediately(0, 0, drawing.getWidth(), drawing.getHeight());
                        done[0] = true;
                    }
                });
                if (!done[0]) {
                    Thread.sleep(0, 200_000);
                }
            }
            repainted[i] = (System.nanoTime() - start) / 1e6;
        }
        return new double[][] {repainted, onEventThread};
    }

    private static MouseEvent event(FrontViewDrawing drawing, int id, int x, int y) {
        return new MouseEvent(drawing, id, System.currentTimeMillis(),
                id == MouseEvent.MOUSE_RELEASED ? 0 : InputEvent.BUTTON1_DOWN_MASK, x, y, 1, false, MouseEvent.BUTTON1);
    }

    private static <T> T onEdt(java.util.concurrent.Callable<T> work) throws Exception {
        Object[] result = new Object[1];
        Exception[] failure = new Exception[1];
        SwingUtilities.invokeAndWait(() -> {
            try {
                result[0] = work.call();
            } catch (Exception failed) {
                failure[0] = failed;
            }
        });
        if (failure[0] != null) {
            throw failure[0];
        }
        @SuppressWarnings("unchecked") T typed = (T) result[0];
        return typed;
    }

    static double percentile(double[] values, double percent) {
        double[] sorted = values.clone();
        Arrays.sort(sorted);
        int index = (int) Math.ceil(percent / 100 * sorted.length) - 1;
        return sorted[Math.max(0, Math.min(sorted.length - 1, index))];
    }
}
