package barwright.measure;

import barwright.model.AxlePosition;
import barwright.sizing.preload.GainingDiagonal;

import java.util.List;

/**
 * Four corner-scale readings and what follows from them (model.md 12.4).
 *
 * @param leftFront   scale reading (kg)
 * @param rightFront  scale reading (kg)
 * @param leftRear    scale reading (kg)
 * @param rightRear   scale reading (kg)
 * @param target      the cross weight wanted, or null
 * @param linkChange  how much longer to make the chosen axle's bar link for the target (m), or null without a
 *                    target, a car or a bar on that axle
 * @param axle        the axle whose link would change, or null
 * @param diagonal    the diagonal that gains when that link gets longer, or null
 * @param warnings    things the person should look at, in words
 */
public record CornerWeights(double leftFront, double rightFront, double leftRear, double rightRear, Double target,
                            Double linkChange, AxlePosition axle, GainingDiagonal diagonal, List<String> warnings) {
    public CornerWeights {
        warnings = List.copyOf(warnings);
    }

    /** @return the sum of the four readings (kg) */
    public double total() {
        return leftFront + rightFront + leftRear + rightRear;
    }

    /** @return the front axle's share of the total */
    public double frontShare() {
        return (leftFront + rightFront) / total();
    }

    /** @return the left side's share of the total */
    public double leftShare() {
        return (leftFront + leftRear) / total();
    }

    /** @return (left front + right rear) / total: the cross weight */
    public double crossWeight() {
        return (leftFront + rightRear) / total();
    }
}
