package barwright.ui.dynamics;

import barwright.io.VehicleDocument;
import barwright.model.TurnDirection;
import barwright.physics.SteadyCornering;
import barwright.physics.VehicleAnalysis;
import barwright.physics.WheelLoads;
import barwright.physics.dynamics.RollState;
import barwright.ui.Display;
import barwright.ui.document.OpenDocument;
import barwright.ui.document.Samples;
import barwright.ui.field.ViewSettings;
import barwright.units.Conversions;
import barwright.units.UnitSystem;
import org.assertj.swing.edt.GuiActionRunner;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import javax.swing.JComponent;
import javax.swing.JFrame;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;
import java.util.function.BooleanSupplier;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * The roll in motion in the window, on the invented samples "club hatchback with dampers" and "club hatchback"
 * and the invented lap shipped beside them: the damper page draws and edits the curve (undoably, refusing with
 * the key path), the turn-in view's dashed steady values are the steady analysis's, playback runs and pauses,
 * and the lap view refuses a bad log with its row and replays the shipped one.
 */
@Tag("window")
class DynamicsViewsTest {
    private static final Samples.Sample WITH_DAMPERS = Samples.ALL.get(Samples.ALL.size() - 1);
    private JFrame frame;

    @AfterEach
    void close() {
        if (frame != null) {
            GuiActionRunner.execute(frame::dispose);
        }
    }

    private <T extends JComponent> T shown(T view) {
        frame = GuiActionRunner.execute(() -> {
            JFrame created = new JFrame("dynamics");
            created.add(view);
            created.setSize(1100, 760);
            created.setLocation(100, 100);
            created.setVisible(true);
            return created;
        });
        return view;
    }

    @Test
    void theDamperPageDrawsTheCurveAtTheDamperAndTheWheelAndEditsItUndoably() {
        Display.require();
        OpenDocument document = GuiActionRunner.execute(() -> Samples.open(WITH_DAMPERS));
        ViewSettings view = new ViewSettings(UnitSystem.SI, Locale.ROOT);
        DamperPage page = shown(GuiActionRunner.execute(() -> new DamperPage(document, view)));

        assertThat(GuiActionRunner.execute(() -> page.chart().seriesCount())).isEqualTo(2);
        // the sample's first front point is [-300 mm/s, -2500 N] (sample-vehicles/club-hatchback-dampers.json)
        double[] atDamper = GuiActionRunner.execute(() -> page.chart().point(0, 0));
        assertThat(atDamper).containsExactly(-300, -2500);
        // at the wheel the same point must pass the same power (force times velocity): virtual work, so the
        // motion ratio cancels; and the wheel moves further than the damper (ratio 0.95 < 1)
        double[] atWheel = GuiActionRunner.execute(() -> page.chart().point(1, 0));
        assertThat(atWheel[0] * atWheel[1]).isCloseTo(atDamper[0] * atDamper[1], within(1e-6));
        assertThat(Math.abs(atWheel[0])).isGreaterThan(300);

        GuiActionRunner.execute(() -> page.table().setValueAt("-2600", 0, 1));
        assertThat(document.tree().at("/front/damper/forceByVelocity/0").toString()).isEqualTo("[-300,-2600]");
        assertThat(document.lastValid().tree().at("/front/damper/forceByVelocity/0/1").asDouble()).isEqualTo(-2600);
        assertThat(GuiActionRunner.execute(() -> page.chart().point(0, 0))).containsExactly(-300, -2600);
        GuiActionRunner.execute(document::undo);
        assertThat(document.tree().at("/front/damper/forceByVelocity/0").toString()).isEqualTo("[-300,-2500]");
        assertThat(document.canUndo()).isFalse();

        // 20,000 mm/s is past the reader's 10,000 mm/s: refused with the key path and the range, car untouched
        GuiActionRunner.execute(() -> page.table().setValueAt("20000", 4, 0));
        assertThat(GuiActionRunner.execute(() -> page.message().getText()))
                .contains("front.damper.forceByVelocity[4][0]").contains("10000");
        assertThat(document.tree().at("/front/damper/forceByVelocity/4").toString()).isEqualTo("[300,1600]");
        assertThat(document.canUndo()).isFalse();

        GuiActionRunner.execute(() -> view.setUnits(UnitSystem.US));
        assertThat(GuiActionRunner.execute(() -> page.table().getColumnName(0))).contains("in/s");
        assertThat(GuiActionRunner.execute(() -> page.table().getColumnName(1))).contains("lbf");

        GuiActionRunner.execute(() -> document.replace(Samples.load(Samples.CLUB_HATCHBACK), null, "sample"));
        assertThat(GuiActionRunner.execute(() -> page.message().getText())).contains("no damper")
                .contains("assumes none");
    }

