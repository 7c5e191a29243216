package barwright.ui.sizing;

import barwright.io.VehicleFileReader;
import barwright.model.AxlePosition;
import barwright.model.Vehicle;
import barwright.physics.VehicleAnalysis;
import barwright.report.sizing.MapOutput;
import barwright.io.BarNodes;
import barwright.sizing.BarSearch;
import barwright.sizing.Candidate;
import barwright.sizing.Constraints;
import barwright.sizing.SizeChoices;
import barwright.sizing.SizingRequest;
import barwright.sizing.SizingResult;
import barwright.sizing.Targets;
import barwright.sizing.catalogue.Catalogues;
import barwright.sizing.catalogue.StockSize;
import barwright.solver.Progress;
import com.fasterxml.jackson.databind.JsonNode;
import org.apache.commons.csv.CSVFormat;
import org.apache.commons.csv.CSVParser;
import org.apache.commons.csv.CSVRecord;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.assertj.swing.edt.GuiActionRunner;
import org.assertj.swing.fixture.DialogFixture;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.awt.Color;
import java.io.Reader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.util.ArrayList;
import java.util.List;

import static barwright.ui.sizing.SizingWindowFixture.number;
import static barwright.ui.sizing.SizingWindowFixture.sample;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * The sizing views as a person uses them, on the club hatchback sample (invented data): a search runs to the
 * core's results and can be cancelled, a candidate goes into the car and Undo takes it out, the arm-hole map
 * has one cell per hole pair with the car's setting marked and figures from the full analysis, and the sheet
 * and map exports write files that parse back.
 */
@Tag("window")
class SizingWindowTest {
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

    private static List<StockSize> builtInSizes() {
        List<StockSize> sizes = new ArrayList<>();
        Catalogues.builtIn().forEach(catalogue -> sizes.addAll(catalogue.sizes()));
        return sizes;
    }

    /** Sizes the rear bar for a front share of 52 % with the form as it opens otherwise. */
    private DialogFixture searchRearFor52() {
        return fixture.searchRearFor52();
    }

    @Test
    void a_search_runs_to_the_cores_ranked_results() {
        DialogFixture sizing = searchRearFor52();
        // the same search made directly: the rear bar in its own material, every built-in size, every hole
        Vehicle car = sample();
        SizingResult core = BarSearch.run(car, SizingRequest.of(AxlePosition.REAR, Targets.share(0.52),
                Constraints.safetyFactor(1.5), new SizeChoices(List.of(car.rear().bar().material()), builtInSizes(),
                        List.of())), Progress.NONE);
        var table = sizing.table("search.results");
        assertThat(table.rowCount()).isEqualTo(core.candidates().size()).isEqualTo(10);
        for (int row = 0; row < core.candidates().size(); row++) {
            Candidate expected = core.candidates().get(row);
            assertThat(table.valueAt(org.assertj.swing.data.TableCell.row(row).column(CandidateTableModel.SIZE)))
                    .isEqualTo(expected.bars().get(0).size().label());
            // shown to one decimal in percent: within half a unit of the last digit
            assertThat(number(table.valueAt(org.assertj.swing.data.TableCell.row(row).column(CandidateTableModel.FRONT_SHARE))))
                    .isCloseTo(expected.figures().frontLoadTransferShare() * 100, within(0.05));
        }
        // 189 sizes in the four built-in catalogue files x 4 arm holes x 1 material
        String summary = GuiActionRunner.execute(() -> fixture.views().search().summaryText());
        assertThat(summary).contains("Tried 756 bars").contains("52.0 %");
        assertThat(GuiActionRunner.execute(() -> fixture.views().search().exactText()))
                .contains("Exact solid diameter for front share 52.0 %");
    }

