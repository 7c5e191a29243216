package barwright.ui.tyre;

import barwright.io.VehicleEdits;
import barwright.model.AxlePosition;
import barwright.report.Cautions;
import barwright.ui.action.Dialogs;
import barwright.ui.chart.TyreFitPanel;
import barwright.ui.document.OpenDocument;
import barwright.ui.field.ViewSettings;
import barwright.ui.panel.Palette;
import barwright.ui.panel.WrappingText;
import barwright.ui.task.BackgroundWork;
import barwright.units.Quantity;
import com.fasterxml.jackson.databind.node.ObjectNode;

import javax.swing.BorderFactory;
import javax.swing.JButton;
import javax.swing.JComponent;
import javax.swing.JDialog;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JProgressBar;
import javax.swing.JScrollPane;
import javax.swing.JTabbedPane;
import javax.swing.JTable;
import javax.swing.JTextArea;
import java.awt.BorderLayout;
import java.awt.FlowLayout;
import java.awt.Window;
import java.awt.event.WindowAdapter;
import java.awt.event.WindowEvent;
import java.nio.file.Path;
import java.util.DoubleSummaryStatistics;
import java.util.List;

/**
 * "Fit from data...": a tyre test file (CSV) fitted off the event thread with progress and cancel; the fitted
 * curves over the measured points, the residuals per curve and the fit's warnings, or the refusal with its lines;
 * and, only on "Apply to front/rear tyre", the fitted tyre put into the car as one undoable edit. Closing or
 * cancelling changes nothing. Event thread.
 */
final class TyreFitDialog extends JDialog {
    private final OpenDocument document;
    private final ViewSettings view;
    private final Dialogs dialogs;
    private final JLabel fileLabel = new JLabel("No file yet");
    private final JProgressBar progress = new JProgressBar();
    private final JButton cancel = new JButton("Cancel fit");
    private final TyreFitPanel chart = new TyreFitPanel("tyreFit.chart");
    private final ResidualTableModel residuals;
    private final JTable table;
    private final JTextArea messages = new WrappingText("");
    private final WrappingText summary = new WrappingText("");
    private final JTabbedPane views = new JTabbedPane();
    private final JButton applyFront = new JButton("Apply to front tyre");
    private final JButton applyRear = new JButton("Apply to rear tyre");
    private final Runnable relabel = this::relabel;
    private BackgroundWork<Void, FitOutcome> work;
    /** Counts the fits started: news of a fit that a newer one replaced is dropped. */
    private long fitsStarted;
    private FitOutcome outcome;
    private String status = "";

    TyreFitDialog(Window owner, OpenDocument document, ViewSettings view, Dialogs dialogs) {
        super(owner, "Fit a tyre from measured data", ModalityType.MODELESS);
        setName("tyreFit.dialog");
        this.document = document;
        this.view = view;
        this.dialogs = dialogs;
        residuals = new ResidualTableModel(view);
        table = new JTable(residuals);
        table.setName("tyreFit.residuals");
        table.setFillsViewportHeight(true);
        widenWorstColumn();
        messages.setName("tyreFit.messages");
        progress.setName("tyreFit.progress");
        progress.setStringPainted(true);
        progress.setVisible(false);
        cancel.setName("tyreFit.cancel");
        cancel.setVisible(false);
        cancel.addActionListener(event -> cancelFit());
        applyFront.setName("tyreFit.applyFront");
        applyRear.setName("tyreFit.applyRear");
        applyFront.addActionListener(event -> apply(AxlePosition.FRONT));
        applyRear.addActionListener(event -> apply(AxlePosition.REAR));
        String applyHelp = "Put the fitted tyre (points against load, camber terms) on this axle in place of its tyre: "
                + "one step, Edit > Undo takes it back";
        applyFront.setToolTipText(applyHelp);
        applyRear.setToolTipText(applyHelp);
        JButton another = new JButton("Open another file…");
        another.setName("tyreFit.open");
        another.addActionListener(event -> chooseAndFit());
        JButton close = new JButton("Close");
        close.addActionListener(event -> dispose());

        JPanel top = new JPanel(new BorderLayout(6, 2));
        top.add(fileLabel, BorderLayout.CENTER);
        JPanel working = new JPanel(new FlowLayout(FlowLayout.TRAILING, 4, 0));
        working.add(progress);
        working.add(cancel);
        working.add(another);
        top.add(working, BorderLayout.EAST);
        JScrollPane messageScroll = new JScrollPane(messages);
        messageScroll.setBorder(BorderFactory.createEmptyBorder(4, 4, 4, 4));
        views.setName("tyreFit.views");
        views.addTab("Fitted curves", chart.component());
        views.addTab("Residuals", new JScrollPane(table));
        views.addTab("Messages", messageScroll);
        summary.setName("tyreFit.summary");
        JPanel buttons = new JPanel(new FlowLayout(FlowLayout.TRAILING));
        buttons.add(applyFront);
        buttons.add(applyRear);
        buttons.add(close);
        WrappingText caution = new WrappingText(Cautions.SHORT);
        caution.setForeground(Palette.muted());
        JPanel bottom = new JPanel(new BorderLayout());
        bottom.add(summary, BorderLayout.NORTH);
        bottom.add(buttons, BorderLayout.CENTER);
        bottom.add(twoLines(caution), BorderLayout.SOUTH);
        JPanel content = new JPanel(new BorderLayout(6, 6));
        content.setBorder(BorderFactory.createEmptyBorder(8, 8, 8, 8));
        content.add(top, BorderLayout.NORTH);
        content.add(views, BorderLayout.CENTER);
        content.add(bottom, BorderLayout.SOUTH);
        setContentPane(content);
        setSize(980, 760);
        setLocationRelativeTo(owner);
        view.addListener(relabel);
        addWindowListener(new WindowAdapter() {
            @Override
            public void windowClosed(WindowEvent event) {
                view.removeListener(relabel);
                cancelFit();
            }
        });
        showOutcome();
    }

