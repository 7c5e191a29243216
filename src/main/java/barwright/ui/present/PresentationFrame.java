package barwright.ui.present;

import barwright.model.AntiRollBar;
import barwright.model.Axle;
import barwright.model.TurnDirection;
import barwright.model.Vehicle;
import barwright.physics.AnalysisResult;
import barwright.physics.curve.Chart;
import barwright.report.Cautions;
import barwright.sizing.compare.Comparison;
import barwright.sizing.compare.Configuration;
import barwright.ui.chart.ComparisonCharts;
import barwright.ui.document.DocumentEvent;
import barwright.ui.document.OpenDocument;
import barwright.ui.field.ViewSettings;
import barwright.ui.panel.CarBehindView;
import barwright.ui.panel.FigureFormat;
import barwright.ui.task.AnalysisOutcome;
import barwright.ui.task.CorneringProbe;
import barwright.ui.task.ResultsModel;
import barwright.units.Quantity;

import javax.swing.AbstractAction;
import javax.swing.BorderFactory;
import javax.swing.JButton;
import javax.swing.JComboBox;
import javax.swing.JComponent;
import javax.swing.JFrame;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JSlider;
import javax.swing.JTabbedPane;
import javax.swing.KeyStroke;
import javax.swing.SwingConstants;
import javax.swing.UIManager;
import java.awt.BorderLayout;
import java.awt.Component;
import java.awt.Container;
import java.awt.Dimension;
import java.awt.FlowLayout;
import java.awt.Font;
import java.awt.GridLayout;
import java.awt.event.ActionEvent;
import java.awt.event.KeyEvent;
import java.util.ArrayList;
import java.util.List;
import java.util.function.Consumer;
import java.util.function.Function;

/**
 * Presentation mode: the car from behind (or a chart) filling the screen with large text, the slider and
 * the turn direction, steppers for what a class wants to see change (each bar's diameter and arm hole, each
 * spring rate), and a pinned setup drawn beside the car as it is now ("before / after"), in the picture,
 * the figures and the charts. F11 or Escape goes back to the main window. Event thread.
 */
public final class PresentationFrame extends JFrame {
    /** Text this many times the window's, for the back of a classroom. */
    static final float TEXT_SCALE = 1.6f;
    private static final List<String> CHART_TITLES = List.of("Handling", "Body roll", "Inside wheel loads");
    private final OpenDocument document;
    private final ViewSettings view;
    private final ResultsModel results;
    private final FigureFormat format;
    private final CorneringProbe probe = new CorneringProbe();
    private final JPanel pictures = new JPanel(new GridLayout(1, 2, 12, 0));
    private final JTabbedPane views = new JTabbedPane();
    private final JPanel figures = new JPanel(new GridLayout(0, 2, 24, 2));
    private final List<QuickControl> controls = new ArrayList<>();
    private final JButton pin = new JButton("Pin this setup");
    /** The caution stays at the window's text size: it is read up close, not from the back of the room. */
    private final JLabel caution = new JLabel();
    private final Runnable resultsChanged = this::refresh;
    private final Runnable unitsChanged = this::unitsChanged;
    private final Consumer<DocumentEvent> documentChanged = event -> refreshControls();
    private final Font large;
    private ResultsModel pinned;

    public PresentationFrame(OpenDocument document, ViewSettings view, ResultsModel results) {
        super("Barwright \u2014 presentation");
        setName("presentation");
        this.document = document;
        this.view = view;
        this.results = results;
        this.format = new FigureFormat(view);
        Font base = UIManager.getFont("defaultFont") != null ? UIManager.getFont("defaultFont")
                : UIManager.getFont("Label.font");
        large = base.deriveFont(base.getSize2D() * TEXT_SCALE);

        views.setName("presentation.views");
        views.addTab("Car from behind", pictures);
        for (String title : CHART_TITLES) {
            views.addTab(title, new JPanel());
        }
        views.addChangeListener(event -> refreshCharts());
        JPanel top = new JPanel(new BorderLayout(8, 4));
        figures.setName("presentation.figures");
        top.add(figures, BorderLayout.CENTER);
        caution.setText("<html>" + Cautions.SHORT + "</html>");
        top.add(caution, BorderLayout.SOUTH);
        top.setBorder(BorderFactory.createEmptyBorder(8, 12, 4, 12));

        JPanel content = new JPanel(new BorderLayout(8, 8));
        content.add(top, BorderLayout.NORTH);
        content.add(views, BorderLayout.CENTER);
        content.add(controls(), BorderLayout.SOUTH);
        setContentPane(content);
        bindKeys(content);
        enlarge(content);
        caution.setFont(base);

        results.addListener(resultsChanged);
        view.addListener(unitsChanged);
        document.addListener(documentChanged);
        refreshControls();
        refresh();
    }

