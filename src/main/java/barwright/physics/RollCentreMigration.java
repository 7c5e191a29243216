package barwright.physics;

import barwright.model.Axle;
import barwright.model.AxlePosition;
import barwright.model.Vehicle;
import barwright.solver.RootFinder;

/**
 * The body's roll against lateral acceleration with the roll centres moving as it rolls (model.md 11, "In the
 * analysis"), for one set of roll stiffnesses. At a roll phi each linkage axle's load-transfer height z(phi)
 * comes from its {@link AxleRollGeometry} table (a typed axle keeps its height), so the roll axis, the roll arm
 * h'(phi) and the roll per a_y r(phi) of model.md 5-6 follow; the steady roll at a_y solves the moment balance
 * <pre>  phi = a_y r(phi)</pre>
 * and each axle's load transfer is its three parts of model.md 5 taken at that roll's heights. With the rolls
 * of a grid known, a_y(phi) = phi / r(phi) is explicit: the grid brackets the root and Brent's method
 * ({@link RootFinder}) finds it to {@link #ROLL_ACCURACY}.
 *
 * <p>The curve is followed while a_y rises with the roll and the body has a stable position; where it stops
 * rising (the roll axis falls so fast that the roll runs away) or a table ends, the heights are held at their
 * last values and the roll carries on linearly, phi = a_y r(phi_end). Where the body leans into the turn at rest
 * (h' of no more than zero) nothing migrates: {@link #migrates()} is false and the analysis is linear.
 * Immutable and thread-safe. Angles in rad, lengths in m, accelerations in m/s^2.
 */
public final class RollCentreMigration {
    /** Spacing of the grid of rolls that brackets each solve (rad): half a degree. */
    static final double GRID_STEP = Math.toRadians(0.5);
    /** The solved roll to 1e-12 rad (about 6e-11 deg). */
    static final double ROLL_ACCURACY = 1e-12;
    private static final RootFinder ROLL = RootFinder.of(
            "the body roll at a lateral acceleration with the roll centres moving", ROLL_ACCURACY, 100);
    private static final RootFinder LIFT = RootFinder.of(
            "the body roll at which an inside wheel lifts with the roll centres moving", ROLL_ACCURACY, 100);
    /** A roll per a_y standing for "no stable position" inside a solve (rad s^2/m): finite, so Brent goes on. */
    private static final double RUNAWAY = 1e6;

    private final Vehicle vehicle;
    private final MassProperties masses;
    private final double frontStiffness;
    private final double rearStiffness;
    private final Double chassisStiffness;
    private final AxleRollGeometry front;
    private final AxleRollGeometry rear;
    private final boolean migrates;
    private final double[] rolls;
    private final double[] accels;
    private final double[] frontTransfer;
    private final double[] rearTransfer;
    private final int last;
    private final String heldBecause;

    private RollCentreMigration(Vehicle vehicle, MassProperties masses, double frontStiffness, double rearStiffness,
                                Double chassisStiffness, AxleRollGeometry front, AxleRollGeometry rear) {
        this.vehicle = vehicle;
        this.masses = masses;
        this.frontStiffness = frontStiffness;
        this.rearStiffness = rearStiffness;
        this.chassisStiffness = chassisStiffness;
        this.front = front;
        this.rear = rear;
        double end = Math.max(front == null ? 0 : front.endRoll(), rear == null ? 0 : rear.endRoll());
        int nodes = (int) Math.ceil(end / GRID_STEP - 1e-9) + 1;
        rolls = new double[Math.max(nodes, 1)];
        accels = new double[rolls.length];
        frontTransfer = new double[rolls.length];
        rearTransfer = new double[rolls.length];
        int valid = -1;
        String reason = null;
        for (int j = 0; j < rolls.length; j++) {
            double roll = j == rolls.length - 1 ? end : j * GRID_STEP;
            RollResponse response = response(roll);
            if (response == null || !(response.rollPerAccel() > 0)) {
                reason = "the body has no stable roll position with the roll centres where they are at that roll";
                break;
            }
            double accel = roll / response.rollPerAccel();
            if (j > 0 && !(accel > accels[j - 1])) {
                reason = "the roll centres fall so fast as the body rolls that the roll runs away";
                break;
            }
            rolls[j] = roll;
            accels[j] = accel;
            frontTransfer[j] = parts(AxlePosition.FRONT, roll, response).total();
            rearTransfer[j] = parts(AxlePosition.REAR, roll, response).total();
            valid = j;
        }
        this.migrates = valid >= 0;
        this.last = Math.max(valid, 0);
        this.heldBecause = reason;
    }

