package barwright.ui.dynamics;

import barwright.io.LapLogReader;
import barwright.io.csv.CsvFileException;
import barwright.model.LapLog;
import barwright.physics.dynamics.LapReplay;
import barwright.physics.dynamics.RollState;
import barwright.solver.Progress;
import barwright.ui.chart.LapChart;
import barwright.ui.document.OpenDocument;
import barwright.ui.field.ViewSettings;
import barwright.ui.panel.Palette;
import barwright.ui.task.BackgroundWork;

import javax.swing.AbstractAction;
import javax.swing.BorderFactory;
import javax.swing.JButton;
import javax.swing.JComponent;
import javax.swing.JLabel;
import javax.swing.JPanel;
import javax.swing.JProgressBar;
import javax.swing.KeyStroke;
import javax.swing.UIManager;
import java.awt.BorderLayout;
import java.awt.FlowLayout;
import java.awt.event.ActionEvent;
import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.function.Supplier;

/**
 * A logged lap replayed through the roll model: open a log, watch the replay's progress (and cancel it), then
 * the four wheel loads, the front share of load transfer and each axle's grip used along the lap, the time each
 * wheel spends lifted or near it, and a cursor (a click, a drag, the arrow keys) that puts the car picture at
 * that instant. Reading and replaying run off the event thread.
 */
public final class LapView extends JPanel {
    /** The invented lap shipped beside the samples (sample-vehicles/laps). */
    static final String SHIPPED_LAP = "/barwright/samples/laps/invented-circuit-lap.csv";
    /** Shift with an arrow key moves the cursor this many samples. */
    static final int BIG_STEP = 50;
    private final OpenDocument document;
    private final ViewSettings view;
    private final Supplier<Path> chooser;
    private final LapChart chart = new LapChart(this::cursorAt);
    private final RollingCarView car;
    private final JLabel source = new JLabel("No lap yet.");
    private final JLabel status = new JLabel(" ");
    private final JLabel atCursor = new JLabel(" ");
    private final JLabel liftRisk = new JLabel(" ");
    private final JProgressBar progress = new JProgressBar(0, 1000);
    private final JButton cancel = new JButton("Cancel");
    private BackgroundWork<Request, Outcome> work;
    private Outcome current;
    private int cursor;

    /** A replay asked for: the log's file (null for the shipped lap) and the car as accepted. */
    record Request(Path file, barwright.io.VehicleDocument document) {
    }

    /** A replay, or the refusal of its log. */
    record Outcome(Request request, DynamicsCar car, LapReplay replay, List<String> refusals) {
    }

    /** @param chooser asks for a log file; null when the person cancels */
    public LapView(OpenDocument document, ViewSettings view, Supplier<Path> chooser) {
        super(new BorderLayout(8, 8));
        setName("lap.page");
        this.document = document;
        this.view = view;
        this.chooser = chooser;
        car = new RollingCarView(view, "lap.car");
        car.showNothing("Open a lap log; click the chart to see the car at that instant.");
        JButton open = new JButton("Open lap log...");
        open.setName("lap.open");
        open.setToolTipText("A CSV with columns timeS, lateralAccelerationG and optionally longitudinalAccelerationG "
                + "and speedKph (file-format.md, Logged lap)");
        open.addActionListener(event -> chooseAndOpen());
        JButton shipped = new JButton("Replay the invented sample lap");
        shipped.setName("lap.shipped");
        shipped.addActionListener(event -> open(null));
        progress.setName("lap.progress");
        progress.setStringPainted(true);
        progress.setVisible(false);
        cancel.setName("lap.cancel");
        cancel.setVisible(false);
        cancel.addActionListener(event -> work.cancel());
        source.setName("lap.source");
        status.setName("lap.status");
        atCursor.setName("lap.cursorFigures");
        liftRisk.setName("lap.liftRisk");
        atCursor.setVerticalAlignment(JLabel.TOP);
        liftRisk.setVerticalAlignment(JLabel.TOP);

        JPanel top = new JPanel(new FlowLayout(FlowLayout.LEADING));
        top.add(open);
        top.add(shipped);
        top.add(progress);
        top.add(cancel);
        JPanel heading = new JPanel(new BorderLayout(2, 2));
        heading.add(top, BorderLayout.NORTH);
        heading.add(source, BorderLayout.SOUTH);
        JPanel words = new JPanel(new BorderLayout(4, 4));
        words.add(atCursor, BorderLayout.NORTH);
        words.add(liftRisk, BorderLayout.CENTER);
        setBorder(BorderFactory.createEmptyBorder(6, 6, 6, 6));
        add(heading, BorderLayout.NORTH);
        add(FitOrScroll.chartAndPicture(chart.component(), car, words, 0.6, status, TurnInView.LEAST_HEIGHT + 60),
                BorderLayout.CENTER);
        keys(chart.component());
        view.addListener(this::redraw);
        work = new BackgroundWork<>(LapView::replay, BackgroundWork.Superseded.CANCELLED, new Listener());
    }

    private void keys(JComponent target) {
        String[][] bindings = {{"LEFT", "-1"}, {"RIGHT", "1"}, {"shift LEFT", "-" + BIG_STEP},
                {"shift RIGHT", Integer.toString(BIG_STEP)}, {"HOME", "-1000000000"}, {"END", "1000000000"}};
        for (String[] binding : bindings) {
            int step = Integer.parseInt(binding[1]);
            target.getInputMap(JComponent.WHEN_FOCUSED).put(KeyStroke.getKeyStroke(binding[0]), "cursor" + step);
            target.getActionMap().put("cursor" + step, new AbstractAction() {
                @Override
                public void actionPerformed(ActionEvent event) {
                    moveCursor(step);
                }
            });
        }
    }

