package barwright.report.sheet;

import barwright.loading.VehicleLoader;
import barwright.physics.AnalysisResult;
import barwright.physics.VehicleAnalysis;
import barwright.sizing.map.AdjustmentMap;
import barwright.sizing.map.MapCell;
import barwright.units.UnitSystem;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.pdmodel.common.PDRectangle;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.params.ParameterizedTest;
import org.junit.jupiter.params.provider.ValueSource;

import java.nio.file.Path;
import java.time.LocalDate;
import java.util.Comparator;
import java.util.HashSet;
import java.util.List;
import java.util.Set;
import java.util.regex.Matcher;
import java.util.regex.Pattern;
import java.util.stream.IntStream;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.within;

/**
 * The sheet as a crew meets it (issue 13): the map's tint against its reference, "current" written once,
 * the crew's block, a full first page and shaped bars drawn with their holes, bushings and drop. Expected
 * values come from the sample files named in each test, or from the issue's own wording.
 */
class SetupSheetLayoutTest {
    private static AnalysisResult analyse(String sample) throws Exception {
        return VehicleAnalysis.analyse(VehicleLoader.read(Path.of("sample-vehicles", sample)).vehicle());
    }

    private static SheetContent usual(String sample, UnitSystem units) throws Exception {
        return SetupSheet.contentFor(analyse(sample), LocalDate.of(2026, 6, 1), units);
    }

    private static String text(SheetContent content, int firstPage, int lastPage) throws Exception {
        try (PDDocument parsed = Loader.loadPDF(SetupSheet.toPdf(content))) {
            PDFTextStripper stripper = new PDFTextStripper();
            stripper.setStartPage(firstPage);
            stripper.setEndPage(Math.min(lastPage, parsed.getNumberOfPages()));
            // lines wrapped by the layout are joined, so a phrase is found wherever it breaks
            return stripper.getText(parsed).replaceAll("\\s+", " ");
        }
    }

    @Test
    void aMapWithEveryCellOnOneSideOfTheReferenceStillShowsGradation() throws Exception {
        // club-hatchback.json: frontMassFraction 0.63, and (the premise, read from the map) every cell of its
        // front-drive map puts less than 63 % of the transfer at the front
        SheetContent content = usual("club-hatchback.json", UnitSystem.SI);
        assertThat(content.referenceShare()).isEqualTo(0.63);
        AdjustmentMap map = content.map();
        assertThat(map.cells()).hasSize(12).allSatisfy(cell ->
                assertThat(cell.figures().frontLoadTransferShare()).isLessThan(0.63));
        List<float[]> tints = MapDrawing.tints(map, 0.63);
        // distinct as printed: 8 bits a channel; the twelve shares span some ten points
        Set<Integer> printed = new HashSet<>();
        for (float[] tint : tints) {
            printed.add(Math.round(tint[0] * 255) << 16 | Math.round(tint[1] * 255) << 8 | Math.round(tint[2] * 255));
        }
        assertThat(printed).hasSizeGreaterThanOrEqualTo(8);
        // every cell below the reference takes one hue: red stays above blue (amber), never a blue
        assertThat(tints).allSatisfy(tint -> assertThat(tint[0]).isGreaterThan(tint[2]));
        // deeper with the distance: ordered by distance, the blue channel never rises
        List<Integer> byDistance = IntStream.range(0, 12).boxed().sorted(Comparator.comparingDouble(
                i -> Math.abs(map.cells().get(i).figures().frontLoadTransferShare() - 0.63))).toList();
        for (int k = 1; k < byDistance.size(); k++) {
            assertThat(tints.get(byDistance.get(k))[2]).isLessThanOrEqualTo(tints.get(byDistance.get(k - 1))[2]);
        }
    }

    @Test
    void theTintIsWhiteAtTheReferenceAndTakesOppositeHuesEitherSide() {
        // the limit case of a diverging scale: no distance, no colour
        assertThat(MapDrawing.tint(0, 0.05)).containsExactly(1f, 1f, 1f);
        // above: blue outweighs red; below: red outweighs blue
        float[] above = MapDrawing.tint(0.03, 0.05);
        float[] below = MapDrawing.tint(-0.03, 0.05);
        assertThat(above[2]).isGreaterThan(above[0]);
        assertThat(below[0]).isGreaterThan(below[2]);
        // a map whose farthest cell is half a point off stays pale: the scale spans at least 2 points
        AdjustmentMap none = new AdjustmentMap(null, List.of(), List.of(), List.of());
        assertThat(MapDrawing.span(none, 0.6)).isEqualTo(MapDrawing.MIN_SPAN);
        assertThat(MapDrawing.tint(0.005, MapDrawing.MIN_SPAN)[0]).isGreaterThan(0.8f);
    }

