package barwright.sizing;

import barwright.model.AntiRollBar;
import barwright.model.AxlePosition;
import barwright.model.Vehicle;
import barwright.physics.AnalysisPipeline;
import barwright.physics.ImpossibleVehicleException;
import barwright.physics.MassProperties;
import barwright.physics.RollBalance;
import barwright.physics.TurnPair;
import barwright.physics.TurnResult;
import barwright.physics.bar.BarResult;

/**
 * The figures of a car with its bars swapped, for searches and maps that try thousands of bars. It runs the
 * stages of the one {@link AnalysisPipeline} (what does not depend on the bars once, then each bar pair's
 * stiffness, linear and turn stages) and leaves out the handling curve. Thread-safe: it holds no mutable
 * state.
 */
public final class SetupEvaluator {
    /** The handling curve is not needed for the figures: two points, the least the turn analysis accepts. */
    private static final int CURVE_POINTS = 2;

    private final AnalysisPipeline pipeline;

    /**
     * @throws ImpossibleVehicleException where the masses cannot be analysed whatever the bars
     */
    public SetupEvaluator(Vehicle vehicle) {
        this.pipeline = new AnalysisPipeline(vehicle);
    }

    public Vehicle vehicle() {
        return pipeline.vehicle();
    }

    public MassProperties masses() {
        return pipeline.masses();
    }

    /** @return the axle as the vehicle has it */
    public AxleState axle(AxlePosition position) {
        return axle(position, vehicle().axle(position).bar());
    }

    /**
     * @param bar the bar to fit to that axle, or null for none
     */
    public AxleState axle(AxlePosition position, AntiRollBar bar) {
        BarResult result = pipeline.barResult(bar);
        return new AxleState(position, bar, result, pipeline.axleStiffness(position, bar, result));
    }

    /**
     * The linear figures: roll and load transfer per a_y, model.md 5-6.
     *
     * @throws ImpossibleVehicleException where the body has no stable roll position
     */
    public RollBalance balance(AxleState front, AxleState rear) {
        return pipeline.balance(front.stiffness(), rear.stiffness());
    }

    /** @return the figures with these two bars (either may be null for none) */
    public SetupFigures figures(AntiRollBar frontBar, AntiRollBar rearBar) {
        return figures(axle(AxlePosition.FRONT, frontBar), axle(AxlePosition.REAR, rearBar));
    }

    /** @return the figures of the car as it is */
    public SetupFigures figures() {
        return figures(vehicle().front().bar(), vehicle().rear().bar());
    }

    /**
     * @throws ImpossibleVehicleException where the body has no stable roll position
     */
    public SetupFigures figures(AxleState front, AxleState rear) {
        RollBalance balance = balance(front, rear);
        TurnPair turns = pipeline.turns(balance, CURVE_POINTS);
        TurnResult left = turns.left();
        TurnResult right = turns.right();
        TurnResult lower = right.limit() < left.limit() ? right : left;
        return new SetupFigures(balance.frontLoadTransferShare(), balance.rollGradient(), front.barFigures(),
                rear.barFigures(), lower.limit(), lower.balance(),
                Math.min(left.frontInsideLift(), right.frontInsideLift()),
                Math.min(left.rearInsideLift(), right.rearInsideLift()),
                left.frontInsideLift() < left.limit() || right.frontInsideLift() < right.limit(),
                left.rearInsideLift() < left.limit() || right.rearInsideLift() < right.limit());
    }
}
