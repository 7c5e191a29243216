package barwright.ui.sizing;

import javax.swing.JTable;
import javax.swing.ListSelectionModel;
import javax.swing.event.TableModelEvent;
import javax.swing.table.JTableHeader;
import javax.swing.table.TableCellRenderer;
import javax.swing.table.TableColumn;
import javax.swing.table.TableModel;
import java.awt.event.MouseEvent;

/**
 * A read-only table of figures: one row chosen at a time, columns at the widths given (scrolling sideways where
 * they do not fit), and hovering shows a cell's whole text or what a column means.
 */
final class FigureTable extends JTable {
    /** The text size the given widths were chosen at (points). */
    private static final float SYSTEM_TEXT_POINTS = 13f;
    /** Rows looked at when a column is fitted to its texts: enough for any list a view shows. */
    private static final int ROWS_MEASURED = 200;
    /** Room either side of a cell's text (pixels). */
    private static final int PADDING = 12;
    private final String[] columnHelp;
    private final int[] widths;
    private boolean fitted;

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
        fitted = true;
        fitColumns();
    }

    private void fitColumns() {
        if (!fitted || getColumnModel() == null) {
            return;
        }
        double scale = getFont() == null ? 1 : getFont().getSize2D() / SYSTEM_TEXT_POINTS;
        for (int view = 0; view < getColumnCount(); view++) {
            TableColumn column = getColumnModel().getColumn(view);
            int width = view < widths.length ? (int) Math.round(widths[view] * Math.min(scale, 1)) : 0;
            TableCellRenderer header = column.getHeaderRenderer() != null ? column.getHeaderRenderer()
                    : getTableHeader() == null ? null : getTableHeader().getDefaultRenderer();
            if (header != null) {
                width = Math.max(width, header.getTableCellRendererComponent(this, column.getHeaderValue(), false,
                        false, -1, view).getPreferredSize().width + PADDING);
            }
            for (int row = 0; row < Math.min(getRowCount(), ROWS_MEASURED); row++) {
                width = Math.max(width, prepareRenderer(getCellRenderer(row, view), row, view).getPreferredSize().width
                        + PADDING);
            }
            column.setPreferredWidth(width);
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
        if (widths != null) { // updateUI runs from JTable's constructor, before the fields are set
            fitColumns();
        }
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
