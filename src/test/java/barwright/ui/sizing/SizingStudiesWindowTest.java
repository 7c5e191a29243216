package barwright.ui.sizing;

import barwright.io.VehicleFileWriter;
import barwright.model.AxlePosition;
import barwright.model.MaterialLibrary;
import barwright.model.Vehicle;
import barwright.physics.AnalysisResult;
import barwright.physics.VehicleAnalysis;
import barwright.io.BarNodes;
import barwright.loading.VehicleLoader;
import barwright.io.VehicleFileException;
import barwright.ui.document.Samples;
import barwright.report.sizing.TubeOutput;
import barwright.sizing.FatigueLap;
import barwright.sizing.TubeEquivalents;
import barwright.sizing.TubeLives;
import barwright.sizing.TubeMatch;
import barwright.sizing.catalogue.Catalogues;
import barwright.sizing.catalogue.StockSize;
import barwright.sizing.preload.GainingDiagonal;
import barwright.sizing.preload.LinkPreload;
import barwright.sizing.preload.PreloadResult;
import com.fasterxml.jackson.databind.JsonNode;
import org.assertj.swing.data.TableCell;
import org.assertj.swing.edt.GuiActionRunner;
import org.assertj.swing.fixture.DialogFixture;
import org.assertj.swing.fixture.JTableFixture;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import static barwright.ui.sizing.SizingWindowFixture.number;
import static barwright.ui.sizing.SizingWindowFixture.sample;
import static barwright.ui.sizing.SizingWindowFixture.shownValue;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * The tube, comparison and link-preload views in the window, on the club hatchback sample (invented data): what
 * they show is what the core computes for the car as it stands, and a chosen tube goes into the car and comes
 * out again with Undo.
 */
@Tag("window")
class SizingStudiesWindowTest {
    private SizingWindowFixture fixture;

    @BeforeEach
    void open() {
        fixture = new SizingWindowFixture();
    }

    @AfterEach
    void close() {
        if (fixture != null) {
            fixture.close();
        }
    }

    /** @return the row of the table whose first cell is the text */
    private static int row(JTableFixture table, String first) {
        for (int row = 0; row < table.rowCount(); row++) {
            if (table.valueAt(TableCell.row(row).column(0)).equals(first)) {
                return row;
            }
        }
        throw new AssertionError("no row " + first);
    }

    private static FatigueLap defaultLap() {
        try {
            return FatigueLap.onDefaultLap(Samples.load(Samples.CLUB_HATCHBACK));
        } catch (VehicleFileException refused) {
            throw new AssertionError(refused);
        }
    }

    @Test
    void the_tubes_of_the_front_bars_rate_are_the_cores_and_the_chosen_one_goes_into_the_car() {
        JsonNode before = fixture.tree();
        DialogFixture sizing = fixture.openTool("Tube or solid bar of the same rate…");
        sizing.checkBox("tubes.material.4130 chromoly").check();
        sizing.button("tubes.find").click();
        TubeView view = fixture.views().tubes();
        fixture.waitFor("the tubes", () -> view.work().isIdle() && view.table().getRowCount() > 0);
        Vehicle car = sample();
        List<StockSize> tubes = new ArrayList<>();
        tubes.addAll(Catalogues.builtIn("tube-metric").orElseThrow().sizes());
        tubes.addAll(Catalogues.builtIn("tube-inch").orElseThrow().sizes());
        TubeEquivalents.Comparison core = TubeEquivalents.compare(car.front().bar(), car.differentialWheelTravel(),
                tubes, List.of(car.front().bar().material(), MaterialLibrary.CHROMOLY_4130), 0.02);
        JTableFixture table = sizing.table("tubes.results");
        assertThat(table.rowCount()).isEqualTo(core.matches().size());
        // each tube's fatigue life on the default lap, as the core gives it (sizing.TubeLivesTest checks the core)
        TubeLives lives = TubeLives.of(car, AxlePosition.FRONT, core, defaultLap());
        for (int row = 0; row < core.matches().size(); row++) {
            assertThat(shownValue(table, row, TubeView.LIFE)).isEqualTo(TubeOutput.lifeText(lives.tubes().get(row)));
        }
        for (int row = 0; row < core.matches().size(); row++) {
            TubeMatch match = core.matches().get(row);
            assertThat(table.valueAt(TableCell.row(row).column(0))).isEqualTo(match.size().label());
            assertThat(shownValue(table, row, TubeView.MATERIAL)).isEqualTo(match.material().name());
            // within the 2 % the issue calls equal rate, as the table says it
            assertThat(Math.abs(number(shownValue(table, row, TubeView.RATE_DIFFERENCE)))).isLessThanOrEqualTo(2.0);
        }
        assertThat(GuiActionRunner.execute(view::solidText)).contains("22.0 mm").contains("spring steel");

        table.selectRows(0);
        sizing.button("tubes.apply").click();
        fixture.waitFor("the analysis", () -> fixture.window.analysis().isIdle());
        assertThat(fixture.tree().path("front").path("bar").path("section"))
                .isEqualTo(BarNodes.section(core.matches().get(0).size().section()));
        fixture.frame.menuItemWithPath("Edit", "Undo").click();
        assertThat(fixture.tree()).isEqualTo(before);
    }

