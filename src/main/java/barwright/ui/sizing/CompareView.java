package barwright.ui.sizing;

import barwright.io.Problem;
import barwright.io.VehicleDocument;
import barwright.io.VehicleFileException;
import barwright.loading.VehicleLoader;
import barwright.model.Vehicle;
import barwright.physics.curve.Chart;
import barwright.sizing.compare.Comparison;
import barwright.sizing.compare.Configuration;
import barwright.sizing.compare.FigureRow;
import barwright.ui.chart.ComparisonCharts;
import barwright.ui.panel.FigureFormat;
import barwright.ui.panel.WrappingText;
import barwright.units.Quantity;

import javax.swing.BorderFactory;
import javax.swing.JButton;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.JSplitPane;
import javax.swing.JTabbedPane;
import javax.swing.JTextField;
import javax.swing.table.AbstractTableModel;
import java.awt.BorderLayout;
import java.awt.Dimension;
import java.awt.FlowLayout;
import java.awt.GridLayout;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.Arrays;
import java.util.List;
import java.util.stream.Collectors;

/**
 * Two to four setups side by side: each a saved vehicle file, the open car as it was when added, or a variant of
 * the open car by key path; their figures with the difference of each from the first, and the main charts with
 * one line per setup. Compared again off the event thread whenever the list changes. Event thread.
 */
final class CompareView extends JPanel {
    /** A setup in the list, with where it came from. */
    record Entry(String name, String source, Vehicle vehicle) {
    }

    private final SizingContext context;
    private final FigureFormat format;
    private final List<Entry> entries = new ArrayList<>();
    private final JTextField name = new JTextField("open car", 14);
    private final JTextField changes = new JTextField("rear.bar.selectedArm=0", 28);
    private final Setups setups = new Setups();
    private final FigureTable setupTable;
    private final Figures figures = new Figures();
    private final FigureTable figureTable;
    private final JTabbedPane charts = new JTabbedPane();
    private final WrappingText hint = new WrappingText("Add two to four setups. To see what a change does, add the "
            + "open car, change it in the main window, and add it again; or add a variant by key paths of the "
            + "vehicle file (arm holes count from 0 there). Each setup's figures show their difference from the first "
            + "in brackets, in the same unit.");
    private final WorkStrip work = new WorkStrip("compare");
    private Comparison shown;

    CompareView(SizingContext context) {
        super(new BorderLayout());
        setName("compare.view");
        this.context = context;
        this.format = new FigureFormat(context.view());
        name.setName("compare.name");
        changes.setName("compare.changes");
        changes.setToolTipText("Changes to the open car, key.path=value, separated by semicolons, e.g. "
                + "front.bar.section.outerDiameterMm=24; rear.bar.selectedArm=3");
        setupTable = new FigureTable("compare.setups", setups, new String[]{"What the setup is called",
            "Where it came from"}, new int[]{220, 640});
        figureTable = new FigureTable("compare.figures", figures, new String[0], new int[]{180, 170, 170, 170, 170});
        charts.setName("compare.charts");

        JButton addOpen = button("compare.addOpen", "Add the open car as it is now", this::addOpenCar);
        JButton addFile = button("compare.addFile", "Add a saved vehicle file…", this::addFile);
        JButton addVariant = button("compare.addVariant", "Add a variant of the open car", this::addVariant);
        JButton remove = button("compare.remove", "Remove the chosen setup", this::removeChosen);
        JPanel naming = new JPanel(new FlowLayout(FlowLayout.LEFT, 6, 2));
        naming.add(new JLabel("Name of the next setup"));
        naming.add(name);
        naming.add(addOpen);
        naming.add(addFile);
        JPanel variant = new JPanel(new FlowLayout(FlowLayout.LEFT, 6, 2));
        variant.add(new JLabel("Changes for a variant"));
        variant.add(changes);
        variant.add(addVariant);
        variant.add(remove);
        JPanel controls = new JPanel(new GridLayout(0, 1));
        controls.add(naming);
        controls.add(variant);
        JPanel top = new JPanel(new BorderLayout(0, 4));
        top.setBorder(BorderFactory.createEmptyBorder(4, 8, 4, 8));
        top.add(hint, BorderLayout.NORTH);
        JScrollPane list = new JScrollPane(setupTable);
        list.setPreferredSize(new Dimension(800, 110));
        top.add(list, BorderLayout.CENTER);
        top.add(controls, BorderLayout.SOUTH);
        JScrollPane figureScroll = new JScrollPane(figureTable);
        figureScroll.setPreferredSize(new Dimension(640, 400));
        charts.setTabLayoutPolicy(JTabbedPane.SCROLL_TAB_LAYOUT);
        charts.setPreferredSize(new Dimension(520, 400));
        JSplitPane split = new JSplitPane(JSplitPane.HORIZONTAL_SPLIT, figureScroll, charts);
        split.setResizeWeight(0.6);
        split.setBorder(null);
        add(top, BorderLayout.NORTH);
        add(split, BorderLayout.CENTER);
        add(work, BorderLayout.SOUTH);
        context.view().addListener(this::redraw);
    }

    private static JButton button(String name, String text, Runnable action) {
        JButton button = new JButton(text);
        button.setName(name);
        button.addActionListener(event -> action.run());
        return button;
    }

    private String nextName(String fallback) {
        String typed = name.getText().strip();
        return typed.isEmpty() ? fallback : typed;
    }

    void addOpenCar() {
        try {
            add(new Entry(nextName("open car"), "the open car when added: " + context.document().displayName(),
                    context.currentCar().vehicle()));
        } catch (IllegalStateException refused) {
            work.say(refused.getMessage(), true);
        }
    }

