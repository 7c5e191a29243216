package barwright.sizing;

import barwright.model.AntiRollBar;
import barwright.model.AxlePosition;
import barwright.physics.ImpossibleVehicleException;

import java.util.EnumMap;
import java.util.List;
import java.util.Map;
import java.util.Optional;

/**
 * Which front shares of lateral load transfer a search can reach at all ({@link ShareReach}), worked out with the
 * same evaluator the search uses: one balance with the sized bars at their softest and one at their stiffest.
 * The softest is no bar (or, where the body has no stable roll without one, the softest bar the search may
 * propose); the stiffest is the stock size, material and hole with the largest bar roll stiffness among those
 * that pass the bar's own limits (outside diameter, mass, safety factor). The front share rises with the front
 * roll stiffness and falls with the rear one (model.md 6), so every bar the search tries lies between the ends.
 */
public final class ReachableShare {
    private ReachableShare() {
    }

    /** @return the reach of the request's bars on the evaluator's car, or empty where it has none (see below) */
    public static Optional<ShareReach> of(SetupEvaluator evaluator, SizingRequest request) {
        return of(evaluator, request.axles(), request.choices(), request.constraints());
    }

    /**
     * @param axles       the sized axles
     * @param choices     what the search may pick for each sized axle
     * @param constraints the limits every bar must meet (the bar's own ones are used)
     * @return the reach, or empty where no bar the search may propose passes its limits, or the body has no
     *         stable roll at either end
     * @throws IllegalArgumentException where a sized axle has no bar to size
     */
    public static Optional<ShareReach> of(SetupEvaluator evaluator, List<AxlePosition> axles,
                                          Map<AxlePosition, SizeChoices> choices, Constraints constraints) {
        Map<AxlePosition, AxleState> softest = new EnumMap<>(AxlePosition.class);
        Map<AxlePosition, AxleState> stiffest = new EnumMap<>(AxlePosition.class);
        for (AxlePosition position : AxlePosition.values()) {
            if (!axles.contains(position)) {
                AxleState asItIs = evaluator.axle(position);
                softest.put(position, asItIs);
                stiffest.put(position, asItIs);
                continue;
            }
            AntiRollBar base = BarSearch.requireBar(evaluator.vehicle(), position);
            AxleState stiff = null;
            AxleState soft = null;
            for (BarChoice choice : BarSearch.enumerate(position, base, choices.get(position))) {
                BarSearch.Screened screened = BarSearch.screen(evaluator, constraints, choice);
                if (screened.rejection() != null) {
                    continue;
                }
                double roll = screened.state().stiffness().barRollStiffness();
                if (stiff == null || roll > stiff.stiffness().barRollStiffness()) {
                    stiff = screened.state();
                }
                if (soft == null || roll < soft.stiffness().barRollStiffness()) {
                    soft = screened.state();
                }
            }
            if (stiff == null) {
                return Optional.empty();
            }
            stiffest.put(position, stiff);
            softest.put(position, stableWithout(evaluator, position, soft));
        }
        try {
            double first = share(evaluator, softest.get(AxlePosition.FRONT), stiffest.get(AxlePosition.REAR));
            double second = share(evaluator, stiffest.get(AxlePosition.FRONT), softest.get(AxlePosition.REAR));
            return Optional.of(new ShareReach(Math.min(first, second), Math.max(first, second)));
        } catch (ImpossibleVehicleException unstable) {
            return Optional.empty();
        }
    }

    /** @return the axle with no bar, or with the softest bar allowed where the body cannot roll stably without */
    private static AxleState stableWithout(SetupEvaluator evaluator, AxlePosition position,
                                           AxleState softestAllowed) {
        AxleState none = evaluator.axle(position, null);
        AxleState other = evaluator.axle(position.other());
        try {
            if (position == AxlePosition.FRONT) {
                evaluator.balance(none, other);
            } else {
                evaluator.balance(other, none);
            }
            return none;
        } catch (ImpossibleVehicleException unstable) {
            return softestAllowed;
        }
    }

    private static double share(SetupEvaluator evaluator, AxleState front, AxleState rear) {
        return evaluator.balance(front, rear).frontLoadTransferShare();
    }
}
