package barwright.sizing;

import barwright.model.AntiRollBar;
import barwright.model.Axle;
import barwright.model.AxlePosition;
import barwright.model.TurnDirection;
import barwright.model.Vehicle;
import barwright.physics.AxleGrip;
import barwright.physics.AxleStiffness;
import barwright.physics.BarAnalysis;
import barwright.physics.ImpossibleVehicleException;
import barwright.physics.LoadTransferParts;
import barwright.physics.MassProperties;
import barwright.physics.RollResponse;
import barwright.physics.SteadyCornering;
import barwright.physics.TurnAnalysis;
import barwright.physics.TurnResult;
import barwright.physics.TyreModel;
import barwright.physics.bar.BarResult;

/**
 * The figures of a car with its bars swapped, for searches and maps that try thousands of bars. It gives the
 * same numbers as {@link barwright.physics.VehicleAnalysis} (tests hold it to that) but computes what does
 * not depend on the bars once, leaves out the handling curve, and works out one turn direction only where
 * the car is symmetric left to right. Thread-safe: it holds no mutable state.
 */
public final class SetupEvaluator {
    /** The handling curve is not needed for the figures: two points, the least the turn analysis accepts. */
    private static final int CURVE_POINTS = 2;

    private final Vehicle vehicle;
    private final MassProperties masses;
    private final AxleGrip frontGrip;
    private final AxleGrip rearGrip;
    private final double frontCornerSprungMass;
    private final double rearCornerSprungMass;

    /**
     * @throws ImpossibleVehicleException where the masses cannot be analysed whatever the bars
     */
    public SetupEvaluator(Vehicle vehicle) {
        this.vehicle = vehicle;
        this.masses = MassProperties.of(vehicle);
        this.frontGrip = new AxleGrip(new TyreModel(vehicle.front().tyre()));
        this.rearGrip = new AxleGrip(new TyreModel(vehicle.rear().tyre()));
        MassProperties.StaticWheelLoads loads = masses.staticLoads();
        this.frontCornerSprungMass = AxleStiffness.cornerSprungMass(vehicle.front(), AxlePosition.FRONT, loads.frontAxle());
        this.rearCornerSprungMass = AxleStiffness.cornerSprungMass(vehicle.rear(), AxlePosition.REAR, loads.rearAxle());
    }

    public Vehicle vehicle() {
        return vehicle;
    }

    public MassProperties masses() {
        return masses;
    }

    /** @return the axle as the vehicle has it */
    public AxleState axle(AxlePosition position) {
        return axle(position, vehicle.axle(position).bar());
    }

    /**
     * @param bar the bar to fit to that axle, or null for none
     */
    public AxleState axle(AxlePosition position, AntiRollBar bar) {
        Axle axle = vehicle.axle(position).withBar(bar);
        BarResult result = bar == null ? null : BarAnalysis.analyse(bar, vehicle.differentialWheelTravel());
        double cornerSprung = position == AxlePosition.FRONT ? frontCornerSprungMass : rearCornerSprungMass;
        return new AxleState(position, bar, result, AxleStiffness.of(axle, result, cornerSprung));
    }

    /**
     * The linear figures: roll and load transfer per a_y, model.md 5-6.
     *
     * @throws ImpossibleVehicleException where the body has no stable roll position
     */
    public RollBalance balance(AxleState front, AxleState rear) {
        double frontRoll = front.stiffness().rollStiffness();
        double rearRoll = rear.stiffness().rollStiffness();
        RollResponse roll = RollResponse.of(masses, frontRoll, rearRoll, vehicle.chassisTorsionalStiffness());
        double frontTransfer = LoadTransferParts.of(vehicle.front(), masses.frontSprungMass(), frontRoll,
                roll.frontRollPerAccel()).total();
        double rearTransfer = LoadTransferParts.of(vehicle.rear(), masses.rearSprungMass(), rearRoll,
                roll.rearRollPerAccel()).total();
        return new RollBalance(roll, frontTransfer, rearTransfer, frontTransfer / (frontTransfer + rearTransfer));
    }

    /** @return the figures with these two bars (either may be null for none) */
    public SetupFigures figures(AntiRollBar frontBar, AntiRollBar rearBar) {
        return figures(axle(AxlePosition.FRONT, frontBar), axle(AxlePosition.REAR, rearBar));
    }

    /** @return the figures of the car as it is */
    public SetupFigures figures() {
        return figures(vehicle.front().bar(), vehicle.rear().bar());
    }

    /**
     * @throws ImpossibleVehicleException where the body has no stable roll position
     */
    public SetupFigures figures(AxleState front, AxleState rear) {
        RollBalance balance = balance(front, rear);
        TurnResult left = turn(TurnDirection.LEFT, front, rear, balance);
        // with no corner masses the car is symmetric and the right turn mirrors the left one exactly
        TurnResult right = vehicle.cornerMasses() == null ? left : turn(TurnDirection.RIGHT, front, rear, balance);
        TurnResult lower = right.limit() < left.limit() ? right : left;
        return new SetupFigures(balance.frontLoadTransferShare(), balance.rollGradient(), front.barFigures(),
                rear.barFigures(), lower.limit(), lower.balance(),
                Math.min(left.frontInsideLift(), right.frontInsideLift()),
                Math.min(left.rearInsideLift(), right.rearInsideLift()),
                left.frontInsideLift() < left.limit() || right.frontInsideLift() < right.limit(),
                left.rearInsideLift() < left.limit() || right.rearInsideLift() < right.limit());
    }

    private TurnResult turn(TurnDirection direction, AxleState front, AxleState rear, RollBalance balance) {
        SteadyCornering cornering = new SteadyCornering(direction, masses, vehicle.cgHeight(),
                vehicle.front().track(), vehicle.rear().track(), balance.frontTransfer(), balance.rearTransfer(),
                balance.roll(), front.stiffness().rollStiffness(), rear.stiffness().rollStiffness(),
                vehicle.chassisTorsionalStiffness());
        return TurnAnalysis.analyse(cornering, masses.mass(), masses.frontMassFraction(), frontGrip, rearGrip,
                CURVE_POINTS);
    }
}
