package barwright.sizing;

import barwright.model.AxlePosition;
import barwright.physics.Balance;

/**
 * The figures a setter compares setups by, for one pair of bars (model.md 3-8), in SI. Where the car is not
 * symmetric the turn with the lower limit is the one reported for the limit and balance, and each lift is the
 * earlier of the two turn directions.
 *
 * @param frontLoadTransferShare dF_f / (dF_f + dF_r) before any lift
 * @param rollGradient           body roll per unit a_y (rad s^2/m)
 * @param frontBar               the front bar's figures, or null for no bar
 * @param rearBar                the rear bar's figures, or null for no bar
 * @param limit                  the lower of the two turn directions' limits (m/s^2)
 * @param balance                which axle reaches its grip first in that turn
 * @param frontInsideLift        the earliest a_y at which an inside front wheel lifts (m/s^2; infinite if never)
 * @param rearInsideLift         the same for the rear (m/s^2)
 * @param frontLiftsBeforeLimit  an inside front wheel lifts below the limit of its turn
 * @param rearLiftsBeforeLimit   an inside rear wheel lifts below the limit of its turn
 */
public record SetupFigures(double frontLoadTransferShare, double rollGradient, BarFigures frontBar,
                           BarFigures rearBar, double limit, Balance balance, double frontInsideLift,
                           double rearInsideLift, boolean frontLiftsBeforeLimit, boolean rearLiftsBeforeLimit) {

    public BarFigures bar(AxlePosition axle) {
        return axle == AxlePosition.FRONT ? frontBar : rearBar;
    }

    public double insideLift(AxlePosition axle) {
        return axle == AxlePosition.FRONT ? frontInsideLift : rearInsideLift;
    }

    public boolean liftsBeforeLimit(AxlePosition axle) {
        return axle == AxlePosition.FRONT ? frontLiftsBeforeLimit : rearLiftsBeforeLimit;
    }
}
