package barwright.ui.insight;

import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;

import javax.swing.SwingUtilities;
import java.util.List;
import java.util.concurrent.CopyOnWriteArrayList;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;

import static org.assertj.core.api.Assertions.assertThat;

/**
 * The insight views' background work: off the event thread, newest request wins, answers on the event thread.
 * The event thread needs the window toolkit, so these run where the window tests do.
 */
@Tag("window")
class LatestOnlyTest {
    @BeforeEach
    void needsDisplay() {
        InsightDisplay.require();
    }

    @Test
    void work_runs_off_the_event_thread_and_only_the_newest_answer_arrives() throws Exception {
        List<Boolean> workOnEventThread = new CopyOnWriteArrayList<>();
        List<Integer> worked = new CopyOnWriteArrayList<>();
        List<Integer> answers = new CopyOnWriteArrayList<>();
        List<Boolean> answerOnEventThread = new CopyOnWriteArrayList<>();
        CountDownLatch release = new CountDownLatch(1);
        CountDownLatch newestArrived = new CountDownLatch(1);
        java.util.concurrent.atomic.AtomicReference<LatestOnly<Integer, Integer>> holder =
                new java.util.concurrent.atomic.AtomicReference<>();
        SwingUtilities.invokeAndWait(() -> holder.set(new LatestOnly<>(input -> {
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
    void a_failure_arrives_as_its_message() throws Exception {
        CountDownLatch arrived = new CountDownLatch(1);
        String[] message = new String[1];
        SwingUtilities.invokeAndWait(() -> new LatestOnly<Integer, Integer>(input -> {
            throw new IllegalStateException("no stable roll position");
        }, answer -> { }, failure -> {
            message[0] = failure;
            arrived.countDown();
        }).submit(1));
        assertThat(arrived.await(10, TimeUnit.SECONDS)).isTrue();
        assertThat(message[0]).isEqualTo("no stable roll position");
    }

    private static void awaitQuietly(CountDownLatch latch) {
        try {
            latch.await(10, TimeUnit.SECONDS);
        } catch (InterruptedException interrupted) {
            Thread.currentThread().interrupt();
        }
    }
}
