package barwright.report.work;

import barwright.model.AxlePosition;
import barwright.physics.AnalysisResult;

/** Shows the work behind each key figure of an analysis. */
public final class Derivations {
    private Derivations() {
    }

    /**
     * @return the working of the figure
     * @throws IllegalArgumentException where the figure does not exist on this car (a bar figure with no bar)
     */
    public static Derivation of(AnalysisResult result, KeyFigure figure) {
        return switch (figure.kind()) {
            case SPRING_ROLL_STIFFNESS -> StiffnessWork.springs(result, figure.axle());
            case BAR_ROLL_STIFFNESS -> StiffnessWork.bar(result, figure.axle());
            case TYRE_ROLL_STIFFNESS -> StiffnessWork.tyres(result, figure.axle());
            case AXLE_ROLL_STIFFNESS -> StiffnessWork.axle(result, figure.axle());
            case ROLL_GRADIENT -> BalanceWork.rollGradient(result);
            case FRONT_LOAD_TRANSFER_SHARE -> BalanceWork.frontShare(result);
            case STATIC_FRONT_WEIGHT -> BalanceWork.staticFrontWeight(result);
            case UNDERSTEER_GRADIENT -> BalanceWork.understeer(result);
            case BALANCE -> TurnWork.balance(result, figure.turn());
            case BAR_BUSHING_LOAD -> BarWork.bushingLoad(result, requireBar(result, figure));
            case LIMIT -> TurnWork.limit(result, figure.turn());
            case INSIDE_LIFT -> TurnWork.lift(result, figure.axle(), figure.turn());
            case BAR_LINK_RATE -> BarWork.linkRate(result, requireBar(result, figure));
            case BAR_MASS -> BarWork.mass(result, requireBar(result, figure));
            case BAR_SAFETY_FACTOR -> BarWork.safetyFactor(result, requireBar(result, figure));
        };
    }

    private static AxlePosition requireBar(AnalysisResult result, KeyFigure figure) {
        if (result.axle(figure.axle()).bar() == null) {
            throw new IllegalArgumentException("there is no " + figure.axle().key() + " bar");
        }
        return figure.axle();
    }
}
