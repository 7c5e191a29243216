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
    private final int frontTyreIndex;
    private final int rearTyreIndex;
    private final int dimension;
    // what does not change with time, computed once (the integrator evaluates the model some million times)
    private final boolean rigid;
    private final double sprungMass;
    private final double gravityMoment;
    private final double frontTrack;
    private final double rearTrack;
    private final double frontDirectPerAccel;
    private final double rearDirectPerAccel;
    private final double shiftPerLongitudinal;
    private final double staticLeftFront;
    private final double staticRightFront;
    private final double staticLeftRear;
    private final double staticRightRear;

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
        int next = chassisStiffness == null ? 2 : 4;
        frontTyreIndex = front.hasTyreState() ? next++ : -1;
        rearTyreIndex = rear.hasTyreState() ? next++ : -1;
        dimension = next;
        rigid = chassisStiffness == null;
        sprungMass = masses.sprungMass();
        gravityMoment = sprungMass * STANDARD_GRAVITY * rollArm;
        frontTrack = front.track();
        rearTrack = rear.track();
        frontDirectPerAccel = front.directTransferPerAccel() * frontTrack;
        rearDirectPerAccel = rear.directTransferPerAccel() * rearTrack;
        // a_x moves m a_x h / l from the front axle to the rear, half from each wheel (model.md 9)
        shiftPerLongitudinal = masses.mass() * cgHeight / (masses.cgToFrontAxle() + masses.cgToRearAxle()) / 2;
        MassProperties.StaticWheelLoads loads = masses.staticLoads();
        staticLeftFront = loads.leftFront();
        staticRightFront = loads.rightFront();
        staticLeftRear = loads.leftRear();
        staticRightRear = loads.rightRear();
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

    /**
     * The moments and loads at one instant, the post-lift rule applied: one run's scratch space, filled by
     * {@link #evaluate} without allocating (the integrator asks for it some 20 times a step), and read at once.
     */
    static final class Evaluation {
        double time;
        double lateral;
        double frontRoll;
        double rearRoll;
        /** The suspension moments passed to the body (N m), the post-lift rule applied. */
        double frontMoment;
        double rearMoment;
        double frontTransfer;
        double rearTransfer;
        /** The static loads shifted by a_x (N): LF, RF, LR, RR. */
        final double[] loads = new double[4];
        /** Each wheel's load with both wheels of its axle down (N): where it crosses zero, that wheel lifts. */
        final double[] liftMargins = new double[4];
        /** What both wheels of a side can still hold against the moment reaching the ground (N m). */
        double leftMargin;
        double rightMargin;
        double meanRoll;

        /** @return the car at this instant, as a value */
        RollState state() {
            return new RollState(time, lateral, frontRoll, rearRoll, meanRoll, frontTransfer, rearTransfer,
                    Math.max(0, loads[0] - frontTransfer), Math.max(0, loads[1] + frontTransfer),
                    Math.max(0, loads[2] - rearTransfer), Math.max(0, loads[3] + rearTransfer));
        }
    }

    /** Fills an evaluation with the suspension moments, transfers and wheel loads at a time and state. */
    void evaluate(double time, double[] y, LateralInput input, Evaluation out) {
        double accel = input.lateral(time);
        double shift = shiftPerLongitudinal * input.longitudinal(time);
        double[] loads = out.loads;
        loads[0] = staticLeftFront - shift;
        loads[1] = staticRightFront - shift;
        loads[2] = staticLeftRear + shift;
        loads[3] = staticRightRear + shift;

        double frontRoll = y[0];
        double rearRoll = rigid ? y[0] : y[2];
        double frontRate = y[1];
        double rearRate = rigid ? y[1] : y[3];
        double frontRaw = front.moment(frontRoll, frontRate, frontTyreIndex < 0 ? 0 : y[frontTyreIndex]);
        double rearRaw = rear.moment(rearRoll, rearRate, rearTyreIndex < 0 ? 0 : y[rearTyreIndex]);
        double frontDirect = frontDirectPerAccel * accel;
        double rearDirect = rearDirectPerAccel * accel;
        // transfer an axle would have with both wheels down (N), positive to the right wheels
        double frontContact = (frontDirect + frontRaw) / frontTrack;
        double rearContact = (rearDirect + rearRaw) / rearTrack;
        double[] margins = out.liftMargins;
        margins[0] = loads[0] - frontContact;
        margins[1] = loads[1] + frontContact;
        margins[2] = loads[2] - rearContact;
        margins[3] = loads[3] + rearContact;

        // the steady model's post-lift rule: the lifted axle carries its inside wheel's static load, its
        // suspension moment no more than at the steady lift; the other axle takes the rest of the moment
        double frontMoment = frontRaw;
        double rearMoment = rearRaw;
        double frontTransfer = frontContact;
        double rearTransfer = rearContact;
        double total = frontDirect + rearDirect;
        if (margins[0] <= 0 || margins[1] <= 0) {
            boolean left = margins[0] <= 0;
            double inside = left ? loads[0] : loads[1];
            frontMoment = liftedMoment(front, frontRaw, inside, frontDirect, left);
            frontTransfer = left ? inside : -inside;
            rearTransfer = (total + frontMoment + rearRaw - frontTransfer * frontTrack) / rearTrack;
        } else if (margins[2] <= 0 || margins[3] <= 0) {
            boolean left = margins[2] <= 0;
            double inside = left ? loads[2] : loads[3];
            rearMoment = liftedMoment(rear, rearRaw, inside, rearDirect, left);
            rearTransfer = left ? inside : -inside;
            frontTransfer = (total + frontRaw + rearMoment - rearTransfer * rearTrack) / frontTrack;
        }
        double ground = total + frontMoment + rearMoment;
        out.time = time;
        out.lateral = accel;
        out.frontRoll = frontRoll;
        out.rearRoll = rearRoll;
        out.frontMoment = frontMoment;
        out.rearMoment = rearMoment;
        out.frontTransfer = frontTransfer;
        out.rearTransfer = rearTransfer;
        out.leftMargin = loads[0] * frontTrack + loads[2] * rearTrack - ground;
        out.rightMargin = loads[1] * frontTrack + loads[3] * rearTrack + ground;
        out.meanRoll = (frontSprungMass * frontRoll + rearSprungMass * rearRoll) / sprungMass;
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

    /** Writes dy/dt (allocates its own scratch space: for occasional calls, such as the linearisation). */
    void derivatives(double time, double[] y, LateralInput input, double[] yDot) {
        Evaluation evaluation = new Evaluation();
        evaluate(time, y, input, evaluation);
        derivatives(evaluation, y, yDot);
    }

    /** Writes dy/dt from an evaluation of the same state. */
    void derivatives(Evaluation forces, double[] y, double[] yDot) {
        double accel = forces.lateral;
        double frontRoll = forces.frontRoll;
        double rearRoll = forces.rearRoll;
        if (rigid) {
            yDot[0] = y[1];
            yDot[1] = (sprungMass * rollArm * accel + gravityMoment * frontRoll - forces.frontMoment
                    - forces.rearMoment) / (frontInertia + rearInertia);
        } else {
            double twist = chassisStiffness * (frontRoll - rearRoll);
            yDot[0] = y[1];
            yDot[1] = (frontSprungMass * rollArm * (accel + STANDARD_GRAVITY * frontRoll) - forces.frontMoment
                    - twist) / frontInertia;
            yDot[2] = y[3];
            yDot[3] = (rearSprungMass * rollArm * (accel + STANDARD_GRAVITY * rearRoll) - forces.rearMoment
                    + twist) / rearInertia;
        }
        if (frontTyreIndex >= 0) {
            yDot[frontTyreIndex] = front.tyreRollRate(frontRoll, y[1], y[frontTyreIndex]);
        }
        if (rearTyreIndex >= 0) {
            yDot[rearTyreIndex] = rear.tyreRollRate(rearRoll, rigid ? y[1] : y[3], y[rearTyreIndex]);
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