    @Test
    void a_long_search_shows_progress_and_cancel_stops_it_with_the_window_free(@TempDir Path folder)
            throws Exception {
        // a stockist's catalogue of 5000 solid sizes, 10.00 to 59.99 mm: 5 materials x 5000 x 4 holes to try
        StringBuilder sizes = new StringBuilder();
        for (int i = 0; i < 5000; i++) {
            sizes.append(i == 0 ? "" : ",").append("{\"shape\":\"solid\",\"outerDiameterMm\":")
                    .append(String.format(java.util.Locale.ROOT, "%.2f", 10 + i * 0.01)).append('}');
        }
        Path catalogue = folder.resolve("long-list.json");
        Files.writeString(catalogue, "{\"format\":\"barwright.catalogue\",\"version\":1,\"name\":\"long list\","
                + "\"basis\":\"made up for a test\",\"sizes\":[" + sizes + "]}");
        DialogFixture sizing = fixture.openTool("Size a bar to a target…");
        sizing.comboBox("search.axle").selectItem("rear bar");
        for (String name : Catalogues.BUILT_IN) {
            sizing.checkBox("search.catalogue." + name).uncheck();
        }
        for (String material : List.of("spring steel", "4130 chromoly", "Ti-6Al-4V titanium", "7075-T6 aluminium")) {
            sizing.checkBox("search.material." + material).check();
        }
        sizing.textBox("search.ownCatalogue").enterText(catalogue.toString());
        sizing.button("search.run").click();
        SearchView view = fixture.views().search();
        fixture.waitFor("progress", () -> view.work().isShowing()
                && fixture.robot.finder().findByName(view, "search.progress", false).isShowing()
                && ((javax.swing.JProgressBar) fixture.robot.finder().findByName(view, "search.progress", false))
                .getString().contains(" of 100,000 bars"));
        // the window answers while the search runs (another tab chosen and back), then Cancel is pressed at once:
        // no robot travel between the first progress and the cancel, so the search cannot finish in between
        boolean idleMeanwhile = GuiActionRunner.execute(() -> {
            fixture.views().tabs().setSelectedIndex(SizingWindow.Tab.MAP.ordinal());
            fixture.views().tabs().setSelectedIndex(SizingWindow.Tab.SEARCH.ordinal());
            boolean idle = view.work().isIdle();
            ((javax.swing.AbstractButton) fixture.robot.finder().findByName(view, "search.cancel", false)).doClick();
            return idle;
        });
        assertThat(idleMeanwhile).as("still searching when Cancel was pressed").isFalse();
        fixture.waitFor("the cancel", () -> view.work().isIdle());
        assertThat(GuiActionRunner.execute(() -> view.work().message())).contains("cancelled");
        assertThat(sizing.table("search.results").rowCount()).isZero();
        sizing.button("search.run").requireEnabled();
        sizing.button("search.apply").requireDisabled();
    }

    @Test
    void the_chosen_candidate_goes_into_the_car_and_undo_takes_it_out() {
        JsonNode before = fixture.tree();
        DialogFixture sizing = searchRearFor52();
        sizing.table("search.results").selectRows(1);
        Candidate chosen = GuiActionRunner.execute(() -> {
            SearchView view = fixture.views().search();
            return ((CandidateTableModel) view.table().getModel()).candidate(1);
        });
        sizing.button("search.apply").click();
        fixture.waitFor("the analysis", () -> fixture.window.analysis().isIdle());
        JsonNode rearBar = fixture.tree().path("rear").path("bar");
        assertThat(rearBar.path("section")).isEqualTo(BarNodes.section(chosen.bars().get(0).size().section()));
        assertThat(rearBar.path("selectedArm").asInt()).isEqualTo(chosen.bars().get(0).selectedArm());
        assertThat(fixture.window.getTitle()).contains("unsaved");
        // the main window's figures follow the car with the new bar
        assertThat(number(GuiActionRunner.execute(() -> fixture.window.figures().figureText("figure.frontShare"))))
                .isCloseTo(chosen.figures().frontLoadTransferShare() * 100, within(0.05));

        fixture.frame.menuItemWithPath("Edit", "Undo").click();
        assertThat(fixture.tree()).isEqualTo(before);
    }

    @Test
    void the_map_has_one_cell_per_hole_pair_with_the_cars_setting_marked_and_the_full_analysis_figures()
            throws Exception {
        JsonNode before = fixture.tree();
        DialogFixture sizing = fixture.openTool("Arm-hole map…");
        MapView map = fixture.views().map();
        // the file's bars: 3 front arm holes, 4 rear; selectedArm 1 and 1
        fixture.waitFor("the map", () -> map.work().isIdle() && map.cells().size() == 12);
        List<MapCellView> cells = GuiActionRunner.execute(map::cells);
        Vehicle car = sample();
        // the tint is centred on the car's setting as it opens
        double reference = GuiActionRunner.execute(map::referenceShare);
        assertThat(reference).isCloseTo(VehicleAnalysis.analyse(car).frontLoadTransferShare(), within(1e-9));
        sizing.comboBox("map.centre").selectItem("the static front weight + 5 points");
        assertThat(GuiActionRunner.execute(map::referenceShare)).isCloseTo(0.63 + 0.05, within(1e-12)); // the file's
        sizing.comboBox("map.centre").selectItem("the car's setting now");
        int current = 0;
        for (MapCellView cell : cells) {
            int front = cell.cell().front().hole();
            int rear = cell.cell().rear().hole();
            double share = VehicleAnalysis.analyse(car
                    .withAxle(AxlePosition.FRONT, car.front().withBar(car.front().bar().withSelectedArm(front)))
                    .withAxle(AxlePosition.REAR, car.rear().withBar(car.rear().bar().withSelectedArm(rear))))
                    .frontLoadTransferShare();
            String text = GuiActionRunner.execute(cell::shareText);
            assertThat(number(text)).as(text).isCloseTo(share * 100, within(0.05));
            Color tint = GuiActionRunner.execute(cell::getBackground);
            if (share < reference - 0.01) {
                assertThat(tint.getRed()).as("below the reference: the rear's warm colour").isGreaterThan(tint.getBlue());
            } else if (share > reference + 0.01) {
                assertThat(tint.getBlue()).as("above the reference: the front's blue").isGreaterThan(tint.getRed());
            }
            if (cell.cell().current()) {
                current++;
                assertThat(front).isEqualTo(1);
                assertThat(rear).isEqualTo(1);
                assertThat(text).endsWith(" now");
            }
        }
        assertThat(current).isEqualTo(1);

        // choosing a cell and putting its holes in the car is one step that Undo takes back
        sizing.panel("map.cell.0.3").click();
        sizing.button("map.useHoles").requireEnabled().click();
        fixture.waitFor("the analysis", () -> fixture.window.analysis().isIdle());
        assertThat(fixture.tree().path("front").path("bar").path("selectedArm").asInt()).isEqualTo(0);
        assertThat(fixture.tree().path("rear").path("bar").path("selectedArm").asInt()).isEqualTo(3);
        fixture.waitFor("the map again", () -> map.work().isIdle() && map.cells().get(3).cell().current());
        fixture.frame.menuItemWithPath("Edit", "Undo").click();
        assertThat(fixture.tree()).isEqualTo(before);
    }

