package barwright.ui.insight;

import barwright.ui.Display;
import barwright.insight.LiftEnvelope;
import barwright.insight.LiftEnvelopeResult;
import barwright.insight.Sensitivity;
import barwright.insight.SensitivityResult;
import barwright.insight.Wheel;
import barwright.loading.VehicleLoader;
import barwright.model.Vehicle;
import barwright.physics.VehicleAnalysis;
import barwright.ui.chart.ChartStyle;
import barwright.report.insight.EnvelopeText;
import barwright.ui.action.Settings;
import barwright.ui.app.MainWindow;
import barwright.ui.app.Themes;
import barwright.ui.chart.EnvelopeChart;
import barwright.ui.document.Samples;
import barwright.units.UnitSystem;
import org.assertj.swing.core.BasicRobot;
import org.assertj.swing.core.Robot;
import org.assertj.swing.edt.GuiActionRunner;
import org.assertj.swing.fixture.FrameFixture;
import org.jfree.data.xy.XYSeries;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.file.Files;
import java.nio.file.Path;

import static barwright.units.Constants.STANDARD_GRAVITY;
import static org.assertj.core.api.Assertions.assertThat;

/**
 * The three insight views in the main window, on the club hatchback sample (invented): what they draw is what
 * the core computes, an edit in the editor leaves the previous setting dashed beside, units follow the toolbar.
 */
@Tag("window")
class InsightViewsTest {
    private Robot robot;
    private FrameFixture frame;
    private MainWindow window;
    private InsightPanel panel;

    @BeforeEach
    void open() throws Exception {
        Display.require();
        robot = BasicRobot.robotWithNewAwtHierarchy();
        window = GuiActionRunner.execute(() -> {
            Themes.apply(Themes.Theme.LIGHT, 0);
            MainWindow created = new MainWindow(Samples.open(Samples.CLUB_HATCHBACK), Settings.inMemory(),
                    new barwright.ui.ScriptedDialogs(), () -> { });
            created.setSize(1250, 900);
            created.setLocation(100, 100); // inside the EDT task that creates it (toolchain.md)
            return created;
        });
        frame = new FrameFixture(robot, window);
        frame.show();
        panel = InsightWindows.panel(window);
        // the results tabs scroll: the last tab may be out of view for a click, so it is chosen as a menu would;
        // the views compute only while on screen, so the panel is shown before waiting for them
        GuiActionRunner.execute(() -> window.tabs().setSelectedComponent(panel));
        InsightWindows.settle(window, panel);
        robot.waitForIdle();
    }

    @AfterEach
    void close() {
        if (frame != null) {
            frame.cleanUp();
        }
    }

    private Vehicle shownVehicle() {
        return GuiActionRunner.execute(() -> window.document().lastValid().vehicle());
    }

    private static LiftEnvelopeResult coreEnvelope(Vehicle vehicle) {
        return LiftEnvelope.of(VehicleAnalysis.analyse(vehicle));
    }

    /** The chart's point of a series: (-a_y in g, a_x in g) on the left-turn side. */
    private XYSeries series(int index) {
        return GuiActionRunner.execute(() -> panel.envelope().chart().data().getSeries(index));
    }

    @Test
    void the_envelope_draws_the_core_boundaries_and_says_where_each_wheel_lifts() {
        frame.tabbedPane("insight.tabs").selectTab("Where a wheel lifts");
        LiftEnvelopeResult expected = coreEnvelope(shownVehicle());
        var leftRear = expected.boundary(Wheel.LEFT_REAR).points();
        XYSeries rear = series(EnvelopeChart.REAR);
        // the left rear comes first in the rear series, drawn on the left (negative) side
        assertThat(rear.getX(0).doubleValue()).isEqualTo(-leftRear.get(0).lateralAcceleration() / STANDARD_GRAVITY);
        assertThat(rear.getY(0).doubleValue()).isEqualTo(leftRear.get(0).longitudinalAcceleration() / STANDARD_GRAVITY);
        assertThat(GuiActionRunner.execute(() -> panel.envelope().sentencesText()))
                .contains(new EnvelopeText(UnitSystem.SI).sentence(expected, expected.boundary(Wheel.LEFT_REAR)));
        assertThat(series(EnvelopeChart.COMPARED_REAR).isEmpty()).isTrue();
    }

    @Test
    void an_edit_in_the_editor_leaves_the_previous_setting_dashed_beside() throws Exception {
        LiftEnvelopeResult before = coreEnvelope(shownVehicle());
        frame.tabbedPane("editor.tabs").selectTab("Rear bar");
        frame.comboBox("rear.bar.selectedArm").selectItem(0);
        InsightWindows.settle(window, panel);
        Vehicle after = shownVehicle();
        assertThat(after.rear().bar().selectedArm()).isZero();
        LiftEnvelopeResult now = coreEnvelope(after);
        double nowLift = now.boundary(Wheel.LEFT_REAR).points().get(0).lateralAcceleration() / STANDARD_GRAVITY;
        double beforeLift = before.boundary(Wheel.LEFT_REAR).points().get(0).lateralAcceleration() / STANDARD_GRAVITY;
        assertThat(nowLift).isNotEqualTo(beforeLift);
        assertThat(series(EnvelopeChart.REAR).getX(0).doubleValue()).isEqualTo(-nowLift);
        assertThat(series(EnvelopeChart.COMPARED_REAR).getX(0).doubleValue()).isEqualTo(-beforeLift);
    }

