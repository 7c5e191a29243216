package barwright.physics;

import barwright.model.AntiRollBar;
import barwright.model.Axle;
import barwright.model.AxlePosition;
import barwright.model.TurnDirection;
import barwright.model.Vehicle;
import barwright.physics.bar.BarResult;
import barwright.physics.linkage.AxleKinematics;

import java.util.List;

import static barwright.units.Constants.STANDARD_GRAVITY;

/**
 * The one chain of model.md 1-8, in stages, so that a full analysis and a search over thousands of bars run the
 * same steps and every model change lands in one place:
 * <ol>
 *   <li>per car (this constructor): masses, static wheel loads, corner sprung masses, each axle's tyre grip;</li>
 *   <li>per axle and bar ({@link #barResult}, {@link #axleStiffness}): the bar's rate and stresses, the axle's
 *       roll stiffness and rates (model.md 2-3);</li>
 *   <li>linear ({@link #balance}): body roll and the load transfer parts per a_y, with the roll-centre heights
 *       of {@link #rollCentreHeight} (model.md 4-6);</li>
 *   <li>per turn direction ({@link #turns}): lift, limits, balance and the handling curve with the grip of
 *       {@link #grip}; the rule of {@link #mirrorSymmetric} alone decides when the right turn is the left one
 *       mirrored (model.md 7-8).</li>
 * </ol>
 * {@link #analyse} runs all four for the car's own bars. Thread-safe: it holds no mutable state.
 */
public final class AnalysisPipeline {
    /** Points of each handling curve of a full analysis. */
    public static final int HANDLING_CURVE_POINTS = 50;

    private final Vehicle vehicle;
    private final MassProperties masses;
    private final MassProperties.StaticWheelLoads loads;
    private final double frontCornerSprungMass;
    private final double rearCornerSprungMass;
    private final AxleGrip frontGrip;
    private final AxleGrip rearGrip;
    // each linkage axle's geometry against roll (null for a typed roll centre), model.md 11
    private final AxleRollGeometry frontGeometry;
    private final AxleRollGeometry rearGeometry;

    /**
     * Stage 1: what does not depend on the bars.
     *
     * @throws ImpossibleVehicleException where the masses cannot be analysed whatever the bars
     */
    public AnalysisPipeline(Vehicle given) {
        // linkage axles: the computed static roll centre and the ride-height changes (model.md 11), and each one's
        // geometry against roll, followed once for every bar the pipeline is asked about
        AxleKinematics frontKinematics = given.front().hasLinkage()
                ? LinkageResolution.kinematics(given, AxlePosition.FRONT) : null;
        AxleKinematics rearKinematics = given.rear().hasLinkage()
                ? LinkageResolution.kinematics(given, AxlePosition.REAR) : null;
        Vehicle vehicle = LinkageResolution.atRideHeight(given, frontKinematics, rearKinematics);
        this.vehicle = vehicle;
        this.masses = MassProperties.of(vehicle);
        this.loads = masses.staticLoads();
        this.frontCornerSprungMass = AxleStiffness.cornerSprungMass(vehicle.front(), AxlePosition.FRONT,
                loads.frontAxle());
        this.rearCornerSprungMass = AxleStiffness.cornerSprungMass(vehicle.rear(), AxlePosition.REAR,
                loads.rearAxle());
        this.frontGrip = new AxleGrip(new TyreModel(vehicle.front().tyre()));
        this.rearGrip = new AxleGrip(new TyreModel(vehicle.rear().tyre()));
        double follow = frontKinematics == null && rearKinematics == null ? 0 : rollToFollow();
        this.frontGeometry = frontKinematics == null ? null
                : AxleRollGeometry.of(AxlePosition.FRONT, frontKinematics, follow);
        this.rearGeometry = rearKinematics == null ? null
                : AxleRollGeometry.of(AxlePosition.REAR, rearKinematics, follow);
    }

