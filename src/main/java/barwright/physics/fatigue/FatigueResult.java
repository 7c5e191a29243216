package barwright.physics.fatigue;

import java.util.List;

/**
 * A bar's fatigue life over one lap's stress history.
 *
 * @param damagePerLap        Palmgren-Miner damage sum of one lap (failure at 1)
 * @param lapsToFailure       1 / damagePerLap; +infinity where no cycle reaches the endurance limit
 * @param hoursToFailure      lapsToFailure times the lap time, in hours; +infinity likewise
 * @param fatigueSafetyFactor Goodman-line safety factor of a fully reversed cycle at the check travel
 * @param cycles              the counted cycles of the nominal (un-notched) stress, equal cycles merged
 * @param curve               the S-N line used
 */
public record FatigueResult(double damagePerLap, double lapsToFailure, double hoursToFailure,
                            double fatigueSafetyFactor, List<StressCycle> cycles, SnCurve curve) {
    public FatigueResult {
        cycles = List.copyOf(cycles);
    }

    /** @return true where the bar outlives any number of laps (no cycle does damage) */
    public boolean infiniteLife() {
        return damagePerLap == 0;
    }
}
