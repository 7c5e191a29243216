package barwright.ui.panel;

import javax.swing.JTable;
import javax.swing.table.TableCellRenderer;
import javax.swing.table.TableColumn;
import java.awt.Component;
import java.awt.FontMetrics;

/**
 * How a table's columns are fitted to their texts at the table's current font: each column as wide as the widest
 * of its header and its cells, with room either side, so that no header reads "Fo..." and no number "-2..." at
 * any text size. The tables differ only in what is given here: a width a column never goes under, a text as wide
 * as a column's widest content, how many rows are measured, and whether the fitted width is also the column's
 * least. {@link FittedColumnsTable} applies a fit
 * again as its rows and its text size change.
 */
public final class ColumnWidths {
    /** Room either side of a cell's text (pixels). */
    public static final int PADDING = 12;

    private final int[] given;
    private final String[] widestTexts;
    private final float givenTextPoints;
    private final int rowsMeasured;
    private final boolean keptAsLeast;
    private final int padding;

    private ColumnWidths(int[] given, String[] widestTexts, float givenTextPoints, int rowsMeasured,
                         boolean keptAsLeast, int padding) {
        this.given = given.clone();
        this.widestTexts = widestTexts.clone();
        this.padding = padding;
        this.givenTextPoints = givenTextPoints;
        this.rowsMeasured = rowsMeasured;
        this.keptAsLeast = keptAsLeast;
    }

    /**
     * @return a fit that measures every row and makes each column's fitted width its least as well as its
     *         preferred one, so that a table that resizes its columns never squeezes one below its texts
     */
    public static ColumnWidths wholeTexts() {
        return new ColumnWidths(new int[0], new String[0], 1f, Integer.MAX_VALUE, true, PADDING);
    }

    /**
     * @param given           each column's width at the text size below (pixels); a column is never narrower
     *                        than this, scaled down with a smaller text (never up: a larger text widens a
     *                        column only as far as its texts need)
     * @param givenTextPoints the text size the given widths were chosen at (points)
     * @param rowsMeasured    how many rows, from the first, are measured (a cap for long lists)
     * @return a fit that sets the preferred widths only
     */
    public static ColumnWidths atLeastGiven(int[] given, float givenTextPoints, int rowsMeasured) {
        return new ColumnWidths(given, new String[0], givenTextPoints, rowsMeasured, false, PADDING);
    }

    /**
     * @param padding the room a column leaves beside its widest text (pixels): less than {@link #PADDING} where
     *                the columns must share a narrow view
     * @param widest  for each column, a text as wide as its widest content (e.g. "-1234.5", "free play"),
     *                measured at the table's font in place of its rows, so that a column keeps its width as rows
     *                are typed
     * @return a fit that measures no rows and makes each column's fitted width its least as well as its preferred
     *         one
     */
    public static ColumnWidths atLeastTexts(int padding, String... widest) {
        return new ColumnWidths(new int[0], widest, 1f, 0, true, padding);
    }

    /** Sets every column's preferred width (and least width, where kept) to its fitted width. Event thread. */
    public void fit(JTable table) {
        if (table.getColumnModel() == null) {
            return; // JTable's constructor asks before its columns are made
        }
        double scale = table.getFont() == null ? 1 : table.getFont().getSize2D() / givenTextPoints;
        for (int view = 0; view < table.getColumnCount(); view++) {
            TableColumn column = table.getColumnModel().getColumn(view);
            int width = view < given.length ? (int) Math.round(given[view] * Math.min(scale, 1)) : 0;
            TableCellRenderer header = column.getHeaderRenderer() != null ? column.getHeaderRenderer()
                    : table.getTableHeader() == null ? null : table.getTableHeader().getDefaultRenderer();
            if (header != null) {
                width = Math.max(width, header.getTableCellRendererComponent(table, column.getHeaderValue(), false,
                        false, -1, view).getPreferredSize().width + padding);
            }
            if (view < widestTexts.length && table.getFont() != null) {
                FontMetrics cells = table.getFontMetrics(table.getFont());
                width = Math.max(width, cells.stringWidth(widestTexts[view]) + padding);
            }
            for (int row = 0; row < Math.min(table.getRowCount(), rowsMeasured); row++) {
                width = Math.max(width, wholeCell(table, row, view).getPreferredSize().width + padding);
            }
            if (keptAsLeast) {
                column.setMinWidth(width);
            }
            column.setPreferredWidth(width);
        }
    }

    /** The cell as drawn with its whole text, also where the view cuts its column (see FittedColumnsTable). */
    private static Component wholeCell(JTable table, int row, int column) {
        TableCellRenderer renderer = table.getCellRenderer(row, column);
        return table instanceof FittedColumnsTable fitted ? fitted.prepareWholeRenderer(renderer, row, column)
                : table.prepareRenderer(renderer, row, column);
    }
}
