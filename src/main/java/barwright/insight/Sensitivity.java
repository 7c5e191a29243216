package barwright.insight;

import barwright.model.TurnDirection;
import barwright.model.Vehicle;
import barwright.physics.AnalysisResult;
import barwright.physics.ImpossibleVehicleException;
import barwright.physics.VehicleAnalysis;

import java.util.ArrayList;
import java.util.Comparator;
import java.util.List;

/**
 * What moves the balance most: every change of {@link InputChanges} is applied to the car and the changed car
 * analysed in full; each figure is the difference of the two analyses, never an estimate.
 */
public final class Sensitivity {
    /**
     * Largest effect first: changes that move the limit balance by their change of the limit margin, then the
     * others by their change of the front share; refused changes last.
     */
    private static final Comparator<SensitivityRow> BY_EFFECT = Comparator
            .comparing((SensitivityRow row) -> !row.analysed())
            .thenComparing(row -> row.analysed() && row.tendency().atLimit() ? -Math.abs(row.limitMarginChange()) : 0.0)
            .thenComparing(row -> row.analysed() ? -Math.abs(row.frontShareChange()) : 0.0);

    private Sensitivity() {
    }

    /** @param analysis the full analysis of {@code vehicle} as it is */
    public static SensitivityResult of(Vehicle vehicle, AnalysisResult analysis) {
        TurnDirection turn = analysis.rightTurn().limit() < analysis.leftTurn().limit()
                ? TurnDirection.RIGHT : TurnDirection.LEFT;
        BalanceFigures base = BalanceFigures.of(analysis, turn);
        InputChanges.Catalogue catalogue = InputChanges.of(vehicle);
        List<SensitivityRow> rows = new ArrayList<>();
        for (InputChange change : catalogue.changes()) {
            rows.add(row(vehicle, change, base, turn));
        }
        rows.sort(BY_EFFECT);
        return new SensitivityResult(vehicle.name(), turn, base, rows, catalogue.notApplicable());
    }

    public static SensitivityResult of(Vehicle vehicle) {
        return of(vehicle, VehicleAnalysis.analyse(vehicle));
    }

    private static SensitivityRow row(Vehicle vehicle, InputChange change, BalanceFigures base, TurnDirection turn) {
        try {
            AnalysisResult changed = VehicleAnalysis.analyse(change.apply().apply(vehicle));
            return new SensitivityRow(change, base, BalanceFigures.of(changed, turn), null);
        } catch (ImpossibleVehicleException | IllegalArgumentException refused) {
            return new SensitivityRow(change, base, null, refused.getMessage());
        }
    }
}
