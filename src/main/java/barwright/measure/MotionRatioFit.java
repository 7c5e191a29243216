package barwright.measure;

import java.util.List;

/**
 * A motion ratio fitted to travel readings (model.md 12.2).
 *
 * @param ratio                component travel / wheel travel: the slope of the straight-line fit, times
 *                             the cosine correction where an angle was given
 * @param rSquared             coefficient of determination of the straight-line fit
 * @param ratioChangePerMetre  how much the ratio grows per metre of wheel travel (1/m; negative: falling),
 *                             from the quadratic fit; 0 with fewer than 4 readings
 * @param cosineCorrection     the factor applied for the link angle (1 where none was given)
 * @param residuals            each reading's component travel minus the straight line's (m)
 * @param outliers             each reading's flag by {@link OutlierRule}
 * @param warnings             things the person should look at, in words
 */
public record MotionRatioFit(double ratio, double rSquared, double ratioChangePerMetre, double cosineCorrection,
                             List<TravelReading> readings, List<Double> residuals, List<Boolean> outliers,
                             List<String> warnings) {
    public MotionRatioFit {
        readings = List.copyOf(readings);
        residuals = List.copyOf(residuals);
        outliers = List.copyOf(outliers);
        warnings = List.copyOf(warnings);
    }

    /** @return the change of the ratio over 100 mm of wheel travel */
    public double ratioChangePer100Mm() {
        return ratioChangePerMetre * 0.1;
    }
}
