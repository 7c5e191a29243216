package barwright.ui.workshop;

import barwright.io.RateCalibrationKeys;
import barwright.io.VehicleDocument;
import barwright.measure.BarRateFit;
import barwright.measure.BarRateMeasurement;
import barwright.measure.BarReading;
import barwright.measure.MeasurementException;
import barwright.model.AntiRollBar;
import barwright.model.AxlePosition;
import barwright.model.RateCalibration;
import barwright.physics.BarAnalysis;
import barwright.report.Cautions;
import barwright.ui.chart.BarRateChart;
import barwright.ui.document.OpenDocument;
import barwright.ui.field.ViewSettings;
import barwright.ui.panel.Palette;
import barwright.ui.panel.ScrollingPage;
import barwright.ui.task.BackgroundWork;
import barwright.units.DisplayUnit;
import barwright.units.Figures;
import barwright.units.Quantity;
import com.fasterxml.jackson.databind.node.ObjectNode;

import javax.swing.BorderFactory;
import javax.swing.JButton;
import javax.swing.JComboBox;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.JTable;
import javax.swing.UIManager;
import javax.swing.table.DefaultTableModel;
import java.awt.BorderLayout;
import java.awt.FlowLayout;
import java.time.LocalDate;
import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

import static barwright.ui.workshop.ReadingCells.blank;
import static barwright.ui.workshop.ReadingCells.text;
import static barwright.ui.workshop.ReadingCells.number;

/**
 * Readings typed into a table or pasted from a spreadsheet (two columns: load, deflection, in the view's
 * units), the fit drawn over them, the model's rate for the chosen axle's bar, and "Use this in the car",
 * which puts the measured factor into the open car as one undoable edit. The fit runs off the event thread.
 */
public final class BarRatePage extends JPanel {
    private static final int ROWS = 12;
    /**
     * The chart's least size in lines of text, where it sits under the readings: its title, the axes' names and
     * ticks, and a plot of some eight lines.
     */
    private static final int CHART_LINES = 14;
    private final OpenDocument document;
    private final ViewSettings view;
    private final DefaultTableModel readings;
    private final JTable table;
    private final JComboBox<String> axle = new JComboBox<>(new String[] {"front", "rear"});
    private final Words summary = new Words("workshop.summary", " ");
    private final JButton use = new JButton("Use this in the car");
    private final BarRateChart chart = new BarRateChart();
    private final BackgroundWork<Request, Outcome> worker;
    private Outcome current;

    /** What the fit is asked: the readings and the bar they are compared with (null for none). */
    private record Request(List<BarReading> readings, AntiRollBar bar) {
    }

    /** The fit and the model's rate, or why there is none. */
    private record Outcome(BarRateFit fit, Double modelRate, String refusal) {
    }

    public BarRatePage(OpenDocument document, ViewSettings view) {
        super(new BorderLayout());
        setName("workshop.page");
        this.document = document;
        this.view = view;
        readings = new DefaultTableModel(ROWS, 4) {
            @Override
            public boolean isCellEditable(int row, int column) {
                return column < 2;
            }
        };
        // the widest content of each column: a load, a deflection, a residual, the longest role
        table = new ReadingsTable(readings, ROWS, "9999.9", "-99.99", "-99.9 lbf", "free play");
        table.setName("workshop.readings");
        PastedRows.bindPaste(table, this::paste, () -> summary.setText(
                "Nothing to paste: copy two columns, load and deflection, from a spreadsheet."));
        // the residual and role columns are the page's own output: only the readings' columns refit
        readings.addTableModelListener(event -> {
            if (event.getColumn() < 2) {
                refit();
            }
        });
        axle.setName("workshop.axle");
        axle.addActionListener(event -> refit());
        use.setName("workshop.use");
        use.setEnabled(false);
        use.setToolTipText("Put the measured factor into the car (one step; Edit > Undo takes it back)");
        use.addActionListener(event -> useInCar());
        summary.setName("workshop.summary");

        JPanel choice = new JPanel(new FlowLayout(FlowLayout.LEADING));
        choice.add(new JLabel("Bar on the"));
        choice.add(axle);
        choice.add(new JLabel("axle"));
        JPanel top = new JPanel(new BorderLayout());
        top.add(choice, BorderLayout.NORTH);
        top.add(new Words("workshop.how", "Hang loads on one link point, hold the other, read the travel. "
                + "Paste two columns, load and deflection, with Ctrl+V."), BorderLayout.CENTER);
        JPanel left = new JPanel(new BorderLayout());
        left.add(new JScrollPane(table), BorderLayout.NORTH);
        ReadingsAndAnswer split = ReadingsAndAnswer.beside(left,
                ReadingsAndAnswer.chartBox(chart.component(), CHART_LINES));
        JPanel useRow = new JPanel(new FlowLayout(FlowLayout.TRAILING, 0, 0));
        useRow.add(use);
        JPanel bottom = new JPanel(new BorderLayout(4, 4));
        bottom.add(summary, BorderLayout.NORTH);
        bottom.add(useRow, BorderLayout.CENTER);
        Words caution = new Words("workshop.caution", Cautions.SHORT);
        caution.setForeground(Palette.muted());
        bottom.add(caution, BorderLayout.SOUTH);
        JPanel content = new JPanel(new BorderLayout(8, 8));
        content.setBorder(BorderFactory.createEmptyBorder(8, 8, 8, 8));
        content.add(top, BorderLayout.NORTH);
        content.add(split, BorderLayout.CENTER);
        content.add(bottom, BorderLayout.SOUTH);
        add(ScrollingPage.of(content), BorderLayout.CENTER);
        worker = BackgroundWork.newestOnly(BarRatePage::fit, this::arrived, message -> summary.setText(message));
        view.addListener(this::relabel);
        document.addListener(event -> refit());
        relabel();
    }

