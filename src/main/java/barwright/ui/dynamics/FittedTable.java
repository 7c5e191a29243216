package barwright.ui.dynamics;

import barwright.ui.panel.ColumnWidths;
import barwright.ui.panel.FittedColumnsTable;

import javax.swing.JViewport;
import javax.swing.table.TableModel;

/**
 * A table whose every column is at least as wide as its header and its cells' texts at the current font (again
 * each time the rows or the text size change): where the columns fit they share the view's width, where they
 * do not the table keeps them whole and scrolls sideways, so that no number is ever cut ("-2..." for "-2500").
 */
final class FittedTable extends FittedColumnsTable {
    FittedTable(TableModel model) {
        super(model);
        setAutoResizeMode(AUTO_RESIZE_SUBSEQUENT_COLUMNS);
        // a new text size reaches the header after the table: measure its titles again then
        getTableHeader().addPropertyChangeListener("font", event -> fitColumns());
        // every row measured, and each fitted width kept as the column's least: the table never squeezes one
        fitColumnsWith(ColumnWidths.wholeTexts());
    }

    /** @return the columns' fitted widths added up */
    int fittedWidth() {
        int total = 0;
        for (int view = 0; view < getColumnCount(); view++) {
            total += getColumnModel().getColumn(view).getMinWidth();
        }
        return total;
    }

    /** Stretched to the view only where the fitted columns fit in it; else as wide as they are, scrolling. */
    @Override
    public boolean getScrollableTracksViewportWidth() {
        return getParent() instanceof JViewport viewport && viewport.getWidth() >= fittedWidth();
    }
}
