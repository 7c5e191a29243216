package barwright.physics.dynamics;

import barwright.model.AxlePosition;
import barwright.model.DynamicsInputs;
import barwright.physics.AnalysisResult;
import barwright.physics.AxleResult;
import barwright.physics.ImpossibleVehicleException;
import barwright.physics.MassProperties;

import static barwright.units.Constants.STANDARD_GRAVITY;

/**
 * The body's roll in motion (model.md 14): one roll angle for a rigid chassis, or a front and a rear end
 * joined by the chassis stiffness K_c, each end with its share of the roll inertia I_xx + m_s h'^2 about the
 * roll axis (shared as the sprung mass is). Each axle's suspension moment (springs, bar and dampers) acts in
 * series with its tyres; gravity adds m_s g h' phi as in the steady model. The state is the roll and roll
 * rate of each end, then the tyre roll of each axle that needs one.
 */
public final class RollModel {
    private final AxleRoll front;
    private final AxleRoll rear;
    private final double frontSprungMass;
    private final double rearSprungMass;
    private final double rollArm;
    private final double frontInertia;
    private final double rearInertia;
    private final Double chassisStiffness;
    private final MassProperties masses;
    private final double cgHeight;
    private final double wheelbase;
    private final int frontTyreIndex;
    private final int rearTyreIndex;
    private final int dimension;

    /**
     * @param rollInertiaAboutAxis I_xx + m_s h'^2 (kg m^2)
     * @param chassisStiffness     K_c (N m/rad), or null for a rigid chassis
     * @param cgHeight             the car's CG height h (m), for the shift of load under a_x
     */
    public RollModel(AxleRoll front, AxleRoll rear, MassProperties masses, double rollInertiaAboutAxis,
                     Double chassisStiffness, double cgHeight) {
        this.front = front;
        this.rear = rear;
        this.masses = masses;
        this.frontSprungMass = masses.frontSprungMass();
        this.rearSprungMass = masses.rearSprungMass();
        this.rollArm = masses.rollArm();
        this.frontInertia = rollInertiaAboutAxis * frontSprungMass / masses.sprungMass();
        this.rearInertia = rollInertiaAboutAxis * rearSprungMass / masses.sprungMass();
        this.chassisStiffness = chassisStiffness;
        this.cgHeight = cgHeight;
        this.wheelbase = masses.cgToFrontAxle() + masses.cgToRearAxle();
        int next = chassisStiffness == null ? 2 : 4;
        frontTyreIndex = front.hasTyreState() ? next++ : -1;
        rearTyreIndex = rear.hasTyreState() ? next++ : -1;
        dimension = next;
    }

    /**
     * The roll model of an analysed car, from the analysis's own stiffnesses, masses and load-transfer parts.
     *
     * @throws ImpossibleVehicleException where the file gives no roll inertia
     */
    public static RollModel of(AnalysisResult result, DynamicsInputs inputs) {
        if (inputs == null || inputs.rollInertia() == null) {
            throw new ImpossibleVehicleException("The roll dynamics needs the body's roll inertia: add "
                    + "vehicle.rollInertiaKgM2 to the file (file-format.md, \"Roll dynamics\", says how to "
                    + "estimate or measure it).");
        }
        MassProperties masses = result.masses();
        double aboutAxis = inputs.rollInertia() + masses.sprungMass() * masses.rollArm() * masses.rollArm();
        return new RollModel(axle(result, inputs, AxlePosition.FRONT), axle(result, inputs, AxlePosition.REAR),
                masses, aboutAxis, result.vehicle().chassisTorsionalStiffness(), result.vehicle().cgHeight());
    }

