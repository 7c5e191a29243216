package barwright.ui.task;

import barwright.model.AxlePosition;
import barwright.model.SolidSection;
import barwright.model.Vehicle;
import barwright.ui.document.Samples;
import org.junit.jupiter.api.Test;

import javax.swing.SwingUtilities;
import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.CountDownLatch;
import java.util.concurrent.TimeUnit;

import static org.assertj.core.api.Assertions.assertThat;

/** The live analysis's scheduling, with no window: Swing's event thread runs headless too. */
class AnalysisSchedulerTest {
    private static final SweepRequest SWEEP = new SweepRequest(AxlePosition.FRONT, SweepParameter.DIAMETER);

    @Test
    void rapidRequestsCollapseIntoTheNewestAndItArrivesLast() throws Exception {
        Vehicle car = Samples.load(Samples.CLUB_HATCHBACK).vehicle();
        List<AnalysisOutcome> outcomes = new ArrayList<>();
        List<Vehicle> submitted = new ArrayList<>();
        CountDownLatch settled = new CountDownLatch(1);
        AnalysisScheduler[] scheduler = new AnalysisScheduler[1];
        SwingUtilities.invokeAndWait(() -> {
            scheduler[0] = new AnalysisScheduler(outcome -> {
                outcomes.add(outcome);
                if (scheduler[0].isIdle()) {
                    settled.countDown();
                }
            });
            for (int i = 0; i < 50; i++) {
                Vehicle changed = car.withFront(car.front().withBar(car.front().bar()
                        .withSection(new SolidSection(0.015 + i * 0.0002))));
                submitted.add(changed);
                scheduler[0].submit(changed, SWEEP);
            }
        });
        assertThat(settled.await(30, TimeUnit.SECONDS)).isTrue();
        // one request was running when the other 49 came; they collapse into the newest: two analyses in all
        assertThat(outcomes).hasSize(2);
        AnalysisOutcome last = outcomes.get(outcomes.size() - 1);
        assertThat(last.vehicle()).isSameAs(submitted.get(49));
        assertThat(last.revision()).isEqualTo(50);
        assertThat(last.succeeded()).isTrue();
    }

    @Test
    void aCarWithNoStableRollPositionComesBackAsAMessageNotANumber() {
        Vehicle car = Samples.load(Samples.CLUB_HATCHBACK).vehicle();
        // springs and bars so soft that K_f + K_r cannot exceed m_s g h' (model.md 5)
        Vehicle floppy = car.withFront(car.front().withBar(null).withSpringRate(500))
                .withRear(car.rear().withBar(null).withSpringRate(500));
        AnalysisOutcome outcome = AnalysisScheduler.analyse(1, floppy, SWEEP);
        assertThat(outcome.succeeded()).isFalse();
        assertThat(outcome.failure()).startsWith("No stable roll position");
    }
}
