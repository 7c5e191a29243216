package barwright.ui.workshop;

import barwright.measure.MeasurementException;
import barwright.measure.MotionRatioFit;
import barwright.measure.MotionRatioMeasurement;
import barwright.measure.TravelReading;
import barwright.report.measure.MeasureText;
import barwright.ui.chart.TravelFitChart;
import barwright.ui.field.ViewSettings;
import barwright.ui.panel.ScrollingPage;
import barwright.units.DisplayUnit;
import barwright.units.Figures;
import barwright.units.Quantity;

import javax.swing.BorderFactory;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.JTable;
import javax.swing.table.DefaultTableModel;
import java.awt.BorderLayout;
import java.awt.FlowLayout;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import static barwright.ui.workshop.ReadingCells.blank;
import static barwright.ui.workshop.ReadingCells.text;
import static barwright.ui.workshop.ReadingCells.number;

/**
 * A motion ratio from travel readings (model.md 12.2): wheel travel against the spring's, damper's or bar
 * link's travel, typed or pasted from a spreadsheet in the view's length unit; the ratio (the slope), its
 * change over the travel, each reading's residual and outliers, the fitted line drawn over the points, and
 * the cosine correction when the component leans. The fit is a least-squares line of a few dozen points at
 * most (microseconds), so it is worked out on the event thread as the readings are typed.
 */
public final class MotionRatioPage extends JPanel {
    private static final int ROWS = 12;
    /** The chart's least size in lines of text, under the readings: title, axes and a plot of some eight lines. */
    private static final int CHART_LINES = 14;
    private final ViewSettings view;
    private final DefaultTableModel readings;
    private final ReadingField angle;
    private final ResultText result = new ResultText("motionRatio.result");
    private final TravelFitChart chart = new TravelFitChart();
    private boolean filling;

    public MotionRatioPage(ViewSettings view) {
        super(new BorderLayout());
        setName("motionRatio.page");
        this.view = view;
        readings = new DefaultTableModel(ROWS, 4) {
            @Override
            public boolean isCellEditable(int row, int column) {
                return column < 2;
            }
        };
        // the widest content of each column: two travels, a residual, the note
        JTable table = new ReadingsTable(readings, ROWS, "-99.9", "-99.9", "-9.99 mm", "outlier");
        table.setName("motionRatio.readings");
        PastedRows.bindPaste(table, this::paste, () -> result.why(
                "Nothing to paste: copy two columns, wheel travel and component travel, from a spreadsheet."));
        readings.addTableModelListener(event -> {
            if (!filling && event.getColumn() < 2) {
                refit();
            }
        });
        angle = new ReadingField("motionRatio.linkAngle", "the component's lean (degrees)", () -> null, this::refit);
        angle.setText("0");
        angle.setToolTipText("The angle between the component's axis and the direction its mount moves; 0 where the "
                + "travel was read along the component itself");

        JPanel lean = new JPanel(new BorderLayout(4, 4));
        Words leanWords = new Words("motionRatio.leanLabel",
                "Lean of the component from the direction its mount moves (deg):");
        lean.add(leanWords, BorderLayout.NORTH);
        JPanel field = new JPanel(new FlowLayout(FlowLayout.LEADING, 4, 0));
        field.add(angle);
        lean.add(field, BorderLayout.CENTER);
        JPanel top = new JPanel(new BorderLayout(4, 4));
        top.add(new Words("motionRatio.how", "Jack the wheel through its travel (springs out, or a dummy damper); "
                + "at each height read the wheel's travel and the component's. Paste two columns with Ctrl+V."),
                BorderLayout.CENTER);
        top.add(lean, BorderLayout.SOUTH);
        JPanel left = new JPanel(new BorderLayout(4, 4));
        left.add(new JScrollPane(table), BorderLayout.NORTH);
        left.add(new JScrollPane(result), BorderLayout.CENTER);
        ReadingsAndAnswer split = ReadingsAndAnswer.beside(left,
                ReadingsAndAnswer.chartBox(chart.component(), CHART_LINES));
        JPanel content = new JPanel(new BorderLayout(8, 8));
        content.setBorder(BorderFactory.createEmptyBorder(8, 8, 8, 8));
        content.add(top, BorderLayout.NORTH);
        content.add(split, BorderLayout.CENTER);
        add(ScrollingPage.of(content), BorderLayout.CENTER);
        view.addListener(this::relabel);
        relabel();
    }

    /** Fills the table from text copied from a spreadsheet: one reading a line, wheel travel then component travel. */
    public void paste(String text) {
        filling = true;
        try {
            PastedRows.fill(readings, text, 2, ROWS);
        } finally {
            filling = false;
        }
        refit();
    }

    private void refit() {
        DisplayUnit length = Quantity.LENGTH.unit(view.units());
        List<TravelReading> list = new ArrayList<>();
        List<Integer> rows = new ArrayList<>();
        for (int r = 0; r < readings.getRowCount(); r++) {
            Object wheel = readings.getValueAt(r, 0);
            Object component = readings.getValueAt(r, 1);
            if (blank(wheel) && blank(component)) {
                continue;
            }
            try {
                list.add(new TravelReading(length.toSi(number(wheel)), length.toSi(number(component)),
                        "row " + (r + 1)));
                rows.add(r);
            } catch (NumberFormatException notANumber) {
                show(null, String.format(Locale.ROOT, "Row %d: \"%s\", \"%s\" is not two numbers (wheel travel, "
                        + "component travel).", r + 1, text(wheel), text(component)));
                return;
            }
        }
        if (list.isEmpty()) {
            show(null, "Type or paste the readings: wheel travel and component travel, one a row.");
            return;
        }
        try {
            MotionRatioFit fit = MotionRatioMeasurement.fit(list, Math.toRadians(angle.plain()));
            show(fit, null);
            filling = true;
            try {
                for (int i = 0; i < rows.size(); i++) {
                    readings.setValueAt(Figures.format(fit.residuals().get(i), Quantity.LENGTH, view.units(), 2,
                            view.locale()), rows.get(i), 2);
                    readings.setValueAt(fit.outliers().get(i) ? "outlier" : "", rows.get(i), 3);
                }
            } finally {
                filling = false;
            }
        } catch (MeasurementException | ReadingField.ReadingException refused) {
            show(null, refused.getMessage());
        }
    }

    private void show(MotionRatioFit fit, String why) {
        if (fit == null) {
            result.why(why);
            chart.clear();
            return;
        }
        result.answer(MeasureText.motionRatio(fit, view.units()));
        chart.show(fit, view.units());
    }

    private void relabel() {
        String unit = Quantity.LENGTH.unit(view.units()).symbol();
        filling = true;
        try {
            readings.setColumnIdentifiers(ReadingsTable.wordUnderWord("Wheel travel (" + unit + ")",
                    "Component travel (" + unit + ")", "Residual", "Note"));
        } finally {
            filling = false;
        }
        refit();
    }

    /** @return the text shown (tests) */
    public String resultText() {
        return result.getText();
    }

}