    /**
     * @param vehicle  the car at its ride height (each linkage axle's static height typed in)
     * @param masses   its masses and static roll axis
     * @param front    the front linkage's table, or null for a typed roll centre
     * @param rear     the rear one's, or null
     * @return the migration, or null where neither axle has a linkage
     */
    static RollCentreMigration of(Vehicle vehicle, MassProperties masses, double frontRollStiffness,
                                  double rearRollStiffness, Double chassisStiffness, AxleRollGeometry front,
                                  AxleRollGeometry rear) {
        if (front == null && rear == null) {
            return null;
        }
        return new RollCentreMigration(vehicle, masses, frontRollStiffness, rearRollStiffness, chassisStiffness,
                front, rear);
    }

    /** @return false where the body leans into the turn at rest: then the roll is linear and nothing migrates */
    public boolean migrates() {
        return migrates;
    }

    /** @return the axle's geometry table, or null for a typed roll centre */
    public AxleRollGeometry geometry(AxlePosition position) {
        return position == AxlePosition.FRONT ? front : rear;
    }

    /** @return the roll past which the heights are held (rad) */
    public double heldFromRoll() {
        return rolls[last];
    }

    /** @return the a_y at which that roll is reached (m/s^2) */
    public double heldFromAccel() {
        return accels[last];
    }

    /**
     * @return why the heights are held before both tables end ("the roll runs away"), or null where they are
     *     held only where the tables end
     */
    public String heldBecause() {
        return heldBecause;
    }

    /** @return the load-transfer height of an axle at a roll (m), held past the end of the curve */
    public double loadTransferHeight(AxlePosition position, double roll) {
        return height(position, Math.min(roll, rolls[last]));
    }

    /** @return h' = h_s - z_a with the roll axis through the two heights at that roll (m), held past the end */
    public double rollArm(double roll) {
        return rollArmAt(Math.min(roll, rolls[last]));
    }

    /** The height at a roll as the tables give it (each held only past its own table's end). */
    private double height(AxlePosition position, double roll) {
        AxleRollGeometry geometry = geometry(position);
        return geometry == null ? vehicle.axle(position).rollCentreHeight() : geometry.loadTransferHeight(roll);
    }

    /** h' with the roll axis through the two heights of that roll (m), model.md 4. */
    private double rollArmAt(double roll) {
        double frontHeight = height(AxlePosition.FRONT, roll);
        double rearHeight = height(AxlePosition.REAR, roll);
        double axis = frontHeight + (rearHeight - frontHeight) * masses.sprungCgToFrontAxle() / vehicle.wheelbase();
        return masses.sprungCgHeight() - axis;
    }

    /** @return the roll per a_y with the heights of that roll, or null where there is no stable position */
    private RollResponse response(double roll) {
        return RollResponse.withRollArm(masses, rollArmAt(roll), frontStiffness, rearStiffness, chassisStiffness);
    }

    private LoadTransferParts parts(AxlePosition position, double roll, RollResponse response) {
        Axle axle = vehicle.axle(position);
        boolean isFront = position == AxlePosition.FRONT;
        return LoadTransferParts.of(axle, height(position, roll),
                isFront ? masses.frontSprungMass() : masses.rearSprungMass(),
                isFront ? frontStiffness : rearStiffness,
                isFront ? response.frontRollPerAccel() : response.rearRollPerAccel());
    }

    /** @return a_y(phi) = phi / r(phi) (m/s^2); very small where the body has no stable position there */
    private double accelAt(double roll) {
        RollResponse response = response(roll);
        return roll / (response == null || !(response.rollPerAccel() > 0) ? RUNAWAY : response.rollPerAccel());
    }