    void addFile() {
        Path file = context.dialogs().chooseFileToOpen();
        if (file == null) {
            return;
        }
        try {
            VehicleDocument read = VehicleLoader.read(file);
            add(new Entry(file.getFileName().toString(), "file " + file, read.vehicle()));
        } catch (VehicleFileException refused) {
            context.dialogs().showError("Cannot compare " + file.getFileName(), "The file was not added:\n\n"
                    + refused.problems().stream().map(Problem::toString).collect(Collectors.joining("\n")));
        }
    }

    void addVariant() {
        List<String> edits = Arrays.stream(changes.getText().split(";")).map(String::strip)
                .filter(edit -> !edit.isEmpty()).toList();
        if (edits.isEmpty()) {
            work.say("Changes for a variant: give at least one key.path=value.", true);
            return;
        }
        try {
            VehicleDocument changed = VehicleLoader.withEdits(context.currentCar(), edits);
            add(new Entry(nextName("variant"), "the open car with " + String.join("; ", edits), changed.vehicle()));
        } catch (VehicleFileException refused) {
            work.say("The variant is refused: " + refused.problems().stream().map(Problem::toString)
                    .collect(Collectors.joining("; ")), true);
        } catch (IllegalStateException refused) {
            work.say(refused.getMessage(), true);
        }
    }

    private void add(Entry entry) {
        if (entries.size() >= Comparison.MAX_CONFIGURATIONS) {
            work.say("Four setups at most: remove one first.", true);
            return;
        }
        entries.add(entry);
        name.setText("setup " + (entries.size() + 1));
        changed();
    }

    private void removeChosen() {
        int row = setupTable.getSelectedRow();
        if (row >= 0) {
            entries.remove(row);
            changed();
        }
    }

    private void changed() {
        setups.fireTableDataChanged();
        if (entries.size() < Comparison.MIN_CONFIGURATIONS) {
            shown = null;
            redraw();
            work.say("Add " + (Comparison.MIN_CONFIGURATIONS - entries.size()) + " more setup to compare.", false);
            return;
        }
        List<Configuration> configurations = entries.stream()
                .map(entry -> new Configuration(entry.name(), entry.vehicle())).toList();
        work.run("Comparing", "", "The setups could not be compared", progress -> Comparison.of(configurations),
                comparison -> {
                    shown = comparison;
                    redraw();
                });
    }

    private void redraw() {
        figures.fireTableStructureChanged();
        for (int i = 0; i < figureTable.getColumnCount(); i++) {
            figureTable.getColumnModel().getColumn(i).setPreferredWidth(i == 0 ? 180 : 170);
        }
        int selected = Math.max(0, charts.getSelectedIndex());
        charts.removeAll();
        if (shown != null) {
            for (Chart chart : shown.charts()) {
                charts.addTab(chart.title().replaceFirst(",.*", ""), ComparisonCharts.panel(chart,
                        shown.configurations().size(), context.view(), "compare.chart." + charts.getTabCount()));
            }
            charts.setSelectedIndex(Math.min(selected, charts.getTabCount() - 1));
        }
    }

    /** @return the text of a figure for a setup, with its difference from the first after it */
    String cell(FigureRow row, int setup) {
        Double value = row.values().get(setup);
        if (value == null) {
            return row.key().contains("Lift") ? "stays down" : "no bar";
        }
        String text = figure(row, value, false);
        Double difference = row.difference(setup);
        return setup == 0 || difference == null ? text : text + "  (" + figure(row, difference, true) + ")";
    }

    private String figure(FigureRow row, double value, boolean signed) {
        String text;
        if (row.quantity() == Quantity.RATIO && row.key().endsWith("Share")) {
            text = signed ? String.format(context.view().locale(), "%.1f pt", value * 100)
                    : format.text(value, Quantity.SHARE);
        } else if (row.quantity() == Quantity.RATIO) {
            text = String.format(context.view().locale(), "%.2f", value);
        } else {
            text = format.text(value, row.quantity());
            if (signed) {
                text = text.split(" ")[0]; // the unit stands after the value beside it
            }
        }
        return signed && !text.startsWith("-") ? "+" + text : text;
    }

    List<Entry> entries() {
        return List.copyOf(entries);
    }

    Comparison shown() {
        return shown;
    }

    WorkStrip work() {
        return work;
    }

    FigureTable figureTable() {
        return figureTable;
    }

    JTabbedPane charts() {
        return charts;
    }

    /** The setups added, one per row. */
    private final class Setups extends TextTableModel {
        Setups() {
            super("Setup", "From");
        }

        @Override
        public int getRowCount() {
            return entries.size();
        }

        @Override
        public Object getValueAt(int row, int column) {
            Entry entry = entries.get(row);
            return column == 0 ? (row == 0 ? entry.name() + " (reference)" : entry.name()) : entry.source();
        }
    }

    /** The figures, one row each, one column per setup; differences from the first in brackets. */
    private final class Figures extends AbstractTableModel {
        @Override
        public int getRowCount() {
            return shown == null ? 0 : shown.rows().size() + 1;
        }

        @Override
        public int getColumnCount() {
            return shown == null ? 1 : shown.configurations().size() + 1;
        }

        @Override
        public String getColumnName(int column) {
            return column == 0 ? "Figure"
                    : shown.configurations().get(column - 1).name();
        }

        @Override
        public Object getValueAt(int row, int column) {
            if (row == shown.rows().size()) {
                return column == 0 ? "balance at the limit (left / right turn)" : shown.balances().get(column - 1);
            }
            FigureRow figure = shown.rows().get(row);
            return column == 0 ? figure.label() : cell(figure, column - 1);
        }
    }
}
