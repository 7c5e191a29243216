package barwright.ui.linkage;

import barwright.io.KeyPath;
import barwright.io.LinkageKeys;
import barwright.io.LinkageKeys.PointKey;
import barwright.model.AxlePosition;
import barwright.ui.document.OpenDocument;
import barwright.ui.field.NumberText;
import barwright.ui.field.Precision;
import barwright.ui.field.ViewSettings;
import barwright.units.DisplayUnit;
import barwright.units.Quantity;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.DoubleNode;
import com.fasterxml.jackson.databind.node.IntNode;
import com.fasterxml.jackson.databind.node.TextNode;

import javax.swing.table.AbstractTableModel;
import java.util.List;
import java.util.OptionalDouble;

/**
 * The measured points of one axle's linkage as a table in the display unit (mm or in): one row a point, the
 * columns x (forward, for the trailing arms' 3-D pivot axis), y (out from the centreline) and z (up from the
 * ground). A typed value is one edit of the open document by its key path; text that is not a number goes to the
 * core as it stands, so the core's message (key path, value, allowed range) marks it as in every other field.
 */
final class PointTableModel extends AbstractTableModel {
    /** The coordinate columns, after the point's name: x only where a point has it (a trailing arm's pivot axis). */
    private static final String[] AXES = {"x forward", "y out from centre", "z up from ground"};
    private static final int FIRST_AXIS = 1;

    private final OpenDocument document;
    private final ViewSettings view;
    private AxlePosition axle = AxlePosition.FRONT;
    private List<PointKey> points = List.of();

    PointTableModel(OpenDocument document, ViewSettings view) {
        this.document = document;
        this.view = view;
    }

    void setAxle(AxlePosition newAxle) {
        axle = newAxle;
        reload();
    }

    AxlePosition axle() {
        return axle;
    }

    /** Rereads the points from the document (another edit, undo, a new file, the unit switch). */
    void reload() {
        List<PointKey> now = LinkageKeys.points(LinkageKeys.type(document.tree().path(axle.key())
                .get(LinkageKeys.linkage())));
        boolean sameRows = now.equals(points);
        points = now;
        if (sameRows) {
            fireTableRowsUpdated(0, Math.max(0, points.size() - 1));
            fireTableChanged(new javax.swing.event.TableModelEvent(this, javax.swing.event.TableModelEvent.HEADER_ROW));
        } else {
            fireTableStructureChanged();
        }
    }

    List<PointKey> points() {
        return points;
    }

    @Override
    public int getRowCount() {
        return points.size();
    }

    /** @return the coordinates the points have: 3 (x, y, z), 2 (y, z) or 1 (a height) */
    private int dimensions() {
        return points.stream().mapToInt(PointKey::dimensions).max().orElse(2);
    }

    @Override
    public int getColumnCount() {
        return FIRST_AXIS + dimensions();
    }

    @Override
    public String getColumnName(int column) {
        if (column < FIRST_AXIS) {
            return "Point (left side)";
        }
        String axis = dimensions() == 1 ? "height above ground" : AXES[AXES.length - dimensions() + column - FIRST_AXIS];
        return axis + " (" + unit().symbol() + ")";
    }

    @Override
    public boolean isCellEditable(int row, int column) {
        return path(row, column) != null;
    }

    /**
     * @return the key path of a cell's number, or null for the name column and a coordinate the point has not
     *         (x of a front-view point; all but z of a Watt's pivot height)
     */
    KeyPath path(int row, int column) {
        if (column < FIRST_AXIS || row >= points.size()) {
            return null;
        }
        PointKey point = points.get(row);
        // the columns are the last coordinates of the widest point: a point with fewer has the leading ones blank
        int coordinate = column - FIRST_AXIS - (dimensions() - point.dimensions());
        return coordinate < 0 || column - FIRST_AXIS >= dimensions() ? null
                : LinkageKeys.path(axle.key(), point, coordinate);
    }

    @Override
    public Object getValueAt(int row, int column) {
        if (column < FIRST_AXIS) {
            return points.get(row).label();
        }
        KeyPath path = path(row, column);
        if (path == null) {
            return "";
        }
        JsonNode node = document.value(path);
        if (node == null || node.isNull()) {
            return "";
        }
        if (!node.isNumber()) {
            return node.isTextual() ? node.textValue() : node.toString();
        }
        double display = unit().fromSi(node.doubleValue() * 1e-3);
        return NumberText.format(display, Precision.field(Quantity.LENGTH, view.units()), view.locale());
    }

    @Override
    public void setValueAt(Object value, int row, int column) {
        KeyPath path = path(row, column);
        if (path == null) {
            return;
        }
        String text = value == null ? "" : value.toString().strip();
        OptionalDouble number = NumberText.parse(text, view.locale());
        JsonNode node;
        if (number.isPresent()) {
            double millimetres = NumberText.forFile(unit().toSi(number.getAsDouble()) * 1e3);
            node = millimetres == Math.rint(millimetres) && Math.abs(millimetres) < Integer.MAX_VALUE
                    ? IntNode.valueOf((int) millimetres) : DoubleNode.valueOf(millimetres);
        } else {
            node = TextNode.valueOf(text); // the core says what is wrong with it, by key path
        }
        document.edit(path, node, null, this);
        document.closeEditStep();
    }

    private DisplayUnit unit() {
        return Quantity.LENGTH.unit(view.units());
    }
}