    /** @return the text in a pane two lines high: on a small screen with large text the rest scrolls */
    private static JScrollPane twoLines(WrappingText text) {
        JScrollPane pane = new JScrollPane(text, JScrollPane.VERTICAL_SCROLLBAR_AS_NEEDED,
                JScrollPane.HORIZONTAL_SCROLLBAR_NEVER) {
            @Override
            public java.awt.Dimension getPreferredSize() {
                java.awt.Dimension size = super.getPreferredSize();
                int lines = 2 * text.getFontMetrics(text.getFont()).getHeight() + 6;
                return new java.awt.Dimension(size.width, Math.min(size.height, lines));
            }
        };
        pane.setBorder(BorderFactory.createEmptyBorder());
        pane.setOpaque(false);
        pane.getViewport().setOpaque(false);
        return pane;
    }

    /** Asks for a tyre test file and fits it; nothing happens where the person cancels the chooser. */
    void chooseAndFit() {
        Path file = dialogs.chooseDataFileToOpen("Open tyre test data", "Tyre test data (*.csv)", "csv");
        if (file != null) {
            fit(file);
        }
    }

    /** Fits the file off the event thread; its outcome replaces what the dialog shows. */
    void fit(Path file) {
        cancelFit();
        outcome = null;
        status = "";
        fileLabel.setText("Fitting " + file.getFileName() + "…");
        progress.setIndeterminate(true);
        progress.setString("reading the file");
        progress.setVisible(true);
        cancel.setVisible(true);
        showOutcome();
        long fit = ++fitsStarted;
        work = BackgroundWork.start(running -> FitOutcome.of(file, running), new BackgroundWork.Listener<>() {
            @Override
            public void progress(long done, long total) {
                if (fit == fitsStarted) {
                    progress.setIndeterminate(false);
                    progress.setMaximum((int) total);
                    progress.setValue((int) done);
                    progress.setString("curve " + done + " of " + total);
                }
            }

            @Override
            public void finished(Void input, FitOutcome result) {
                if (fit == fitsStarted) {
                    ended(file);
                    outcome = result;
                    showOutcome();
                }
            }

            @Override
            public void failed(Void input, String message) {
                if (fit == fitsStarted) {
                    ended(file);
                    status = "The fit failed: " + message + ". Nothing in the car was changed. ";
                    showOutcome();
                }
            }

            @Override
            public void cancelled(Void input) {
                if (fit == fitsStarted) {
                    ended(file);
                    status = "The fit was cancelled. Nothing in the car was changed. ";
                    showOutcome();
                }
            }
        });
    }

    private void ended(Path file) {
        work = null;
        progress.setVisible(false);
        cancel.setVisible(false);
        fileLabel.setText("Data: " + file.getFileName());
        fileLabel.setToolTipText(file.toString());
    }

