package barwright.sizing;

import barwright.model.AntiRollBar;
import barwright.model.AxlePosition;
import barwright.physics.AxleStiffness;
import barwright.physics.bar.BarResult;

/**
 * One axle with one bar choice: the bar's result and the axle's stiffnesses (model.md 2-3).
 *
 * @param position   which axle
 * @param bar        the bar, or null for none
 * @param barResult  its rate and stresses, or null for none
 * @param stiffness  the axle's roll stiffnesses and rates
 */
public record AxleState(AxlePosition position, AntiRollBar bar, BarResult barResult, AxleStiffness stiffness) {

    /** @return the bar's figures, or null where the axle has no bar */
    public BarFigures barFigures() {
        if (barResult == null) {
            return null;
        }
        return new BarFigures(barResult.linkRate(), stiffness.barRollStiffness(), barResult.mass(),
                barResult.maxVonMisesStress(), barResult.safetyFactor());
    }
}
