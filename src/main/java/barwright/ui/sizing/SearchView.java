package barwright.ui.sizing;

import barwright.model.AntiRollBar;
import barwright.model.AxlePosition;
import barwright.model.Vehicle;
import barwright.sizing.BarChoice;
import barwright.sizing.Candidate;
import barwright.sizing.ExactSolution;
import barwright.sizing.Rejection;
import barwright.sizing.SizingResult;
import barwright.sizing.TradeLimits;
import barwright.report.sizing.ReachText;
import barwright.report.sizing.TradeFlagText;
import barwright.ui.document.DocumentEvent;
import barwright.ui.panel.FigureFormat;
import barwright.ui.panel.PagePanel;
import barwright.ui.panel.WrappingText;
import barwright.units.Quantity;

import javax.swing.BorderFactory;
import javax.swing.JButton;
import javax.swing.JComponent;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
import javax.swing.JTable;
import java.awt.BorderLayout;
import java.awt.Dimension;
import java.awt.FlowLayout;
import java.util.ArrayList;
import java.util.List;

/**
 * Sizing a bar (or both) to a target: the settings on the left, the ranked stock sizes on the right with the
 * exact solid diameter (and wall), and a button that puts the chosen candidate in the open car as one undoable
 * edit. The search runs off the event thread with progress and Cancel. Event thread.
 */
final class SearchView extends JPanel {
    private final SizingContext context;
    private final FigureFormat format;
    private final SearchForm form;
    private final CandidateTableModel rows;
    private final JTable table;
    private final WrappingText summary = new WrappingText("Choose what to aim at and press Find bars.");
    private final WrappingText exact = new WrappingText(" ");
    /** What the flags mean and, where the best proposal has any, a caution naming them. */
    private final WrappingText flagNote = new WrappingText(" ");
    private final WrappingText applied = new WrappingText(" ");
    private final JButton apply = new JButton("Put the chosen bar in the car");
    private final WorkStrip work = new WorkStrip("search");
    private SearchOutcome shown;
    private final WhileShown carShown;
    /** The settings beside the results, or the two as tabs where the window is narrow for its text. */
    private final SettingsBeside layout;

    SearchView(SizingContext context) {
        super(new BorderLayout());
        setName("search.view");
        this.context = context;
        this.format = new FigureFormat(context.view());
        this.form = new SearchForm(context.view());
        this.rows = new CandidateTableModel(format);
        FigureTable figures = new FigureTable("search.results", rows, CandidateTableModel.TOOLTIPS,
                new int[]{30, 60, 60, 50, 50, 70, 44, 44, 90, 80, 90, 110});
        figures.fitColumnsToTexts();
        table = figures;
        table.getSelectionModel().addListSelectionListener(event -> refreshApply());
        summary.setName("search.summary");
        exact.setName("search.exact");
        flagNote.setName("search.flags");
        for (WrappingText words : List.of(summary, flagNote, exact)) {
            // a long text shows its start: setting it moves no scroll pane to its end
            ((javax.swing.text.DefaultCaret) words.getCaret()).setUpdatePolicy(javax.swing.text.DefaultCaret.NEVER_UPDATE);
        }
        applied.setName("search.applied");
        apply.setName("search.apply");
        apply.setToolTipText("Writes the chosen bar's material, section and arm hole into the open car; Edit > Undo "
                + "takes it back");
        apply.addActionListener(event -> applyChosen());
        form.searchButton().addActionListener(event -> search());

        JPanel results = new JPanel(new BorderLayout(0, 4));
        results.setBorder(BorderFactory.createEmptyBorder(6, 8, 4, 8));
        results.add(capped(summary, results, 20), BorderLayout.NORTH);
        results.add(new JScrollPane(table), BorderLayout.CENTER);
        JPanel under = new JPanel(new BorderLayout(0, 4));
        JPanel notes = new PagePanel(new BorderLayout(0, 4)); // wraps its words at the scroll pane's width
        notes.add(flagNote, BorderLayout.NORTH);
        notes.add(exact, BorderLayout.CENTER);
        under.add(capped(notes, results, 30), BorderLayout.NORTH);
        JPanel buttons = new JPanel(new FlowLayout(FlowLayout.LEFT, 0, 0));
        buttons.add(apply);
        under.add(buttons, BorderLayout.CENTER);
        under.add(applied, BorderLayout.SOUTH);
        results.add(under, BorderLayout.SOUTH);
        JPanel left = new JPanel(new BorderLayout());
        left.add(SettingsBeside.settingsScroll(form, 500), BorderLayout.CENTER);
        JPanel run = new JPanel(new FlowLayout(FlowLayout.RIGHT, 8, 4));
        run.add(form.searchButton()); // outside the scrolled settings: always in view
        left.add(run, BorderLayout.SOUTH);
        layout = new SettingsBeside("search", left, results);
        add(layout, BorderLayout.CENTER);
        add(work, BorderLayout.SOUTH);
        carShown = new WhileShown(this, this::showCar);
        context.document().addListener(this::documentChanged);
        context.view().addListener(this::unitsChanged);
        carShown.request();
        refreshApply();
    }