    private static AxleRoll axle(AnalysisResult result, DynamicsInputs inputs, AxlePosition position) {
        AxleResult axle = result.axle(position);
        double track = result.vehicle().axle(position).track();
        var damper = inputs.damper(position);
        double rollPerAccel = position == AxlePosition.FRONT ? result.roll().frontRollPerAccel()
                : result.roll().rearRollPerAccel();
        double transferPerAccel = axle.loadTransfer().total();
        // the steady model lifts at a_L = W / c; its suspension then carries K phi(a_L) = K rho W / c
        double liftMomentPerLoad = transferPerAccel > 0
                ? axle.stiffness().rollStiffness() * rollPerAccel / transferPerAccel : Double.POSITIVE_INFINITY;
        return new AxleRoll(track, axle.stiffness().suspensionRollStiffness(), axle.stiffness().tyreRollStiffness(),
                damper == null ? null : new RollDamping(damper, track),
                axle.loadTransfer().unsprung() + axle.loadTransfer().geometric(), liftMomentPerLoad);
    }

    /** @return the number of state variables */
    public int dimension() {
        return dimension;
    }

    public boolean rigidChassis() {
        return chassisStiffness == null;
    }

    public AxleRoll front() {
        return front;
    }

    public AxleRoll rear() {
        return rear;
    }

    public MassProperties masses() {
        return masses;
    }

    /** @return the roll inertia of each end about the roll axis, summed (kg m^2) */
    public double inertiaAboutAxis() {
        return frontInertia + rearInertia;
    }

    double frontRoll(double[] y) {
        return y[0];
    }

    double rearRoll(double[] y) {
        return chassisStiffness == null ? y[0] : y[2];
    }

    /** The moments and loads at one instant, the post-lift rule applied. */
    record Forces(RollState state, double frontMoment, double rearMoment, double frontRawMoment,
                  double rearRawMoment, double[] liftMargins, double leftMargin, double rightMargin) {
    }

    /** @return the suspension moments, transfers and wheel loads at a time and state */
    Forces forces(double time, double[] y, LateralInput input) {
        double accel = input.lateral(time);
        double shift = masses.mass() * input.longitudinal(time) * cgHeight / wheelbase / 2;
        MassProperties.StaticWheelLoads loads = masses.staticLoads();
        double leftFront = loads.leftFront() - shift;
        double rightFront = loads.rightFront() - shift;
        double leftRear = loads.leftRear() + shift;
        double rightRear = loads.rightRear() + shift;

        double frontRoll = frontRoll(y);
        double rearRoll = rearRoll(y);
        double frontRate = y[1];
        double rearRate = chassisStiffness == null ? y[1] : y[3];
        double frontRaw = front.moment(frontRoll, frontRate, frontTyreIndex < 0 ? 0 : y[frontTyreIndex]);
        double rearRaw = rear.moment(rearRoll, rearRate, rearTyreIndex < 0 ? 0 : y[rearTyreIndex]);
        double frontDirect = front.directTransferPerAccel() * accel * front.track();
        double rearDirect = rear.directTransferPerAccel() * accel * rear.track();
        // transfer an axle would have with both wheels down (N), positive to the right wheels
        double frontContact = (frontDirect + frontRaw) / front.track();
        double rearContact = (rearDirect + rearRaw) / rear.track();
        double[] margins = {leftFront - frontContact, rightFront + frontContact, leftRear - rearContact,
                rightRear + rearContact};

        // the steady model's post-lift rule: the lifted axle carries its inside wheel's static load, its
        // suspension moment no more than at the steady lift; the other axle takes the rest of the moment
        double frontMoment = frontRaw;
        double rearMoment = rearRaw;
        double frontTransfer = frontContact;
        double rearTransfer = rearContact;
        double total = frontDirect + rearDirect;
        if (margins[0] <= 0 || margins[1] <= 0) {
            boolean left = margins[0] <= 0;
            double inside = left ? leftFront : rightFront;
            frontMoment = liftedMoment(front, frontRaw, inside, frontDirect, left);
            frontTransfer = left ? inside : -inside;
            rearTransfer = (total + frontMoment + rearRaw - frontTransfer * front.track()) / rear.track();
        } else if (margins[2] <= 0 || margins[3] <= 0) {
            boolean left = margins[2] <= 0;
            double inside = left ? leftRear : rightRear;
            rearMoment = liftedMoment(rear, rearRaw, inside, rearDirect, left);
            rearTransfer = left ? inside : -inside;
            frontTransfer = (total + frontRaw + rearMoment - rearTransfer * rear.track()) / front.track();
        }
        double ground = total + frontMoment + rearMoment;
        // what both wheels of a side can still hold against the moment reaching the ground (N m)
        double leftMargin = leftFront * front.track() + leftRear * rear.track() - ground;
        double rightMargin = rightFront * front.track() + rightRear * rear.track() + ground;
        double mean = (frontSprungMass * frontRoll + rearSprungMass * rearRoll) / masses.sprungMass();
        RollState state = new RollState(time, accel, frontRoll, rearRoll, mean, frontTransfer, rearTransfer,
                Math.max(0, leftFront - frontTransfer), Math.max(0, rightFront + frontTransfer),
                Math.max(0, leftRear - rearTransfer), Math.max(0, rightRear + rearTransfer));
        return new Forces(state, frontMoment, rearMoment, frontRaw, rearRaw, margins, leftMargin, rightMargin);
    }

