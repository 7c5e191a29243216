package barwright.ui.task;

import barwright.model.Vehicle;
import barwright.physics.AnalysisResult;
import barwright.physics.ImpossibleVehicleException;
import barwright.physics.VehicleAnalysis;
import barwright.solver.RootNotFoundException;

import java.util.function.Consumer;

/**
 * Runs the analysis off the event thread and coalesces rapid edits: at most one analysis runs at a time;
 * requests that arrive meanwhile collapse into the newest, which runs next. Outcomes are handed over on the
 * event thread, newest last. Call from the event thread only.
 */
public final class AnalysisScheduler {
    private final BackgroundWork<Request, AnalysisOutcome> work;
    private long revision;

    private record Request(long revision, Vehicle vehicle, SweepRequest sweep) {
    }

    /** @param onOutcome receives every outcome on the event thread */
    public AnalysisScheduler(Consumer<AnalysisOutcome> onOutcome) {
        this.work = new BackgroundWork<>((request, progress) -> analyse(request.revision(), request.vehicle(),
                request.sweep()), BackgroundWork.Superseded.DELIVERED, new BackgroundWork.Listener<>() {
                    @Override
                    public void finished(Request request, AnalysisOutcome outcome) {
                        onOutcome.accept(outcome);
                    }

                    @Override
                    public void failed(Request request, String message) {
                        onOutcome.accept(new AnalysisOutcome(request.revision(), request.vehicle(), null, null, null,
                                "The analysis failed inside the program: " + message));
                    }
                });
    }

    /**
     * Asks for an analysis of this car; an earlier request not yet started is dropped.
     *
     * @param sweep the bar sweep to run as well, or null for none (it costs a score of analyses)
     */
    public void submit(Vehicle vehicle, SweepRequest sweep) {
        work.submit(new Request(++revision, vehicle, sweep));
    }

    /** @return true when nothing runs or waits */
    public boolean isIdle() {
        return work.isIdle();
    }

    /** @return the revision of the newest request */
    public long latestRevision() {
        return revision;
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
}
