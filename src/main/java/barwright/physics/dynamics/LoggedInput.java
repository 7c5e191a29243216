package barwright.physics.dynamics;

import barwright.model.LapLog;

/**
 * A logged lap as the roll model's input: a_y and a_x linear between the samples, so each sample is a corner
 * of the input where the integration restarts.
 *
 * @param log the lap
 */
public record LoggedInput(LapLog log) implements LateralInput {
    @Override
    public double lateral(double time) {
        return log.lateralAt(time);
    }

    @Override
    public double longitudinal(double time) {
        return log.longitudinalAt(time);
    }

    @Override
    public double finestFeature() {
        return log.shortestInterval();
    }

    @Override
    public double[] breakpoints() {
        return log.times().clone();
    }

    /** @return a view that remembers the last sample interval, so a run along the log needs no search */
    @Override
    public LateralInput forOneThread() {
        return new Walker(this);
    }

    /** The log read by one thread walking along it: the same values, the interval found from the last one. */
    private static final class Walker implements LateralInput {
        private final LoggedInput input;
        private final LapLog log;
        private int interval = -1;

        Walker(LoggedInput input) {
            this.input = input;
            this.log = input.log();
        }

        @Override
        public double lateral(double time) {
            interval = log.intervalOf(time, interval);
            return log.valueAt(log.lateral(), interval, time);
        }

        @Override
        public double longitudinal(double time) {
            interval = log.intervalOf(time, interval);
            return log.valueAt(log.longitudinal(), interval, time);
        }

        @Override
        public double finestFeature() {
            return input.finestFeature();
        }

        @Override
        public double[] breakpoints() {
            return input.breakpoints();
        }
    }
}