    /**
     * @return the text in a borderless scroll pane at most that share of the results column high (and never less
     *         than two lines), so that with large text on a small screen the words above and under the table
     *         scroll rather than squeeze the table out of sight
     */
    static JScrollPane capped(JComponent text, JComponent column, int percent) {
        JScrollPane scroll = new JScrollPane(text, JScrollPane.VERTICAL_SCROLLBAR_AS_NEEDED,
                JScrollPane.HORIZONTAL_SCROLLBAR_NEVER) {
            @Override
            public Dimension getPreferredSize() {
                Dimension wanted = super.getPreferredSize();
                int twoLines = 2 * text.getFontMetrics(text.getFont()).getHeight() + 4;
                int room = Math.max(twoLines, column.getHeight() * percent / 100);
                return new Dimension(wanted.width, Math.min(wanted.height, room));
            }
        };
        scroll.setBorder(null);
        scroll.setOpaque(false);
        scroll.getViewport().setOpaque(false);
        scroll.getVerticalScrollBar().setUnitIncrement(16);
        return scroll;
    }

    /** @return true where the settings and the results are two tabs (a window narrow for its text) */
    boolean settingsAndResultsTabbed() {
        return layout.tabbed();
    }

    /** Starts a search on the car as it stands; a refused setting is said in the status line instead. */
    void search() {
        SearchSettings settings;
        Vehicle vehicle;
        try {
            vehicle = context.currentCar().vehicle();
            settings = form.settings();
            SearchPlan.request(vehicle, settings); // refuses bad settings now, before any work starts
        } catch (IllegalArgumentException | IllegalStateException refused) {
            boolean hadResults = shown != null;
            clearResults(" ");
            work.say(refused.getMessage() + (hadResults ? " The last search's results were cleared." : ""), true);
            return;
        }
        String unit = settings.axles().size() > 1 ? "bars and pairs" : "bars";
        work.run("Searching", unit, "The search failed", progress -> SearchPlan.run(vehicle, settings, progress),
                this::showOutcome, () -> clearResults(" "));
    }

    /** Takes the results off the screen (they no longer answer what was asked), with Apply disabled. */
    private void clearResults(String why) {
        shown = null;
        rows.show(List.of(), null, TradeLimits.commonPractice(0));
        summary.setText(why);
        exact.setText(" ");
        flagNote.setText(" ");
        applied.setText(" ");
        refreshApply();
    }

    private void showOutcome(SearchOutcome outcome) {
        shown = outcome;
        rows.show(outcome.result().candidates(), outcome.vehicle(), TradeLimits.of(outcome.request()));
        if (!outcome.result().candidates().isEmpty()) {
            table.setRowSelectionInterval(0, 0);
        }
        layout.showResults();
        applied.setText(" ");
        describe();
        refreshApply();
    }

    private void describe() {
        if (shown == null) {
            return;
        }
        SizingResult result = shown.result();
        boolean pairs = shown.request().axles().size() > 1;
        StringBuilder text = new StringBuilder();
        text.append("Sizing the ").append(pairs ? "front and rear bars" : shown.request().axles().get(0).key() + " bar")
                .append(" for ").append(targets(result)).append(". Tried ")
                .append(String.format(format.view().locale(), "%,d", result.evaluated()))
                .append(pairs ? " pairs of bars; " : " bars; ")
                .append(String.format(format.view().locale(), "%,d", result.accepted()))
                .append(pairs ? " of those checked in full" : "").append(" met every limit");
        List<String> left = new ArrayList<>();
        for (Rejection reason : Rejection.values()) { // in a fixed order, most basic check first
            Long count = result.rejections().get(reason);
            if (count != null) {
                left.add(String.format(format.view().locale(), "%,d", count) + " " + reason.words());
            }
        }
        text.append(left.isEmpty() ? "." : "; left out: " + String.join(", ", left) + ".");
        if (result.candidates().isEmpty()) {
            text.append(" No stock size meets every limit: relax the limit that left most out, or try more sizes "
                    + "or materials.");
        } else {
            text.append(" Best first: closest to the target, then lightest.");
        }
        if (!stillApplies()) {
            text.append(" The car has changed since this search: search again before using these results.");
        }
        summary.setText(text.toString());
        flagNote.setText(flagWords(result));
        List<String> lines = new ArrayList<>();
        if (shown.exactSolid() != null) {
            lines.add(exactLine("Exact solid diameter", shown.exactSolid()));
        }
        if (shown.exactWall() != null) {
            lines.add(exactLine("Exact wall of a " + format.text(shown.settings().tubeDiameter(), Quantity.LENGTH)
                    + " tube", shown.exactWall()));
        }
        exact.setText(lines.isEmpty() ? " " : String.join("\n", lines));

    }

