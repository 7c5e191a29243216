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
import javax.swing.Box;
import javax.swing.JButton;
import javax.swing.JComboBox;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JSlider;
import javax.swing.JTabbedPane;
import java.awt.BorderLayout;
import java.awt.FlowLayout;
import java.util.ArrayList;
import java.util.List;
import java.util.function.BiConsumer;

/** The pictures: the car from behind with its slider, and the five charts, each with its export buttons. */
public final class ResultsTabs extends JTabbedPane {
    private final ResultsModel results;
    private final CorneringProbe probe;
    private final List<ResultChart> charts = new ArrayList<>();
    private final CarBehindView car;
    private TurnDirection shownTurn;

    /**
     * @param export called with a chart and "png" or "svg" when a person asks to export it
     */
    public ResultsTabs(ResultsModel results, CorneringProbe probe, FigureFormat format, AnalysisController analysis,
                       BiConsumer<ResultChart, String> export) {
        this.results = results;
        this.probe = probe;
        setName("results.tabs");
        setTabLayoutPolicy(SCROLL_TAB_LAYOUT);
        var view = format.view();
        car = new CarBehindView(results, probe, format);
        JPanel carTab = new JPanel(new BorderLayout());
        carTab.add(car, BorderLayout.CENTER);
        carTab.add(controls(), BorderLayout.SOUTH);
        addTab("Car from behind", carTab);
        setToolTipTextAt(0, "The car in a steady turn at the slider's lateral acceleration");
        charts.add(new WheelLoadChart(view, probe));
        charts.add(new RollChart(view, probe));
        charts.add(new TransferSplitChart(view, probe));
        charts.add(new HandlingChart(view, probe));
        SweepChart sweep = new SweepChart(view, probe);
        charts.add(sweep);
        for (ResultChart chart : charts) {
            JPanel tab = new JPanel(new BorderLayout());
            tab.add(chart.component(), BorderLayout.CENTER);
            JPanel bar = new JPanel(new FlowLayout(FlowLayout.LEFT, 6, 2));
            if (chart == sweep) {
                sweepControls(bar, analysis);
            }
            bar.add(Box.createHorizontalStrut(12));
            bar.add(exportButton(chart, "png", "Save as PNG…", export));
            bar.add(exportButton(chart, "svg", "Save as SVG…", export));
            tab.add(bar, BorderLayout.SOUTH);
            addTab(chart.title(), tab);
        }
        results.addListener(this::refresh);
        view.addListener(this::refresh);
        probe.addListener(this::probeMoved);
    }

    private JButton exportButton(ResultChart chart, String type, String text, BiConsumer<ResultChart, String> export) {
        JButton button = new JButton(text);
        button.setName(chart.fileStem() + ".export." + type);
        button.setToolTipText("Write this chart to a " + type.toUpperCase(java.util.Locale.ROOT)
                + " file, in the units shown");
        button.addActionListener(event -> export.accept(chart, type));
        return button;
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
        JLabel label = new JLabel("Lateral acceleration:");
        label.setLabelFor(slider);
        label.setDisplayedMnemonic('L');
        JPanel left = new JPanel(new FlowLayout(FlowLayout.LEFT, 6, 0));
        left.add(turn);
        left.add(label);
        controls.add(left, BorderLayout.WEST);
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

    private void refresh() {
        shownTurn = probe.turn();
        var shown = results.shown();
        boolean stale = results.isStale();
        for (ResultChart chart : charts) {
            chart.show(shown, stale);
        }
    }

    private void probeMoved() {
        // a new turn direction changes every chart; a slider move only moves the markers
        if (probe.turn() != shownTurn) {
            refresh();
        } else {
            charts.forEach(chart -> chart.probeMoved(results.shown()));
        }
    }

    /** @return the charts, in tab order */
    public List<ResultChart> charts() {
        return charts;
    }

    /** @return the chart on the selected tab, or null on the car picture */
    public ResultChart selectedChart() {
        int index = getSelectedIndex();
        return index >= 1 && index <= charts.size() ? charts.get(index - 1) : null;
    }

    public CarBehindView car() {
        return car;
    }
}
