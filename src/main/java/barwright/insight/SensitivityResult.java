package barwright.insight;

import barwright.model.TurnDirection;

import java.util.List;

/**
 * What moves the balance most, for one car.
 *
 * @param vehicleName   the car's name
 * @param turn          the turn direction the figures are for: the one with the lower limit
 * @param base          the car as it is
 * @param rows          one per change, largest effect first (see {@link Sensitivity}); refused ones last
 * @param notApplicable changes left out for this car, each with why
 */
public record SensitivityResult(String vehicleName, TurnDirection turn, BalanceFigures base, List<SensitivityRow> rows,
                                List<String> notApplicable) {
    public SensitivityResult {
        rows = List.copyOf(rows);
        notApplicable = List.copyOf(notApplicable);
    }
}
