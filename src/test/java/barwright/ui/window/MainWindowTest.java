package barwright.ui.window;

import barwright.io.VehicleFileWriter;
import barwright.loading.VehicleLoader;
import barwright.physics.AnalysisResult;
import barwright.physics.VehicleAnalysis;
import barwright.report.ProgramVersion;
import barwright.ui.action.Dialogs;
import barwright.ui.document.Samples;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import org.assertj.swing.edt.GuiActionRunner;
import org.assertj.swing.fixture.JTextComponentFixture;
import org.junit.jupiter.api.AfterEach;
import org.junit.jupiter.api.BeforeEach;
import org.junit.jupiter.api.Tag;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.file.Files;
import java.nio.file.Path;
import java.util.List;
import java.util.Locale;

import static barwright.units.Constants.RADIANS_PER_DEGREE;
import static barwright.units.Constants.STANDARD_GRAVITY;
import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/** The main window as a person uses it: on the sample, typing, refused values, units, files, undo. */
@Tag("window")
class MainWindowTest {
    private WindowFixture fixture;

    @BeforeEach
    void open() {
        fixture = new WindowFixture();
    }

    @AfterEach
    void close() {
        if (fixture != null) {
            fixture.close();
        }
    }

    /** @return the number at the start of a figure's text, e.g. 46.7 from "46.7 %" */
    private static double number(String text) {
        return Double.parseDouble(text.trim().split(" ")[0].replace(',', '.'));
    }

    private static AnalysisResult coreAnalysis(java.util.function.Consumer<ObjectNode> change) throws Exception {
        ObjectNode tree = Samples.load(Samples.CLUB_HATCHBACK).editableTree();
        change.accept(tree);
        return VehicleAnalysis.analyse(VehicleLoader.fromTree(tree).vehicle());
    }

    private boolean bannerShowing() {
        return GuiActionRunner.execute(() -> fixture.robot.finder().findByName(fixture.window, "stale.banner", false)
                .isShowing());
    }

    private JsonNode documentTree() {
        return GuiActionRunner.execute(() -> fixture.window.document().tree().deepCopy());
    }

    private JTextComponentFixture field(String tab, String path) {
        fixture.frame.tabbedPane("editor.tabs").selectTab(tab);
        return fixture.frame.textBox(path);
    }

    @Test
    void opensOnTheSampleWithTheCoresFigures() throws Exception {
        AnalysisResult expected = coreAnalysis(tree -> { });
        assertThat(fixture.window.getTitle()).contains("Club hatchback").doesNotContain("unsaved");
        assertThat(field("Car", "vehicle.massKg").text()).isEqualTo("1020");
        // shown to one decimal in percent, so within half a unit of the last digit
        assertThat(number(fixture.figure("figure.frontShare"))).isCloseTo(expected.frontLoadTransferShare() * 100,
                within(0.05));
        assertThat(number(fixture.figure("figure.rollGradient")))
                .isCloseTo(expected.rollGradient() * STANDARD_GRAVITY / RADIANS_PER_DEGREE, within(0.005));
        assertThat(bannerShowing()).isFalse();
    }

    @Test
    void typingAFrontBarDiameterMovesTheShareAndRollGradientToTheCoresValues() throws Exception {
        String shareBefore = fixture.figure("figure.frontShare");
        String rollBefore = fixture.figure("figure.rollGradient");
        field("Front bar", "front.bar.section.outerDiameterMm").deleteText().enterText("25");
        fixture.settle();
        AnalysisResult expected = coreAnalysis(tree ->
                ((ObjectNode) tree.at("/front/bar/section")).put("outerDiameterMm", 25));
        String share = fixture.figure("figure.frontShare");
        String roll = fixture.figure("figure.rollGradient");
        assertThat(share).isNotEqualTo(shareBefore);
        assertThat(roll).isNotEqualTo(rollBefore);
        assertThat(number(share)).isCloseTo(expected.frontLoadTransferShare() * 100, within(0.05));
        assertThat(number(roll)).isCloseTo(expected.rollGradient() * STANDARD_GRAVITY / RADIANS_PER_DEGREE,
                within(0.005));
        assertThat(fixture.window.getTitle()).contains("unsaved changes");
    }

