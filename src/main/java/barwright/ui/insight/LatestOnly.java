package barwright.ui.insight;

import javax.swing.SwingUtilities;
import javax.swing.SwingWorker;
import java.util.function.Consumer;
import java.util.function.Function;

/**
 * Runs a computation off the event thread, one at a time; requests made while one runs collapse into the
 * newest. Results (or the failure's message) arrive on the event thread. Call from the event thread.
 *
 * @param <I> what is computed from
 * @param <O> what is computed
 */
final class LatestOnly<I, O> {
    private final Function<I, O> work;
    private final Consumer<O> onResult;
    private final Consumer<String> onFailure;
    private I pending;
    private boolean running;

    LatestOnly(Function<I, O> work, Consumer<O> onResult, Consumer<String> onFailure) {
        this.work = work;
        this.onResult = onResult;
        this.onFailure = onFailure;
    }

    void submit(I input) {
        if (!SwingUtilities.isEventDispatchThread()) {
            throw new IllegalStateException("submit from the event thread");
        }
        pending = input;
        if (!running) {
            startNext();
        }
    }

    /** @return true when nothing runs or waits */
    boolean isIdle() {
        return !running && pending == null;
    }

    private void startNext() {
        I input = pending;
        pending = null;
        running = true;
        new SwingWorker<Void, Void>() {
            @Override
            protected Void doInBackground() {
                O result = null;
                String failure = null;
                try {
                    result = work.apply(input);
                } catch (RuntimeException | Error failed) {
                    failure = failed.getMessage() != null ? failed.getMessage() : failed.toString();
                }
                // handed over with invokeLater, not done(): SwingWorker runs done() from a timer of about
                // 33 ms, which would add that much to every edit
                O finished = result;
                String failed = failure;
                SwingUtilities.invokeLater(() -> finished(finished, failed));
                return null;
            }
        }.execute();
    }

    private void finished(O result, String failure) {
        running = false;
        // a newer request supersedes this answer: only the newest is shown
        if (pending == null) {
            if (failure == null) {
                onResult.accept(result);
            } else {
                onFailure.accept(failure);
            }
        } else {
            startNext();
        }
    }
}
