package barwright.sizing;

/**
 * The dimension that meets a target exactly, or why none does.
 *
 * @param dimension    the solid diameter or the tube wall that meets it (m), or NaN where none in range does
 * @param figure       which figure was aimed at
 * @param target       its wanted value (share, or rad s^2/m)
 * @param achieved     its value at that dimension (NaN where none)
 * @param lowestReach  the least value the figure takes over the range tried
 * @param highestReach the largest value it takes over the range tried
 */
public record ExactSolution(double dimension, TargetFigure figure, double target, double achieved,
                            double lowestReach, double highestReach) {

    /** Which figure an exact size is solved for. */
    public enum TargetFigure {
        FRONT_SHARE, ROLL_GRADIENT
    }

    public boolean found() {
        return !Double.isNaN(dimension);
    }
}
