package barwright.physics;

import barwright.model.AxlePosition;
import barwright.model.TurnDirection;

/**
 * The share of an axle's grip that load transfer costs at the limit (model.md 8.1): its capacity at the
 * limit's wheel loads against the capacity with the same load shared evenly by its two tyres. The number that
 * explains why a bar moves the balance: the axle that transfers more load loses more grip.
 */
public final class GripLostToTransfer {
    private GripLostToTransfer() {
    }

    /**
     * @return the share lost, 0 to 1 (0 for a tyre whose grip does not fall with load), with the analysis's own
     *     axle grip and, for a linkage axle, its wheels' cambers at the limit (the same in both capacities, so
     *     only the loads differ)
     */
    public static double atLimit(AnalysisResult result, AxlePosition axle, TurnDirection direction) {
        TurnResult turn = result.turn(direction);
        SteadyCornering cornering = turn.cornering();
        SteadyCornering.Point point = cornering.at(turn.limit());
        AxleGrip grip = result.grip(axle);
        double outside = point.loads().outside(axle);
        double inside = point.loads().inside(axle);
        Double outsideCamber = cornering.outsideCamber(axle, point);
        return outsideCamber == null ? grip.gripLostToTransfer(outside, inside)
                : grip.gripLostToTransfer(outside, inside, outsideCamber, cornering.insideCamber(axle, point));
    }
}
