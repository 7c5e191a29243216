package barwright.ui.task;

import barwright.solver.Progress;

import javax.swing.SwingUtilities;
import java.util.concurrent.CancellationException;
import java.util.concurrent.ExecutorService;
import java.util.concurrent.Executors;
import java.util.concurrent.ThreadFactory;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.concurrent.atomic.AtomicInteger;
import java.util.concurrent.atomic.AtomicLong;
import java.util.function.Consumer;
import java.util.function.Function;

/**
 * The window's one way of running work off the event thread. One piece of work runs at a time; a request made
 * while it runs waits, and a newer request replaces the one waiting (the newest wins). The work sees the core's
 * {@link Progress}: it reports how far it has come from any of its threads and stops at its next check once
 * cancelled. Progress, results, failures and cancellations reach the {@link Listener} on the event thread only.
 * Call from the event thread.
 *
 * @param <I> what a request carries
 * @param <O> what the work produces
 */
public final class BackgroundWork<I, O> {
    /** The work itself, run off the event thread. */
    @FunctionalInterface
    public interface Work<I, O> {
        O run(I input, Progress progress);
    }

    /** What the view does with the work's news; every method is called on the event thread. */
    public interface Listener<I, O> {
        /** @param done units finished, @param total units in all */
        default void progress(long done, long total) {
        }

        void finished(I input, O result);

        /** @param message why the work failed, in words */
        void failed(I input, String message);

        default void cancelled(I input) {
        }
    }

    /** What becomes of a piece of work that a newer request supersedes. */
    public enum Superseded {
        /**
         * It runs to the end and its answer is delivered before the newer one starts: the live analysis, so that
         * a slider dragged for a long time still shows results as it goes.
         */
        DELIVERED,
        /** It runs to the end but its answer, already stale, is dropped. */
        DROPPED,
        /** It is told to stop at its next check and its answer, if any, is dropped: long searches. */
        CANCELLED
    }

    private static final AtomicInteger THREADS = new AtomicInteger();
    private static final ThreadFactory DAEMONS = task -> {
        Thread thread = new Thread(task, "barwright-work-" + THREADS.incrementAndGet());
        thread.setDaemon(true); // never keeps the program alive once the window has closed
        return thread;
    };
    private static final ExecutorService WORKERS = Executors.newCachedThreadPool(DAEMONS);

    private final Work<I, O> work;
    private final Superseded superseded;
    private final Listener<I, O> listener;
    private Job running;
    private I pending;
    private boolean hasPending;

    public BackgroundWork(Work<I, O> work, Superseded superseded, Listener<I, O> listener) {
        this.work = work;
        this.superseded = superseded;
        this.listener = listener;
    }

    /** Starts one piece of work at once, e.g. a search or an export; cancel it through the object returned. */
    public static <O> BackgroundWork<Void, O> start(Function<Progress, O> work,
                                                    Listener<Void, O> listener) {
        BackgroundWork<Void, O> background = new BackgroundWork<>((input, progress) -> work.apply(progress),
                Superseded.CANCELLED, listener);
        background.submit(null);
        return background;
    }

    /**
     * Newest-wins work whose superseded answers are dropped, as the insight views use it.
     *
     * @param onResult  receives the newest answer on the event thread
     * @param onFailure receives a failure's message on the event thread
     */
    public static <I, O> BackgroundWork<I, O> newestOnly(Function<I, O> work, Consumer<O> onResult,
                                                         Consumer<String> onFailure) {
        return new BackgroundWork<>((input, progress) -> work.apply(input), Superseded.DROPPED, new Listener<>() {
            @Override
            public void finished(I input, O result) {
                onResult.accept(result);
            }

            @Override
            public void failed(I input, String message) {
                onFailure.accept(message);
            }
        });
    }

    /** Asks for the work on this input; an earlier request not yet started is dropped. */
    public void submit(I input) {
        requireEventThread();
        pending = input;
        hasPending = true;
        if (running == null) {
            startNext();
        } else if (superseded == Superseded.CANCELLED) {
            running.cancelled.set(true);
        }
    }

    /** Tells the running work to stop at its next check and drops any request waiting. */
    public void cancel() {
        requireEventThread();
        pending = null;
        hasPending = false;
        if (running != null) {
            running.cancelled.set(true);
        }
    }

    /** @return true when nothing runs or waits */
    public boolean isIdle() {
        return running == null && !hasPending;
    }

    private void startNext() {
        Job job = new Job(pending);
        pending = null;
        hasPending = false;
        running = job;
        WORKERS.execute(job::runOffTheEventThread);
    }

    private void ended(Job job, O result, Throwable failure) {
        running = null;
        boolean stale = hasPending;
        if (!stale || superseded == Superseded.DELIVERED) {
            if (failure instanceof CancellationException || (failure == null && job.cancelled.get())) {
                listener.cancelled(job.input);
            } else if (failure != null) {
                listener.failed(job.input, failure.getMessage() != null ? failure.getMessage() : failure.toString());
            } else {
                listener.finished(job.input, result);
            }
        }
        if (hasPending) {
            startNext();
        }
    }

    private static void requireEventThread() {
        if (!SwingUtilities.isEventDispatchThread()) {
            throw new IllegalStateException("background work is asked for from the event thread only");
        }
    }

    /** One request being worked on: the core's progress and cancel, as the work sees them. */
    private final class Job implements Progress {
        final I input;
        final AtomicBoolean cancelled = new AtomicBoolean();
        private final AtomicLong done = new AtomicLong();
        private final AtomicLong total = new AtomicLong();
        private final AtomicBoolean progressQueued = new AtomicBoolean();

        Job(I input) {
            this.input = input;
        }

        void runOffTheEventThread() {
            O result = null;
            Throwable failure = null;
            try {
                result = work.run(input, this);
            } catch (RuntimeException | Error failed) {
                failure = failed;
            }
            // handed over with invokeLater rather than SwingWorker.done(): that is batched on a timer of about
            // 33 ms, which would add that much to every edit
            O finished = result;
            Throwable failed = failure;
            SwingUtilities.invokeLater(() -> ended(this, finished, failed));
        }

        /** Called from the work's threads; the newest figures reach the event thread, coalesced. */
        @Override
        public void update(long doneSoFar, long totalWork) {
            done.set(doneSoFar);
            total.set(totalWork);
            if (progressQueued.compareAndSet(false, true)) {
                SwingUtilities.invokeLater(() -> {
                    progressQueued.set(false);
                    if (running == this && !cancelled.get()) {
                        listener.progress(done.get(), total.get());
                    }
                });
            }
        }

        @Override
        public boolean isCancelled() {
            return cancelled.get();
        }
    }
}