    @Test
    void theLegendNamesWhatTheMapIsTintedAgainst() throws Exception {
        SheetContent byWeight = usual("club-hatchback.json", UnitSystem.SI);
        assertThat(text(byWeight, 1, 9)).contains("Tinted against the static front weight 63.0 %");
        SheetContent byTarget = new SheetContent(byWeight.result(), byWeight.map(), 0.58, byWeight.charts(),
                byWeight.date(), byWeight.units());
        // 58.0 % is 5.0 points below the file's 63.0 %
        assertThat(text(byTarget, 1, 9)).contains(
                "Tinted against the target 58.0 % (static front weight 63.0 % minus 5.0 points)");
    }

    @Test
    void theNearestCellIsTheOneWhoseShareIsClosestToTheReference() throws Exception {
        AdjustmentMap map = usual("club-hatchback.json", UnitSystem.SI).map();
        int nearest = MapDrawing.nearest(map, 0.63);
        double best = map.cells().stream().mapToDouble(c -> Math.abs(c.figures().frontLoadTransferShare() - 0.63))
                .min().orElseThrow();
        assertThat(Math.abs(map.cells().get(nearest).figures().frontLoadTransferShare() - 0.63)).isEqualTo(best);
        assertThat(map.cells().stream().filter(MapCell::current)).hasSize(1);
    }

    @ParameterizedTest
    @ValueSource(strings = {"club-hatchback.json", "hillclimb-special-swept-bar.json"})
    void currentIsWrittenOnceInTheWholeSheet(String sample) throws Exception {
        Matcher word = Pattern.compile("\\bcurrent\\b", Pattern.CASE_INSENSITIVE)
                .matcher(text(usual(sample, UnitSystem.SI), 1, 9));
        int count = 0;
        while (word.find()) {
            count++;
        }
        assertThat(count).isEqualTo(1);
    }

    @Test
    void theCrewBlockIsOnTheFirstPageInTheSheetsUnits() throws Exception {
        String metric = text(usual("club-hatchback.json", UnitSystem.SI), 1, 1);
        assertThat(metric).contains("At the track", "Event, session", "Driver", "Track temp °C", "Air temp °C",
                "Tyre pressure, cold (kPa or bar)", "Tyre pressure, hot", "Tyre temp, in / mid / out °C",
                "Ride height (mm)", "Corner weight (kg)", "front left", "front right", "rear left", "rear right",
                "Front bar: hole run", "Rear bar: hole run", "Driver's comments", "Notes and changes");
        String us = text(usual("club-hatchback.json", UnitSystem.US), 1, 1);
        assertThat(us).contains("Tyre pressure, cold (psi)", "Ride height (in)", "Corner weight (lb)",
                "Track temp °F");
    }

    @ParameterizedTest
    @ValueSource(strings = {"club-hatchback.json", "estate-dropped-rear-bar.json",
            "hillclimb-special-swept-bar.json"})
    void theFirstPageIsFull(String sample) throws Exception {
        SetupSheet.Layout layout = SetupSheet.layout(usual(sample, UnitSystem.SI));
        // no band of the first page taller than a tenth of it is left empty: a heading's gap is about 2 %, and
        // the half-empty first page this replaces left a band of about a quarter of the page above its closing
        // caution
        assertThat(layout.largestEmptyBand(0)).isLessThan(0.10f * PDRectangle.A4.getHeight());
    }

    @Test
    void aSweptBarIsDrawnWithEveryHoleNumberedAndItsBushings() throws Exception {
        // hillclimb-special-swept-bar.json, front bar: holeSetbacksMm [0, 20, 40], selectedArm 1, two bushings
        SetupSheet.Layout layout = SetupSheet.layout(usual("hillclimb-special-swept-bar.json", UnitSystem.SI));
        assertThat(layout.frontBar().holeNumbers()).containsExactly(1, 2, 3);
        assertThat(layout.frontBar().holeInUse()).isEqualTo(2);
        assertThat(layout.frontBar().bushings()).isEqualTo(2 * 2);
        // its centreline is flat (every z is 0): nothing drops in the view from behind
        assertThat(layout.frontBar().dropDrawn()).isZero();
        // the rear is a plain U-bar, armLengthsMm [150, 170], selectedArm 0
        assertThat(layout.rearBar().holeNumbers()).containsExactly(1, 2);
        assertThat(layout.rearBar().holeInUse()).isEqualTo(1);
    }

    @Test
    void aDroppedBarShowsItsDropToScale() throws Exception {
        // estate-dropped-rear-bar.json, rear bar: centreline y from 560 to -560 mm, z from 0 down to -80 mm,
        // holeSetbacksMm [0, 25], two bushings
        SetupSheet.Layout layout = SetupSheet.layout(usual("estate-dropped-rear-bar.json", UnitSystem.SI));
        BarDrawing.Drawn rear = layout.rearBar();
        assertThat(rear.holeNumbers()).containsExactly(1, 2);
        assertThat(rear.bushings()).isEqualTo(2 * 2);
        // drawn at one scale across and up: the drop keeps its proportion to the bar's width (80 / 1120), and
        // is tall enough to see on paper (8 pt is about 3 mm)
        assertThat(rear.dropDrawn() / rear.widthDrawn()).isCloseTo(80f / 1120f, within(1e-4f));
        assertThat(rear.dropDrawn()).isGreaterThan(8f);
    }
}