    @Test
    void aTubeWallThickerThanTheRadiusIsMarkedWithTheCoresMessage() throws Exception {
        JTextComponentFixture wall = field("Rear bar", "rear.bar.section.wallMm");
        wall.deleteText().enterText("14");
        fixture.settle();
        var problem = fixture.frame.textBox("rear.bar.section.wallMm.problem");
        problem.requireVisible();
        // the core's message names the key path, the value and the allowed range (BarReader)
        assertThat(problem.text()).contains("rear.bar.section.wallMm").contains("14 mm")
                .contains("must be less than half of outerDiameterMm (12.7 mm)");
        assertThat(GuiActionRunner.execute(() -> wall.target().getClientProperty("JComponent.outline")))
                .isEqualTo("error");
        assertThat(bannerShowing()).isTrue();
        assertThat(fixture.frame.textBox("stale.banner").text()).contains("Out of date")
                .contains("rear.bar.section.wallMm");
        // typed key by key, "14" is applied only when complete (NumberField): "1" was never accepted on the
        // way, so the figures stay on the sample as it was, the last car the program accepted
        AnalysisResult lastAccepted = coreAnalysis(tree -> { });
        assertThat(number(fixture.figure("figure.frontShare")))
                .isCloseTo(lastAccepted.frontLoadTransferShare() * 100, within(0.05));

        wall.deleteText().enterText("3");
        fixture.settle();
        assertThat(GuiActionRunner.execute(() -> problem.target().isShowing())).isFalse();
        assertThat(bannerShowing()).isFalse();
        assertThat(number(fixture.figure("figure.frontShare")))
                .isCloseTo(coreAnalysis(tree -> { }).frontLoadTransferShare() * 100, within(0.05));
    }

    @Test
    void switchingUnitsShowsASpringRateInPoundsForcePerInchByTheNistFactor() {
        JTextComponentFixture spring = field("Front axle", "front.springRateNPerMm");
        assertThat(spring.text()).isEqualTo("70");
        fixture.frame.toggleButton("units.us").click();
        fixture.robot.waitForIdle();
        // 1 lbf/in = 0.175 126 835 N/mm (docs/validation.md, section "Units"); shown with two decimals
        double shown = Double.parseDouble(spring.text().replace(',', '.'));
        assertThat(shown).isCloseTo(70 / 0.175126835, within(0.005));
        assertThat(fixture.frame.label("front.springRateNPerMm.unit").text()).isEqualTo("lbf/in");
        fixture.frame.toggleButton("units.si").click();
        fixture.robot.waitForIdle();
        assertThat(spring.text()).isEqualTo("70");
    }

    @Test
    void aboutShowsTheVersionThatDashDashVersionPrintsTheJavaAndTheLicence() {
        fixture.frame.menuItemWithPath("Help", "About Barwright").click();
        fixture.robot.waitForIdle();
        // the build writes the version from pom.xml; "unknown" would mean the test ran without it
        assertThat(ProgramVersion.number()).isNotEqualTo("unknown");
        assertThat(fixture.dialogs.information).singleElement().asString()
                .startsWith("About Barwright: " + ProgramVersion.line() + "\n")
                .contains("Java " + System.getProperty("java.version"))
                .contains("MIT licence");
    }

