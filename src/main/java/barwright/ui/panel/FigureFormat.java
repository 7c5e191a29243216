package barwright.ui.panel;

import barwright.report.ReportJson;
import barwright.ui.field.Precision;
import barwright.ui.field.ViewSettings;
import barwright.units.Figures;
import barwright.units.Quantity;

/** Result figures as text in the chosen units and locale. */
public final class FigureFormat {
    private final ViewSettings view;

    public FigureFormat(ViewSettings view) {
        this.view = view;
    }

    /** @return e.g. "1417 N·m/deg" */
    public String text(double si, Quantity quantity) {
        return Figures.format(si, quantity, view.units(), Precision.figure(quantity, view.units()), view.locale());
    }

    /** @return the lateral acceleration at which a wheel lifts, or "stays down" where it does not by 3 g */
    public String lift(double accel) {
        return ReportJson.liftInG(accel) == null ? "stays down" : text(accel, Quantity.ACCELERATION);
    }

    /** @return a plain number with two decimals (safety factors) */
    public String factor(double value) {
        return Double.isInfinite(value) ? "unstressed" : String.format(view.locale(), "%.2f", value);
    }

    public ViewSettings view() {
        return view;
    }
}
