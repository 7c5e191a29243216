package barwright.ui.linkage;

import barwright.ui.app.MainWindow;

import javax.swing.SwingUtilities;

/** Waiting for the linkage page in a window test or a tool: the analysis and the page's solves done, painted. */
final class LinkageWindows {
    private LinkageWindows() {
    }

    /** Waits (at most 20 s) until the analysis and the page's drawing solves are idle, then for a paint. */
    static void settle(MainWindow window, LinkagePage page) throws Exception {
        long deadline = System.currentTimeMillis() + 20_000;
        boolean[] idle = new boolean[1];
        do {
            Thread.sleep(30);
            SwingUtilities.invokeAndWait(() -> idle[0] = window.analysis().isIdle() && window.results().shown() != null
                    && page.isIdle());
        } while (!idle[0] && System.currentTimeMillis() < deadline);
        // the results' arrival asks the page again: let that solve finish too
        do {
            Thread.sleep(30);
            SwingUtilities.invokeAndWait(() -> idle[0] = page.isIdle());
        } while (!idle[0] && System.currentTimeMillis() < deadline);
        SwingUtilities.invokeAndWait(() -> { });
        SwingUtilities.invokeAndWait(() -> page.drawing().paintImmediately(page.drawing().getBounds()));
        Thread.sleep(150);
    }
}
