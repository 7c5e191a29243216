package barwright.physics;

/**
 * The linear stage of the analysis (model.md 5-6): body roll and each axle's load transfer per unit a_y, before
 * any wheel lifts. Cheap to compute, so a search can rank many bar pairs by it before working out their limits.
 *
 * @param frontRollStiffness K_f, suspension in series with the tyres (N m/rad)
 * @param rearRollStiffness  K_r (N m/rad)
 * @param roll               body roll per a_y
 * @param front              the front axle's transfer per a_y in three parts (N s^2/m)
 * @param rear               the rear axle's (N s^2/m)
 */
public record RollBalance(double frontRollStiffness, double rearRollStiffness, RollResponse roll,
                          LoadTransferParts front, LoadTransferParts rear) {

    /** @return front load transfer per a_y (N s^2/m) */
    public double frontTransfer() {
        return front.total();
    }

    /** @return rear load transfer per a_y (N s^2/m) */
    public double rearTransfer() {
        return rear.total();
    }

    /** @return dF_f / (dF_f + dF_r) */
    public double frontLoadTransferShare() {
        double frontTransfer = frontTransfer();
        return frontTransfer / (frontTransfer + rearTransfer());
    }

    /** @return roll gradient (rad s^2/m) */
    public double rollGradient() {
        return roll.rollPerAccel();
    }
}
