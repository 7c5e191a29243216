package barwright.sizing;

import barwright.physics.RollResponse;

/**
 * The linear part of a setup, before any wheel lifts (model.md 5-6): cheap to compute, so a search can rank
 * many bar pairs by it before working out their limits.
 *
 * @param roll                   body roll per a_y
 * @param frontTransfer          front load transfer per a_y (N s^2/m)
 * @param rearTransfer           rear load transfer per a_y (N s^2/m)
 * @param frontLoadTransferShare dF_f / (dF_f + dF_r)
 */
public record RollBalance(RollResponse roll, double frontTransfer, double rearTransfer,
                          double frontLoadTransferShare) {

    /** @return roll gradient (rad s^2/m) */
    public double rollGradient() {
        return roll.rollPerAccel();
    }
}
