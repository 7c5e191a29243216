package barwright.ui.tyre;

import barwright.tyrefit.CurveFit;
import barwright.ui.field.ViewSettings;
import barwright.units.Quantity;

import javax.swing.table.AbstractTableModel;
import java.util.List;
import java.util.Locale;

import static barwright.units.Constants.RADIANS_PER_DEGREE;

/**
 * The fit's residuals per measured curve, in the view's force unit: the curve's load and camber, its lines in the
 * file, the fitted peak, and the RMS and worst residuals in force and as a share of the peak. Event thread.
 */
final class ResidualTableModel extends AbstractTableModel {
    private final ViewSettings view;
    private List<CurveFit> curves = List.of();

    ResidualTableModel(ViewSettings view) {
        this.view = view;
    }

    void show(List<CurveFit> fitted) {
        curves = List.copyOf(fitted);
        fireTableDataChanged();
    }

    /** The unit switch: new column titles and figures. */
    void relabel() {
        fireTableStructureChanged();
    }

    @Override
    public int getRowCount() {
        return curves.size();
    }

    @Override
    public int getColumnCount() {
        return 6;
    }

    @Override
    public String getColumnName(int column) {
        String force = Quantity.FORCE.unit(view.units()).symbol();
        return switch (column) {
            case 0 -> "Load (" + force + ")";
            case 1 -> "Camber (°)";
            case 2 -> "Lines (points)";
            case 3 -> "Fitted peak (" + force + ")";
            case 4 -> "RMS residual (" + force + ", % of peak)";
            default -> "Worst residual (" + force + ", % of peak, line)";
        };
    }

    @Override
    public Object getValueAt(int row, int column) {
        CurveFit curve = curves.get(row);
        return switch (column) {
            case 0 -> force(curve.load(), 0);
            case 1 -> String.format(view.locale(), "%.1f", curve.camber() / RADIANS_PER_DEGREE);
            case 2 -> String.format(Locale.ROOT, "%d–%d (%d)", curve.firstLine(), curve.lastLine(), curve.rows());
            case 3 -> force(curve.formula().peak(), 0);
            case 4 -> String.format(view.locale(), "%s (%.2f %%)", force(curve.rmsResidual(), 1),
                    100 * curve.rmsShareOfPeak());
            default -> String.format(view.locale(), "%s (%.2f %%) at line %d", force(curve.worstResidual(), 1),
                    100 * curve.worstShareOfPeak(), curve.worstLine());
        };
    }

    /** @return the number alone, in the view's force unit: the column title carries the unit */
    private String force(double si, int decimals) {
        return String.format(view.locale(), "%." + decimals + "f", Quantity.FORCE.unit(view.units()).fromSi(si));
    }
}