    /**
     * How far the linkages' roll is followed for this car, whatever bars it is given (model.md 11): half as much
     * again as the roll of the car without bars at a_y = mu_max g (no axle grips more than its tyres' highest
     * friction times its load, and its load does not change in a turn), plus a degree; at most
     * {@link AxleRollGeometry#MAX_ROLL}, and that where the car without bars has no stable roll position.
     *
     * @return the roll (rad)
     */
    private double rollToFollow() {
        double frontSprings = AxleStiffness.of(vehicle.front().withBar(null), null, frontCornerSprungMass)
                .rollStiffness();
        double rearSprings = AxleStiffness.of(vehicle.rear().withBar(null), null, rearCornerSprungMass)
                .rollStiffness();
        RollResponse withoutBars = RollResponse.withRollArm(masses, masses.rollArm(), frontSprings, rearSprings,
                vehicle.chassisTorsionalStiffness());
        if (withoutBars == null || !(withoutBars.rollPerAccel() > 0)) {
            return AxleRollGeometry.MAX_ROLL;
        }
        double weight = masses.mass() * STANDARD_GRAVITY;
        double highestFriction = 0;
        for (int i = 1; i <= 20; i++) {
            double load = weight * i / 20;
            highestFriction = Math.max(highestFriction, Math.max(frontGrip.tyre().friction(load),
                    rearGrip.tyre().friction(load)));
        }
        double roll = 1.5 * withoutBars.rollPerAccel() * highestFriction * STANDARD_GRAVITY + Math.toRadians(1);
        return Math.min(AxleRollGeometry.MAX_ROLL, roll);
    }

    public Vehicle vehicle() {
        return vehicle;
    }

    public MassProperties masses() {
        return masses;
    }

    /** @return the axle's tyre grip: the one place the turn stage takes its tyres from */
    private AxleGrip grip(AxlePosition position) {
        return position == AxlePosition.FRONT ? frontGrip : rearGrip;
    }

    /** @return half of (static axle load / g - unsprung axle mass) (kg) */
    private double cornerSprungMass(AxlePosition position) {
        return position == AxlePosition.FRONT ? frontCornerSprungMass : rearCornerSprungMass;
    }

    /** @return the roll-centre height the linear stage uses for that axle (m): the one place it is read */
    private double rollCentreHeight(AxlePosition position) {
        return vehicle.axle(position).rollCentreHeight();
    }

    /**
     * The one symmetry rule: where the static wheel loads are the same left and right, the car turns right
     * exactly as it turns left, so the right turn's limits and handling curve are the left turn's.
     */
    private boolean mirrorSymmetric() {
        return loads.symmetric();
    }

    /** Stage 2: @return a bar's rate and stresses at the car's differential wheel travel, or null for no bar */
    public BarResult barResult(AntiRollBar bar) {
        return bar == null ? null : BarAnalysis.analyse(bar, vehicle.differentialWheelTravel());
    }

    /**
     * Stage 2: @return the axle's stiffnesses with that bar fitted
     *
     * @param bar    the bar, or null for none
     * @param result its result from {@link #barResult}
     */
    public AxleStiffness axleStiffness(AxlePosition position, AntiRollBar bar, BarResult result) {
        Axle axle = vehicle.axle(position);
        Axle fitted = bar == axle.bar() ? axle : axle.withBar(bar);
        return AxleStiffness.of(fitted, result, cornerSprungMass(position));
    }

    /**
     * Stage 3: body roll and load transfer per a_y (model.md 5-6).
     *
     * @throws ImpossibleVehicleException where the body has no stable roll position
     */
    public RollBalance balance(AxleStiffness front, AxleStiffness rear) {
        double frontRoll = front.rollStiffness();
        double rearRoll = rear.rollStiffness();
        RollResponse roll = RollResponse.of(masses, frontRoll, rearRoll, vehicle.chassisTorsionalStiffness());
        LoadTransferParts frontParts = LoadTransferParts.of(vehicle.front(), rollCentreHeight(AxlePosition.FRONT),
                masses.frontSprungMass(), frontRoll, roll.frontRollPerAccel());
        LoadTransferParts rearParts = LoadTransferParts.of(vehicle.rear(), rollCentreHeight(AxlePosition.REAR),
                masses.rearSprungMass(), rearRoll, roll.rearRollPerAccel());
        return new RollBalance(frontRoll, rearRoll, roll, frontParts, rearParts);
    }

    /**
     * Stage 4: both turn directions.
     *
     * @param curvePoints points of each handling curve (at least 2)
     */
    public TurnPair turns(RollBalance balance, int curvePoints) {
        return turns(balance, migration(balance), curvePoints);
    }

    /**
     * The roll centres' migration for a linear stage's roll stiffnesses (model.md 11).
     *
     * @return it, or null where no axle has a linkage
     */
    public RollCentreMigration migration(RollBalance balance) {
        return RollCentreMigration.of(vehicle, masses, balance.frontRollStiffness(), balance.rearRollStiffness(),
                vehicle.chassisTorsionalStiffness(), frontGeometry, rearGeometry);
    }

