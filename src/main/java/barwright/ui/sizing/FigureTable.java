package barwright.ui.sizing;

import barwright.ui.panel.ColumnWidths;
import barwright.ui.panel.FittedColumnsTable;

import javax.swing.ListSelectionModel;
import javax.swing.table.JTableHeader;
import javax.swing.table.TableModel;
import java.awt.event.MouseEvent;

/**
 * A read-only table of figures: one row chosen at a time, columns at the widths given (scrolling sideways where
 * they do not fit), and hovering shows a cell's whole text or what a column means.
 */
final class FigureTable extends FittedColumnsTable {
    /** The text size the given widths were chosen at (points). */
    private static final float SYSTEM_TEXT_POINTS = 13f;
    /** Rows looked at when a column is fitted to its texts: enough for any list a view shows. */
    private static final int ROWS_MEASURED = 200;
    private final String[] columnHelp;
    private final int[] widths;

    /**
     * @param columnHelp what each column of the model means, shown on its header
     * @param widths     each column's width (pixels at the system text size)
     */
    FigureTable(String name, TableModel model, String[] columnHelp, int[] widths) {
        super(model);
        this.columnHelp = columnHelp.clone();
        this.widths = widths.clone();
        setName(name);
        setSelectionMode(ListSelectionModel.SINGLE_SELECTION);
        setAutoResizeMode(AUTO_RESIZE_OFF);
        setFillsViewportHeight(true);
        getTableHeader().setReorderingAllowed(false);
        for (int i = 0; i < widths.length && i < getColumnCount(); i++) {
            getColumnModel().getColumn(i).setPreferredWidth(widths[i]);
        }
    }

    /**
     * Sizes every column to the widest of its header and its texts (from now on, each time the rows change or the
     * text size does), never narrower than its given width scaled to the text size, so that nothing is cut at any
     * text size and no column takes room it does not need.
     */
    void fitColumnsToTexts() {
        fitColumnsWith(ColumnWidths.atLeastGiven(widths, SYSTEM_TEXT_POINTS, ROWS_MEASURED));
    }

    @Override
    public String getToolTipText(MouseEvent event) {
        int row = rowAtPoint(event.getPoint());
        int column = columnAtPoint(event.getPoint());
        if (row < 0 || column < 0) {
            return null;
        }
        Object value = getValueAt(row, column);
        return value == null || value.toString().isBlank() ? null : value.toString();
    }

    @Override
    protected JTableHeader createDefaultTableHeader() {
        return new JTableHeader(columnModel) {
            @Override
            public String getToolTipText(MouseEvent event) {
                int column = columnAtPoint(event.getPoint());
                int index = column < 0 ? -1 : convertColumnIndexToModel(column);
                return index < 0 || index >= columnHelp.length ? null : columnHelp[index];
            }
        };
    }
}
