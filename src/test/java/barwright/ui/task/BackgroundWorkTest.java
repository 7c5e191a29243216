package barwright.ui.task;

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
 * The window's background work: progress and answers arrive on the event thread only, a cancelled piece of work
 * stops at its next check and never delivers a result, the event thread stays free meanwhile, and of requests made
 * while one runs only the newest is worked on. No window is opened: Swing's event thread runs headless too, so
 * these run in a plain {@code mvn test} with no display.
 */
class BackgroundWorkTest {
    /** Records what the work's listener hears, and on which thread. */
    private static final class Heard<T> implements BackgroundWork.Listener<Void, T> {
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
        public void finished(Void input, T answer) {
            onEventThread.add(SwingUtilities.isEventDispatchThread());
            result.set(answer);
            events.add("finished");
            ended.countDown();
        }

        @Override
        public void failed(Void input, String message) {
            onEventThread.add(SwingUtilities.isEventDispatchThread());
            events.add("failed: " + message);
            ended.countDown();
        }

        @Override
        public void cancelled(Void input) {
            onEventThread.add(SwingUtilities.isEventDispatchThread());
            events.add("cancelled");
            ended.countDown();
        }
    }

    @Test
    void the_work_runs_off_the_event_thread_and_its_progress_and_result_arrive_on_it() throws Exception {
        Heard<Integer> heard = new Heard<>();
        AtomicBoolean workOnEventThread = new AtomicBoolean(true);
        SwingUtilities.invokeAndWait(() -> BackgroundWork.start(progress -> {
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
        AtomicReference<BackgroundWork<Void, String>> running = new AtomicReference<>();
        SwingUtilities.invokeAndWait(() -> running.set(BackgroundWork.start(progress -> {
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
        SwingUtilities.invokeAndWait(() -> BackgroundWork.start(progress -> {
            throw new IllegalArgumentException("the rear axle has no bar");
        }, heard));
        assertThat(heard.ended.await(10, TimeUnit.SECONDS)).isTrue();
        assertThat(heard.events).containsExactly("failed: the rear axle has no bar");
    }

    @Test
    void newest_wins_work_runs_off_the_event_thread_and_only_the_newest_answer_arrives() throws Exception {
        List<Boolean> workOnEventThread = new CopyOnWriteArrayList<>();
        List<Integer> worked = new CopyOnWriteArrayList<>();
        List<Integer> answers = new CopyOnWriteArrayList<>();
        List<Boolean> answerOnEventThread = new CopyOnWriteArrayList<>();
        CountDownLatch release = new CountDownLatch(1);
        CountDownLatch newestArrived = new CountDownLatch(1);
        AtomicReference<BackgroundWork<Integer, Integer>> holder = new AtomicReference<>();
        SwingUtilities.invokeAndWait(() -> holder.set(BackgroundWork.newestOnly(input -> {
            workOnEventThread.add(SwingUtilities.isEventDispatchThread());
            worked.add(input);
            if (input == 1) {
                awaitQuietly(release); // the first request is slow: the next ones queue behind it
            }
            return input * 10;
        }, answer -> {
            answerOnEventThread.add(SwingUtilities.isEventDispatchThread());
            answers.add(answer);
            if (answer == 30) {
                newestArrived.countDown();
            }
        }, failure -> { })));
        SwingUtilities.invokeAndWait(() -> {
            holder.get().submit(1);
            holder.get().submit(2);
            holder.get().submit(3);
        });
        release.countDown();
        assertThat(newestArrived.await(10, TimeUnit.SECONDS)).isTrue();
        // 2 was superseded before it started; 1 ran but its answer was stale when it came
        assertThat(worked).containsExactly(1, 3);
        assertThat(answers).containsExactly(30);
        assertThat(workOnEventThread).containsOnly(false);
        assertThat(answerOnEventThread).containsOnly(true);
        boolean[] idle = new boolean[1];
        SwingUtilities.invokeAndWait(() -> idle[0] = holder.get().isIdle());
        assertThat(idle[0]).isTrue();
    }

    @Test
    void a_newest_wins_failure_arrives_as_its_message() throws Exception {
        CountDownLatch arrived = new CountDownLatch(1);
        String[] message = new String[1];
        SwingUtilities.invokeAndWait(() -> BackgroundWork.<Integer, Integer>newestOnly(input -> {
            throw new IllegalStateException("no stable roll position");
        }, answer -> { }, failure -> {
            message[0] = failure;
            arrived.countDown();
        }).submit(1));
        assertThat(arrived.await(10, TimeUnit.SECONDS)).isTrue();
        assertThat(message[0]).isEqualTo("no stable roll position");
    }

    @Test
    void a_newer_search_tells_the_running_one_to_stop_and_only_the_newer_answer_arrives() throws Exception {
        List<String> heard = new CopyOnWriteArrayList<>();
        CountDownLatch firstStarted = new CountDownLatch(1);
        CountDownLatch secondArrived = new CountDownLatch(1);
        AtomicBoolean firstSawTheCancel = new AtomicBoolean();
        AtomicReference<BackgroundWork<Integer, Integer>> holder = new AtomicReference<>();
        SwingUtilities.invokeAndWait(() -> holder.set(new BackgroundWork<>((input, progress) -> {
            if (input == 1) {
                firstStarted.countDown();
                long until = System.nanoTime() + TimeUnit.SECONDS.toNanos(10);
                while (!progress.isCancelled() && System.nanoTime() < until) {
                    sleep(2);
                }
                firstSawTheCancel.set(progress.isCancelled());
            }
            return input * 10;
        }, BackgroundWork.Superseded.CANCELLED, new BackgroundWork.Listener<>() {
            @Override
            public void finished(Integer input, Integer answer) {
                heard.add("finished " + answer);
                secondArrived.countDown();
            }

            @Override
            public void failed(Integer input, String message) {
                heard.add("failed " + message);
            }

            @Override
            public void cancelled(Integer input) {
                heard.add("cancelled " + input);
            }
        })));
        SwingUtilities.invokeAndWait(() -> holder.get().submit(1));
        assertThat(firstStarted.await(10, TimeUnit.SECONDS)).isTrue();
        SwingUtilities.invokeAndWait(() -> holder.get().submit(2));
        assertThat(secondArrived.await(10, TimeUnit.SECONDS)).isTrue();
        assertThat(firstSawTheCancel).as("the superseded search was told to stop").isTrue();
        // the superseded search's end is not news: only the newer answer reaches the view
        assertThat(heard).containsExactly("finished 20");
    }

    private static void awaitQuietly(CountDownLatch latch) {
        try {
            latch.await(10, TimeUnit.SECONDS);
        } catch (InterruptedException interrupted) {
            Thread.currentThread().interrupt();
        }
    }

    private static void sleep(long millis) {
        try {
            Thread.sleep(millis);
        } catch (InterruptedException interrupted) {
            Thread.currentThread().interrupt();
        }
    }
}
