package barwright.ui.sizing;

import javax.swing.table.AbstractTableModel;

/** A read-only table of texts with fixed column names; the rows are the subclass's. */
abstract class TextTableModel extends AbstractTableModel {
    private final String[] columns;

    TextTableModel(String... columns) {
        this.columns = columns.clone();
    }

    @Override
    public final int getColumnCount() {
        return columns.length;
    }

    @Override
    public final String getColumnName(int column) {
        return columns[column];
    }
}
