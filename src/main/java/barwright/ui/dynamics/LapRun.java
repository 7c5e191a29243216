package barwright.ui.dynamics;

import barwright.model.LapLog;
import barwright.physics.dynamics.LapReplay;
import barwright.physics.dynamics.LateralInput;
import barwright.physics.dynamics.LoggedInput;
import barwright.physics.dynamics.RollModel;
import barwright.physics.dynamics.RollModes;
import barwright.physics.dynamics.RollSimulation;
import barwright.physics.dynamics.TransientResult;
import barwright.solver.Progress;

import java.util.concurrent.CancellationException;

/**
 * A whole logged lap through the roll model, off the event thread, telling how far it has come and stopping
 * when cancelled. The core's replay has no progress of its own: the log is handed to the integrator through
 * {@link Watched}, which reports the time the integrator has reached and stops it once the person cancels.
 */
final class LapRun {
    private LapRun() {
    }

    /** @return the replay of the whole log (recorded at the log's own sample times) */
    static LapReplay replay(DynamicsCar car, LapLog log, Progress progress) {
        RollModel model = RollModel.of(car.analysis(), car.inputs());
        Watched input = new Watched(new LoggedInput(log), log.start(), log.end(), progress);
        RollSimulation.Run run = RollSimulation.run(model, input, log.times(), RollSimulation.DEFAULT_INTEGRATION);
        progress.update(Watched.UNITS, Watched.UNITS);
        return LapReplay.of(car.analysis(), TransientResult.of(RollModes.of(model), run, Double.NaN));
    }

    /** The log as the integrator sees it, reporting the time reached and refusing to go on once cancelled. */
    private static final class Watched implements LateralInput {
        /** Progress is told in thousandths of the lap. */
        static final long UNITS = 1000;
        /** The integrator asks for a_y many times a step: tell the progress only every this many calls. */
        private static final int EVERY = 512;
        private final LateralInput log;
        private final double start;
        private final double length;
        private final Progress progress;
        private int calls;

        Watched(LateralInput log, double start, double end, Progress progress) {
            this.log = log;
            this.start = start;
            this.length = Math.max(end - start, 1e-9);
            this.progress = progress;
        }

        @Override
        public double lateral(double time) {
            if (++calls % EVERY == 0) {
                if (progress.isCancelled()) {
                    throw new CancellationException("the replay was cancelled");
                }
                progress.update(Math.min(UNITS - 1, (long) ((time - start) / length * UNITS)), UNITS);
            }
            return log.lateral(time);
        }

        @Override
        public double longitudinal(double time) {
            return log.longitudinal(time);
        }

        @Override
        public double finestFeature() {
            return log.finestFeature();
        }
    }
}