    @Test
    void a_chosen_vehicle_file_is_drawn_dashed_and_a_refused_one_is_said_so(@TempDir Path folder) throws Exception {
        Path saloon = Path.of("sample-vehicles", "road-saloon.json");
        GuiActionRunner.execute(() -> panel.envelope().compareWith(saloon));
        InsightWindows.settle(window, panel);
        LiftEnvelopeResult expected = coreEnvelope(barwright.loading.VehicleLoader.read(saloon).vehicle());
        assertThat(series(EnvelopeChart.COMPARED_FRONT).getX(0).doubleValue()).isEqualTo(
                -expected.boundary(Wheel.LEFT_FRONT).points().get(0).lateralAcceleration() / STANDARD_GRAVITY);
        assertThat(frame.label("insight.envelope.compareNote").text()).contains("Road saloon");
        Path broken = folder.resolve("broken.json");
        Files.writeString(broken, Files.readString(saloon).replace("\"wheelbaseMm\": ", "\"wheelbaseMm\": -"));
        GuiActionRunner.execute(() -> panel.envelope().compareWith(broken));
        InsightWindows.settle(window, panel);
        assertThat(frame.label("insight.envelope.compareNote").text())
                .startsWith("Not compared: the file was refused").contains("vehicle.wheelbaseMm");
    }

    @Test
    void the_sensitivity_table_lists_the_core_rows_in_order_with_their_steps() {
        frame.tabbedPane("insight.tabs").selectTab("What moves the balance");
        SensitivityResult expected = Sensitivity.of(shownVehicle());
        var table = GuiActionRunner.execute(() -> panel.sensitivity().table());
        assertThat(GuiActionRunner.execute(table::getRowCount)).isEqualTo(expected.rows().size());
        for (int i = 0; i < expected.rows().size(); i++) {
            int row = i;
            assertThat(GuiActionRunner.execute(() -> table.getValueAt(row, 0)))
                    .isEqualTo(expected.rows().get(i).change().effect());
            assertThat(GuiActionRunner.execute(() -> table.getValueAt(row, 6)))
                    .isEqualTo(expected.rows().get(i).tendency().words());
        }
        frame.comboBox("insight.sensitivity.measure").selectItem(1);
        // the whole name: on a narrow chart the axis may show its unit alone, the words being in the title
        assertThat(GuiActionRunner.execute(() -> ChartStyle.axisName(
                panel.sensitivity().chart().chart().getCategoryPlot().getRangeAxis()))).contains("front share");
    }

    @Test
    void the_chassis_view_states_the_eighty_percent_stiffness_and_follows_the_units() {
        frame.tabbedPane("insight.tabs").selectTab("Chassis stiffness");
        assertThat(GuiActionRunner.execute(() -> panel.chassis().statementText()))
                .contains("Deakin et al., SAE 2000-01-3554").contains("N·m/deg")
                .contains("This car's file gives no chassis stiffness");
        frame.toggleButton("units.us").click();
        robot.waitForIdle();
        assertThat(GuiActionRunner.execute(() -> panel.chassis().chart().chart().getXYPlot().getDomainAxis().getLabel()))
                .contains("lbf·ft/deg");
        assertThat(GuiActionRunner.execute(() -> panel.chassis().statementText())).contains("lbf·ft/deg");
        assertThat(GuiActionRunner.execute(() -> (String) panel.sensitivity().table().getValueAt(0, 1)))
                .doesNotContain(" mm").doesNotContain("N/mm");
    }

    @Test
    void a_car_with_a_flexible_chassis_is_marked_on_the_chassis_chart() throws Exception {
        GuiActionRunner.execute(() -> window.document().replace(Samples.load(Samples.ALL.get(2)), null, "sample"));
        InsightWindows.settle(window, panel);
        assertThat(GuiActionRunner.execute(() -> panel.current().chassis().current())).isNotNull();
        java.util.List<String> labels = GuiActionRunner.execute(() -> {
            java.util.List<String> found = new java.util.ArrayList<>();
            for (Object marker : panel.chassis().chart().chart().getXYPlot().getDomainMarkers(org.jfree.chart.ui.Layer.FOREGROUND)) {
                found.add(((org.jfree.chart.plot.Marker) marker).getLabel());
            }
            return found;
        });
        assertThat(labels).contains("this car");
    }
}
