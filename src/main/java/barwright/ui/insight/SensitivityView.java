package barwright.ui.insight;

import barwright.insight.SensitivityResult;
import barwright.insight.SensitivityRow;
import barwright.report.insight.SensitivityText;
import barwright.ui.chart.SensitivityChart;
import barwright.ui.field.ViewSettings;
import barwright.ui.panel.ScrollingPage;
import barwright.units.Figures;
import barwright.units.Quantity;

import javax.swing.BorderFactory;
import javax.swing.JComboBox;
import javax.swing.JComponent;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.UIManager;
import javax.swing.JTable;
import javax.swing.JTextArea;
import javax.swing.table.DefaultTableModel;
import java.awt.BorderLayout;
import java.awt.Dimension;
import java.awt.event.MouseEvent;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import static barwright.units.Conversions.toG;

/**
 * What moves the balance most: a bar per change of the figure chosen, coloured by the way it moves the balance,
 * and a table of every figure with the step used. Event thread.
 */
public final class SensitivityView extends JPanel {
    /** The figures the chart can show. */
    enum Measure {
        LIMIT_MARGIN("limit margin, front minus rear limit (g)"),
        FRONT_SHARE("front share of load transfer (points of %)"),
        ROLL_GRADIENT("roll gradient"),
        INSIDE_LIFT("first inside lift (g)");

        private final String words;

        Measure(String words) {
            this.words = words;
        }
    }

    static final String[] COLUMNS = {"Change", "Step", "Front share", "Roll gradient", "Limit margin",
        "First inside lift", "Balance"};
    /**
     * The chart's least height in lines of text: a title of two lines, a legend of three, the value axis's two
     * and a bar a line high for each of the dozen or so changes.
     */
    static final int LEAST_LINES = 20;
    /** The table's rows in view; the rest scroll within it. */
    private static final int TABLE_ROWS = 6;
    private final ViewSettings view;
    private final SensitivityChart chart = new SensitivityChart();
    private final DefaultTableModel table = new DefaultTableModel(COLUMNS, 0) {
        @Override
        public boolean isCellEditable(int row, int column) {
            return false;
        }
    };
    private final JComboBox<String> measure = new JComboBox<>();
    private final JTextArea basis = InsightCharts.sentences("insight.sensitivity.basis");
    private SensitivityResult shown;

    SensitivityView(ViewSettings view) {
        super(new BorderLayout());
        this.view = view;
        setName("insight.sensitivity");
        JComponent panel = chart.panel("insight.sensitivity.chart");
        JTable rows = new JTable(table) {
            @Override
            public String getToolTipText(MouseEvent event) {
                int row = rowAtPoint(event.getPoint());
                int column = columnAtPoint(event.getPoint());
                return row >= 0 && column >= 0 ? String.valueOf(getValueAt(row, column)) : null;
            }
        };
        rows.setAutoResizeMode(JTable.AUTO_RESIZE_OFF);
        rows.setName("insight.sensitivity.table");
        rows.setAutoCreateRowSorter(false);
        // widths for the system text size, widened with the text: the table scrolls sideways within its box
        float scale = textScale();
        int[] widths = {240, 300, 90, 110, 100, 110, 420};
        for (int i = 0; i < widths.length; i++) {
            rows.getColumnModel().getColumn(i).setPreferredWidth(Math.round(widths[i] * scale));
        }
        rows.setPreferredScrollableViewportSize(new Dimension(400, TABLE_ROWS * rows.getRowHeight()));
        for (Measure choice : Measure.values()) {
            measure.addItem(choice.words);
        }
        measure.setName("insight.sensitivity.measure");
        measure.addActionListener(event -> {
            if (shown != null) {
                show(shown);
            }
        });
        JLabel label = new JLabel("Bars show the change of the");
        label.setLabelFor(measure);
        // one above the other: the longest figure's name is as wide as the view at 28 points
        JPanel bar = new JPanel(new BorderLayout(0, 2));
        bar.add(label, BorderLayout.NORTH);
        bar.add(measure, BorderLayout.CENTER);
        bar.add(basis, BorderLayout.SOUTH);
        bar.setBorder(BorderFactory.createEmptyBorder(2, 8, 2, 8));
        basis.setOpaque(false);
        JPanel words = new JPanel(new BorderLayout(0, 4));
        words.add(bar, BorderLayout.NORTH);
        words.add(new JScrollPane(rows), BorderLayout.CENTER);
        add(ScrollingPage.chartOverWords(panel, words, LEAST_LINES, InsightPanel.CHART_SHARE), BorderLayout.CENTER);
    }

    void show(SensitivityResult result) {
        shown = result;
        SensitivityText text = new SensitivityText(view.units());
        Measure chosen = Measure.values()[Math.max(0, measure.getSelectedIndex())];
        List<SensitivityChart.Bar> bars = new ArrayList<>();
        table.setRowCount(0);
        for (SensitivityRow row : result.rows()) {
            String label = row.change().effect();
            if (row.analysed()) {
                bars.add(new SensitivityChart.Bar(label, value(row, chosen), row.tendency()));
                table.addRow(new Object[]{label, text.step(row.change()),
                    String.format(Locale.ROOT, "%+.2f pt", row.frontShareChange() * 100),
                    signed(row.rollGradientChange(), Quantity.ROLL_GRADIENT, 3),
                    signed(row.limitMarginChange(), Quantity.ACCELERATION, 4),
                    row.insideLiftChange().isPresent()
                            ? signed(row.insideLiftChange().getAsDouble(), Quantity.ACCELERATION, 3) : "no lift",
                    row.tendency().words()});
            } else {
                table.addRow(new Object[]{label, text.step(row.change()), "", "", "", "",
                    "not analysed: " + row.refusal()});
            }
        }
        String unit = chosen == Measure.ROLL_GRADIENT
                ? " (" + Quantity.ROLL_GRADIENT.unit(view.units()).symbol() + ")" : "";
        chart.show(bars, "Change of the " + chosen.words + unit,
                "One small change at a time, turning " + result.turn().word() + " (largest on top)");
        basis.setText("Each change re-analysed in full; steps in the table.");
    }

    private double value(SensitivityRow row, Measure chosen) {
        return switch (chosen) {
            case LIMIT_MARGIN -> toG(row.limitMarginChange());
            case FRONT_SHARE -> row.frontShareChange() * 100;
            case ROLL_GRADIENT -> Quantity.ROLL_GRADIENT.unit(view.units()).fromSi(row.rollGradientChange());
            case INSIDE_LIFT -> toG(row.insideLiftChange().orElse(0));
        };
    }

    private String signed(double si, Quantity quantity, int decimals) {
        String figure = Figures.format(si, quantity, view.units(), decimals);
        return figure.startsWith("-") ? figure : "+" + figure;
    }

    /** @return the text size against the system's 13 points, at least 1 */
    private static float textScale() {
        java.awt.Font font = UIManager.getFont("Label.font");
        return font == null ? 1f : Math.max(1f, font.getSize2D() / 13f);
    }

    DefaultTableModel table() {
        return table;
    }

    SensitivityChart chart() {
        return chart;
    }

    @Override
    public void updateUI() {
        super.updateUI();
        if (chart != null) {
            chart.style();
        }
    }
}
