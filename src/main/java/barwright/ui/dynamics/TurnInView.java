package barwright.ui.dynamics;

import barwright.io.VehicleDocument;
import barwright.physics.WheelLoads;
import barwright.physics.dynamics.LateralInput;
import barwright.physics.dynamics.RollState;
import barwright.physics.dynamics.TransientAnalysis;
import barwright.physics.dynamics.TransientResult;
import barwright.report.Cautions;
import barwright.report.dynamics.TransientText;
import barwright.ui.chart.TransientChart;
import barwright.ui.document.OpenDocument;
import barwright.ui.field.ViewSettings;
import barwright.ui.panel.Palette;
import barwright.ui.sizing.WhileShown;
import barwright.ui.task.BackgroundWork;
import barwright.units.Conversions;

import javax.swing.AbstractAction;
import javax.swing.BorderFactory;
import javax.swing.JComponent;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.KeyStroke;
import javax.swing.UIManager;
import java.awt.BorderLayout;
import java.awt.event.ActionEvent;
import java.util.ArrayList;
import java.util.List;

/**
 * The first second of a corner: a step of lateral acceleration (target and rise time set by sliders) drawn as
 * the body's roll and the four wheel loads against time with the steady values dashed, the key dynamic figures
 * beside it, and the car from behind playing the response. The run is worked out off the event thread; a run
 * asked for while another is working replaces it, and a superseded answer is dropped.
 */
public final class TurnInView extends JPanel {
    /** The length of each run (s): a car's roll settles well within it (natural frequencies 1-3 Hz). */
    static final double DURATION = 3;
    static final double MIN_TARGET_G = 0.05;
    static final double MAX_TARGET_G = 1.5;
    static final double MAX_RISE_S = 0.5;
    /** Below this height (pixels) the page scrolls rather than squeeze the chart and the car picture. */
    static final int LEAST_HEIGHT = 600;
    private final OpenDocument document;
    private final ViewSettings view;
    private final TransientChart chart = new TransientChart();
    private final RollingCarView car;
    private final Playback playback = new Playback();
    private final PlaybackBar playbackBar = new PlaybackBar(playback);
    private final SliderSpinner target;
    private final SliderSpinner rise;
    private final JLabel figures = new JLabel(" ");
    private final BackgroundWork<Request, Outcome> worker;
    private final WhileShown whileShown;
    private final List<Runnable> shownListeners = new ArrayList<>();
    private Outcome current;

    /** A run asked for: the car as accepted, the target a_y (m/s^2) and the rise time (s). */
    record Request(VehicleDocument document, double target, double riseTime) {
    }

    /** A run and the steady figures it is drawn against. */
    record Outcome(Request request, DynamicsCar car, TransientResult result, double[] steadyLoads) {
    }

    public TurnInView(OpenDocument document, ViewSettings view) {
        super(new BorderLayout(8, 8));
        setName("turnIn.page");
        this.document = document;
        this.view = view;
        car = new RollingCarView(view, "turnIn.car");
        target = new SliderSpinner("turnIn.target", "Target a_y (g)", MIN_TARGET_G,
                MAX_TARGET_G, 0.01, 0.8, value -> request());
        rise = new SliderSpinner("turnIn.rise", "Rise time (s)", 0, MAX_RISE_S, 0.01, 0.1, value -> request());
        target.setToolTipText("The lateral acceleration the step rises to and holds, in a left turn");
        rise.setToolTipText("How long the lateral acceleration takes to rise from 0 to the target (0: a sudden step)");
        figures.setName("turnIn.figures");
        figures.setVerticalAlignment(JLabel.TOP);

        JPanel controls = new JPanel();
        controls.setLayout(new javax.swing.BoxLayout(controls, javax.swing.BoxLayout.Y_AXIS));
        controls.add(target);
        controls.add(rise);
        setBorder(BorderFactory.createEmptyBorder(6, 6, 6, 6));
        add(controls, BorderLayout.NORTH);
        add(FitOrScroll.chartAndPicture(chart.component(), car, playbackBar, 0.55, figures, LEAST_HEIGHT),
                BorderLayout.CENTER);

        playback.addListener(this::showInstant);
        getInputMap(JComponent.WHEN_ANCESTOR_OF_FOCUSED_COMPONENT).put(KeyStroke.getKeyStroke("SPACE"), "play");
        getActionMap().put("play", new AbstractAction() {
            @Override
            public void actionPerformed(ActionEvent event) {
                playbackBar.playButton().doClick();
            }
        });
        worker = new BackgroundWork<>((request, progress) -> run(request), BackgroundWork.Superseded.DROPPED,
                new BackgroundWork.Listener<>() {
                    @Override
                    public void finished(Request request, Outcome outcome) {
                        show(outcome);
                    }

                    @Override
                    public void failed(Request request, String message) {
                        refuse(message);
                    }
                });
        whileShown = new WhileShown(this, this::submit);
        document.addListener(event -> request());
        view.addListener(this::redraw);
        request();
    }

