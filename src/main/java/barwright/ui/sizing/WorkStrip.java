package barwright.ui.sizing;

import barwright.solver.Progress;
import barwright.ui.panel.Palette;
import barwright.ui.panel.WrappingText;
import barwright.ui.task.BackgroundWork;

import javax.swing.BorderFactory;
import javax.swing.JButton;
import javax.swing.JPanel;
import javax.swing.JProgressBar;
import javax.swing.UIManager;
import java.awt.BorderLayout;
import java.awt.FlowLayout;
import java.util.Locale;
import java.util.function.Consumer;
import java.util.function.Function;

/**
 * A view's line of news about its work: what it is doing with a progress bar and a Cancel button while work
 * runs off the event thread, then what came of it. One piece of work at a time: starting another cancels the one
 * running, whose answer is then dropped. Event thread.
 */
final class WorkStrip extends JPanel {
    private final WrappingText status = new WrappingText(" ");
    private final JProgressBar bar = new JProgressBar(0, 1000);
    private final JButton cancel = new JButton("Cancel");
    private BackgroundWork<?, ?> running;

    /** @param name a stem for the components' names, e.g. "search" */
    WorkStrip(String name) {
        super(new BorderLayout(8, 0));
        setName(name + ".work");
        status.setName(name + ".status");
        bar.setName(name + ".progress");
        cancel.setName(name + ".cancel");
        cancel.setToolTipText("Stop the work; the window stays as it was before it started");
        bar.setStringPainted(true);
        bar.setVisible(false);
        cancel.setVisible(false);
        cancel.addActionListener(event -> cancelRunning());
        JPanel controls = new JPanel(new FlowLayout(FlowLayout.RIGHT, 6, 0));
        controls.setOpaque(false);
        controls.add(bar);
        controls.add(cancel);
        add(status, BorderLayout.CENTER);
        add(controls, BorderLayout.EAST);
        setBorder(BorderFactory.createEmptyBorder(4, 8, 4, 8));
    }

    /**
     * Runs work off the event thread; its result is handed to {@code onResult} on the event thread.
     *
     * @param doing  what the status says meanwhile, e.g. "Searching"
     * @param unit   what the progress counts, e.g. "bars"
     * @param failed what the status says before a failure's reason, e.g. "The search failed"
     */
    <T> void run(String doing, String unit, String failed, Function<Progress, T> work, Consumer<T> onResult) {
        run(doing, unit, failed, work, onResult, () -> { });
    }

    /** As {@link #run(String, String, String, Function, Consumer)}, with what the view does when the work fails. */
    <T> void run(String doing, String unit, String failed, Function<Progress, T> work, Consumer<T> onResult,
                 Runnable onFailed) {
        if (running != null) {
            running.cancel();
        }
        say(doing + "…", false);
        bar.setValue(0);
        bar.setString("starting");
        bar.setVisible(true);
        cancel.setVisible(true);
        Object[] self = new Object[1];
        self[0] = BackgroundWork.start(work, new BackgroundWork.Listener<Void, T>() {
            @Override
            public void progress(long done, long total) {
                if (running == self[0] && total > 0) {
                    bar.setValue((int) Math.min(1000, 1000 * done / total));
                    bar.setString(String.format(Locale.ROOT, "%,d of %,d %s", done, total, unit));
                }
            }

            @Override
            public void finished(Void input, T result) {
                if (running == self[0]) {
                    stopped();
                    say(" ", false);
                    onResult.accept(result);
                }
            }

            @Override
            public void failed(Void input, String message) {
                if (running == self[0]) {
                    stopped();
                    onFailed.run();
                    say(failed + ": " + message, true);
                }
            }

            @Override
            public void cancelled(Void input) {
                if (running == self[0]) {
                    stopped();
                    say(doing + " was cancelled; nothing was changed.", false);
                }
            }
        });
        running = (BackgroundWork<?, ?>) self[0];
    }

    /** Cancels the work running, if any. */
    void cancelRunning() {
        if (running != null) {
            running.cancel();
        }
    }

    /** Shows a message; a problem in the theme's colour for refused values. */
    void say(String message, boolean problem) {
        status.setText(message);
        status.setForeground(problem ? Palette.problem() : UIManager.getColor("Label.foreground"));
    }

    /** @return the message shown */
    String message() {
        return status.getText();
    }

    /** @return true when no work runs */
    boolean isIdle() {
        return running == null;
    }

    private void stopped() {
        running = null;
        bar.setVisible(false);
        cancel.setVisible(false);
    }
}
