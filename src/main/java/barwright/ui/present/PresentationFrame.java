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
import barwright.ui.panel.WrappingText;
import barwright.ui.task.AnalysisOutcome;
import barwright.ui.task.CorneringProbe;
import barwright.ui.task.ResultsModel;
import barwright.units.Quantity;

import javax.swing.AbstractAction;
import javax.swing.BorderFactory;
import javax.swing.BoxLayout;
import javax.swing.JButton;
import javax.swing.JComboBox;
import javax.swing.JComponent;
import javax.swing.JFrame;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JScrollPane;
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
import java.awt.GridBagConstraints;
import java.awt.GridBagLayout;
import java.awt.GridLayout;
import java.awt.Insets;
import java.awt.event.ActionEvent;
import java.awt.event.ComponentAdapter;
import java.awt.event.ComponentEvent;
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
    /**
     * Text this many times the window's, for the back of a classroom, but no taller than a {@link #LINES_HIGH}th
     * of the screen (never smaller than the window's own): the largest text on a 1024x768 projector would
     * otherwise leave the picture no room.
     */
    static final float TEXT_SCALE = 1.6f;
    static final int LINES_HIGH = 26;
    private static final List<String> CHART_TITLES = List.of("Handling", "Body roll", "Inside wheel loads");
    private final OpenDocument document;
    private final ViewSettings view;
    private final ResultsModel results;
    private final FigureFormat format;
    private final CorneringProbe probe = new CorneringProbe();
    private final JPanel pictures = new JPanel(new GridLayout(1, 2, 12, 0));
    /** The car tab: the pictures under their shared key. */
    private final JPanel carTab = new JPanel(new BorderLayout(0, 4));
    private final JTabbedPane views = new JTabbedPane();
    /** Each tab's page: its picture or chart, and the figures' column while it is the tab shown. */
    private final List<JPanel> pages = new ArrayList<>();
    /** The figures' column beside the picture: each name over its value; it takes the width it needs. */
    private final JPanel figures = new JPanel();
    private final List<QuickControl> controls = new ArrayList<>();
    private final JButton pin = new JButton("Pin this setup");
    /** The presenter's controls, at the middle text size: the room reads the figures and the picture. */
    private final JComponent controlsPanel;
    /** The caution stays at the window's text size: it is read up close, not from the back of the room. */
    private final WrappingText caution = new WrappingText(Cautions.SHORT);
    private final Runnable resultsChanged = this::refresh;
    private final Runnable unitsChanged = this::unitsChanged;
    private final Consumer<DocumentEvent> documentChanged = event -> refreshControls();
    private final Font base;
    private Font large;
    private ResultsModel pinned;

    public PresentationFrame(OpenDocument document, ViewSettings view, ResultsModel results) {
        super("Barwright \u2014 presentation");
        setName("presentation");
        this.document = document;
        this.view = view;
        this.results = results;
        this.format = new FigureFormat(view);
        base = UIManager.getFont("defaultFont") != null ? UIManager.getFont("defaultFont")
                : UIManager.getFont("Label.font");
        large = base.deriveFont(base.getSize2D() * TEXT_SCALE);

        controlsPanel = controls();
        views.setName("presentation.views");
        carTab.add(new PictureKey(), BorderLayout.NORTH);
        carTab.add(pictures, BorderLayout.CENTER);
        addPage("Car from behind", carTab);
        for (String title : CHART_TITLES) {
            addPage(title, new JPanel());
        }
        views.addChangeListener(event -> {
            figuresBesideShownPage();
            refreshCharts();
        });
        figures.setName("presentation.figures");
        figures.setLayout(new BoxLayout(figures, BoxLayout.Y_AXIS));
        figures.setBorder(BorderFactory.createEmptyBorder(4, 12, 4, 12));
        caution.setName("presentation.caution");
        caution.setBorder(BorderFactory.createEmptyBorder(4, 12, 4, 12));

        // the tabs' titles run the whole width, in one row where they fit; under them the figures' column beside
        // the picture takes the width it needs, the picture the rest; the controls and the caution run under both
        figuresBesideShownPage();
        JPanel bottom = new JPanel(new BorderLayout());
        bottom.add(controlsPanel, BorderLayout.CENTER);
        bottom.add(scrolledWhereShort(caution), BorderLayout.SOUTH);
        JPanel content = new JPanel(new BorderLayout(8, 4));
        content.add(views, BorderLayout.CENTER);
        content.add(bottom, BorderLayout.SOUTH);
        setContentPane(content);
        bindKeys(content);
        applyFonts();
        addComponentListener(new ComponentAdapter() {
            @Override
            public void componentResized(ComponentEvent event) {
                Font fitted = fittedLarge();
                if (fitted.getSize2D() != large.getSize2D()) {
                    large = fitted;
                    applyFonts();
                    refresh();
                }
            }
        });

        results.addListener(resultsChanged);
        view.addListener(unitsChanged);
        document.addListener(documentChanged);
        refreshControls();
        refresh();
    }

    private void addPage(String title, JComponent shown) {
        JPanel page = new JPanel(new BorderLayout(8, 0));
        page.add(shown, BorderLayout.CENTER);
        pages.add(page);
        views.addTab(title, page);
    }

    /** Moves the figures' column to the page of the tab shown: one column, beside whichever view is up. */
    private void figuresBesideShownPage() {
        JPanel page = pages.get(Math.max(0, views.getSelectedIndex()));
        if (figures.getParent() != page) {
            page.add(figures, BorderLayout.EAST);
            page.revalidate();
        }
    }

    /** The large text for the window's height now (before it is shown: 1.6 times the window's text). */
    private Font fittedLarge() {
        float wanted = base.getSize2D() * TEXT_SCALE;
        // the frame's own height less its frame (its content pane is laid out only after it is resized)
        int height = getHeight() - getInsets().top - getInsets().bottom;
        if (height > 0) {
            wanted = Math.max(base.getSize2D(), Math.min(wanted, (float) height / LINES_HIGH));
        }
        return base.deriveFont((float) Math.floor(wanted));
    }

    /**
     * Large text on the figures and the picture; a middle size on the figures' names, the tabs' titles and the
     * presenter's controls; the window's own on the caution, which is read up close.
     */
    private void applyFonts() {
        enlarge(getContentPane());
        views.setFont(nameFont());
        caution.setFont(base);
        setFontUnder(controlsPanel, nameFont());
        setFontUnder(figures, large);
        for (Component name : figures.getComponents()) {
            if ("presentation.figure.name".equals(name.getName())) {
                name.setFont(nameFont());
            }
        }
    }

    private Font nameFont() {
        return large.deriveFont(Math.max(base.getSize2D(), large.getSize2D() * 0.75f));
    }

    /**
     * @return the caution, scrolled to two lines where the window is short for its text (fewer than 30 lines of
     *         it: the largest text on a 1024x768 projector), so that the picture keeps its room
     */
    private JComponent scrolledWhereShort(WrappingText text) {
        JScrollPane scroll = new JScrollPane(text, JScrollPane.VERTICAL_SCROLLBAR_AS_NEEDED,
                JScrollPane.HORIZONTAL_SCROLLBAR_NEVER) {
            @Override
            public Dimension getPreferredSize() {
                Dimension wanted = super.getPreferredSize();
                int line = text.getFontMetrics(text.getFont()).getHeight();
                int height = PresentationFrame.this.getHeight();
                if (height <= 0 || height >= 30 * line) {
                    return wanted;
                }
                Insets border = text.getInsets();
                return new Dimension(wanted.width, Math.min(wanted.height, 2 * line + border.top + border.bottom));
            }
        };
        scroll.setBorder(null);
        scroll.getVerticalScrollBar().setUnitIncrement(16);
        return scroll;
    }

    private JComponent controls() {
        JPanel row1 = new JPanel(new WrappingRows());
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
        slider.setPreferredSize(new Dimension(160, slider.getPreferredSize().height));
        row1.add(group(new JLabel("Share of grip"), slider));
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

        // the steppers as a small table: a row per axle, a column per part, each named once
        JPanel steppers = new JPanel(new GridBagLayout());
        steppers.setName("presentation.steppers");
        String[] heads = {"", "Bar \u00d8", "Arm hole", "Spring"};
        for (int column = 1; column < heads.length; column++) {
            steppers.add(new JLabel(heads[column]), cell(column, 0));
        }
        int row = 1;
        for (String axle : List.of("front", "rear")) {
            Function<Vehicle, Axle> of = car -> "front".equals(axle) ? car.front() : car.rear();
            steppers.add(new JLabel("front".equals(axle) ? "Front" : "Rear"), cell(0, row));
            int at = row++;
            add(steppers, at, 1, new QuickControl("presentation." + axle + ".diameter",
                    axle + ".bar.section.outerDiameterMm", Quantity.LENGTH, 0.5e-3, document, view,
                    car -> bar(of.apply(car)) == null ? Double.NaN : bar(of.apply(car)).section().outerDiameter(),
                    null));
            add(steppers, at, 2, new QuickControl("presentation." + axle + ".hole", axle + ".bar.selectedArm", null, 1,
                    document, view, car -> bar(of.apply(car)) == null ? Double.NaN : bar(of.apply(car)).selectedArm(),
                    car -> bar(of.apply(car)).holeCount()));
            add(steppers, at, 3, new QuickControl("presentation." + axle + ".spring", axle + ".springRateNPerMm",
                    Quantity.LINEAR_RATE, 2e3, document, view, car -> of.apply(car).springRate(), null));
        }
        JPanel both = new JPanel(new BorderLayout());
        both.add(row1, BorderLayout.NORTH);
        both.add(steppers, BorderLayout.WEST);
        return both;
    }

    private static AntiRollBar bar(Axle axle) {
        return axle.bar();
    }

    private void add(JPanel table, int row, int column, QuickControl control) {
        controls.add(control);
        table.add(group(control.component(), control.unitLabel()), cell(column, row));
    }

    private static GridBagConstraints cell(int column, int row) {
        GridBagConstraints cell = new GridBagConstraints();
        cell.gridx = column;
        cell.gridy = row;
        cell.anchor = GridBagConstraints.LINE_START;
        cell.insets = new Insets(2, 10, 2, 4);
        return cell;
    }

    /** Components kept together on one row when the row wraps (a stepper with its name and unit). */
    private static JPanel group(JComponent... parts) {
        JPanel group = new JPanel(new FlowLayout(FlowLayout.LEADING, 6, 0));
        for (JComponent part : parts) {
            group.add(part);
        }
        return group;
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
        pin.setText(pinned == null ? "Pin this setup" : "Unpin");
        refresh();
    }

    /** @return whether a setup is pinned beside the car now */
    public boolean hasPinned() {
        return pinned != null;
    }

    /** @return the before/after lines shown at the top (tests) */
    public List<String> figureLines() {
        List<String> lines = new ArrayList<>();
        Component[] shown = figures.getComponents();
        for (int i = 0; i + 1 < shown.length; i += 2) {
            lines.add(((JLabel) shown[i]).getText() + ": " + ((JLabel) shown[i + 1]).getText());
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
            pictures.add(picture("Before (pinned)", pinned));
        }
        pictures.add(picture(pinned != null ? "After (now)" : "Now", results));
        figures.removeAll();
        AnalysisOutcome now = results.shown();
        if (now != null && now.succeeded()) {
            AnalysisResult before = pinned == null ? null : pinned.shown().result();
            for (BeforeAfter.Figure figure : BeforeAfter.lines(before, now.result(), probe.turn(), format)) {
                JLabel name = new JLabel(figure.name());
                name.setName("presentation.figure.name");
                name.setFont(nameFont());
                name.setBorder(BorderFactory.createEmptyBorder(figures.getComponentCount() == 0 ? 0 : 2, 0, 0, 0));
                figures.add(name);
                JLabel value = new JLabel(figure.value());
                value.setName("presentation.figure.value");
                value.setFont(large);
                figures.add(value);
            }
        }
        refreshCharts();
        enlarge(carTab);
        if (pinned != null) {
            // two cars side by side: a smaller text keeps each one's headings whole
            setFontUnder(carTab, large.deriveFont(large.getSize2D() * 0.75f));
        }
        revalidate();
        repaint();
    }

    private JComponent picture(String caption, ResultsModel model) {
        JPanel panel = new JPanel(new BorderLayout());
        JLabel title = new JLabel(caption, SwingConstants.CENTER);
        panel.add(title, BorderLayout.NORTH);
        CarBehindView car = new CarBehindView(model, probe, format);
        car.setCompact(true); // the key above the pictures says what the columns, the dot and the arrow are
        panel.add(car, BorderLayout.CENTER);
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
        JPanel page = pages.get(index);
        page.remove(((BorderLayout) page.getLayout()).getLayoutComponent(BorderLayout.CENTER));
        page.add(drawn, BorderLayout.CENTER);
        page.revalidate();
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
