package barwright.ui.dynamics;

import com.fasterxml.jackson.databind.JsonNode;

import barwright.loading.VehicleLoader;

import barwright.io.DamperEdits;
import barwright.io.DynamicsInputReader;
import barwright.io.Problem;
import barwright.io.VehicleFileException;
import barwright.model.AxlePosition;
import barwright.model.Damper;
import barwright.model.DynamicsInputs;
import barwright.ui.chart.DamperChart;
import barwright.ui.document.OpenDocument;
import barwright.ui.field.NumberText;
import barwright.ui.field.ViewSettings;
import barwright.ui.panel.Palette;
import barwright.units.DisplayUnit;
import barwright.units.Quantity;
import com.fasterxml.jackson.databind.node.ObjectNode;

import javax.swing.BorderFactory;
import javax.swing.JComboBox;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.JSplitPane;
import javax.swing.JTable;
import javax.swing.UIManager;
import javax.swing.table.AbstractTableModel;
import java.awt.BorderLayout;
import java.awt.Dimension;
import java.awt.Insets;
import java.awt.FlowLayout;
import java.util.List;
import java.util.Locale;
import java.util.OptionalDouble;

/**
 * One axle's dampers: the force against velocity curve at the damper and at the wheel, the motion ratio, and
 * the points in a table whose two first columns can be typed into. Each point typed is one undoable edit of the
 * open car; a point the file reader would refuse is refused here with its key path and range, and the car stays
 * as it was. Event thread.
 */
public final class DamperPage extends JPanel {
    private final OpenDocument document;
    private final ViewSettings view;
    private final JComboBox<String> axle = new JComboBox<>(new String[] {"Front", "Rear"});
    private final JLabel ratio = new JLabel(" ");
    private final JLabel message = new JLabel(" ");
    private final DamperChart chart = new DamperChart();
    private final Points points = new Points();
    private final JTable table;

    /** The table's share of the width with the chart beside it. */
    private static final double SIDE_BY_SIDE_TABLE_SHARE = 0.42;
    /**
     * The page's least height at the normal text size (doubled on a narrow page, where the chart is under the
     * table): below it the page scrolls rather than squeezing the chart's plot away.
     */
    private static final int LEAST_HEIGHT = 260;