    /** Fills the table from text copied from a spreadsheet: one reading a line, load then deflection. */
    public void paste(String text) {
        PastedRows.fill(readings, text, 2, ROWS);
    }

    /** The work, off the event thread. */
    private static Outcome fit(Request request) {
        try {
            BarRateFit fit = BarRateMeasurement.fit(request.readings());
            Double model = request.bar() == null ? null : BarAnalysis.model(request.bar(), 0).linkRate();
            return new Outcome(fit, model, null);
        } catch (MeasurementException refused) {
            return new Outcome(null, null, refused.getMessage());
        }
    }

    private void refit() {
        DisplayUnit force = Quantity.FORCE.unit(view.units());
        DisplayUnit length = Quantity.LENGTH.unit(view.units());
        List<BarReading> list = new ArrayList<>();
        for (int r = 0; r < readings.getRowCount(); r++) {
            Object load = readings.getValueAt(r, 0);
            Object deflection = readings.getValueAt(r, 1);
            if (blank(load) && blank(deflection)) {
                continue;
            }
            try {
                list.add(new BarReading(length.toSi(number(deflection)), force.toSi(number(load)), "row " + (r + 1)));
            } catch (NumberFormatException notANumber) {
                show(new Outcome(null, null, String.format(Locale.ROOT, "Row %d: \"%s\", \"%s\" is not two numbers "
                        + "(load, deflection).", r + 1, text(load), text(deflection))));
                return;
            }
        }
        if (list.isEmpty()) {
            show(new Outcome(null, null, "Type or paste the readings: load and deflection, one a row."));
            return;
        }
        VehicleDocument car = document.lastValid();
        AntiRollBar bar = car == null ? null : car.vehicle().axle(selectedAxle()).bar();
        worker.submit(new Request(List.copyOf(list), bar));
    }

    private void arrived(Outcome outcome) {
        show(outcome);
    }

    private void show(Outcome outcome) {
        current = outcome;
        if (outcome.fit() == null) {
            summary.setText(outcome.refusal());
            summary.setForeground(Palette.warning());
            chart.clear();
            use.setEnabled(false);
            return;
        }
        BarRateFit fit = outcome.fit();
        StringBuilder text = new StringBuilder(String.format(Locale.ROOT, "Rate %s, free play %s, R² %.4f",
                f(fit.rate(), Quantity.LINEAR_RATE, 1), f(fit.lash(), Quantity.LENGTH, 2), fit.rSquared()));
        if (outcome.modelRate() != null) {
            text.append(String.format(Locale.ROOT, "; the model gives %s: measured / model %.3f",
                    f(outcome.modelRate(), Quantity.LINEAR_RATE, 1), factor()));
        } else {
            text.append("; this axle has no bar to compare with");
        }
        fit.warnings().forEach(w -> text.append(". ").append(w));
        summary.setText(text.toString());
        summary.setForeground(UIManager.getColor("Label.foreground"));
        chart.show(fit, view.units());
        for (int i = 0, r = 0; r < readings.getRowCount() && i < fit.readings().size(); r++) {
            if (blank(readings.getValueAt(r, 0)) && blank(readings.getValueAt(r, 1))) {
                continue;
            }
            readings.setValueAt(f(fit.residuals().get(i), Quantity.FORCE, 1), r, 2);
            readings.setValueAt(fit.roles().get(i).words(), r, 3);
            i++;
        }
        double factor = factor();
        use.setEnabled(outcome.modelRate() != null && factor >= RateCalibration.LOWEST
                && factor <= RateCalibration.HIGHEST);
    }

    private double factor() {
        return current.fit().rate() / current.modelRate();
    }

    /** Puts the measured factor into the car's bar: one edit, one undo step. */
    public void useInCar() {
        if (current == null || current.fit() == null || current.modelRate() == null) {
            return;
        }
        RateCalibration calibration = new RateCalibration(factor(), LocalDate.now(), String.format(Locale.ROOT,
                "%d readings in the workshop page, R² %.4f", current.fit().readings().size(), current.fit().rSquared()));
        String key = selectedAxle().key();
        document.editAll(tree -> RateCalibrationKeys.put((ObjectNode) tree.path(key).path("bar"), calibration), this);
        document.closeEditStep();
    }

    private void relabel() {
        readings.setColumnIdentifiers(ReadingsTable.wordUnderWord("Load (" + Quantity.FORCE.unit(view.units()).symbol()
                + ")", "Deflection (" + Quantity.LENGTH.unit(view.units()).symbol() + ")", "Residual", "Used as"));
        refit();
    }

    private AxlePosition selectedAxle() {
        return "rear".equals(axle.getSelectedItem()) ? AxlePosition.REAR : AxlePosition.FRONT;
    }

    private String f(double si, Quantity quantity, int decimals) {
        return Figures.format(si, quantity, view.units(), decimals, view.locale());
    }

}
