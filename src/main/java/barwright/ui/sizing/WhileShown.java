package barwright.ui.sizing;

import javax.swing.JComponent;
import java.awt.event.HierarchyEvent;

/**
 * Runs a view's update only while the view is on screen: an edit made while it is hidden (another tab, its window
 * closed) is remembered and the update runs when the view is shown again, so hidden views cost an edit nothing.
 * Event thread.
 */
public final class WhileShown {
    private final JComponent view;
    private final Runnable update;
    private boolean pending;

    public WhileShown(JComponent view, Runnable update) {
        this.view = view;
        this.update = update;
        view.addHierarchyListener(event -> {
            if ((event.getChangeFlags() & HierarchyEvent.SHOWING_CHANGED) != 0 && view.isShowing() && pending) {
                pending = false;
                update.run();
            }
        });
    }

    /** Updates now where the view is on screen, else when it is next shown. */
    public void request() {
        if (view.isShowing()) {
            pending = false;
            update.run();
        } else {
            pending = true;
        }
    }
}
