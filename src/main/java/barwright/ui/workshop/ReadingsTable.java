package barwright.ui.workshop;

import barwright.ui.panel.ColumnWidths;
import barwright.ui.panel.FittedColumnsTable;

import javax.swing.JViewport;
import javax.swing.event.TableModelEvent;
import javax.swing.table.TableModel;
import java.awt.Dimension;
import java.awt.FontMetrics;

/**
 * The readings typed or pasted on a workshop page. Each column's name is shown word under word ("Deflection"
 * over "(mm)", {@link #wordUnderWord}), and no column gets narrower than its name's longest word or its widest
 * content: at 28-point text on a 1024x768 projector the four names in a row were cut to "L..." and "...".
 * The columns share out what width is left; where the view is narrower than the columns need, the table keeps
 * its width and scrolls sideways rather than cut a name or a number. Event thread.
 */
final class ReadingsTable extends FittedColumnsTable {
    /** The room a cell leaves about its text (pixels): four columns share a 1024x768 view at 28-point text. */
    private static final int PADDING = 8;
    private final int rowsShown;

    /**
     * @param widest    for each column, a text as wide as its widest content (e.g. "-1234.5", "free play")
     * @param rowsShown the rows in view before the table scrolls
     */
    ReadingsTable(TableModel model, int rowsShown, String... widest) {
        super(model);
        this.rowsShown = rowsShown;
        getTableHeader().setReorderingAllowed(false);
        fitColumnsWith(ColumnWidths.atLeastTexts(PADDING, widest));
        fitRows();
    }

    @Override
    public void tableChanged(TableModelEvent event) {
        super.tableChanged(event);
        if (event == null || event.getFirstRow() == TableModelEvent.HEADER_ROW) {
            fitRows(); // new names (a change of units): the columns were made again, and fitted again above
        }
    }

    /** @return the columns' names, each with a word a line (the table's header shows them so) */
    static Object[] wordUnderWord(String... names) {
        Object[] lines = new Object[names.length];
        for (int i = 0; i < names.length; i++) {
            lines[i] = names[i].contains(" ") ? "<html>" + names[i].replace(" ", "<br>") + "</html>" : names[i];
        }
        return lines;
    }

    /** Sets the rows' height and the rows in view at the present text size, once the columns are fitted. */
    private void fitRows() {
        if (getTableHeader() == null) {
            return; // JTable's constructor asks before the header is made
        }
        FontMetrics cells = getFontMetrics(getFont());
        setRowHeight(Math.max(getRowHeight(), cells.getHeight() + 4));
        setPreferredScrollableViewportSize(new Dimension(getPreferredSize().width, rowsShown * getRowHeight()));
        getTableHeader().resizeAndRepaint();
    }

    @Override
    public void updateUI() {
        super.updateUI();
        fitRows();
    }

    @Override
    public boolean getScrollableTracksViewportWidth() {
        // fill the view where it holds every column at its least width; scroll sideways where it does not
        return !(getParent() instanceof JViewport viewport) || viewport.getWidth() >= getPreferredSize().width;
    }
}
