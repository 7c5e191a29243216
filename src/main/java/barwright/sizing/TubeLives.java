package barwright.sizing;

import barwright.model.AntiRollBar;
import barwright.model.AxlePosition;
import barwright.model.Vehicle;
import barwright.physics.RollBalance;

import java.util.ArrayList;
import java.util.List;
import java.util.OptionalDouble;

/**
 * The fatigue life of the solid bar and of each tube of a tube-or-solid comparison (docs/model.md 13), each in the
 * car in the solid bar's place, on one lap: beside mass and stress, what the tube's higher stress costs.
 *
 * @param solid the solid bar's laps to failure (+infinity for no damage; empty where its material has no data)
 * @param tubes each tube's, in the comparison's order
 * @param lap   the lap they are counted on
 */
public record TubeLives(OptionalDouble solid, List<OptionalDouble> tubes, FatigueLap lap) {
    public TubeLives {
        tubes = List.copyOf(tubes);
    }

    /**
     * @param vehicle  the car (its other axle as it is)
     * @param position the axle of the bars compared
     * @throws barwright.physics.ImpossibleVehicleException where a bar leaves the body no stable roll position
     */
    public static TubeLives of(Vehicle vehicle, AxlePosition position, TubeEquivalents.Comparison comparison,
                               FatigueLap lap) {
        SetupEvaluator evaluator = new SetupEvaluator(vehicle);
        AxleState other = evaluator.axle(position.other());
        AntiRollBar solidBar = comparison.solidBar();
        OptionalDouble solid = life(evaluator, position, solidBar, other, lap);
        List<OptionalDouble> tubes = new ArrayList<>();
        for (TubeMatch match : comparison.matches()) {
            tubes.add(life(evaluator, position, solidBar.withMaterial(match.material())
                    .withSection(match.size().section()), other, lap));
        }
        return new TubeLives(solid, tubes, lap);
    }

    private static OptionalDouble life(SetupEvaluator evaluator, AxlePosition position, AntiRollBar bar,
                                       AxleState other, FatigueLap lap) {
        AxleState state = evaluator.axle(position, bar);
        RollBalance balance = position == AxlePosition.FRONT ? evaluator.balance(state, other)
                : evaluator.balance(other, state);
        return lap.lapsToFailure(evaluator.vehicle(), state, balance);
    }
}
