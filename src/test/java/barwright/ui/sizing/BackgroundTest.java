package barwright.ui.sizing;

import barwright.ui.Display;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import javax.swing.SwingUtilities;
import java.util.List;
import java.util.concurrent.CopyOnWriteArrayList;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;
import java.util.concurrent.atomic.AtomicBoolean;
import java.util.concurrent.atomic.AtomicReference;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * Long work off the event thread: progress and answers arrive on the event thread only, a cancelled piece of work
 * stops at its next check and never delivers a result, and the event thread stays free meanwhile. The event thread
 * needs the window toolkit, so these run where the window tests do.
 */
@Tag("window")
class BackgroundTest {
    @BeforeEach
    void needsDisplay() {
        Display.require();
    }

    /** Records what the work's listener hears, and on which thread. */
    private static final class Heard<T> implements Background.Listener<T> {
        final List<String> events = new CopyOnWriteArrayList<>();
        final List<Boolean> onEventThread = new CopyOnWriteArrayList<>();
        final List<Long> progress = new CopyOnWriteArrayList<>();
        final CountDownLatch ended = new CountDownLatch(1);
        final AtomicReference<T> result = new AtomicReference<>();

        @Override
        public void progress(long done, long total) {
            onEventThread.add(SwingUtilities.isEventDispatchThread());
            progress.add(done);
        }

        @Override
        public void finished(T answer) {
            onEventThread.add(SwingUtilities.isEventDispatchThread());
            result.set(answer);
            events.add("finished");
            ended.countDown();
        }

        @Override
        public void failed(String message) {
            onEventThread.add(SwingUtilities.isEventDispatchThread());
            events.add("failed: " + message);
            ended.countDown();
        }

        @Override
        public void cancelled() {
            onEventThread.add(SwingUtilities.isEventDispatchThread());
            events.add("cancelled");
            ended.countDown();
        }
    }

    @Test
    void the_work_runs_off_the_event_thread_and_its_progress_and_result_arrive_on_it() throws Exception {
        Heard<Integer> heard = new Heard<>();
        AtomicBoolean workOnEventThread = new AtomicBoolean(true);
        SwingUtilities.invokeAndWait(() -> Background.start(progress -> {
            workOnEventThread.set(SwingUtilities.isEventDispatchThread());
            for (int i = 1; i <= 5; i++) {
                progress.update(i, 5);
                sleep(20);
            }
            return 42;
        }, heard));
        assertThat(heard.ended.await(10, TimeUnit.SECONDS)).isTrue();
        assertThat(workOnEventThread).isFalse();
        assertThat(heard.events).containsExactly("finished");
        assertThat(heard.result.get()).isEqualTo(42);
        assertThat(heard.progress).isNotEmpty().allMatch(done -> done >= 1 && done <= 5);
        assertThat(heard.onEventThread).isNotEmpty().containsOnly(true);
    }

    @Test
    void cancelled_work_stops_at_its_next_check_delivers_no_result_and_leaves_the_event_thread_free()
            throws Exception {
        Heard<String> heard = new Heard<>();
        CountDownLatch started = new CountDownLatch(1);
        CountDownLatch stopped = new CountDownLatch(1);
        AtomicReference<Background<String>> running = new AtomicReference<>();
        SwingUtilities.invokeAndWait(() -> running.set(Background.start(progress -> {
            started.countDown();
            try {
                for (long i = 0; ; i++) { // as long as it takes: only the cancel ends it
                    progress.checkCancelled();
                    progress.update(i, Long.MAX_VALUE);
                    sleep(2);
                }
            } finally {
                stopped.countDown();
            }
        }, heard)));
        assertThat(started.await(10, TimeUnit.SECONDS)).isTrue();
        // the event thread answers while the work runs
        AtomicBoolean answered = new AtomicBoolean();
        SwingUtilities.invokeAndWait(() -> answered.set(true));
        assertThat(answered).isTrue();
        SwingUtilities.invokeAndWait(() -> running.get().cancel());
        assertThat(heard.ended.await(10, TimeUnit.SECONDS)).isTrue();
        assertThat(stopped.await(10, TimeUnit.SECONDS)).as("the work stopped at its next check").isTrue();
        assertThat(heard.events).containsExactly("cancelled");
        assertThat(heard.result.get()).isNull();
        assertThat(heard.onEventThread).containsOnly(true);
    }

    @Test
    void a_failure_arrives_as_its_message() throws Exception {
        Heard<String> heard = new Heard<>();
        SwingUtilities.invokeAndWait(() -> Background.start(progress -> {
            throw new IllegalArgumentException("the rear axle has no bar");
        }, heard));
        assertThat(heard.ended.await(10, TimeUnit.SECONDS)).isTrue();
        assertThat(heard.events).containsExactly("failed: the rear axle has no bar");
    }

    private static void sleep(long millis) {
        try {
            Thread.sleep(millis);
        } catch (InterruptedException interrupted) {
            Thread.currentThread().interrupt();
        }
    }
}