    @Test
    void the_file_menu_writes_a_setup_sheet_and_a_map_that_parse_back(@TempDir Path folder) throws Exception {
        Path pdf = folder.resolve("hatchback-sheet.pdf");
        fixture.dialogs.filesToSave.add(pdf);
        fixture.frame.menuItemWithPath("File", "Export setup sheet as PDF…").click();
        fixture.waitFor("the sheet", () -> fixture.window.contribution(SizingViews.class).lastMessage() != null);
        assertThat(fixture.dialogs.errors).isEmpty();
        try (PDDocument parsed = Loader.loadPDF(Files.readAllBytes(pdf))) {
            String text = new PDFTextStripper().getText(parsed);
            assertThat(parsed.getNumberOfPages()).isGreaterThanOrEqualTo(2);
            assertThat(text).contains("Barwright setup sheet").contains("Club hatchback")
                    .contains("Adjustment map").contains("Caution");
        }

        fixture.dialogs.filesToSave.add(folder.resolve("hatchback-map")); // the extension is added
        fixture.frame.menuItemWithPath("File", "Export arm-hole map as CSV…").click();
        Path csv = folder.resolve("hatchback-map.csv");
        fixture.waitFor("the map file", () -> Files.exists(csv)
                && fixture.window.contribution(SizingViews.class).lastMessage().contains("hatchback-map.csv"));
        double currentShare = VehicleAnalysis.analyse(sample()).frontLoadTransferShare();
        try (Reader in = Files.newBufferedReader(csv);
             CSVParser parser = CSVFormat.RFC4180.builder().setHeader().setSkipHeaderRecord(true).get().parse(in)) {
            assertThat(parser.getHeaderNames()).isEqualTo(MapOutput.CSV_COLUMNS);
            List<CSVRecord> records = parser.getRecords();
            assertThat(records).hasSize(12);
            List<CSVRecord> current = records.stream().filter(r -> r.get("current").equals("true")).toList();
            assertThat(current).hasSize(1);
            assertThat(current.get(0).get("frontSelectedArm")).isEqualTo("1");
            assertThat(current.get(0).get("rearSelectedArm")).isEqualTo("1");
            // the same analysis of the same car, written and read back as text: 1e-12
            assertThat(Double.parseDouble(current.get(0).get("frontLoadTransferShare"))).isCloseTo(currentShare,
                    within(1e-12));
        }
    }

    @Test
    void figures_and_fields_follow_the_unit_switch() {
        DialogFixture sizing = searchRearFor52();
        assertThat(sizing.table("search.results").valueAt(org.assertj.swing.data.TableCell.row(0).column(CandidateTableModel.MASS)))
                .endsWith("kg");
        sizing.textBox("search.maxMass").enterText("2");
        fixture.frame.toggleButton("units.us").click();
        assertThat(sizing.table("search.results").valueAt(org.assertj.swing.data.TableCell.row(0).column(CandidateTableModel.MASS)))
                .endsWith("lb");
        assertThat(sizing.label("search.maxMass.unit").text()).isEqualTo("lb");
        // 2 kg typed, shown again in pounds: 2 / 0.45359237 (NIST SP 811) = 4.409 lb
        assertThat(number(sizing.textBox("search.maxMass").text())).isCloseTo(4.409, within(0.0005));
    }
}
