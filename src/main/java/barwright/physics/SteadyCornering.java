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
 *
 * <p>With a linkage on either axle ({@link RollCentreMigration}) the roll and transfers before the first lift
 * follow the migrating roll centres instead, and from the first lift on the roll centres stay where they were
 * at the lift (with one wheel off the ground the two-contact-point roll centre no longer applies): h' above is
 * the one at the lift's roll. Each wheel's camber to the road is the linkage's at the same roll.
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
    // the roll centres' migration (null for typed roll centres: everything linear before the lift)
    private final RollCentreMigration migration;
    private final boolean migrating;
    // h' from the first lift on, and the roll at the lift (rad)
    private final double liftRollArm;
    private final double rollAtFirstLift;

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
        this(turn, masses, cgHeight, frontTrack, rearTrack, frontTransfer, rearTransfer, roll, frontRollStiffness,
                rearRollStiffness, chassisStiffness, null);
    }

    /**
     * As above, with the roll centres migrating as the body rolls.
     *
     * @param migration the migration of the same roll stiffnesses, or null for typed roll centres
     */
    public SteadyCornering(TurnDirection turn, MassProperties masses, double cgHeight, double frontTrack,
                           double rearTrack, double frontTransfer, double rearTransfer, RollResponse roll,
                           double frontRollStiffness, double rearRollStiffness, Double chassisStiffness,
                           RollCentreMigration migration) {
        this.migration = migration;
        this.migrating = migration != null && migration.migrates();
        this.turn = turn;
        this.masses = masses;
        this.cgHeight = cgHeight;
        this.frontTrack = frontTrack;
        this.rearTrack = rearTrack;
        this.frontTransferPerAccel = frontTransfer;
        this.rearTransferPerAccel = rearTransfer;
        this.rollPerAccel = roll.rollPerAccel();

        MassProperties.StaticWheelLoads loads = masses.staticLoads();
        double frontLift = migrating ? migration.liftAccel(AxlePosition.FRONT, loads.frontInside(turn))
                : liftAccel(loads.frontInside(turn), frontTransfer);
        double rearLift = migrating ? migration.liftAccel(AxlePosition.REAR, loads.rearInside(turn))
                : liftAccel(loads.rearInside(turn), rearTransfer);
        this.firstLiftAxle = frontLift <= rearLift ? AxlePosition.FRONT : AxlePosition.REAR;
        this.firstLift = Math.min(frontLift, rearLift);
        if (migrating && Double.isFinite(firstLift)) {
            this.rollAtFirstLift = migration.roll(firstLift);
            this.liftRollArm = migration.rollArm(rollAtFirstLift);
        } else {
            this.rollAtFirstLift = rollPerAccel * firstLift;
            this.liftRollArm = masses.rollArm();
        }

        double remaining = firstLiftAxle == AxlePosition.FRONT ? rearRollStiffness : frontRollStiffness;
        if (chassisStiffness != null) {
            remaining = AxleStiffness.inSeries(remaining, chassisStiffness);
        }
        double remainingNet = remaining - liftGravityRollMoment();
        this.unstableAfterLift = !(remainingNet > 0);
        this.rollPerAccelAfterLift = unstableAfterLift ? Double.POSITIVE_INFINITY
                : masses.sprungMass() * liftRollArm / remainingNet;
        this.secondLift = Double.isInfinite(firstLift) ? Double.POSITIVE_INFINITY : computeSecondLift();
    }

    /** @return m_s g h' with h' from the first lift on (N m/rad): the masses' own for typed roll centres */
    public double liftGravityRollMoment() {
        return masses.sprungMass() * barwright.units.Constants.STANDARD_GRAVITY * liftRollArm;
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
                + liftGravityRollMoment() * rollAngle(accel);
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
            return migrating ? migration.roll(accel) : rollPerAccel * accel;
        }
        return rollAtFirstLift + (accel - firstLift) * rollPerAccelAfterLift;
    }

    /**
     * @return the roll at which the linkages' geometry is taken at this a_y (rad): the body's roll up to the first
     *     lift, the roll at the lift after it
     */
    public double geometryRoll(double accel) {
        return accel <= firstLift ? rollAngle(accel) : rollAtFirstLift;
    }

    /**
     * @return the outside wheel's camber to the road at this a_y (rad, SAE J670), or null for an axle without a
     *     linkage (the tyres then stand at zero camber to the road, model.md 8.2)
     */
    public Double outsideCamber(AxlePosition axle, double accel) {
        AxleRollGeometry geometry = migration == null ? null : migration.geometry(axle);
        return geometry == null ? null : geometry.outsideCamber(geometryRoll(accel));
    }

    /** @return the inside wheel's camber to the road at this a_y (rad, SAE J670), or null without a linkage */
    public Double insideCamber(AxlePosition axle, double accel) {
        AxleRollGeometry geometry = migration == null ? null : migration.geometry(axle);
        return geometry == null ? null : geometry.insideCamber(geometryRoll(accel));
    }

    /** @return the roll centres' migration behind this turn, or null for typed roll centres */
    public RollCentreMigration migration() {
        return migration;
    }

    /** @return the load transfer of an axle at a lateral acceleration (N), following the post-lift rule */
    public double loadTransfer(AxlePosition axle, double accel) {
        if (accel <= firstLift) {
            return migrating ? migration.loadTransfer(axle, accel)
                    : (axle == AxlePosition.FRONT ? frontTransferPerAccel : rearTransferPerAccel) * accel;
        }
        if (axle == firstLiftAxle) {
            return staticInside(axle);
        }
        return Math.min(transferAfterLift(accel), staticInside(axle));
    }

    /** @return the four wheel loads at a lateral acceleration (N); inside loads never below zero */
    public WheelLoads wheelLoads(double accel) {
        return at(accel).loads();
    }

    /**
     * The turn at one a_y.
     *
     * @param accel        a_y (m/s^2)
     * @param loads        the four wheel loads (N)
     * @param geometryRoll the roll at which the linkages' geometry is taken (rad): see {@link #geometryRoll}
     */
    public record Point(double accel, WheelLoads loads, double geometryRoll) {
    }

    /** @return the wheel loads and the linkages' roll at a_y, with the roll solved once */
    public Point at(double accel) {
        double front;
        double rear;
        double geometryRoll;
        if (migrating && accel <= firstLift) {
            geometryRoll = migration.roll(accel);
            double[] transfers = migration.loadTransfersAtRoll(geometryRoll, accel);
            front = transfers[0];
            rear = transfers[1];
        } else {
            front = loadTransfer(AxlePosition.FRONT, accel);
            rear = loadTransfer(AxlePosition.REAR, accel);
            geometryRoll = migration == null ? 0 : geometryRoll(accel);
        }
        return new Point(accel, new WheelLoads(staticOutside(AxlePosition.FRONT) + front,
                Math.max(0, staticInside(AxlePosition.FRONT) - front),
                staticOutside(AxlePosition.REAR) + rear,
                Math.max(0, staticInside(AxlePosition.REAR) - rear)), geometryRoll);
    }

    /** @return the outside wheel's camber to the road at that point (rad, SAE J670), or null without a linkage */
    public Double outsideCamber(AxlePosition axle, Point point) {
        AxleRollGeometry geometry = migration == null ? null : migration.geometry(axle);
        return geometry == null ? null : geometry.outsideCamber(point.geometryRoll());
    }

    /** @return the inside wheel's camber to the road at that point (rad, SAE J670), or null without a linkage */
    public Double insideCamber(AxlePosition axle, Point point) {
        AxleRollGeometry geometry = migration == null ? null : migration.geometry(axle);
        return geometry == null ? null : geometry.insideCamber(point.geometryRoll());
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

    /** @return body roll per a_y before any lift (rad s^2/m); with migrating roll centres, as a_y -> 0 */
    public double rollPerAccel() {
        return rollPerAccel;
    }
}