    /**
     * @param accel a_y, zero or more (m/s^2)
     * @return the steady body roll (rad): the sprung-mass mean of model.md 6 with a flexible chassis
     */
    public double roll(double accel) {
        if (!(accel > 0)) {
            return 0;
        }
        if (accel >= accels[last]) {
            return accel * rollPerAccelHeld();
        }
        int j = bracket(accels, accel);
        return ROLL.solve(roll -> accelAt(roll) - accel, rolls[j], rolls[j + 1]);
    }

    /**
     * @param roll a body roll, positive leaning out of the turn (rad)
     * @return the a_y at which the body reaches it before any lift (m/s^2), infinite where it never does
     */
    public double accelForRoll(double roll) {
        if (!migrates) {
            RollResponse rest = response(0);
            double accel = rest == null ? Double.POSITIVE_INFINITY : roll / rest.rollPerAccel();
            return accel >= 0 && Double.isFinite(accel) ? accel : Double.POSITIVE_INFINITY;
        }
        return roll <= rolls[last] ? accelAt(roll) : roll / rollPerAccelHeld();
    }

    private double rollPerAccelHeld() {
        return last == 0 ? response(0).rollPerAccel() : rolls[last] / accels[last];
    }

    /** @return the index j with values[j] <= x < values[j + 1], the values rising, x inside them */
    private int bracket(double[] values, double x) {
        int low = 0;
        int high = last;
        while (high - low > 1) {
            int mid = (low + high) >>> 1;
            if (values[mid] <= x) {
                low = mid;
            } else {
                high = mid;
            }
        }
        return low;
    }

    /**
     * @param accel a_y, zero or more (m/s^2)
     * @return an axle's load transfer there before any wheel lifts (N)
     */
    public double loadTransfer(AxlePosition position, double accel) {
        return loadTransferAtRoll(position, roll(accel), accel);
    }

    /**
     * @param roll  the roll solved for that a_y by {@link #roll(double)}
     * @return an axle's load transfer at a_y before any wheel lifts (N)
     */
    double loadTransferAtRoll(AxlePosition position, double roll, double accel) {
        if (!(accel > 0)) {
            return 0;
        }
        double held = Math.min(roll, rolls[last]);
        RollResponse response = response(held);
        return parts(position, held, response).total() * accel;
    }

    /**
     * @param roll the roll solved for that a_y by {@link #roll(double)}
     * @return both axles' load transfers at a_y before any wheel lifts, {front, rear} (N)
     */
    double[] loadTransfersAtRoll(double roll, double accel) {
        if (!(accel > 0)) {
            return new double[2];
        }
        double held = Math.min(roll, rolls[last]);
        RollResponse response = response(held);
        return new double[] {parts(AxlePosition.FRONT, held, response).total() * accel,
                parts(AxlePosition.REAR, held, response).total() * accel};
    }

    /**
     * The a_y at which an axle's transfer first reaches its inside wheel's static load: sought along the grid of
     * rolls (the transfer at each is explicit there), then by Brent's method on the roll between two of them;
     * past the curve's end the transfer is linear in a_y.
     *
     * @param insideLoad the inside wheel's static load (N)
     * @return the a_y of the lift (m/s^2), infinite where the transfer never reaches it
     */
    double liftAccel(AxlePosition position, double insideLoad) {
        double[] transfer = position == AxlePosition.FRONT ? frontTransfer : rearTransfer;
        if (!(insideLoad > 0)) {
            return transfer[0] > 0 ? 0 : Double.POSITIVE_INFINITY;
        }
        for (int j = 1; j <= last; j++) {
            if (transfer[j] * accels[j] >= insideLoad) {
                double roll = LIFT.solve(phi -> {
                    double accel = accelAt(phi);
                    return loadTransferAtRoll(position, phi, accel) - insideLoad;
                }, rolls[j - 1], rolls[j]);
                return accelAt(roll);
            }
        }
        double perAccel = transfer[last];
        return perAccel > 0 ? Math.max(insideLoad / perAccel, accels[last]) : Double.POSITIVE_INFINITY;
    }
}
