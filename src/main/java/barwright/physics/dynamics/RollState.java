package barwright.physics.dynamics;

/**
 * The car at one instant of a run, in SI. Roll positive to the right (the body leans right in a left turn);
 * load transfer positive from the left wheels to the right.
 *
 * @param time          (s)
 * @param lateral       a_y (m/s^2)
 * @param frontRoll     the body's roll at the front axle (rad)
 * @param rearRoll      at the rear axle (rad); the front's for a rigid chassis
 * @param roll          the sprung-mass-weighted mean roll (rad)
 * @param frontTransfer the front axle's lateral load transfer (N)
 * @param rearTransfer  the rear's (N)
 * @param leftFront     wheel load (N), never negative
 * @param rightFront    (N)
 * @param leftRear      (N)
 * @param rightRear     (N)
 */
public record RollState(double time, double lateral, double frontRoll, double rearRoll, double roll,
                        double frontTransfer, double rearTransfer, double leftFront, double rightFront,
                        double leftRear, double rightRear) {

    /** @return the front axle's share of the total load transfer; 0.5 where there is none */
    public double frontShare() {
        double total = frontTransfer + rearTransfer;
        return total == 0 ? 0.5 : frontTransfer / total;
    }

    /** @return the least of the four wheel loads (N) */
    public double leastLoad() {
        return Math.min(Math.min(leftFront, rightFront), Math.min(leftRear, rightRear));
    }
}
