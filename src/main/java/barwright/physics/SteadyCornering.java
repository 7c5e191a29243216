package barwright.physics;

import barwright.model.AxlePosition;
import barwright.model.TurnDirection;

/**
 * Wheel loads, body roll and inside-wheel lift in a steady turn in one direction (model.md 5 and 7).
 * Accelerations in m/s^2, loads in N, angles in rad.
 *
 * <p>Before any wheel lifts every load transfer is linear in a_y. An inside wheel lifts where its static load
 * minus the transfer reaches zero. Beyond the first axle X's lift at a_L, X's transfer stays at its inside
 * wheel's static load W_Xi and the other axle Y takes the rest of the overturning moment:
 * {@code dF_Y t_Y = m a_y h + m_s g h' phi - W_Xi t_X}, while the body rolls against Y alone:
 * {@code phi = phi(a_L) + (a_y - a_L) m_s h' / (K_Y' - m_s g h')}. When Y lifts too, the car rolls over.
 */
public final class SteadyCornering {
    private final TurnDirection turn;
    private final MassProperties masses;
    private final double frontTrack;
    private final double rearTrack;
    private final double frontTransferPerAccel;
    private final double rearTransferPerAccel;
    private final double rollPerAccel;
    private final double cgHeight;
    // the first lift (axle, acceleration) and the roll slope after it; infinite accelerations where none
    private final AxlePosition firstLiftAxle;
    private final double firstLift;
    private final double rollPerAccelAfterLift;
    private final boolean unstableAfterLift;
    private final double secondLift;

    /**
     * @param frontTransfer   front load transfer per a_y before lift (N s^2/m)
     * @param rearTransfer    rear load transfer per a_y before lift (N s^2/m)
     * @param roll            body roll per a_y before lift
     * @param frontRollStiffness K_f (N m/rad)
     * @param rearRollStiffness  K_r (N m/rad)
     * @param chassisStiffness   K_c (N m/rad) or null for a rigid chassis
     */
    public SteadyCornering(TurnDirection turn, MassProperties masses, double cgHeight, double frontTrack,
                           double rearTrack, double frontTransfer, double rearTransfer, RollResponse roll,
                           double frontRollStiffness, double rearRollStiffness, Double chassisStiffness) {
        this.turn = turn;
        this.masses = masses;
        this.cgHeight = cgHeight;
        this.frontTrack = frontTrack;
        this.rearTrack = rearTrack;
        this.frontTransferPerAccel = frontTransfer;
        this.rearTransferPerAccel = rearTransfer;
        this.rollPerAccel = roll.rollPerAccel();

        MassProperties.StaticWheelLoads loads = masses.staticLoads();
        double frontLift = liftAccel(loads.frontInside(turn), frontTransfer);
        double rearLift = liftAccel(loads.rearInside(turn), rearTransfer);
        this.firstLiftAxle = frontLift <= rearLift ? AxlePosition.FRONT : AxlePosition.REAR;
        this.firstLift = Math.min(frontLift, rearLift);

        double remaining = firstLiftAxle == AxlePosition.FRONT ? rearRollStiffness : frontRollStiffness;
        if (chassisStiffness != null) {
            remaining = AxleStiffness.inSeries(remaining, chassisStiffness);
        }
        double remainingNet = remaining - masses.gravityRollMoment();
        this.unstableAfterLift = !(remainingNet > 0);
        this.rollPerAccelAfterLift = unstableAfterLift ? Double.POSITIVE_INFINITY
                : masses.sprungMass() * masses.rollArm() / remainingNet;
        this.secondLift = Double.isInfinite(firstLift) ? Double.POSITIVE_INFINITY : computeSecondLift();
    }

    /** @return a_y at which an inside wheel of static load W lifts under transfer c a_y; infinite if never */
    private static double liftAccel(double staticInsideLoad, double transferPerAccel) {
        return transferPerAccel > 0 ? staticInsideLoad / transferPerAccel : Double.POSITIVE_INFINITY;
    }

