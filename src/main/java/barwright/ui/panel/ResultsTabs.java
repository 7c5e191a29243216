package barwright.ui.panel;

import barwright.model.AxlePosition;
import barwright.model.TurnDirection;
import barwright.ui.chart.HandlingChart;
import barwright.ui.chart.ResultChart;
import barwright.ui.chart.RollChart;
import barwright.ui.chart.SweepChart;
import barwright.ui.chart.TransferSplitChart;
import barwright.ui.chart.WheelLoadChart;
import barwright.ui.task.AnalysisController;
import barwright.ui.task.CorneringProbe;
import barwright.ui.task.ResultsModel;
import barwright.ui.task.SweepParameter;
import barwright.ui.task.SweepRequest;

import javax.swing.BorderFactory;
import javax.swing.JButton;
import javax.swing.JComboBox;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JSlider;
import javax.swing.JTabbedPane;
import java.awt.BorderLayout;
import java.awt.FlowLayout;
import java.util.List;
import java.util.function.BiConsumer;

/** The pictures: the car from behind with its slider, and the five charts, each with its export buttons. */
public final class ResultsTabs extends JTabbedPane {
    private final ResultsModel results;
    private final CorneringProbe probe;
    /** The chart tabs after the car picture, in order; the last is the sweep. */
    static final List<String> CHART_TITLES = List.of("Wheel loads", "Body roll", "Load transfer parts", "Handling",
            "Bar sweep");
    private final ResultChart[] built = new ResultChart[CHART_TITLES.size()];
    private final barwright.ui.field.ViewSettings view;
    private final AnalysisController analysis;
    private final BiConsumer<ResultChart, String> export;
    private final CarBehindView car;
    private final JPanel carTab = new JPanel(new BorderLayout());
    private TurnDirection shownTurn;
    private final java.util.Set<ResultChart> outOfDate = new java.util.HashSet<>();

    /**
     * @param export called with a chart and "png" or "svg" when a person asks to export it
     */
    public ResultsTabs(ResultsModel results, CorneringProbe probe, FigureFormat format, AnalysisController analysis,
                       BiConsumer<ResultChart, String> export,
                       BiConsumer<barwright.ui.chart.ChartExport.Picture, String> exportPicture) {
        this.results = results;
        this.probe = probe;
        setName("results.tabs");
        setTabLayoutPolicy(SCROLL_TAB_LAYOUT);
        var view = format.view();
        car = new CarBehindView(results, probe, format);
        carTab.add(car, BorderLayout.CENTER);
        JPanel carControls = new JPanel(new BorderLayout());
        carControls.add(controls(), BorderLayout.CENTER);
        carControls.add(pictureExport(exportPicture), BorderLayout.SOUTH);
        carTab.add(carControls, BorderLayout.SOUTH);
        addTab("Car from behind", carTab);
        setToolTipTextAt(0, "The car in a steady turn at the slider's lateral acceleration");
        this.view = view;
        this.analysis = analysis;
        this.export = export;
        for (String title : CHART_TITLES) {
            addTab(title, new JPanel()); // the chart itself is made when its tab is first chosen
        }
        results.addListener(this::refresh);
        view.addListener(this::refresh);
        probe.addListener(this::probeMoved);
        addChangeListener(event -> {
            analysis.setSweepWanted(getSelectedIndex() == CHART_TITLES.size());
            showSelected();
        });
    }

    private JButton exportButton(ResultChart chart, String type, String text, BiConsumer<ResultChart, String> export) {
        JButton button = new JButton(text);
        button.setName(chart.fileStem() + ".export." + type);
        button.setToolTipText("Write this chart to a " + type.toUpperCase(java.util.Locale.ROOT)
                + " file, in the units shown");
        button.addActionListener(event -> export.accept(chart, type));
        return button;
    }

    /** The car picture's own export buttons, as under every chart; written at the export size, 18-point text. */
    private JPanel pictureExport(BiConsumer<barwright.ui.chart.ChartExport.Picture, String> exportPicture) {
        JPanel bar = new JPanel(new FlowLayout(FlowLayout.LEFT, 6, 2));
        for (String type : new String[]{"png", "svg"}) {
            JButton button = new JButton("Save as " + type.toUpperCase(java.util.Locale.ROOT) + "…");
            button.setName("car-from-behind.export." + type);
            button.setToolTipText("Write the car picture to a " + type.toUpperCase(java.util.Locale.ROOT)
                    + " file, in the units shown");
            button.addActionListener(event -> exportPicture.accept((graphics, width, height) -> car.paintPicture(
                    graphics, width, height, new java.awt.Font(java.awt.Font.SANS_SERIF, java.awt.Font.PLAIN, 18)),
                    type));
            bar.add(button);
        }
        return bar;
    }