    @Test
    void setups_compare_side_by_side_with_the_full_analysis_and_their_differences(@TempDir Path folder)
            throws Exception {
        Path saved = folder.resolve("roadster.json");
        VehicleFileWriter.save(VehicleLoader.read(Path.of("sample-vehicles/sprint-roadster.json")), saved);
        DialogFixture sizing = fixture.openTool("Compare setups…");
        sizing.textBox("compare.name").deleteText().enterText("as it is");
        sizing.button("compare.addOpen").click();
        sizing.textBox("compare.name").deleteText().enterText("rear hole 1");
        sizing.comboBox("compare.what").selectItem("Rear bar — " + VariantChoices.ARM_HOLE);
        sizing.comboBox("compare.hole").selectItem(0);
        sizing.button("compare.addChange").click();
        sizing.button("compare.addVariant").click();
        fixture.dialogs.filesToOpen.add(saved);
        sizing.button("compare.addFile").click();
        CompareView view = fixture.views().compare();
        fixture.waitFor("the comparison", () -> view.work().isIdle() && view.shown() != null
                && view.shown().configurations().size() == 3);

        Vehicle car = sample();
        AnalysisResult asItIs = VehicleAnalysis.analyse(car);
        AnalysisResult variant = VehicleAnalysis.analyse(car.withAxle(AxlePosition.REAR,
                car.rear().withBar(car.rear().bar().withSelectedArm(0))));
        AnalysisResult roadster = VehicleAnalysis.analyse(VehicleLoader.read(saved).vehicle());
        assertThat(GuiActionRunner.execute(() -> view.entries().stream().map(CompareView.Entry::name).toList()))
                .containsExactly("as it is", "rear hole 1", "roadster.json");
        JTableFixture table = sizing.table("compare.figures");
        int share = row(table, "front share of load transfer");
        assertThat(table.columnIndexFor("rear hole 1")).isEqualTo(2);
        assertThat(number(shownValue(table, share, 1)))
                .isCloseTo(asItIs.frontLoadTransferShare() * 100, within(0.05));
        String second = shownValue(table, share, 2);
        assertThat(number(second)).isCloseTo(variant.frontLoadTransferShare() * 100, within(0.05));
        // the difference in brackets, in points of percent, to its one decimal
        double difference = Double.parseDouble(second.substring(second.indexOf('(') + 1, second.indexOf(" pt"))
                .replace(',', '.'));
        assertThat(difference).isCloseTo((variant.frontLoadTransferShare() - asItIs.frontLoadTransferShare()) * 100,
                within(0.05));
        assertThat(number(shownValue(table, share, 3)))
                .isCloseTo(roadster.frontLoadTransferShare() * 100, within(0.05));
        // three charts, one line per setup in the handling curve
        assertThat(GuiActionRunner.execute(() -> view.charts().getTabCount())).isEqualTo(3);
        assertThat(GuiActionRunner.execute(() -> view.shown().charts().get(0).series().size())).isEqualTo(3);

        // the setup says where it came from in words, and a variant with no change is refused, not added
        assertThat(GuiActionRunner.execute(() -> view.entries().get(1).source()))
                .endsWith("with Rear bar — Arm hole in use: 2 → 1");
        sizing.button("compare.addVariant").click();
        assertThat(GuiActionRunner.execute(() -> view.work().message())).contains("at least one change");
        assertThat(GuiActionRunner.execute(() -> view.entries().size())).isEqualTo(3);
    }

    @Test
    void the_preload_view_shows_the_cores_corner_loads_and_says_the_diagonal_in_words() {
        DialogFixture sizing = fixture.openTool("Link preload and cross weight…");
        PreloadView view = fixture.views().preload();
        fixture.waitFor("the preload", () -> view.work().isIdle() && view.shown() != null);
        PreloadResult core = LinkPreload.of(sample(), AxlePosition.FRONT, GainingDiagonal.LEFT_FRONT_RIGHT_REAR, 2e-3);
        JTableFixture table = sizing.table("preload.wheels");
        assertThat(number(table.valueAt(TableCell.row(0).column(3)))).isCloseTo(core.loads().leftFront(), within(0.5));
        assertThat(number(table.valueAt(TableCell.row(3).column(3)))).isCloseTo(core.loads().rightRear(), within(0.5));
        assertThat(GuiActionRunner.execute(view::wordsText))
                .contains("2.0 mm longer loads the left front and right rear wheels")
                .contains("unloads the right front and left rear");
        assertThat(GuiActionRunner.execute(view::crossText)).contains(String.format(java.util.Locale.ROOT, "%.2f",
                100 * core.loads().crossWeight()).replace('.', GuiActionRunner.execute(() ->
                barwright.ui.field.NumberText.decimalSeparator(fixture.window.view().locale()))));
        assertThat(GuiActionRunner.execute(() -> fixture.robot.finder().findByName(view, "preload.advice", false)
                .isShowing())).isTrue();

        // shorter: the other diagonal gains
        sizing.textBox("preload.change").deleteText().enterText("-1").pressAndReleaseKeys(
                java.awt.event.KeyEvent.VK_ENTER);
        fixture.waitFor("the preload again", () -> view.work().isIdle() && view.shown().linkChange() < 0);
        assertThat(GuiActionRunner.execute(view::wordsText))
                .contains("1.0 mm shorter loads the right front and left rear wheels");
    }
}