    /** @return the reach where the target lies outside it, the caution of a flagged best proposal, the legend */
    private String flagWords(SizingResult result) {
        List<String> lines = new ArrayList<>();
        if (result.targetOutOfReach()) {
            boolean pairs = shown.request().axles().size() > 1;
            String bars = pairs ? "front and rear bars" : shown.request().axles().get(0).key() + " bar";
            String words = ReachText.outOfReach(bars, Double.NaN, result.targetShare(), result.reach(),
                    format.view().locale());
            lines.add("Out of reach: " + words + ". The rows are the closest, not on target.");
        }
        if (!result.candidates().isEmpty()) {
            TradeLimits limits = TradeLimits.of(shown.request());
            String caution = TradeFlagText.bestCaution(result.candidates().get(0),
                    limits.flags(result.candidates().get(0)), format.view().units());
            if (!caution.isEmpty()) {
                lines.add(caution);
            }
            lines.add(TradeFlagText.legend(limits, format.view().units()));
        }
        return lines.isEmpty() ? " " : String.join("\n", lines);
    }

    private String targets(SizingResult result) {
        List<String> parts = new ArrayList<>();
        if (!Double.isNaN(result.targetShare())) {
            parts.add("a front share of " + format.text(result.targetShare(), Quantity.SHARE));
        }
        if (shown.request().targets().rollGradient() != null) {
            parts.add("a roll gradient of " + format.text(shown.request().targets().rollGradient(),
                    Quantity.ROLL_GRADIENT));
        }
        return String.join(" and ", parts);
    }

    private String exactLine(String what, ExactSolution solution) {
        AxlePosition axle = shown.request().axles().get(0);
        AntiRollBar bar = shown.vehicle().axle(axle).bar();
        String material = shown.request().choices().get(axle).materials().get(0).name();
        boolean share = solution.figure() == ExactSolution.TargetFigure.FRONT_SHARE;
        Quantity quantity = share ? Quantity.SHARE : Quantity.ROLL_GRADIENT;
        String target = (share ? "front share " : "roll gradient ") + format.text(solution.target(), quantity);
        String where = " (" + material + ", the bar's own hole " + (bar.selectedArm() + 1) + ")";
        if (!solution.found()) {
            return what + ": none gives " + target + where + "; this bar reaches only "
                    + format.text(solution.lowestReach(), quantity) + " to "
                    + format.text(solution.highestReach(), quantity) + ".";
        }
        return what + " for " + target + ": " + format.text(solution.dimension(), Quantity.LENGTH) + where
                + ". Not a stock size: round it to one the table lists.";
    }

    /** @return true where the shown results are still for the car as it stands (apart from the sized bars) */
    private boolean stillApplies() {
        if (shown == null || !context.document().isValid()) {
            return false;
        }
        Vehicle current = context.document().lastValid().vehicle();
        Vehicle searched = shown.vehicle();
        Vehicle aligned = current;
        for (AxlePosition axle : shown.request().axles()) {
            AntiRollBar now = current.axle(axle).bar();
            AntiRollBar then = searched.axle(axle).bar();
            if (now == null || then.selectedArm() >= now.holeCount()) {
                return false; // a bar with other holes (another car opened, arms edited) is another car
            }
            aligned = aligned.withAxle(axle, aligned.axle(axle).withBar(now.withMaterial(then.material())
                    .withSection(then.section()).withSelectedArm(then.selectedArm())));
        }
        return aligned.equals(searched);
    }

    private void applyChosen() {
        int row = table.getSelectedRow();
        if (row < 0 || !stillApplies()) {
            return;
        }
        Candidate candidate = rows.candidate(table.convertRowIndexToModel(row));
        BarEdits.putBars(context.document(), candidate.bars(), this);
        List<String> words = new ArrayList<>();
        for (BarChoice choice : candidate.bars()) {
            words.add(choice.axle().key() + " bar: " + choice.size().label() + " " + choice.material().name()
                    + ", hole " + (choice.selectedArm() + 1));
        }
        applied.setText("Put in the car: " + String.join("; ", words) + ". Edit > Undo (Ctrl+Z) in the main window "
                + "takes it back. Have the bar and its mounts checked before it is fitted.");
    }

    private void documentChanged(DocumentEvent event) {
        carShown.request();
        if (event.kind() == DocumentEvent.Kind.REPLACED && shown != null) {
            clearResults("Another car was opened: " + context.document().displayName() + ". The results for the "
                    + "car before it were cleared; press Find bars to size this one.");
            return;
        }
        describe();
        refreshApply();
    }

    /** Tells the form about the car as it stands; only while the view is on screen (it costs an analysis). */
    private void showCar() {
        if (context.document().isValid()) {
            form.showCar(context.document().lastValid().vehicle());
        }
    }

    private void unitsChanged() {
        rows.unitsChanged();
        describe();
    }

    private void refreshApply() {
        apply.setEnabled(table.getSelectedRow() >= 0 && stillApplies());
    }

    SearchForm form() {
        return form;
    }

    JTable table() {
        return table;
    }

    WorkStrip work() {
        return work;
    }

    String summaryText() {
        return summary.getText();
    }

    String exactText() {
        return exact.getText();
    }

    String flagText() {
        return flagNote.getText();
    }
}
