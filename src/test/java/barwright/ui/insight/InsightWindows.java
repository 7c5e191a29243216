package barwright.ui.insight;

import barwright.ui.app.MainWindow;

import javax.swing.SwingUtilities;
import java.awt.Component;
import java.awt.Container;

/** Finding the insight panel in the main window and waiting for it, for the window tests and screenshots. */
final class InsightWindows {
    private InsightWindows() {
    }

    static InsightPanel panel(MainWindow window) throws Exception {
        InsightPanel[] found = new InsightPanel[1];
        SwingUtilities.invokeAndWait(() -> found[0] = find(window.getContentPane()));
        if (found[0] == null) {
            throw new AssertionError("the main window has no insight panel");
        }
        return found[0];
    }

    private static InsightPanel find(Container container) {
        for (Component child : container.getComponents()) {
            if (child instanceof InsightPanel panel) {
                return panel;
            }
            if (child instanceof Container inner) {
                InsightPanel found = find(inner);
                if (found != null) {
                    return found;
                }
            }
        }
        return null;
    }

    /** Waits (up to 20 s) until the window's analysis and the insight views have caught up, then for painting. */
    static void settle(MainWindow window, InsightPanel panel) throws Exception {
        boolean[] settled = new boolean[1];
        for (int i = 0; i < 1000 && !settled[0]; i++) {
            SwingUtilities.invokeAndWait(() -> settled[0] = window.analysis().isIdle() && window.results().shown() != null
                    && panel.isSettled() && panel.envelope().isIdle());
            if (!settled[0]) {
                Thread.sleep(20);
            }
        }
        if (!settled[0]) {
            throw new AssertionError("the insight views did not settle within 20 s");
        }
        SwingUtilities.invokeAndWait(() -> { });
        Thread.sleep(150);
    }
}