    private TurnPair turns(RollBalance balance, RollCentreMigration migration, int curvePoints) {
        AxleGrip front = grip(AxlePosition.FRONT);
        AxleGrip rear = grip(AxlePosition.REAR);
        TurnResult left = TurnAnalysis.analyse(cornering(vehicle, masses, TurnDirection.LEFT, balance, migration),
                masses.mass(), masses.frontMassFraction(), front, rear, curvePoints);
        SteadyCornering rightCornering = cornering(vehicle, masses, TurnDirection.RIGHT, balance, migration);
        TurnResult right = mirrorSymmetric() ? left.withCornering(rightCornering)
                : TurnAnalysis.analyse(rightCornering, masses.mass(), masses.frontMassFraction(), front, rear,
                curvePoints);
        return new TurnPair(left, right);
    }

    /**
     * The steady turn of a car whose linear stage is known, with these masses (the car's own, or shifted by a
     * longitudinal acceleration).
     */
    static SteadyCornering cornering(Vehicle vehicle, MassProperties masses, TurnDirection direction,
                                     RollBalance balance, RollCentreMigration migration) {
        return new SteadyCornering(direction, masses, vehicle.cgHeight(), vehicle.front().track(),
                vehicle.rear().track(), balance.frontTransfer(), balance.rearTransfer(), balance.roll(),
                balance.frontRollStiffness(), balance.rearRollStiffness(), vehicle.chassisTorsionalStiffness(),
                migration);
    }

    /**
     * All four stages for the car's own bars, with the suspension-only roll, the understeer gradient and the
     * warnings (model.md 1-8).
     *
     * @throws ImpossibleVehicleException where the car cannot be analysed
     */
    public AnalysisResult analyse() {
        AntiRollBar frontBarGeometry = vehicle.front().bar();
        AntiRollBar rearBarGeometry = vehicle.rear().bar();
        BarResult frontBar = barResult(frontBarGeometry);
        BarResult rearBar = barResult(rearBarGeometry);
        AxleStiffness frontStiffness = axleStiffness(AxlePosition.FRONT, frontBarGeometry, frontBar);
        AxleStiffness rearStiffness = axleStiffness(AxlePosition.REAR, rearBarGeometry, rearBar);
        RollBalance balance = balance(frontStiffness, rearStiffness);
        RollResponse suspensionRoll = RollResponse.of(masses, frontStiffness.suspensionRollStiffness(),
                rearStiffness.suspensionRollStiffness(), vehicle.chassisTorsionalStiffness());

        double frontCornering = grip(AxlePosition.FRONT).corneringStiffness(loads.leftFront(), loads.rightFront());
        double rearCornering = grip(AxlePosition.REAR).corneringStiffness(loads.leftRear(), loads.rightRear());
        // K = W_f/C_f - W_r/C_r in rad per g (Gillespie, Fundamentals of Vehicle Dynamics, ch. 6), per m/s^2 here
        double understeer = (loads.frontAxle() / frontCornering - loads.rearAxle() / rearCornering)
                / STANDARD_GRAVITY;
        RollCentreMigration migration = migration(balance);
        TurnPair turns = turns(balance, migration, HANDLING_CURVE_POINTS);

        AxleResult front = new AxleResult(frontStiffness, frontBar, balance.front(), frontCornering,
                cornerSprungMass(AxlePosition.FRONT));
        AxleResult rear = new AxleResult(rearStiffness, rearBar, balance.rear(), rearCornering,
                cornerSprungMass(AxlePosition.REAR));
        double rollShare = balance.frontRollStiffness() / (balance.frontRollStiffness() + balance.rearRollStiffness());
        AnalysisResult withoutWarnings = new AnalysisResult(vehicle, masses, front, rear, balance.roll(),
                suspensionRoll, balance.frontLoadTransferShare(), rollShare, understeer, turns.left(),
                turns.right(), List.of(), grip(AxlePosition.FRONT), grip(AxlePosition.REAR), migration);
        return new AnalysisResult(vehicle, masses, front, rear, balance.roll(), suspensionRoll,
                balance.frontLoadTransferShare(), rollShare, understeer, turns.left(), turns.right(),
                Warnings.of(withoutWarnings), grip(AxlePosition.FRONT), grip(AxlePosition.REAR), migration);
    }
}
