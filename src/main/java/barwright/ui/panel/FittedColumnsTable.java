package barwright.ui.panel;

import javax.swing.JTable;
import javax.swing.event.TableModelEvent;
import javax.swing.table.TableModel;

/**
 * A table whose columns, once a {@link ColumnWidths} fit is given, are fitted to their texts again each time its
 * rows change and each time its look does (a new theme or text size), so that no column is left at the widths of
 * rows or a font it no longer shows.
 */
public class FittedColumnsTable extends JTable {
    /** Null until a fit is given (and while JTable's constructor runs, which already asks for a fit). */
    private ColumnWidths fit;

    public FittedColumnsTable(TableModel model) {
        super(model);
    }

    /** Fits the columns with this fit, now and from now on. Event thread. */
    protected final void fitColumnsWith(ColumnWidths widths) {
        fit = widths;
        fitColumns();
    }

    /** Fits the columns again, where a fit has been given. Event thread. */
    protected final void fitColumns() {
        if (fit != null) {
            fit.fit(this);
        }
    }

    @Override
    public void tableChanged(TableModelEvent event) {
        super.tableChanged(event);
        fitColumns();
    }

    @Override
    public void updateUI() {
        super.updateUI();
        fitColumns();
    }
}
