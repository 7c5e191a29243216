package barwright.ui.sizing;

import barwright.ui.app.MainWindow;

import javax.swing.SwingUtilities;
import java.util.concurrent.Callable;
import java.util.concurrent.atomic.AtomicReference;

/** Reaching the sizing views of a main window from tests and the screenshot tool, and waiting for their work. */
final class SizingScreens {
    private SizingScreens() {
    }

    /** Opens the sizing window on a tab (as the Tools menu does) and returns it. */
    static SizingWindow open(MainWindow window, SizingWindow.Tab tab) throws Exception {
        return onEdt(() -> {
            SizingWindow views = window.contribution(SizingViews.class).views();
            views.open(tab);
            return views;
        });
    }

    /** Opens the sizing window on a tab, at the screen's top left at that size (pixels), laid out. */
    static SizingWindow open(MainWindow window, SizingWindow.Tab tab, int width, int height) throws Exception {
        SizingWindow views = open(window, tab);
        onEdt(() -> {
            views.setLocation(0, 0);
            views.setSize(width, height);
            views.validate();
            return null;
        });
        return views;
    }

    static <T> T onEdt(Callable<T> task) throws Exception {
        AtomicReference<T> result = new AtomicReference<>();
        AtomicReference<Exception> failure = new AtomicReference<>();
        SwingUtilities.invokeAndWait(() -> {
            try {
                result.set(task.call());
            } catch (Exception failed) {
                failure.set(failed);
            }
        });
        if (failure.get() != null) {
            throw failure.get();
        }
        return result.get();
    }

    /** Waits (up to 60 s) until the condition holds on the event thread, then for painting. */
    static void until(String what, Callable<Boolean> condition) throws Exception {
        for (int i = 0; i < 3000; i++) {
            if (onEdt(condition)) {
                onEdt(() -> null);
                Thread.sleep(100);
                return;
            }
            Thread.sleep(20);
        }
        throw new AssertionError("timed out waiting for " + what);
    }

    /** Waits until the main window's analysis is idle with results shown. */
    static void analysed(MainWindow window) throws Exception {
        until("the analysis", () -> window.analysis().isIdle() && window.results().shown() != null);
    }

    /** @return the component of that name under the container (AssertJ Swing's finder), or an error naming it */
    @SuppressWarnings("unchecked")
    static <T extends java.awt.Component> T find(java.awt.Container root, String name) {
        return (T) org.assertj.swing.core.BasicComponentFinder.finderWithCurrentAwtHierarchy()
                .findByName(root, name, false);
    }
}
