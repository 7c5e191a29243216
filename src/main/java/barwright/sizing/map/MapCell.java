package barwright.sizing.map;

import barwright.sizing.SetupFigures;

/**
 * One cell of an adjustment map: a front option with a rear option.
 *
 * @param front   the front bar and hole
 * @param rear    the rear bar and hole
 * @param figures what the car does, or null where it has no stable roll position
 * @param problem why there are no figures, or null
 */
public record MapCell(BarOption front, BarOption rear, SetupFigures figures, String problem) {
    /** @return true where both options are what the vehicle has */
    public boolean current() {
        return front.current() && rear.current();
    }
}
