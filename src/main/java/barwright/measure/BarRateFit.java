package barwright.measure;

import java.util.List;
import java.util.stream.IntStream;

/**
 * A bar's rate fitted to load and deflection readings (model.md 12.1).
 *
 * @param rate      the slope of load against deflection past the free play (N/m)
 * @param lash      the free play: the deflection where the fitted line crosses zero load (m)
 * @param rSquared  coefficient of determination of the fit over the readings used
 * @param readings  the readings in the order given
 * @param residuals each reading's load minus the fitted line's load at its deflection (N)
 * @param roles     what each reading was used for
 * @param warnings  things the person should look at, in words
 */
public record BarRateFit(double rate, double lash, double rSquared, List<BarReading> readings,
                         List<Double> residuals, List<ReadingRole> roles, List<String> warnings) {
    public BarRateFit {
        readings = List.copyOf(readings);
        residuals = List.copyOf(residuals);
        roles = List.copyOf(roles);
        warnings = List.copyOf(warnings);
    }

    /** @return the readings flagged as far off the line */
    public List<BarReading> outliers() {
        return IntStream.range(0, readings.size())
                .filter(i -> roles.get(i) == ReadingRole.OUTLIER).mapToObj(readings::get).toList();
    }

    /** @return the load the fitted line gives at a deflection (N) */
    public double loadAt(double deflection) {
        return rate * (deflection - lash);
    }
}