    @Test
    void savingThenOpeningGivesBackTheSameDocument(@TempDir Path folder) throws Exception {
        field("Front bar", "front.bar.section.outerDiameterMm").deleteText().enterText("23.5");
        fixture.settle();
        Path file = folder.resolve("hatchback.json");
        fixture.dialogs.filesToSave.add(file);
        fixture.frame.button("toolbar.Save").click();
        fixture.robot.waitForIdle();
        assertThat(file).exists();
        JsonNode saved = documentTree();
        assertThat(fixture.window.getTitle()).contains("hatchback.json").doesNotContain("unsaved");

        fixture.frame.textBox("front.bar.section.outerDiameterMm").deleteText().enterText("30");
        fixture.settle();
        fixture.dialogs.unsavedAnswers.add(Dialogs.UnsavedChoice.DISCARD);
        fixture.dialogs.filesToOpen.add(file);
        GuiActionRunner.execute(() -> fixture.window.files().open());
        fixture.settle();

        assertThat(fixture.dialogs.unsavedQuestions).isEqualTo(1);
        assertThat(documentTree()).isEqualTo(saved);
        assertThat(VehicleLoader.read(file).tree()).isEqualTo(saved);
        assertThat(fixture.frame.textBox("front.bar.section.outerDiameterMm").text()).isEqualTo("23.5");
        assertThat(fixture.window.getTitle()).contains("hatchback.json").doesNotContain("unsaved");
    }

    @Test
    void aFileThatFailsToLoadLeavesTheOpenDocumentUntouched(@TempDir Path folder) throws Exception {
        field("Front bar", "front.bar.section.outerDiameterMm").deleteText().enterText("24");
        fixture.settle();
        JsonNode before = documentTree();
        String title = fixture.window.getTitle();
        ObjectNode broken = Samples.load(Samples.CLUB_HATCHBACK).editableTree();
        ((ObjectNode) broken.at("/rear/bar/section")).put("wallMm", 20);
        Path file = folder.resolve("broken.json");
        Files.writeString(file, VehicleFileWriter.toJson(broken));
        fixture.dialogs.unsavedAnswers.add(Dialogs.UnsavedChoice.DISCARD);
        fixture.dialogs.filesToOpen.add(file);
        GuiActionRunner.execute(() -> fixture.window.files().open());
        fixture.settle();

        assertThat(fixture.dialogs.errors).singleElement().asString()
                .contains("broken.json").contains("unchanged").contains("rear.bar.section.wallMm");
        assertThat(documentTree()).isEqualTo(before);
        assertThat(fixture.window.getTitle()).isEqualTo(title);
        assertThat(fixture.frame.textBox("front.bar.section.outerDiameterMm").text()).isEqualTo("24");
    }

    @Test
    void undoPutsBackTheValueBeforeTheEdit() {
        JTextComponentFixture diameter = field("Front bar", "front.bar.section.outerDiameterMm");
        String shareBefore = fixture.figure("figure.frontShare");
        diameter.deleteText().enterText("26");
        fixture.settle();
        assertThat(fixture.figure("figure.frontShare")).isNotEqualTo(shareBefore);
        fixture.frame.button("toolbar.Undo").click();
        fixture.settle();
        // one typing session in one field is one undo step
        assertThat(diameter.text()).isEqualTo("22");
        assertThat(fixture.figure("figure.frontShare")).isEqualTo(shareBefore);
        assertThat(fixture.window.getTitle()).doesNotContain("unsaved");
        fixture.frame.button("toolbar.Redo").click();
        fixture.settle();
        assertThat(diameter.text()).isEqualTo("26");
        assertThat(String.format(Locale.ROOT, "%s", fixture.window.getTitle())).contains("unsaved");
    }

    private List<String> carPictureFigures() {
        fixture.robot.waitForIdle();
        return GuiActionRunner.execute(() -> fixture.window.tabs().car().drawnFigures());
    }

    @Test
    void theCarPictureRedrawsInTheNewUnitsAtOnceWithNoSliderMoved() {
        fixture.frame.tabbedPane("results.tabs").selectTab("Car from behind");
        assertThat(carPictureFigures()).anyMatch(text -> text.endsWith(" N")).noneMatch(text -> text.endsWith(" lbf"));
        fixture.frame.toggleButton("units.us").click();
        assertThat(carPictureFigures()).anyMatch(text -> text.endsWith(" lbf")).noneMatch(text -> text.endsWith(" N"));
        fixture.frame.toggleButton("units.si").click();
        assertThat(carPictureFigures()).anyMatch(text -> text.endsWith(" N")).noneMatch(text -> text.endsWith(" lbf"));
    }
}
