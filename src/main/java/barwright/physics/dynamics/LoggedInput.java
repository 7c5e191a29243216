package barwright.physics.dynamics;

import barwright.model.LapLog;

/**
 * A logged lap as the roll model's input: a_y and a_x linear between the samples.
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
}
