package barwright.measure;

import barwright.model.AxlePosition;
import barwright.model.Vehicle;
import barwright.sizing.preload.GainingDiagonal;
import barwright.sizing.preload.LinkPreload;
import barwright.sizing.preload.PreloadResult;
import barwright.units.Constants;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import static barwright.measure.BarRateMeasurement.plain;

/**
 * Corner weights (model.md 12.4): the front and left shares and the cross weight are sums of the readings
 * (common practice); the link change for a target cross weight comes from the link preload model
 * (model.md 9, {@link LinkPreload}), which is linear in the link change.
 */
public final class CornerWeighing {
    /** Readings whose sum differs from the car's mass by more than this share get a warning (the program's choice:
     * fuel, driver and scale error between two weighings). */
    public static final double MASS_WARNING_SHARE = 0.02;
    /** Beyond this share the readings are refused: another car, or the scales read in another unit. */
    public static final double MASS_REFUSAL_SHARE = 0.25;
    /** Cross weights the target may ask for (shares). */
    public static final double LOWEST_TARGET = 0.3;
    public static final double HIGHEST_TARGET = 0.7;

    private CornerWeighing() {
    }

    /** The four readings alone. */
    public static CornerWeights of(double leftFront, double rightFront, double leftRear, double rightRear)
            throws MeasurementException {
        check(leftFront, rightFront, leftRear, rightRear);
        return new CornerWeights(leftFront, rightFront, leftRear, rightRear, null, null, null, null, List.of());
    }

    /**
     * The readings on a car, with the link change that brings the cross weight to the target.
     *
     * @param target   cross weight wanted (share), or null
     * @param axle     the axle whose bar link changes
     * @param diagonal the diagonal that gains load when that link gets longer
     */
    public static CornerWeights of(double leftFront, double rightFront, double leftRear, double rightRear,
                                   Vehicle vehicle, Double target, AxlePosition axle, GainingDiagonal diagonal)
            throws MeasurementException {
        check(leftFront, rightFront, leftRear, rightRear);
        double total = leftFront + rightFront + leftRear + rightRear;
        List<String> warnings = new ArrayList<>();
        double share = total / vehicle.mass() - 1;
        String comparison = String.format(Locale.ROOT, "the scales add up to %s kg and the car file says %s kg "
                + "(%+.1f %%)", plain(total), plain(vehicle.mass()), share * 100);
        if (Math.abs(share) > MASS_REFUSAL_SHARE) {
            throw new MeasurementException(comparison + ": more than " + Math.round(MASS_REFUSAL_SHARE * 100)
                    + " % apart. Is it the same car, and do the scales read in kg?");
        }
        if (Math.abs(share) > MASS_WARNING_SHARE) {
            warnings.add(comparison + ": more than " + Math.round(MASS_WARNING_SHARE * 100) + " % apart; check the "
                    + "fuel, the driver or ballast, and that the scales were zeroed");
        }
        if (target != null && !(target >= LOWEST_TARGET && target <= HIGHEST_TARGET)) {
            throw new MeasurementException("target cross weight " + plain(target) + ": must be from "
                    + LOWEST_TARGET + " to " + HIGHEST_TARGET + " (a share, 0.50 for half)");
        }
        Double linkChange = null;
        if (target != null && vehicle.axle(axle).bar() != null) {
            double cross = (leftFront + rightRear) / total;
            PreloadResult perMetre = LinkPreload.of(vehicle, axle, diagonal, 1.0);
            // left front + right rear gain per metre of link, as a share of the weighed car
            double crossPerMetre = (perMetre.changePerLength().leftFront() + perMetre.changePerLength().rightRear())
                    / (total * Constants.STANDARD_GRAVITY);
            linkChange = (target - cross) / crossPerMetre;
        } else if (target != null) {
            warnings.add("the " + axle.key() + " axle has no bar, so no link change is worked out");
        }
        return new CornerWeights(leftFront, rightFront, leftRear, rightRear, target, linkChange, axle, diagonal,
                warnings);
    }

    private static void check(double... readings) throws MeasurementException {
        String[] names = {"left front", "right front", "left rear", "right rear"};
        for (int i = 0; i < readings.length; i++) {
            if (!Double.isFinite(readings[i]) || !(readings[i] > 0) || readings[i] > 10000) {
                throw new MeasurementException(names[i] + " scale " + plain(readings[i]) + " kg: must be more than "
                        + "0 and at most 10000 kg");
            }
        }
    }
}
