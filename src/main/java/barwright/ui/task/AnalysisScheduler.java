package barwright.ui.task;

import barwright.model.Vehicle;
import barwright.physics.AnalysisResult;
import barwright.physics.ImpossibleVehicleException;
import barwright.physics.VehicleAnalysis;
import barwright.solver.RootNotFoundException;

import javax.swing.SwingUtilities;
import javax.swing.SwingWorker;
import java.util.function.Consumer;

/**
 * Runs the analysis off the event thread and coalesces rapid edits: at most one analysis runs at a time;
 * requests that arrive meanwhile collapse into the newest, which runs next. Outcomes are handed over on the
 * event thread, newest last. Call from the event thread only.
 */
public final class AnalysisScheduler {
    private final Consumer<AnalysisOutcome> onOutcome;
    private long revision;
    private Request pending;
    private boolean running;

    private record Request(long revision, Vehicle vehicle, SweepRequest sweep) {
    }

    /** @param onOutcome receives every outcome on the event thread */
    public AnalysisScheduler(Consumer<AnalysisOutcome> onOutcome) {
        this.onOutcome = onOutcome;
    }

    /**
     * Asks for an analysis of this car; an earlier request not yet started is dropped.
     *
     * @param sweep the bar sweep to run as well, or null for none (it costs a score of analyses)
     */
    public void submit(Vehicle vehicle, SweepRequest sweep) {
        requireEventThread();
        pending = new Request(++revision, vehicle, sweep);
        if (!running) {
            startNext();
        }
    }

    /** @return true when nothing runs or waits */
    public boolean isIdle() {
        return !running && pending == null;
    }

    /** @return the revision of the newest request */
    public long latestRevision() {
        return revision;
    }

    private void startNext() {
        Request request = pending;
        pending = null;
        running = true;
        new SwingWorker<Void, Void>() {
            @Override
            protected Void doInBackground() {
                AnalysisOutcome outcome;
                try {
                    outcome = analyse(request.revision(), request.vehicle(), request.sweep());
                } catch (RuntimeException | Error failed) {
                    outcome = new AnalysisOutcome(request.revision(), request.vehicle(), null, null, null,
                            "The analysis failed inside the program: " + failed);
                }
                // handed over with invokeLater rather than done(): SwingWorker batches done() on a timer that
                // fires about every 33 ms, which would add that much to every edit
                AnalysisOutcome finished = outcome;
                SwingUtilities.invokeLater(() -> delivered(finished));
                return null;
            }
        }.execute();
    }

    private void delivered(AnalysisOutcome outcome) {
        running = false;
        onOutcome.accept(outcome);
        if (pending != null) {
            startNext();
        }
    }

    /** The work itself, on whatever thread calls it. */
    public static AnalysisOutcome analyse(long revision, Vehicle vehicle, SweepRequest sweep) {
        try {
            AnalysisResult result = VehicleAnalysis.analyse(vehicle);
            return new AnalysisOutcome(revision, vehicle, result, sweep == null ? null : BarSweep.run(vehicle, sweep),
                    withoutBars(vehicle), null);
        } catch (ImpossibleVehicleException | RootNotFoundException impossible) {
            return new AnalysisOutcome(revision, vehicle, null, null, null, impossible.getMessage());
        } catch (UnsupportedOperationException notBuilt) {
            return new AnalysisOutcome(revision, vehicle, null, null, null,
                    "This car cannot be analysed by this version of Barwright: " + notBuilt.getMessage() + ".");
        }
    }

    /** @return the car with both bars taken off, analysed; null where it then has no stable roll position */
    private static AnalysisResult withoutBars(Vehicle vehicle) {
        Vehicle bare = vehicle.withFront(vehicle.front().withBar(null)).withRear(vehicle.rear().withBar(null));
        try {
            return VehicleAnalysis.analyse(bare);
        } catch (ImpossibleVehicleException impossible) {
            return null;
        }
    }

    private static void requireEventThread() {
        if (!SwingUtilities.isEventDispatchThread()) {
            throw new IllegalStateException("the analysis scheduler is used from the event thread");
        }
    }
}
