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
import barwright.ui.panel.PagePanel;
import barwright.ui.panel.WrappingText;
import barwright.units.Quantity;

import javax.swing.BorderFactory;
import javax.swing.JButton;
import javax.swing.JComponent;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.JTabbedPane;
import javax.swing.JTextField;
import javax.swing.UIManager;
import javax.swing.table.AbstractTableModel;
import java.awt.BorderLayout;
import java.awt.Dimension;
import java.awt.FlowLayout;
import java.awt.Font;
import java.awt.GridLayout;
import java.awt.Insets;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;
import java.util.stream.Collectors;

/**
 * Two to four setups side by side: each a saved vehicle file, the open car as it was when added, or a variant of
 * the open car built from its fields ({@link VariantBuilder}); their figures with the difference of each from the first, and the main charts with
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
    private final Setups setups = new Setups();
    private final FigureTable setupTable;
    private final Figures figures = new Figures();
    private final FigureTable figureTable;
    private final JTabbedPane charts = new JTabbedPane();
    private final WrappingText hint = new WrappingText("Add two to four setups: the open car as it is now, a saved "
            + "vehicle file, or a variant of the open car built below (arm holes count from 1, as in the editor). "
            + "Each setup's figures show their difference from the first in brackets, in the same unit.");
    private final WorkStrip work = new WorkStrip("compare");
    private final VariantBuilder variant;
    private final CompareResults results;
    private final SettingsBeside layout;
    private Comparison shown;

    CompareView(SizingContext context) {
        super(new BorderLayout());
        setName("compare.view");
        this.context = context;
        this.format = new FigureFormat(context.view());
        name.setName("compare.name");
        setupTable = new FigureTable("compare.setups", setups, new String[]{"What the setup is called",
            "Where it came from"}, new int[]{fit(170, "front bar 25 mm (reference)"), 760});
        figureTable = new FigureTable("compare.figures", figures, new String[0], new int[]{180, 170, 170, 170, 170});
        figureTable.fitColumnsToTexts(); // each setup's name in full over its column, at any text size
        charts.setName("compare.charts");

        JPanel buttonColumn = column(button("compare.addOpen", "Add the open car as it is now", this::addOpenCar),
                button("compare.addFile", "Add a saved vehicle file…", this::addFile),
                button("compare.remove", "Remove the chosen setup", this::removeChosen));
        JScrollPane list = new JScrollPane(setupTable) {
            @Override
            public Dimension getPreferredSize() {
                // four rows under the header, and some fourteen lines of text wide (it scrolls sideways), so that
                // at full size the results beside the setups keep the room for their columns
                int line = setupTable.getFontMetrics(setupTable.getFont()).getHeight();
                Insets border = getInsets();
                return new Dimension(14 * line, setupTable.getTableHeader().getPreferredSize().height
                        + 4 * setupTable.getRowHeight() + border.top + border.bottom + 2);
            }
        };
        JPanel setupList = new JPanel(new BorderLayout(6, 0));
        setupList.add(list, BorderLayout.CENTER);
        setupList.add(buttonColumn, BorderLayout.EAST);
        JPanel naming = new JPanel(new FlowLayout(FlowLayout.LEFT, 6, 2));
        naming.add(new JLabel("Name of the next setup"));
        naming.add(name);
        variant = new VariantBuilder(context, message -> work.say(message, true), this::addVariant);
        JPanel controls = new JPanel(new BorderLayout());
        controls.add(naming, BorderLayout.NORTH);
        controls.add(variant, BorderLayout.CENTER);
        PagePanel top = new PagePanel(new BorderLayout(0, 4)) {
            @Override
            public Dimension getPreferredSize() {
                // as wide as the list with its buttons and the variant builder need: not the hint in one line
                Insets border = getInsets();
                int width = Math.max(list.getPreferredSize().width + 6 + buttonColumn.getPreferredSize().width,
                        controls.getPreferredSize().width);
                return new Dimension(width + border.left + border.right, super.getPreferredSize().height);
            }
        };
        top.setBorder(BorderFactory.createEmptyBorder(4, 8, 4, 8));
        top.add(hint, BorderLayout.NORTH);
        top.add(setupList, BorderLayout.CENTER);
        top.add(controls, BorderLayout.SOUTH);
        JScrollPane figureScroll = new JScrollPane(figureTable);
        figureScroll.setName("compare.figures.scroll");
        charts.setTabLayoutPolicy(JTabbedPane.SCROLL_TAB_LAYOUT);
        results = new CompareResults(figureScroll, charts);
        layout = new SettingsBeside("compare", "Setups", SettingsBeside.settingsScroll(top, 500), results);
        add(layout, BorderLayout.CENTER);
        add(work, BorderLayout.SOUTH);
        context.view().addListener(this::redraw);
    }

    /** @return the width given, or wider where a large text size needs it for the sample text */
    private int fit(int pixels, String sample) {
        Font font = UIManager.getFont("Table.font");
        return font == null ? pixels : Math.max(pixels, getFontMetrics(font).stringWidth(sample) + 16);
    }

    /** @return the buttons one above the other, of equal width, at the top of a column */
    static JPanel column(JButton... buttons) {
        JPanel stack = new JPanel(new GridLayout(0, 1, 0, 2));
        for (JButton button : buttons) {
            stack.add(button);
        }
        JPanel column = new JPanel(new BorderLayout());
        column.add(stack, BorderLayout.NORTH);
        return column;
    }

    static JButton button(String name, String text, Runnable action) {
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
        List<VariantChange> changes = variant.pending();
        if (changes.isEmpty()) {
            work.say("A variant needs at least one change: choose what to change and its new value, then "
                    + "Add this change.", true);
            return;
        }
        try {
            VehicleDocument car = context.currentCar();
            VehicleDocument changed = VehicleLoader.withEdits(car, changes.stream().map(VariantChange::edit)
                    .toList());
            if (add(new Entry(nextName("variant"), "the open car with " + variant.words(car.tree()),
                    changed.vehicle()))) {
                variant.clear();
            }
        } catch (VehicleFileException refused) {
            work.say("The variant is refused: " + refused.problems().stream().map(Problem::toString)
                    .collect(Collectors.joining("; ")), true);
        } catch (IllegalStateException refused) {
            work.say(refused.getMessage(), true);
        }
    }

    /** @return whether the setup was added (four at most) */
    private boolean add(Entry entry) {
        if (entries.size() >= Comparison.MAX_CONFIGURATIONS) {
            work.say("Four setups at most: remove one first.", true);
            return false;
        }
        entries.add(entry);
        name.setText("setup " + (entries.size() + 1));
        changed();
        return true;
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
                    layout.showResults(); // where the setups and the results are two tabs
                });
    }

    private void redraw() {
        figures.fireTableStructureChanged();
        List<String> titles = new ArrayList<>();
        List<JComponent> panels = new ArrayList<>();
        if (shown != null) {
            for (Chart chart : shown.charts()) {
                titles.add(chart.title().replaceFirst(",.*", ""));
                panels.add(ComparisonCharts.panel(chart, shown.configurations().size(), context.view(),
                        "compare.chart." + panels.size()));
            }
        }
        results.showCharts(titles, panels);
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

    VariantBuilder variant() {
        return variant;
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

    CompareResults results() {
        return results;
    }

    /** @return true where the setups and the results are two tabs */
    boolean setupsAndResultsTabbed() {
        return layout.tabbed();
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
                return column == 0 ? "balance at the limit, left / right" : shown.balances().get(column - 1);
            }
            FigureRow figure = shown.rows().get(row);
            return column == 0 ? figure.label() : cell(figure, column - 1);
        }
    }
}