    private JPanel controls() {
        JPanel controls = new JPanel(new BorderLayout(8, 0));
        controls.setBorder(BorderFactory.createEmptyBorder(4, 8, 6, 8));
        JComboBox<String> turn = new JComboBox<>(new String[]{"Left turn", "Right turn"});
        turn.setName("probe.turn");
        turn.setToolTipText("Which way the car turns; the inside wheels are on that side");
        turn.addActionListener(event -> probe.setTurn(turn.getSelectedIndex() == 0 ? TurnDirection.LEFT
                : TurnDirection.RIGHT));
        JSlider slider = new JSlider(0, 100, (int) Math.round(probe.fractionOfLimit() * 100));
        slider.setName("probe.slider");
        slider.setMajorTickSpacing(25);
        slider.setPaintTicks(true);
        java.util.Hashtable<Integer, JLabel> ends = new java.util.Hashtable<>();
        ends.put(0, new JLabel("straight"));
        ends.put(50, new JLabel("half"));
        ends.put(100, new JLabel("grip limit"));
        slider.setLabelTable(ends);
        slider.setPaintLabels(true);
        slider.setToolTipText("Lateral acceleration, from driving straight (left end) to the grip limit (right end)");
        slider.getAccessibleContext().setAccessibleName("Lateral acceleration, share of the grip limit");
        slider.addChangeListener(event -> probe.setFractionOfLimit(slider.getValue() / 100.0));
        // the linkage page moves the same probe with a slider of its own: follow it
        probe.addListener(() -> {
            slider.setValue((int) Math.round(probe.fractionOfLimit() * 100));
            turn.setSelectedIndex(probe.turn() == TurnDirection.LEFT ? 0 : 1);
        });
        JLabel label = new JLabel("Lateral acceleration:");
        label.setLabelFor(slider);
        label.setDisplayedMnemonic('L');
        JPanel left = new JPanel(new FlowLayout(FlowLayout.LEFT, 6, 0));
        left.add(turn);
        left.add(label);
        controls.add(left, BorderLayout.NORTH);
        controls.add(slider, BorderLayout.CENTER);
        return controls;
    }

    private void sweepControls(JPanel bar, AnalysisController analysis) {
        JComboBox<String> axle = new JComboBox<>(new String[]{"Front bar", "Rear bar"});
        axle.setName("sweep.axle");
        JComboBox<String> parameter = new JComboBox<>(new String[]{"outside diameter", "tube wall", "arm hole"});
        parameter.setName("sweep.parameter");
        Runnable apply = () -> analysis.setSweep(new SweepRequest(
                axle.getSelectedIndex() == 0 ? AxlePosition.FRONT : AxlePosition.REAR,
                SweepParameter.values()[parameter.getSelectedIndex()]));
        axle.addActionListener(event -> apply.run());
        parameter.addActionListener(event -> apply.run());
        JLabel vary = new JLabel("Vary the");
        vary.setLabelFor(axle);
        bar.add(vary);
        bar.add(axle);
        bar.add(new JLabel("'s"));
        bar.add(parameter);
    }

    /**
     * Brings the chart on screen up to date at once; the others are marked and redrawn when their tab is
     * chosen, so that an edit costs one chart's update, not five.
     */
    private void refresh() {
        shownTurn = probe.turn();
        outOfDate.addAll(charts());
        showSelected();
    }

    private void showSelected() {
        ResultChart chart = selectedChart();
        if (chart != null && outOfDate.remove(chart)) {
            chart.show(results.shown(), results.isStale());
        }
    }

    /** Redraws every chart in the current theme and text size. */
    public void restyle() {
        charts().forEach(ResultChart::restyle);
        refresh();
    }

    private void probeMoved() {
        // a new turn direction changes every chart; a slider move only moves the markers
        if (probe.turn() != shownTurn) {
            refresh();
        } else {
            ResultChart chart = selectedChart();
            if (chart != null && !outOfDate.contains(chart)) {
                chart.probeMoved(results.shown());
            }
        }
    }

    /** @return the charts made so far, in tab order */
    public List<ResultChart> charts() {
        return java.util.Arrays.stream(built).filter(java.util.Objects::nonNull).toList();
    }

    /** @return the chart on the selected tab (made now if it is the first time), or null on the car picture */
    public ResultChart selectedChart() {
        int index = getSelectedIndex() - 1;
        if (index < 0 || index >= built.length) {
            return null; // the car picture, or a tab added after the charts that is not one
        }
        if (built[index] == null) {
            built[index] = make(index);
            outOfDate.add(built[index]);
            setComponentAt(index + 1, tabFor(built[index], index == CHART_TITLES.size() - 1));
        }
        return built[index];
    }

    private ResultChart make(int index) {
        return switch (index) {
            case 0 -> new WheelLoadChart(view, probe);
            case 1 -> new RollChart(view, probe);
            case 2 -> new TransferSplitChart(view, probe);
            case 3 -> new HandlingChart(view, probe);
            default -> new SweepChart(view, probe);
        };
    }

    private JPanel tabFor(ResultChart chart, boolean isSweep) {
        JPanel tab = new JPanel(new BorderLayout());
        tab.add(chart.component(), BorderLayout.CENTER);
        JPanel bar = new JPanel(new FlowLayout(FlowLayout.LEFT, 6, 2));
        bar.add(exportButton(chart, "png", "Save as PNG…", export));
        bar.add(exportButton(chart, "svg", "Save as SVG…", export));
        if (isSweep) {
            JPanel rows = new JPanel(new BorderLayout());
            JPanel choice = new JPanel(new FlowLayout(FlowLayout.LEFT, 6, 2));
            sweepControls(choice, analysis);
            rows.add(choice, BorderLayout.NORTH);
            rows.add(bar, BorderLayout.SOUTH);
            tab.add(rows, BorderLayout.SOUTH);
        } else {
            tab.add(bar, BorderLayout.SOUTH);
        }
        return tab;
    }

    /**
     * @return the height the tabs take beside the car picture itself (pixels): the tab strip, the turn
     * direction and the slider, at the present text size
     */
    public int pictureOverhead() {
        int controls = carTab.getPreferredSize().height - car.getPreferredSize().height;
        java.awt.Rectangle tab = getTabCount() > 0 ? getBoundsAt(0) : null;
        int line = getFontMetrics(getFont()).getHeight();
        int strip = tab != null && tab.height > 0 ? tab.y + tab.height : line * 2;
        java.awt.Insets insets = getInsets();
        return controls + strip + insets.top + insets.bottom + 4;
    }

    public CarBehindView car() {
        return car;
    }
}