    private JComponent controls() {
        JPanel row1 = new JPanel(new FlowLayout(FlowLayout.LEADING, 10, 4));
        JComboBox<String> turn = new JComboBox<>(new String[] {"Left turn", "Right turn"});
        turn.setName("presentation.turn");
        turn.addActionListener(event -> probe.setTurn(turn.getSelectedIndex() == 1 ? TurnDirection.RIGHT
                : TurnDirection.LEFT));
        JSlider slider = new JSlider(0, 100, (int) Math.round(probe.fractionOfLimit() * 100));
        slider.setName("presentation.slider");
        slider.setToolTipText("How hard the car corners, as a share of its grip limit (arrow keys and the wheel step it)");
        slider.addChangeListener(event -> probe.setFractionOfLimit(slider.getValue() / 100.0));
        slider.addMouseWheelListener(event -> slider.setValue(slider.getValue() - event.getWheelRotation() * 5));
        row1.add(turn);
        row1.add(new JLabel("Share of grip"));
        slider.setPreferredSize(new Dimension(160, slider.getPreferredSize().height));
        row1.add(slider);
        pin.setName("presentation.pin");
        pin.setToolTipText("Keep this setup on screen beside the car as it changes: before and after");
        pin.addActionListener(new AbstractAction() {
            @Override
            public void actionPerformed(ActionEvent event) {
                togglePin();
            }
        });
        row1.add(pin);
        JButton back = new JButton("Back (Esc)");
        back.setToolTipText("Back to the main window (F11 or Esc)");
        back.addActionListener(event -> close());
        row1.add(back);

        JPanel controlsPanel = new JPanel(new GridLayout(3, 1));
        controlsPanel.add(row1);
        for (String axle : List.of("front", "rear")) {
            JPanel row2 = new JPanel(new FlowLayout(FlowLayout.LEADING, 10, 4));
            controlsPanel.add(row2);
            Function<Vehicle, Axle> of = car -> "front".equals(axle) ? car.front() : car.rear();
            String title = "front".equals(axle) ? "Front" : "Rear";
            add(row2, title + " bar \u00d8", new QuickControl("presentation." + axle + ".diameter",
                    axle + ".bar.section.outerDiameterMm", Quantity.LENGTH, 0.5e-3, document, view,
                    car -> bar(of.apply(car)) == null ? Double.NaN : bar(of.apply(car)).section().outerDiameter(),
                    null));
            add(row2, title + " arm hole", new QuickControl("presentation." + axle + ".hole", axle + ".bar.selectedArm", null, 1,
                    document, view, car -> bar(of.apply(car)) == null ? Double.NaN : bar(of.apply(car)).selectedArm(),
                    car -> bar(of.apply(car)).holeCount()));
            add(row2, title + " spring", new QuickControl("presentation." + axle + ".spring", axle + ".springRateNPerMm",
                    Quantity.LINEAR_RATE, 2e3, document, view, car -> of.apply(car).springRate(), null));
        }
        return controlsPanel;
    }

    private static AntiRollBar bar(Axle axle) {
        return axle.bar();
    }

    private void add(JPanel row, String label, QuickControl control) {
        controls.add(control);
        row.add(new JLabel(label));
        row.add(control.component());
        row.add(control.unitLabel());
    }

