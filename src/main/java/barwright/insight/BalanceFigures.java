package barwright.insight;

import barwright.model.AxlePosition;
import barwright.model.TurnDirection;
import barwright.physics.AnalysisResult;
import barwright.physics.TurnResult;

/**
 * The figures a sensitivity compares, from one full analysis, in one turn direction.
 *
 * @param frontLoadTransferShare front share of lateral load transfer before any lift
 * @param rollGradient           body roll per a_y (rad s^2/m)
 * @param limitMargin            front axle limit minus rear axle limit (m/s^2): negative is understeer at the
 *                               limit, positive oversteer (model.md 8)
 * @param insideLift             the a_y at which the first inside wheel lifts (m/s^2), infinite where none does
 * @param insideLiftAxle         the axle of that wheel
 */
public record BalanceFigures(double frontLoadTransferShare, double rollGradient, double limitMargin,
                             double insideLift, AxlePosition insideLiftAxle) {

    public static BalanceFigures of(AnalysisResult result, TurnDirection turn) {
        TurnResult turnResult = result.turn(turn);
        boolean frontFirst = turnResult.frontInsideLift() <= turnResult.rearInsideLift();
        return new BalanceFigures(result.frontLoadTransferShare(), result.rollGradient(),
                turnResult.frontLimit() - turnResult.rearLimit(),
                Math.min(turnResult.frontInsideLift(), turnResult.rearInsideLift()),
                frontFirst ? AxlePosition.FRONT : AxlePosition.REAR);
    }
}