    @Test
    void theTurnInViewDrawsTheSteadyAnalysisAtTheTargetDashed() throws Exception {
        Display.require();
        OpenDocument document = GuiActionRunner.execute(() -> Samples.open(WITH_DAMPERS));
        TurnInView turnIn = shown(GuiActionRunner.execute(() -> new TurnInView(document,
                new ViewSettings(UnitSystem.SI, Locale.ROOT))));
        GuiActionRunner.execute(() -> turnIn.setTarget(0.6));
        double target = Conversions.fromG(0.6);
        await(() -> Math.abs(turnIn.shownTarget() - target) < 1e-12);

        // the reference: the steady analysis (model.md 5-7) of the same car in a left turn at the target
        VehicleDocument car = document.lastValid();
        SteadyCornering steady = VehicleAnalysis.analyse(car.vehicle()).turn(TurnDirection.LEFT).cornering();
        WheelLoads loads = steady.wheelLoads(target);
        double[] expected = {Conversions.toDegrees(steady.rollAngle(target)), loads.frontInside(),
                loads.frontOutside(), loads.rearInside(), loads.rearOutside()};
        double[] drawn = GuiActionRunner.execute(() -> turnIn.chart().steadyShown());
        // only a unit conversion lies between the two: 1e-9 relative
        for (int i = 0; i < expected.length; i++) {
            assertThat(drawn[i]).as("steady value %d", i).isCloseTo(expected[i], within(Math.abs(expected[i]) * 1e-9));
        }
        // and the run itself ends on them: after 3 s the roll mode (about 4 Hz, damping ratio about 0.3 on this
        // sample) has decayed by exp(-zeta omega t), below 1e-20, so 1e-4 relative is loose
        List<RollState> states = GuiActionRunner.execute(() -> turnIn.playback().end() > 0
                ? turnInStates(turnIn) : List.<RollState>of());
        RollState last = states.get(states.size() - 1);
        assertThat(Conversions.toDegrees(last.roll())).isCloseTo(expected[0], within(Math.abs(expected[0]) * 1e-4));
        assertThat(last.rightRear()).isCloseTo(expected[4], within(expected[4] * 1e-4));
        assertThat(GuiActionRunner.execute(() -> turnIn.figures().getText())).contains("Roll natural frequency")
                .contains("overshoot").doesNotContain("NaN").doesNotContain("Infinity");
    }

    private static List<RollState> turnInStates(TurnInView turnIn) {
        return turnIn.currentStates();
    }

    @Test
    void playbackAdvancesAndPauses() throws Exception {
        Display.require();
        OpenDocument document = GuiActionRunner.execute(() -> Samples.open(WITH_DAMPERS));
        TurnInView turnIn = shown(GuiActionRunner.execute(() -> new TurnInView(document,
                new ViewSettings(UnitSystem.SI, Locale.ROOT))));
        await(() -> !Double.isNaN(turnIn.shownTarget()));
        GuiActionRunner.execute(() -> {
            turnIn.playbackBar().chooseSpeed(2); // a tenth of real time: 3 s of run take 30 s, never the end here
            turnIn.playbackBar().playButton().doClick();
        });
        await(() -> turnIn.playback().time() > 0.005);
        RollState moving = GuiActionRunner.execute(() -> turnIn.car().shownState());
        assertThat(moving.time()).isPositive();
        GuiActionRunner.execute(() -> turnIn.playbackBar().playButton().doClick());
        double paused = GuiActionRunner.execute(() -> turnIn.playback().time());
        assertThat(GuiActionRunner.execute(() -> turnIn.playback().isPlaying())).isFalse();
        Thread.sleep(300);
        assertThat(GuiActionRunner.execute(() -> turnIn.playback().time())).isEqualTo(paused);
        assertThat(GuiActionRunner.execute(() -> turnIn.playbackBar().playButton().getText())).isEqualTo("Play");
    }

    @Test
    void theLapViewRefusesABadLogWithItsRowAndReplaysTheShippedLap(@TempDir Path folder) throws Exception {
        Display.require();
        OpenDocument document = GuiActionRunner.execute(() -> Samples.open(WITH_DAMPERS));
        LapView lap = shown(GuiActionRunner.execute(() -> new LapView(document,
                new ViewSettings(UnitSystem.SI, Locale.ROOT), () -> null)));

        GuiActionRunner.execute(() -> lap.open(null));
        await(() -> lap.shownReplay() != null && !lap.isWorking(), () -> lap.status().getText());
        var replay = GuiActionRunner.execute(lap::shownReplay);
        List<RollState> states = replay.result().run().states();
        // every data row of the shipped log is a recorded state (3,015 rows under 4 comment and header lines)
        long rows = Files.readAllLines(Path.of("sample-vehicles/laps/invented-circuit-lap.csv")).stream()
                .filter(line -> !line.startsWith("#") && !line.startsWith("timeS") && !line.isBlank()).count();
        assertThat(states).hasSize((int) rows);
        assertThat(GuiActionRunner.execute(() -> lap.liftRisk().getText())).contains("Lift risk")
                .doesNotContain("NaN");
        GuiActionRunner.execute(() -> lap.moveCursor(100));
        assertThat(GuiActionRunner.execute(() -> lap.car().shownState())).isEqualTo(states.get(100));

        // a time that goes backwards on the fourth line: refused with that line, the lap shown stays
        Path bad = folder.resolve("backwards.csv");
        Files.writeString(bad, "timeS,lateralAccelerationG\n0.00,0.1\n0.02,0.2\n0.01,0.3\n0.04,0.2\n");
        GuiActionRunner.execute(() -> lap.open(bad));
        await(() -> !lap.isWorking());
        assertThat(GuiActionRunner.execute(() -> lap.status().getText())).contains("refused").contains("line 4")
                .contains("timeS");
        assertThat(GuiActionRunner.execute(lap::shownReplay)).isSameAs(replay);
    }

    private static void await(BooleanSupplier condition) throws InterruptedException {
        await(condition, () -> "");
    }

    /** Waits for the view; a run can take seconds on a loaded 2-core machine, so the bound is generous. */
    private static void await(BooleanSupplier condition, java.util.function.Supplier<String> shown)
            throws InterruptedException {
        long deadline = System.currentTimeMillis() + 120_000;
        while (!GuiActionRunner.execute(condition::getAsBoolean)) {
            if (System.currentTimeMillis() > deadline) {
                throw new AssertionError("the view never got there within 120 s; it shows: "
                        + GuiActionRunner.execute(shown::get));
            }
            Thread.sleep(20);
        }
    }
}
