package barwright.physics.dynamics;

/**
 * The lateral acceleration a_y that drives the roll (m/s^2, positive to the car's left: a left turn, with
 * the left wheels inside), and the longitudinal acceleration a_x (m/s^2, forward positive).
 */
public interface LateralInput {
    /** @return a_y at a time (m/s^2) */
    double lateral(double time);

    /** @return a_x at a time (m/s^2); zero unless a log gives it */
    default double longitudinal(double time) {
        return 0;
    }

    /** @return the widest integration step that still sees every feature of the input (s) */
    double finestFeature();

    /**
     * @return the times at which a_y or a_x has a corner or a jump (s), increasing; the integration restarts
     *     at each, so its error control never straddles one. None by default (a smooth input).
     */
    default double[] breakpoints() {
        return new double[0];
    }

    /**
     * @return this input for one run on one thread: the same values, but it may remember where the last call
     *     was to answer the next one faster. Itself by default.
     */
    default LateralInput forOneThread() {
        return this;
    }

    /**
     * A step of a_y from 0 to a target, rising linearly over a rise time (0 for a true step).
     *
     * @param target   the held a_y (m/s^2)
     * @param riseTime the time to reach it (s), zero or more
     */
    record Step(double target, double riseTime) implements LateralInput {
        public Step {
            if (!Double.isFinite(target) || !(riseTime >= 0) || Double.isInfinite(riseTime)) {
                throw new IllegalArgumentException("a step needs a finite target and a rise time of 0 or more");
            }
        }

        @Override
        public double lateral(double time) {
            if (time <= 0) {
                return riseTime == 0 && time == 0 ? target : 0;
            }
            return time >= riseTime ? target : target * time / riseTime;
        }

        @Override
        public double finestFeature() {
            return riseTime > 0 ? riseTime : Double.POSITIVE_INFINITY;
        }

        /** @return the end of the rise, where a_y turns to held */
        @Override
        public double[] breakpoints() {
            return riseTime > 0 ? new double[] {riseTime} : new double[0];
        }
    }

    /**
     * a_y = amplitude sin(2 pi f t).
     *
     * @param amplitude (m/s^2)
     * @param frequency (Hz), positive
     */
    record Sine(double amplitude, double frequency) implements LateralInput {
        public Sine {
            if (!Double.isFinite(amplitude) || !(frequency > 0) || Double.isInfinite(frequency)) {
                throw new IllegalArgumentException("a sine needs a finite amplitude and a positive frequency");
            }
        }

        @Override
        public double lateral(double time) {
            return amplitude * Math.sin(2 * Math.PI * frequency * time);
        }

        @Override
        public double finestFeature() {
            return 1 / (20 * frequency);
        }
    }
}