    /** Asks for a log and replays it. */
    public void chooseAndOpen() {
        Path file = chooser.get();
        if (file != null) {
            open(file);
        }
    }

    /** Reads and replays a log off the event thread; null replays the invented lap shipped with the program. */
    public void open(Path file) {
        progress.setValue(0);
        progress.setString("reading the log");
        progress.setVisible(true);
        cancel.setVisible(true);
        status.setText(" ");
        work.submit(new Request(file, document.lastValid()));
        revalidate();
    }

    /** The work, off the event thread. */
    private static Outcome replay(Request request, Progress progress) {
        LapLog log;
        try {
            log = request.file() == null ? LapLogReader.parse(shippedLap()) : LapLogReader.read(request.file());
        } catch (CsvFileException refused) {
            return new Outcome(request, null, null, refused.problems());
        } catch (IOException unreadable) {
            return new Outcome(request, null, null, List.of("cannot be read: " + unreadable.getMessage()));
        }
        DynamicsCar car = DynamicsCar.of(request.document());
        return new Outcome(request, car, LapRun.replay(car, log, progress), List.of());
    }

    private static String shippedLap() {
        try (InputStream in = LapView.class.getResourceAsStream(SHIPPED_LAP)) {
            if (in == null) {
                throw new IllegalStateException("the shipped lap " + SHIPPED_LAP + " is missing");
            }
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        } catch (IOException unreadable) {
            throw new UncheckedIOException(unreadable);
        }
    }

    private static String name(Request request) {
        return request.file() == null ? "the invented sample lap" : String.valueOf(request.file().getFileName());
    }

    /** What the replay's news does to the page; on the event thread. */
    private final class Listener implements BackgroundWork.Listener<Request, Outcome> {
        @Override
        public void progress(long done, long total) {
            progress.setValue((int) (1000 * done / Math.max(1, total)));
            progress.setString(String.format(Locale.ROOT, "replaying %.0f %%", 100.0 * done / Math.max(1, total)));
        }

        @Override
        public void finished(Request request, Outcome outcome) {
            done();
            if (!outcome.refusals().isEmpty()) {
                refuse("The log " + name(request) + " was refused (the open lap, if any, stays):",
                        outcome.refusals());
                return;
            }
            current = outcome;
            source.setText(name(request) + ", " + outcome.replay().result().run().states().size() + " samples, on "
                    + outcome.car().analysis().vehicle().name());
            cursor = 0;
            redraw();
        }

        @Override
        public void failed(Request request, String message) {
            done();
            refuse("The lap " + name(request) + " could not be replayed:", List.of(message));
        }

        @Override
        public void cancelled(Request request) {
            done();
            status.setForeground(UIManager.getColor("Label.foreground"));
            status.setText("The replay of " + name(request) + " was cancelled; the lap shown before stays.");
        }

        private void done() {
            progress.setVisible(false);
            cancel.setVisible(false);
        }
    }

    private void refuse(String heading, List<String> problems) {
        StringBuilder text = new StringBuilder("<html><b>").append(TurnInFigures.escape(heading)).append("</b>");
        problems.stream().limit(6).forEach(p -> text.append("<br>").append(TurnInFigures.escape(p)));
        if (problems.size() > 6) {
            text.append("<br>... and ").append(problems.size() - 6).append(" more");
        }
        status.setForeground(Palette.problem());
        status.setText(text.append("</html>").toString());
    }

    private void redraw() {
        if (current == null) {
            return;
        }
        LapReplay replay = current.replay();
        List<RollState> states = replay.result().run().states();
        chart.show("Along the lap: " + name(current.request()),
                states, replay.frontGripUsed(), replay.rearGripUsed(), view.units());
        liftRisk.setText(new LapFigures(view).liftRisk(replay, current.car().missingDampers()));
        status.setForeground(UIManager.getColor("Label.foreground"));
        status.setText(" ");
        showCursor();
    }

    /** Puts the cursor at the sample nearest a time (s). */
    private void cursorAt(double time) {
        if (current == null) {
            return;
        }
        List<RollState> states = current.replay().result().run().states();
        int low = 0;
        int high = states.size() - 1;
        while (high - low > 1) {
            int middle = (low + high) >>> 1;
            if (states.get(middle).time() <= time) {
                low = middle;
            } else {
                high = middle;
            }
        }
        cursor = Math.abs(states.get(high).time() - time) < Math.abs(states.get(low).time() - time) ? high : low;
        showCursor();
    }

    /** Moves the cursor by a number of samples, held within the lap. */
    void moveCursor(int samples) {
        if (current == null) {
            return;
        }
        int last = current.replay().result().run().states().size() - 1;
        cursor = (int) Math.max(0, Math.min(last, (long) cursor + samples));
        showCursor();
    }

    private void showCursor() {
        RollState state = current.replay().result().run().states().get(cursor);
        chart.cursor(state.time());
        car.show(current.car().outline(), state);
        atCursor.setText(new LapFigures(view).atCursor(state, current.replay().frontGripUsed()[cursor],
                current.replay().rearGripUsed()[cursor]));
    }

    /** @return the replay on screen, or null (for the window tests) */
    LapReplay shownReplay() {
        return current == null ? null : current.replay();
    }

    /** @return true while a log is being read or replayed */
    boolean isWorking() {
        return !work.isIdle();
    }

    LapChart chart() {
        return chart;
    }

    JLabel status() {
        return status;
    }

    JLabel liftRisk() {
        return liftRisk;
    }

    RollingCarView car() {
        return car;
    }

    int cursorIndex() {
        return cursor;
    }
}
