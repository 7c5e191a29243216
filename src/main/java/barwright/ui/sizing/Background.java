package barwright.ui.sizing;

import barwright.solver.Progress;

import javax.swing.SwingUtilities;
import javax.swing.SwingWorker;
import java.util.concurrent.CancellationException;
import java.util.concurrent.ExecutionException;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.concurrent.atomic.AtomicLong;
import java.util.function.Function;

/**
 * One piece of long work off the event thread, as the core's {@link Progress}: the work reports how far it has
 * come from any of its threads, and stops at its next check once {@link #cancel} is called. Progress, the
 * result, a failure or the cancellation arrive on the event thread only, through the {@link Listener}.
 *
 * @param <T> what the work produces
 */
public final class Background<T> extends SwingWorker<T, Void> implements Progress {
    /** What the view does with the work's news; every method is called on the event thread. */
    public interface Listener<T> {
        /** @param done units finished, @param total units in all */
        default void progress(long done, long total) {
        }

        void finished(T result);

        /** @param message why the work failed, in words */
        void failed(String message);

        default void cancelled() {
        }
    }

    private final Function<Progress, T> work;
    private final Listener<T> listener;
    private final AtomicLong done = new AtomicLong();
    private final AtomicLong total = new AtomicLong();
    private final AtomicBoolean progressQueued = new AtomicBoolean();

    private Background(Function<Progress, T> work, Listener<T> listener) {
        this.work = work;
        this.listener = listener;
    }

    /** Starts the work; call from the event thread. */
    public static <T> Background<T> start(Function<Progress, T> work, Listener<T> listener) {
        Background<T> background = new Background<>(work, listener);
        background.execute();
        return background;
    }

    @Override
    protected T doInBackground() {
        return work.apply(this);
    }

    /** Called from the work's threads; the newest figures reach the event thread, coalesced. */
    @Override
    public void update(long doneSoFar, long totalWork) {
        done.set(doneSoFar);
        total.set(totalWork);
        if (progressQueued.compareAndSet(false, true)) {
            SwingUtilities.invokeLater(() -> {
                progressQueued.set(false);
                if (!isDone()) {
                    listener.progress(done.get(), total.get());
                }
            });
        }
    }

    /** Asks the work to stop; it does at its next check of {@link #isCancelled()}. */
    public void cancel() {
        cancel(false);
    }

    @Override
    protected void done() {
        if (isCancelled()) {
            listener.cancelled();
            return;
        }
        try {
            listener.finished(get());
        } catch (CancellationException stopped) {
            listener.cancelled();
        } catch (ExecutionException failed) {
            Throwable cause = failed.getCause();
            if (cause instanceof CancellationException) {
                listener.cancelled();
            } else {
                listener.failed(cause.getMessage() != null ? cause.getMessage() : cause.toString());
            }
        } catch (InterruptedException interrupted) {
            Thread.currentThread().interrupt();
            listener.failed("interrupted");
        }
    }
}