    public DamperPage(OpenDocument document, ViewSettings view) {
        super(new BorderLayout(8, 8));
        setName("dampers.page");
        this.document = document;
        this.view = view;
        table = new FittedTable(points); // after the view: the table asks the column names at once
        axle.setName("dampers.axle");
        axle.addActionListener(event -> refresh());
        ratio.setName("dampers.ratio");
        message.setName("dampers.message");
        table.setName("dampers.points");
        table.setSurrendersFocusOnKeystroke(true);
        table.putClientProperty("terminateEditOnFocusLost", Boolean.TRUE);

        JPanel top = new JPanel(new FlowLayout(FlowLayout.LEADING));
        top.add(new JLabel("Dampers on the"));
        top.add(axle);
        top.add(new JLabel("axle"));
        JScrollPane tableScroll = new JScrollPane(table) {
            /**
             * As tall as the header and the rows (room for three at least) and no more, at the current text
             * size: with the chart under it, the table does not take the chart's height with empty rows.
             */
            @Override
            public Dimension getPreferredSize() {
                Dimension wanted = super.getPreferredSize();
                Insets border = getInsets();
                int rows = Math.max(3, table.getRowCount()) * table.getRowHeight();
                int header = table.getTableHeader().getPreferredSize().height;
                int scrollBar = getHorizontalScrollBar().isVisible() ? getHorizontalScrollBar().getHeight() : 0;
                return new Dimension(wanted.width, border.top + header + rows + scrollBar + border.bottom + 2);
            }
        };
        JLabel help = new JLabel("<html>Type a point's velocity or force at the damper (the first two columns; "
                + "the last two are the same point at the wheel): bump positive, rebound negative, through 0 at 0. "
                + "Each change is one step of Edit &gt; Undo.</html>");
        help.setForeground(Palette.muted());
        JSplitPane split = new JSplitPane(JSplitPane.HORIZONTAL_SPLIT, tableScroll, chart.component()) {
            /**
             * With the chart under the table, the divider stays at the table's height (its header and rows at
             * the current text size) whenever that height changes: reset to the preferred sizes, a short page
             * squeezed the table to its header, and a text size changed after the page was made left rows hidden.
             * A divider the user drags stays where it is put.
             */
            private int placedAt = -1;

            @Override
            public void doLayout() {
                int wanted = tableScroll.getPreferredSize().height;
                if (getOrientation() == VERTICAL_SPLIT && wanted != placedAt) {
                    placedAt = wanted;
                    setDividerLocation(wanted);
                }
                super.doLayout();
            }

            @Override
            public void resetToPreferredSizes() {
                super.resetToPreferredSizes();
                placedAt = -1; // turned (FitOrScroll): placed anew at the next layout
            }
        };
        split.setResizeWeight(SIDE_BY_SIDE_TABLE_SHARE);
        // on a narrow page the chart goes under the table (FitOrScroll turns the split): the table then keeps
        // the height of its rows and the chart takes the rest, instead of a sideways-scrolled column beside a
        // chart with no room for its plot
        split.addPropertyChangeListener(JSplitPane.ORIENTATION_PROPERTY, change -> split.setResizeWeight(
                split.getOrientation() == JSplitPane.VERTICAL_SPLIT ? 0 : SIDE_BY_SIDE_TABLE_SHARE));
        // the table's scroll pane is a validate root: taller rows, a larger header or other rows lay the split out
        // again, so that its divider follows the table's height
        table.addPropertyChangeListener("rowHeight", change -> split.revalidate());
        table.getTableHeader().addPropertyChangeListener("font", change -> split.revalidate());
        points.addTableModelListener(change -> split.revalidate());
        setBorder(BorderFactory.createEmptyBorder(8, 8, 8, 8));
        // the motion ratio's sentence and the help across the whole page, not in the top row or under the table:
        // at a large text, in a row or a narrow column, they took the table's rows
        JPanel bottom = new JPanel(new BorderLayout(4, 4));
        bottom.add(ratio, BorderLayout.NORTH);
        bottom.add(help, BorderLayout.CENTER);
        bottom.add(message, BorderLayout.SOUTH);
        JPanel content = new JPanel(new BorderLayout(8, 8));
        content.add(top, BorderLayout.NORTH);
        content.add(split, BorderLayout.CENTER);
        content.add(bottom, BorderLayout.SOUTH);
        add(FitOrScroll.of(content, LEAST_HEIGHT, split), BorderLayout.CENTER);
        document.addListener(event -> refresh());
        view.addListener(this::refresh);
        refresh();
    }

    private AxlePosition selectedAxle() {
        return axle.getSelectedIndex() == 1 ? AxlePosition.REAR : AxlePosition.FRONT;
    }

    private String axleWords() {
        return (String) axle.getSelectedItem();
    }

    /** Reads the chosen axle's damper from the open car and redraws the table and the chart. */
    private void refresh() {
        AxlePosition position = selectedAxle();
        points.load(DamperEdits.points(document.tree(), position));
        Damper damper = acceptedDamper(position);
        if (damper == null) {
            chart.clear(axleWords() + " axle: no damper in the file");
            ratio.setText(" ");
            say(axleWords() + " axle: this car has no damper here. The roll in motion then assumes none on this "
                    + "axle: nothing takes the energy out of the roll, so the body overshoots more and rocks for "
                    + "longer (with none on either axle it never settles). Add \"damper\" to the axle in the file "
                    + "(file-format.md, Roll dynamics) or open the sample \"Club hatchback with dampers\".", false);
            return;
        }
        chart.show(axleWords(), damper, view.units());
        ratio.setText("<html>" + TurnInFigures.escape(String.format(view.locale(), "Motion ratio %.2f (damper "
                + "travel / wheel travel): at the wheel the velocity is divided by it and the force multiplied by it",
                damper.motionRatio())) + "</html>");
        say(" ", false);
    }

    /** @return the damper of the car as last accepted, or null where it has none */
    private Damper acceptedDamper(AxlePosition position) {
        try {
            DynamicsInputs inputs = DynamicsInputReader.read(document.lastValid().tree());
            return inputs.damper(position);
        } catch (VehicleFileException refused) {
            return null; // the accepted car's keys are never refused; nothing to draw if they were
        }
    }