    /**
     * The suspension moment a lifted axle passes to the body (N m, signed as the turn's roll): its own moment,
     * but no more than the steady model's moment at its lift, K phi(a_lift), or where more, the moment at which
     * the inside wheel's load is exactly zero at this a_y, W t - direct. The second keeps the moment continuous
     * as the wheel lifts (it is the moment at that instant), so the integrator never meets a jump; once a_y has
     * passed the steady lift it is the first, and a held a_y ends on the steady model's figures.
     *
     * @param raw    the axle's own suspension moment (N m)
     * @param inside W, the lifting wheel's static load (N)
     * @param direct the axle's unsprung and geometric moment now (N m), signed
     * @param left   true for a left wheel lifting (positive roll)
     */
    private static double liftedMoment(AxleRoll axle, double raw, double inside, double direct, boolean left) {
        double steadyCap = axle.liftMomentPerLoad() * inside;
        double insideMoment = inside * axle.track();
        return left ? Math.min(raw, Math.max(steadyCap, insideMoment - direct))
                : Math.max(raw, -Math.max(steadyCap, insideMoment + direct));
    }

    /** Writes dy/dt. */
    void derivatives(double time, double[] y, LateralInput input, double[] yDot) {
        Forces forces = forces(time, y, input);
        double accel = forces.state().lateral();
        double gravity = STANDARD_GRAVITY;
        double frontRoll = frontRoll(y);
        double rearRoll = rearRoll(y);
        if (chassisStiffness == null) {
            double sprung = masses.sprungMass();
            yDot[0] = y[1];
            yDot[1] = (sprung * rollArm * accel + sprung * gravity * rollArm * frontRoll - forces.frontMoment()
                    - forces.rearMoment()) / (frontInertia + rearInertia);
        } else {
            double twist = chassisStiffness * (frontRoll - rearRoll);
            yDot[0] = y[1];
            yDot[1] = (frontSprungMass * rollArm * (accel + gravity * frontRoll) - forces.frontMoment() - twist)
                    / frontInertia;
            yDot[2] = y[3];
            yDot[3] = (rearSprungMass * rollArm * (accel + gravity * rearRoll) - forces.rearMoment() + twist)
                    / rearInertia;
        }
        if (frontTyreIndex >= 0) {
            yDot[frontTyreIndex] = front.tyreRollRate(frontRoll, y[1], y[frontTyreIndex]);
        }
        if (rearTyreIndex >= 0) {
            yDot[rearTyreIndex] = rear.tyreRollRate(rearRoll, chassisStiffness == null ? y[1] : y[3],
                    y[rearTyreIndex]);
        }
    }

    /** @return the roll stiffness left after gravity, each axle in series with its tyres (N m/rad) */
    double netRigidStiffness() {
        return front.seriesStiffness() + rear.seriesStiffness() - masses.gravityRollMoment();
    }

    Double chassisStiffness() {
        return chassisStiffness;
    }
}
