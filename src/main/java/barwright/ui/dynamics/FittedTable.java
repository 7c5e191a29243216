package barwright.ui.dynamics;

import javax.swing.JTable;
import javax.swing.JViewport;
import javax.swing.event.TableModelEvent;
import javax.swing.table.TableCellRenderer;
import javax.swing.table.TableColumn;
import javax.swing.table.TableModel;

/**
 * A table whose every column is at least as wide as its header and its cells' texts at the current font (again
 * each time the rows or the text size change): where the columns fit they share the view's width, where they
 * do not the table keeps them whole and scrolls sideways, so that no number is ever cut ("-2..." for "-2500").
 */
final class FittedTable extends JTable {
    /** Room either side of a cell's text (pixels). */
    private static final int PADDING = 12;

    FittedTable(TableModel model) {
        super(model);
        setAutoResizeMode(AUTO_RESIZE_SUBSEQUENT_COLUMNS);
        // a new text size reaches the header after the table: measure its titles again then
        getTableHeader().addPropertyChangeListener("font", event -> fitColumns());
        fitColumns();
    }

    /** Sets each column's least and preferred width to the widest of its header and its cells. */
    private void fitColumns() {
        if (getColumnModel() == null || getTableHeader() == null) {
            return; // JTable's constructor asks before the header is made
        }
        for (int view = 0; view < getColumnCount(); view++) {
            TableColumn column = getColumnModel().getColumn(view);
            TableCellRenderer header = column.getHeaderRenderer() != null ? column.getHeaderRenderer()
                    : getTableHeader().getDefaultRenderer();
            int width = header.getTableCellRendererComponent(this, column.getHeaderValue(), false, false, -1, view)
                    .getPreferredSize().width;
            for (int row = 0; row < getRowCount(); row++) {
                width = Math.max(width, prepareRenderer(getCellRenderer(row, view), row, view).getPreferredSize().width);
            }
            column.setMinWidth(width + PADDING);
            column.setPreferredWidth(width + PADDING);
        }
    }

    /** @return the columns' fitted widths added up */
    int fittedWidth() {
        int total = 0;
        for (int view = 0; view < getColumnCount(); view++) {
            total += getColumnModel().getColumn(view).getMinWidth();
        }
        return total;
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

    /** Stretched to the view only where the fitted columns fit in it; else as wide as they are, scrolling. */
    @Override
    public boolean getScrollableTracksViewportWidth() {
        return getParent() instanceof JViewport viewport && viewport.getWidth() >= fittedWidth();
    }
}