    /** @return the roll model's caution and the safety caution, small and muted under the figures */
    static JLabel caution() {
        JLabel caution = new JLabel("<html>" + TransientText.CAUTION + " " + Cautions.SHORT + "</html>");
        caution.setForeground(Palette.muted());
        caution.setFont(caution.getFont().deriveFont(caution.getFont().getSize2D() * 0.9f));
        return caution;
    }

    /** The work, off the event thread: the step run and the steady analysis at its target. */
    private static Outcome run(Request request) {
        DynamicsCar car = DynamicsCar.of(request.document());
        TransientResult result = TransientAnalysis.step(car.analysis(), car.inputs(),
                new LateralInput.Step(request.target(), request.riseTime()), DURATION);
        WheelLoads steady = TransientAnalysis.steadyTurn(car.analysis(), request.target())
                .wheelLoads(Math.abs(request.target()));
        // a left turn (positive a_y): the left wheels are inside
        double[] loads = {steady.frontInside(), steady.frontOutside(), steady.rearInside(), steady.rearOutside()};
        return new Outcome(request, car, result, loads);
    }

    private void request() {
        whileShown.request();
    }

    private void submit() {
        worker.submit(new Request(document.lastValid(), Conversions.fromG(target.value()), rise.value()));
    }

    private void show(Outcome outcome) {
        boolean first = current == null;
        current = outcome;
        List<RollState> states = outcome.result().run().states();
        double end = states.get(states.size() - 1).time();
        if (first || playback.end() != end) {
            double keep = playback.time();
            playback.load(end);
            playback.set(first ? 0 : keep);
        }
        redraw();
        shownListeners.forEach(Runnable::run);
    }

    /** Draws the run on screen again (chart, figures, picture) in the view's units; the latency harness times it. */
    public void redraw() {
        if (current == null) {
            return;
        }
        TransientResult result = current.result();
        chart.title(String.format(view.locale(), "A left turn: a_y rises to %.2f g in %.2f s",
                Conversions.toG(current.request().target()), current.request().riseTime()));
        chart.show(result.run().states(), result.steadyRoll(), current.steadyLoads(), true, view.units());
        figures.setForeground(UIManager.getColor("Label.foreground"));
        figures.setText(new TurnInFigures(view).html(current.car(), result));
        showInstant(playback.time());
    }

    private void refuse(String message) {
        current = null;
        chart.clear("No run: see the message below");
        car.showNothing("No run.");
        figures.setForeground(Palette.warning());
        figures.setText("<html>" + TurnInFigures.escape(message) + "</html>");
        shownListeners.forEach(Runnable::run);
    }

    /** Shows the car and the cursor at a time of the run (s). */
    private void showInstant(double time) {
        chart.cursor(time);
        if (current == null) {
            return;
        }
        List<RollState> states = current.result().run().states();
        int index = Math.min(states.size() - 1, Math.max(0, (int) Math.round(time / TransientAnalysis.SAMPLE_INTERVAL)));
        while (index > 0 && states.get(index).time() > time + 1e-9) {
            index--; // a run that stopped early (a roll-over) has fewer states than its clock
        }
        car.show(current.car().outline(), states.get(index));
    }

    /** @param listener told each time a run (or a refusal) reaches the screen; for the latency harness */
    public void addShownListener(Runnable listener) {
        shownListeners.add(listener);
    }

    /** Sets the target a_y (g) as the spinner does. */
    public void setTarget(double g) {
        target.set(g);
    }

    /** Sets the rise time (s) as the spinner does. */
    public void setRiseTime(double seconds) {
        rise.set(seconds);
    }

    /** @return the target a_y of the run on screen (m/s^2), NaN where none is */
    public double shownTarget() {
        return current == null ? Double.NaN : current.request().target();
    }

    /** @return the rise time of the run on screen (s), NaN where none is */
    public double shownRiseTime() {
        return current == null ? Double.NaN : current.request().riseTime();
    }

    /** @return the states of the run on screen, or none */
    List<RollState> currentStates() {
        return current == null ? List.of() : current.result().run().states();
    }

    TransientChart chart() {
        return chart;
    }

    RollingCarView car() {
        return car;
    }

    Playback playback() {
        return playback;
    }

    PlaybackBar playbackBar() {
        return playbackBar;
    }

    JLabel figures() {
        return figures;
    }

    SliderSpinner targetControl() {
        return target;
    }
}