    private double computeSecondLift() {
        if (unstableAfterLift) {
            return firstLift; // nothing holds the body once the first axle is gone: it rolls over at once
        }
        // dF_Y(a) is linear in a after the first lift: dF_Y = intercept + slope a; solve dF_Y = W_Yi
        AxlePosition other = firstLiftAxle.other();
        double otherInside = staticInside(other);
        double atLift = transferAfterLift(firstLift);
        double slope = transferAfterLift(firstLift + 1.0) - atLift; // per m/s^2: the relation is linear
        if (!(slope > 0)) {
            return Double.POSITIVE_INFINITY;
        }
        return firstLift + (otherInside - atLift) / slope;
    }

    /** dF of the axle that has not lifted, after the first lift (N), model.md 7 */
    private double transferAfterLift(double accel) {
        AxlePosition other = firstLiftAxle.other();
        double liftedTrack = track(firstLiftAxle);
        double overturning = masses.mass() * accel * cgHeight
                + masses.gravityRollMoment() * rollAngle(accel);
        return (overturning - staticInside(firstLiftAxle) * liftedTrack) / track(other);
    }

    private double track(AxlePosition axle) {
        return axle == AxlePosition.FRONT ? frontTrack : rearTrack;
    }

    private double staticInside(AxlePosition axle) {
        MassProperties.StaticWheelLoads loads = masses.staticLoads();
        return axle == AxlePosition.FRONT ? loads.frontInside(turn) : loads.rearInside(turn);
    }

    private double staticOutside(AxlePosition axle) {
        MassProperties.StaticWheelLoads loads = masses.staticLoads();
        return axle == AxlePosition.FRONT ? loads.frontOutside(turn) : loads.rearOutside(turn);
    }

    /** @return the body roll at a lateral acceleration (rad), following the post-lift rule */
    public double rollAngle(double accel) {
        if (accel <= firstLift) {
            return rollPerAccel * accel;
        }
        return rollPerAccel * firstLift + (accel - firstLift) * rollPerAccelAfterLift;
    }

    /** @return the load transfer of an axle at a lateral acceleration (N), following the post-lift rule */
    public double loadTransfer(AxlePosition axle, double accel) {
        if (accel <= firstLift) {
            return (axle == AxlePosition.FRONT ? frontTransferPerAccel : rearTransferPerAccel) * accel;
        }
        if (axle == firstLiftAxle) {
            return staticInside(axle);
        }
        return Math.min(transferAfterLift(accel), staticInside(axle));
    }

    /** @return the four wheel loads at a lateral acceleration (N); inside loads never below zero */
    public WheelLoads wheelLoads(double accel) {
        double front = loadTransfer(AxlePosition.FRONT, accel);
        double rear = loadTransfer(AxlePosition.REAR, accel);
        return new WheelLoads(staticOutside(AxlePosition.FRONT) + front,
                Math.max(0, staticInside(AxlePosition.FRONT) - front),
                staticOutside(AxlePosition.REAR) + rear,
                Math.max(0, staticInside(AxlePosition.REAR) - rear));
    }

    /** @return a_y at which the inside wheel of an axle lifts (m/s^2); infinite where it never does */
    public double insideLift(AxlePosition axle) {
        return axle == firstLiftAxle ? firstLift : secondLift;
    }

    /** @return a_y at which both inside wheels are off the ground (m/s^2), infinite where it never happens */
    public double rollover() {
        return secondLift;
    }

    /** @return the axle whose inside wheel lifts first */
    public AxlePosition firstLiftAxle() {
        return firstLiftAxle;
    }

    public TurnDirection turn() {
        return turn;
    }

    /** @return body roll per a_y before any lift (rad s^2/m) */
    public double rollPerAccel() {
        return rollPerAccel;
    }
}
