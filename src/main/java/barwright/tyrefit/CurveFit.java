package barwright.tyrefit;

/**
 * The Magic Formula fitted to one measured curve (one load, one camber).
 *
 * @param load            F_z (N)
 * @param camber          gamma (rad)
 * @param firstLine       the curve's first line in the data file
 * @param lastLine        its last line
 * @param rows            how many points it has
 * @param formula         the fitted coefficients
 * @param rmsResidual     root mean square of measured minus fitted force (N)
 * @param worstResidual   the largest absolute residual (N)
 * @param worstLine       the line of that residual
 */
public record CurveFit(double load, double camber, int firstLine, int lastLine, int rows, MagicFormula formula,
                       double rmsResidual, double worstResidual, int worstLine) {
    /** @return the peak friction D / F_z */
    public double peakFriction() {
        return formula.peak() / load;
    }

    /** @return the RMS residual as a share of the peak D */
    public double rmsShareOfPeak() {
        return rmsResidual / formula.peak();
    }

    /** @return the worst residual as a share of the peak D */
    public double worstShareOfPeak() {
        return worstResidual / formula.peak();
    }
}
