package barwright.ui.tyre;

import barwright.model.AxlePosition;
import barwright.model.Tyre;
import barwright.model.TurnDirection;
import barwright.physics.AnalysisResult;
import barwright.physics.GripLostToTransfer;
import barwright.physics.TyreModel;
import barwright.physics.Warning;
import barwright.physics.curve.Series;
import barwright.physics.curve.TyreCurves;
import barwright.report.Cautions;
import barwright.ui.chart.TyreCamberChart;
import barwright.ui.chart.TyreLoadChart;
import barwright.ui.chart.TyreSlipChart;
import barwright.ui.field.ViewSettings;
import barwright.ui.panel.PagePanel;
import barwright.ui.panel.Palette;
import barwright.ui.panel.WrappingText;
import barwright.units.Figures;
import barwright.units.Quantity;

import javax.swing.BorderFactory;
import javax.swing.BoxLayout;
import javax.swing.JComponent;
import javax.swing.UIManager;
import javax.swing.text.DefaultCaret;
import java.awt.Dimension;
import java.util.List;
import java.util.Locale;
import java.util.stream.Collectors;

/**
 * One axle's tyre: what the file gives, the axle's loads at the limit, the grip lost to load transfer, the tyre
 * warnings of the analysis, and three charts (peak friction against load, lateral force against slip angle at the
 * three loads, the camber effect). Filled on the event thread from the analysis on screen: the lines are a few
 * hundred evaluations of the tyre model.
 */
final class AxleTyreView extends PagePanel {
    /** The analysis's tyre warnings (model.md 8.1); stable codes, as scripts see them. */
    static final List<String> TYRE_WARNING_CODES = List.of("TYRE_LOAD_OUTSIDE_DATA", "TYRE_FRICTION_AT_FLOOR");
    /** Each chart's height at the smallest: below this the axis titles crowd the plot. */
    private static final int CHART_HEIGHT = 330;
    /** With larger text, this many lines of text a chart: titles, legend and ticks grow with the text. */
    private static final int CHART_LINES = 24;

    private final AxlePosition axle;
    private final ViewSettings view;
    private final WrappingText summary = new WrappingText(" ");
    private final WrappingText warnings = new WrappingText("");
    private final TyreLoadChart loadChart;
    private final TyreSlipChart slipChart;
    private final TyreCamberChart camberChart;
    private final JComponent camberPanel;
    private final WrappingText noCamber = new WrappingText("");
    /** The three charts' panels, sized to the text. */
    private final List<JComponent> chartPanels = new java.util.ArrayList<>();

    AxleTyreView(AxlePosition axle, ViewSettings view) {
        super(null);
        this.axle = axle;
        this.view = view;
        setName("tyre." + axle.key());
        setLayout(new BoxLayout(this, BoxLayout.Y_AXIS));
        setBorder(BorderFactory.createEmptyBorder(6, 8, 8, 8));
        summary.setName("tyre." + axle.key() + ".summary");
        warnings.setName("tyre." + axle.key() + ".warnings");
        noCamber.setName("tyre." + axle.key() + ".noCamber");
        loadChart = new TyreLoadChart(view);
        slipChart = new TyreSlipChart(view);
        camberChart = new TyreCamberChart(view);
        camberPanel = camberChart.panel("tyre." + axle.key() + ".camberChart");
        add(stretch(summary));
        add(stretch(warnings));
        add(chart(loadChart.panel("tyre." + axle.key() + ".loadChart")));
        add(chart(slipChart.panel("tyre." + axle.key() + ".slipChart")));
        add(chart(camberPanel));
        add(stretch(noCamber));
        WrappingText caution = new WrappingText(Cautions.SHORT);
        caution.setForeground(Palette.muted());
        add(stretch(caution));
    }

    private static JComponent stretch(WrappingText text) {
        text.setAlignmentX(LEFT_ALIGNMENT);
        // new text must not scroll the page to itself: the page stays where the person left it. A caret of our
        // own (not the look and feel's) keeps this policy through a change of theme or text size
        DefaultCaret caret = new DefaultCaret();
        caret.setUpdatePolicy(DefaultCaret.NEVER_UPDATE);
        text.setCaret(caret);
        return text;
    }

    private JComponent chart(JComponent panel) {
        chartPanels.add(panel);
        panel.setAlignmentX(LEFT_ALIGNMENT);
        sizeChart(panel);
        return panel;
    }

    private static void sizeChart(JComponent panel) {
        java.awt.Font text = UIManager.getFont("defaultFont") != null ? UIManager.getFont("defaultFont")
                : UIManager.getFont("Label.font");
        int height = Math.max(CHART_HEIGHT, CHART_LINES * (text == null ? 13 : text.getSize()));
        panel.setPreferredSize(new Dimension(500, height));
        panel.setMinimumSize(new Dimension(200, height));
        panel.setMaximumSize(new Dimension(Integer.MAX_VALUE, height));
    }

