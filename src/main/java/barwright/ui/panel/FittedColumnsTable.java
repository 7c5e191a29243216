package barwright.ui.panel;

import javax.swing.JLabel;
import javax.swing.JTable;
import javax.swing.JViewport;
import javax.swing.event.ChangeListener;
import javax.swing.event.TableModelEvent;
import javax.swing.table.TableCellRenderer;
import javax.swing.table.TableModel;
import java.awt.Component;
import java.awt.Rectangle;

/**
 * A table whose columns, once a {@link ColumnWidths} fit is given, are fitted to their texts again each time its
 * rows change and each time its look does (a new theme or text size), so that no column is left at the widths of
 * rows or a font it no longer shows.
 *
 * <p>Where the table is wider than its view, a column that stands only partly in view shows "…" in its cells
 * until it is scrolled into view: a figure cut at the view's edge could read as another number ("0.987 g
 * (-0.050)" as "0.987 g (-0.0").
 */
public class FittedColumnsTable extends JTable {
    /** Null until a fit is given (and while JTable's constructor runs, which already asks for a fit). */
    private ColumnWidths fit;
    /** Scrolling copies the painted cells across; the cells at the view's edges are painted afresh instead. */
    private final ChangeListener repaintOnScroll = event -> repaint();
    private JViewport viewport;

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

    /** True where part of the column, but not all of it, lies outside the table's visible rectangle. */
    public final boolean partlyOutOfView(int column) {
        Rectangle visible = getVisibleRect();
        Rectangle cell = getCellRect(0, column, true);
        if (visible.width <= 0 || cell.width <= 0) {
            return false;
        }
        boolean inView = cell.x < visible.x + visible.width && cell.x + cell.width > visible.x;
        boolean whole = cell.x >= visible.x && cell.x + cell.width <= visible.x + visible.width;
        return inView && !whole;
    }

    @Override
    public Component prepareRenderer(TableCellRenderer renderer, int row, int column) {
        Component cell = super.prepareRenderer(renderer, row, column);
        if (cell instanceof JLabel label && partlyOutOfView(column)) {
            label.setText("\u2026");
        }
        return cell;
    }

    /** The cell as JTable prepares it, with its whole text even where the view cuts its column: for measuring. */
    public final Component prepareWholeRenderer(TableCellRenderer renderer, int row, int column) {
        return super.prepareRenderer(renderer, row, column);
    }

    @Override
    public void addNotify() {
        super.addNotify();
        if (getParent() instanceof JViewport parent) {
            viewport = parent;
            viewport.addChangeListener(repaintOnScroll);
        }
    }

    @Override
    public void removeNotify() {
        if (viewport != null) {
            viewport.removeChangeListener(repaintOnScroll);
            viewport = null;
        }
        super.removeNotify();
    }

    @Override
    public void updateUI() {
        super.updateUI();
        fitColumns();
    }
}