    private void say(String words, boolean problem) {
        message.setText("<html>" + TurnInFigures.escape(words) + "</html>");
        message.setForeground(problem ? Palette.problem() : UIManager.getColor("Label.foreground"));
    }

    /**
     * Puts a point typed in the view's units into the car as one undoable edit, or refuses it.
     *
     * @return true where the car took it
     */
    boolean putPoint(int row, double velocitySi, double forceSi) {
        AxlePosition position = selectedAxle();
        ObjectNode trial = (ObjectNode) document.tree().deepCopy();
        DamperEdits.putPoint(trial, position, row, velocitySi, forceSi);
        String curve = DamperEdits.curvePath(position).toString();
        List<Problem> refused = refusals(trial).stream()
                .filter(problem -> problem.path().startsWith(curve)).toList();
        if (!refused.isEmpty()) {
            say("Not taken: " + refused.get(0), true);
            points.fireTableDataChanged();
            return false;
        }
        document.editAll(tree -> DamperEdits.putPoint(tree, position, row, velocitySi, forceSi), this);
        document.closeEditStep();
        return true;
    }

    /** @return the chart (for the window tests) */
    DamperChart chart() {
        return chart;
    }

    JTable table() {
        return table;
    }

    JLabel message() {
        return message;
    }

    void chooseAxle(AxlePosition position) {
        axle.setSelectedIndex(position == AxlePosition.REAR ? 1 : 0);
    }

    /** The points in the view's units: velocity and force at the damper (editable), then at the wheel. */
    private final class Points extends AbstractTableModel {
        private List<double[]> rows = List.of();
        private double motionRatio = Double.NaN;

        void load(List<double[]> filePoints) {
            rows = filePoints;
            Damper damper = acceptedDamper(selectedAxle());
            motionRatio = damper == null ? Double.NaN : damper.motionRatio();
            fireTableStructureChanged();
        }

        private DisplayUnit velocity() {
            return Quantity.LENGTH.unit(view.units());
        }

        private DisplayUnit force() {
            return Quantity.FORCE.unit(view.units());
        }

        @Override
        public int getRowCount() {
            return rows.size();
        }

        @Override
        public int getColumnCount() {
            return 4;
        }

        @Override
        public String getColumnName(int column) {
            String speed = velocity().symbol() + "/s";
            String push = force().symbol();
            return switch (column) {
                // the unit under the name: four columns side by side on a narrow page at the largest text
                case 0 -> twoLines("Velocity", speed);
                case 1 -> twoLines("Force", push);
                case 2 -> twoLines("At wheel", speed);
                default -> twoLines("At wheel", push);
            };
        }

        private static String twoLines(String name, String unit) {
            return "<html><center>" + name + "<br>(" + unit + ")</center></html>";
        }

        @Override
        public boolean isCellEditable(int row, int column) {
            return column < 2;
        }

        @Override
        public Object getValueAt(int row, int column) {
            double[] point = rows.get(row);
            boolean atWheel = column >= 2;
            if (atWheel && !Double.isFinite(motionRatio)) {
                return "";
            }
            double value = column % 2 == 0
                    ? velocity().fromSi(atWheel ? point[0] / motionRatio : point[0])
                    : force().fromSi(atWheel ? point[1] * motionRatio : point[1]);
            return NumberText.format(value, column % 2 == 0 && view.units() != barwright.units.UnitSystem.SI ? 2 : 1,
                    view.locale());
        }

        @Override
        public void setValueAt(Object typed, int row, int column) {
            OptionalDouble number = NumberText.parse(String.valueOf(typed), view.locale());
            if (number.isEmpty()) {
                say(String.format(Locale.ROOT, "Not taken: row %d, \"%s\" is not a number.", row + 1, typed), true);
                return;
            }
            double[] point = rows.get(row);
            double velocitySi = column == 0 ? velocity().toSi(number.getAsDouble()) : point[0];
            double forceSi = column == 1 ? force().toSi(number.getAsDouble()) : point[1];
            putPoint(row, velocitySi, forceSi);
        }
    }

    /** @return what loading the changed car refuses (key path, value, allowed range), empty where it is accepted */
    private static List<Problem> refusals(JsonNode tree) {
        try {
            VehicleLoader.fromTree(tree);
            return List.of();
        } catch (VehicleFileException refused) {
            return refused.problems();
        }
    }
}