    /** Draws the axle's tyre from the analysis, at the limit of the turn given. */
    void show(AnalysisResult result, TurnDirection direction, boolean stale) {
        Tyre tyre = result.vehicle().axle(axle).tyre();
        TyreModel model = new TyreModel(tyre);
        TyreCurves.AxleLoads loads = TyreCurves.loads(result, axle, direction);
        String limitWords = direction.word() + " turn";
        loadChart.show(TyreCurves.frictionAgainstLoad(model, loads.outside()), loads);
        boolean camberTerms = !tyre.camber().isNone();
        List<Series> curves = TyreCurves.forceAgainstSlip(model, loads.all(), new String[]{
                "static " + force(loads.staticLoad()), "inside at the limit " + force(loads.inside()),
                "outside at the limit " + force(loads.outside())}, 0);
        slipChart.show(curves, camberTerms ? "zero camber" : "");
        TyreCurves.CamberEffect effect = TyreCurves.camberEffect(model, loads.staticLoad());
        camberPanel.setVisible(effect != null);
        noCamber.setVisible(effect == null);
        if (effect != null) {
            camberChart.show(effect, "at the static load");
        } else {
            noCamber.setText("This tyre has no camber terms (camberForPeakGripDeg and the two keys with it), so "
                    + "camber changes nothing in the model. \"Fit from data...\" finds them from curves measured at "
                    + "three or more cambers.");
        }
        double accel = result.turn(direction).limit();
        summary.setText(String.format(Locale.ROOT, "%s%s %s. At the grip limit of a %s (%s): static %s a wheel, "
                        + "inside %s, outside %s. Load transfer costs this axle %s of its grip.",
                stale ? "Out of date: the last car the program accepted. " : "", capitalised(axle.key()),
                describe(tyre), limitWords, Figures.format(accel, Quantity.ACCELERATION, view.units(), 2, view.locale()),
                force(loads.staticLoad()), force(loads.inside()), force(loads.outside()),
                Figures.format(GripLostToTransfer.atLimit(result, axle, direction), Quantity.SHARE, view.units(), 1,
                        view.locale())));
        String tyreWarnings = result.warnings().stream().filter(this::concernsThisAxle).map(Warning::message)
                .collect(Collectors.joining("\n"));
        warnings.setText(tyreWarnings);
        warnings.setForeground(Palette.warning());
        warnings.setVisible(!tyreWarnings.isEmpty());
        revalidate();
    }

    private boolean concernsThisAxle(Warning warning) {
        return TYRE_WARNING_CODES.contains(warning.code()) && warning.message().contains(axle.key() + " tyres");
    }

    private String describe(Tyre tyre) {
        StringBuilder text = new StringBuilder("tyres: peak friction ");
        if (tyre.hasFrictionPoints()) {
            text.append(String.format(Locale.ROOT, "from %d measured points (%s to %s)",
                    tyre.frictionByLoad().points().size(), force(tyre.frictionByLoad().lowestLoad()),
                    force(tyre.frictionByLoad().highestLoad())));
        } else {
            text.append(String.format(Locale.ROOT, "from the law, %.2f at %s, load sensitivity %.3f",
                    tyre.frictionAtNominalLoad(), force(tyre.nominalLoad()), tyre.frictionLoadSensitivity()));
        }
        text.append(tyre.hasStiffnessPoints() ? "; cornering stiffness from points"
                : "; cornering stiffness from the law");
        text.append(tyre.camber().isNone() ? "; no camber terms" : "; with camber terms");
        return text.toString();
    }

    private String force(double si) {
        return Figures.format(si, Quantity.FORCE, view.units(), 0, view.locale());
    }

    private static String capitalised(String word) {
        return Character.toUpperCase(word.charAt(0)) + word.substring(1);
    }

    /** Sets the charts' renderers and colours again, as after a change of theme. */
    void restyle() {
        chartPanels.forEach(AxleTyreView::sizeChart);
        loadChart.style();
        slipChart.style();
        camberChart.style();
        warnings.setForeground(Palette.warning());
    }

    TyreLoadChart loadChart() {
        return loadChart;
    }

    TyreSlipChart slipChart() {
        return slipChart;
    }

    TyreCamberChart camberChart() {
        return camberChart;
    }

    String summaryText() {
        return summary.getText();
    }

    String warningText() {
        return warnings.isVisible() ? warnings.getText() : "";
    }

    boolean showsCamberChart() {
        return camberPanel.isVisible();
    }
}
