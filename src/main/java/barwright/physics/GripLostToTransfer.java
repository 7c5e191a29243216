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

    /** @return the share lost, 0 to 1 (0 for a tyre whose grip does not fall with load) */
    public static double atLimit(AnalysisResult result, AxlePosition axle, TurnDirection direction) {
        TurnResult turn = result.turn(direction);
        WheelLoads loads = turn.cornering().wheelLoads(turn.limit());
        AxleGrip grip = new AxleGrip(new TyreModel(result.vehicle().axle(axle).tyre()));
        return axle == AxlePosition.FRONT ? grip.gripLostToTransfer(loads.frontOutside(), loads.frontInside())
                : grip.gripLostToTransfer(loads.rearOutside(), loads.rearInside());
    }
}