    private void bindKeys(JComponent content) {
        for (int key : new int[] {KeyEvent.VK_F11, KeyEvent.VK_ESCAPE}) {
            content.getInputMap(JComponent.WHEN_IN_FOCUSED_WINDOW).put(KeyStroke.getKeyStroke(key, 0), "leave");
        }
        content.getActionMap().put("leave", new AbstractAction() {
            @Override
            public void actionPerformed(ActionEvent event) {
                close();
            }
        });
    }

    /** Leaves presentation mode; the views stop following the open car. */
    public void close() {
        results.removeListener(resultsChanged);
        view.removeListener(unitsChanged);
        document.removeListener(documentChanged);
        dispose();
    }

    /** Pins the setup on screen now, or lets go of the pinned one. */
    public void togglePin() {
        AnalysisOutcome shown = results.shown();
        pinned = pinned == null && shown != null && shown.succeeded() ? ResultsModel.pinned(shown) : null;
        pin.setText(pinned == null ? "Pin this setup" : "Let go of the pinned setup");
        refresh();
    }

    /** @return whether a setup is pinned beside the car now */
    public boolean hasPinned() {
        return pinned != null;
    }

    /** @return the before/after lines shown at the top (tests) */
    public List<String> figureLines() {
        List<String> lines = new ArrayList<>();
        for (Component label : figures.getComponents()) {
            lines.add(((JLabel) label).getText());
        }
        return lines;
    }

    private void unitsChanged() {
        refreshControls();
        refresh();
    }

    private void refreshControls() {
        Vehicle car = document.lastValid() == null ? null : document.lastValid().vehicle();
        controls.forEach(control -> control.refresh(car));
    }

    private void refresh() {
        pictures.removeAll();
        if (pinned != null) {
            pictures.add(picture("Pinned setup (before)", pinned));
        }
        pictures.add(picture(pinned != null ? "Now (after)" : "Now", results));
        figures.removeAll();
        AnalysisOutcome now = results.shown();
        if (now != null && now.succeeded()) {
            AnalysisResult before = pinned == null ? null : pinned.shown().result();
            for (String line : BeforeAfter.lines(before, now.result(), probe.turn(), format)) {
                JLabel label = new JLabel(line);
                label.setFont(large);
                figures.add(label);
            }
        }
        refreshCharts();
        enlarge(pictures);
        if (pinned != null) {
            // two cars side by side: a smaller text keeps each one's headings whole
            setFontUnder(pictures, large.deriveFont(large.getSize2D() * 0.75f));
        }
        revalidate();
        repaint();
    }

    private JComponent picture(String caption, ResultsModel model) {
        JPanel panel = new JPanel(new BorderLayout());
        JLabel title = new JLabel(caption, SwingConstants.CENTER);
        panel.add(title, BorderLayout.NORTH);
        panel.add(new CarBehindView(model, probe, format), BorderLayout.CENTER);
        return panel;
    }

    private void refreshCharts() {
        int index = views.getSelectedIndex();
        AnalysisOutcome now = results.shown();
        if (index < 1 || now == null || !now.succeeded()) {
            return;
        }
        List<Configuration> setups = new ArrayList<>();
        List<AnalysisResult> analysed = new ArrayList<>();
        if (pinned != null) {
            setups.add(new Configuration("Pinned (before)", pinned.shown().vehicle()));
            analysed.add(pinned.shown().result());
        }
        setups.add(new Configuration(pinned != null ? "Now (after)" : "Now", now.vehicle()));
        analysed.add(now.result());
        Chart chart = Comparison.charts(setups, analysed).get(index - 1);
        JComponent drawn = ComparisonCharts.panel(chart, setups.size(), view, "presentation.chart");
        enlarge(drawn);
        views.setComponentAt(index, drawn);
    }

    /** Sets the large text on every component under {@code root} (the car picture scales its own drawing with it). */
    private void enlarge(Container root) {
        setFontUnder(root, large);
    }

    private static void setFontUnder(Container root, Font font) {
        root.setFont(font);
        for (Component child : root.getComponents()) {
            child.setFont(font);
            if (child instanceof Container inner) {
                setFontUnder(inner, font);
            }
        }
    }
}
