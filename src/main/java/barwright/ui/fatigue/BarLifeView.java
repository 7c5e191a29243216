package barwright.ui.fatigue;

import barwright.io.BarFatigueReader;
import barwright.io.VehicleDocument;
import barwright.io.VehicleFileException;
import barwright.model.AxlePosition;
import barwright.model.BarFatigueInputs;
import barwright.physics.AnalysisPipeline;
import barwright.physics.fatigue.DamageByRange;
import barwright.physics.fatigue.DefaultSpectrum;
import barwright.physics.fatigue.FatigueAnalysis;
import barwright.physics.fatigue.FatigueResult;
import barwright.physics.fatigue.MeanStressCorrection;
import barwright.ui.chart.DamageChart;
import barwright.ui.document.DocumentEvent;
import barwright.ui.document.OpenDocument;
import barwright.ui.field.ViewSettings;
import barwright.ui.task.BackgroundWork;
import barwright.units.Figures;
import barwright.units.Quantity;

import javax.swing.JPanel;
import javax.swing.JTextArea;
import java.awt.BorderLayout;
import java.awt.Dimension;
import java.util.Locale;
import java.util.function.Consumer;

/**
 * One bar's fatigue life on the default lap (invented, and said so), with a chart of the lap's damage by cycle
 * range (docs/model.md 13). Worked out off the event thread on each valid edit; the newest answer wins. For a
 * logged lap the text points to the {@code fatigue --log} command.
 */
public final class BarLifeView extends JPanel {
    /** The life view's least width (pixels): the damage chart still reads at this width. */
    private static final int LEAST_WIDTH = 240;
    /** The short caution under the life (the command line prints the full one). */
    static final String CAUTION = "An estimate with a wide scatter: inspect the bar and its ends for cracks, and "
            + "follow the maker's schedule and your event's rules.";
    /** Bins of the damage chart. */
    static final int BINS = 12;

    private final OpenDocument document;
    private final ViewSettings view;
    private final AxlePosition axle;
    private final JTextArea summary = wrapping("Working out the fatigue life...");
    private final DamageChart chart;
    private final BackgroundWork<VehicleDocument, Outcome> work;
    private final Consumer<DocumentEvent> onEdit = event -> refresh();
    private final Runnable onUnits = this::redraw;
    private Outcome shown;

    /** What one computation gives: a life and its damage by range, or a message saying why there is none. */
    record Outcome(FatigueResult result, DamageByRange byRange, String message) {
    }

    public BarLifeView(OpenDocument document, ViewSettings view, AxlePosition axle) {
        super(new BorderLayout(0, 4));
        this.document = document;
        this.view = view;
        this.axle = axle;
        setName(axle.key() + ".bar.life");
        setOpaque(false);
        summary.setName(axle.key() + ".bar.life.text");
        chart = new DamageChart("chart." + axle.key() + ".damage");
        add(summary, BorderLayout.NORTH);
        add(chart.component(), BorderLayout.CENTER);
        // the text wraps at the width given: once that changes, its height is asked again
        summary.addComponentListener(new java.awt.event.ComponentAdapter() {
            private int laidOutWidth = -1;

            @Override
            public void componentResized(java.awt.event.ComponentEvent event) {
                if (summary.getWidth() != laidOutWidth) {
                    laidOutWidth = summary.getWidth();
                    if (summary.getPreferredSize().height != summary.getHeight()) {
                        revalidate();
                    }
                }
            }
        });
        work = BackgroundWork.newestOnly(this::compute, outcome -> {
            shown = outcome;
            redraw();
        }, message -> summary.setText("The fatigue life could not be worked out: " + message));
    }

    /**
     * Never squashed below the chart's own least height plus a few lines of text; no wider than the editor's
     * column needs (the column takes its least width from its pages, and a wider one would push the key
     * figures below the charts on a 1280 px screen).
     */
    @Override
    public Dimension getMinimumSize() {
        Dimension text = summary.getPreferredSize();
        Dimension plot = chart.component().getMinimumSize();
        return new Dimension(Math.min(plot.width, LEAST_WIDTH), text.height + 4 + plot.height);
    }