    void cancelFit() {
        if (work != null) {
            work.cancel();
        }
    }

    /** @return true while no fit runs, nor waits for its news to reach the event thread */
    boolean isIdle() {
        return work == null;
    }

    private void showOutcome() {
        boolean ready = outcome != null && outcome.succeeded();
        applyFront.setEnabled(ready);
        applyRear.setEnabled(ready);
        if (ready) {
            chart.show(outcome.fit(), outcome.data(), Quantity.FORCE.unit(view.units()));
            residuals.show(outcome.fit().curves());
        } else {
            chart.clear();
            residuals.show(List.of());
        }
        StringBuilder line = new StringBuilder(status);
        StringBuilder text = new StringBuilder();
        boolean refused = outcome != null && !outcome.succeeded();
        if (refused) {
            text.append(outcome.refusal()).append('\n');
            outcome.problems().forEach(problem -> text.append("  ").append(problem).append('\n'));
            text.append("Nothing in the car was changed.");
            line.append(outcome.refusal()).append(' ').append(outcome.problems().isEmpty() ? ""
                    : outcome.problems().get(0)).append(outcome.problems().size() > 1 ? " (more under Messages)" : "")
                    .append(". Nothing in the car was changed.");
            views.setSelectedIndex(2);
        } else if (ready) {
            DoubleSummaryStatistics shares = outcome.fit().curves().stream()
                    .mapToDouble(curve -> 100 * curve.rmsShareOfPeak()).summaryStatistics();
            text.append(outcome.fit().curves().size()).append(" curves fitted (the Magic Formula per curve, by "
                    + "least squares). Lines: the fits; dots: the measurements.");
            text.append(outcome.fit().camberFitted() ? " Camber terms were fitted." : " No camber terms: the data "
                    + "has no load measured at three or more cambers.");
            outcome.fit().warnings().forEach(warning -> text.append("\nWarning: ").append(warning));
            line.append(String.format(view.locale(), "%d curves fitted; RMS residuals %.2f to %.2f %% of a curve's "
                            + "peak (see Residuals)%s.", outcome.fit().curves().size(), shares.getMin(), shares.getMax(),
                    outcome.fit().warnings().isEmpty() ? "" : "; " + outcome.fit().warnings().size()
                            + " warning(s) under Messages"));
            if (status.isEmpty()) {
                line.append(" Nothing changes until you apply the tyre to an axle.");
            }
        } else if (status.isEmpty() && work == null) {
            line.append("Choose a CSV file with the columns loadN, slipAngleDeg, lateralForceN and, optionally, "
                    + "camberDeg.");
        }
        messages.setText(text.toString());
        messages.setCaretPosition(0);
        summary.setText(line.toString());
        summary.setForeground(refused || (ready && !outcome.fit().warnings().isEmpty()) ? Palette.warning()
                : javax.swing.UIManager.getColor("Label.foreground"));
    }

    /** Puts the fitted tyre on the axle as one undoable edit. */
    void apply(AxlePosition axle) {
        if (outcome == null || !outcome.succeeded()) {
            return;
        }
        ObjectNode tyre = outcome.tyre();
        document.editAll(tree -> VehicleEdits.putTyre(tree, axle, tyre), this);
        document.closeEditStep();
        status = "The fitted tyre is now on the " + axle.key() + " axle (Edit > Undo takes it back). ";
        showOutcome();
    }

    /** The worst residual names its line too: give that column the room. */
    private void widenWorstColumn() {
        table.getColumnModel().getColumn(5).setPreferredWidth(230);
    }

    private void relabel() {
        residuals.relabel();
        widenWorstColumn();
        if (outcome != null && outcome.succeeded()) {
            chart.show(outcome.fit(), outcome.data(), Quantity.FORCE.unit(view.units()));
        }
    }

    /** @return the summary line and the messages, as a person reads them */
    String messagesText() {
        return summary.getText() + "\n" + messages.getText();
    }

    ResidualTableModel residuals() {
        return residuals;
    }

    TyreFitPanel chartPanel() {
        return chart;
    }

    JButton applyButton(AxlePosition axle) {
        return axle == AxlePosition.FRONT ? applyFront : applyRear;
    }

    FitOutcome outcome() {
        return outcome;
    }

    JComponent progressBar() {
        return progress;
    }
}