    /**
     * No wider than the least either: the column stretches the view to its own width, while the chart's own wish
     * (a chart's usual width) and the text's (its lines unwrapped) made the editor scroll sideways at a large
     * text. As tall as the text wrapped at the width given and the chart's own height.
     */
    @Override
    public Dimension getPreferredSize() {
        Dimension text = summary.getPreferredSize();
        Dimension plot = chart.component().getPreferredSize();
        return new Dimension(Math.min(plot.width, LEAST_WIDTH), text.height + 4
                + Math.max(plot.height, chart.component().getMinimumSize().height));
    }

    @Override
    public void addNotify() {
        super.addNotify();
        document.addListener(onEdit);
        view.addListener(onUnits);
        refresh();
    }

    @Override
    public void removeNotify() {
        document.removeListener(onEdit);
        view.removeListener(onUnits);
        super.removeNotify();
    }

    private void refresh() {
        if (document.isValid()) {
            work.submit(document.lastValid());
        }
    }

    /** Off the event thread. */
    private Outcome compute(VehicleDocument car) {
        if (car.vehicle().axle(axle).bar() == null) {
            return new Outcome(null, null, "No bar on this axle.");
        }
        BarFatigueInputs inputs;
        try {
            inputs = BarFatigueReader.read(car, axle);
        } catch (VehicleFileException missing) {
            return new Outcome(null, null, "No fatigue life: " + missing.getMessage());
        }
        FatigueResult result = FatigueAnalysis.ofSpectrum(new AnalysisPipeline(car.vehicle()), axle, inputs,
                MeanStressCorrection.GOODMAN, DefaultSpectrum.CORNERS, DefaultSpectrum.LAP_SECONDS);
        DamageByRange byRange = DamageByRange.of(result.cycles(), result.curve(),
                inputs.settings().stressConcentration(), MeanStressCorrection.GOODMAN, BINS);
        return new Outcome(result, byRange, null);
    }

    private void redraw() {
        if (shown == null) {
            return;
        }
        if (shown.result() == null) {
            summary.setText(shown.message());
            chart.clear();
            return;
        }
        FatigueResult result = shown.result();
        String life = result.infiniteLife() ? "no cycle reaches the endurance limit: no fatigue damage expected."
                : String.format(Locale.ROOT, "%s laps to failure (%.3g hours of such laps).", laps(result),
                result.hoursToFailure());
        String safety = Double.isFinite(result.fatigueSafetyFactor())
                ? String.format(Locale.ROOT, "%.2f", result.fatigueSafetyFactor()) : "(no stress)";
        summary.setText("On the default lap (invented: 12 corners up to 1.2 g, 90 s; not your circuit): " + life
                + "\nEndurance limit after surface and size factors "
                + Figures.format(result.curve().enduranceLimit(), Quantity.STRESS, view.units(), 0)
                + "; fatigue safety factor at the check travel, swung both ways: " + safety
                + (result.fatigueSafetyFactor() < 1 ? " (below 1: that much travel, again and again, wears the bar)."
                : ".") + "\nFor your own lap: the command fatigue FILE --log LAP.csv.\n" + CAUTION);
        chart.show(shown.byRange(), view.units());
    }

    /** A read-only text that wraps at words (not ui.panel's, which uses this package: no cycle). */
    private static JTextArea wrapping(String text) {
        JTextArea area = new JTextArea(text);
        area.setLineWrap(true);
        area.setWrapStyleWord(true);
        area.setEditable(false);
        area.setOpaque(false);
        area.setFocusable(false);
        return area;
    }

    private static String laps(FatigueResult result) {
        double laps = result.lapsToFailure();
        return laps >= 1e6 ? String.format(Locale.ROOT, "%.3g", laps) : String.format(Locale.ROOT, "%.0f", laps);
    }

    /** @return the text shown (for tests) */
    public String summaryText() {
        return summary.getText();
    }
}
