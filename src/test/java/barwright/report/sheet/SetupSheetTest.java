package barwright.report.sheet;

import barwright.loading.VehicleLoader;
import barwright.physics.VehicleAnalysis;
import barwright.units.UnitSystem;
import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.Test;

import java.nio.file.Path;
import java.time.LocalDate;

import static org.assertj.core.api.Assertions.assertThat;

/** The setup sheet, parsed back with PDFBox's own text extraction. */
class SetupSheetTest {
    @Test
    void theSheetHoldsTheFiguresTheMapAndTheCautions() throws Exception {
        var document = barwright.loading.VehicleLoader.read(Path.of("sample-vehicles/club-hatchback.json"));
        var result = VehicleAnalysis.analyse(document.vehicle());
        byte[] pdf = SetupSheet.toPdf(SetupSheet.contentFor(result, LocalDate.of(2025, 6, 1), UnitSystem.SI));
        try (PDDocument parsed = Loader.loadPDF(pdf)) {
            assertThat(parsed.getNumberOfPages()).isBetween(2, 3);
            String text = new PDFTextStripper().getText(parsed);
            assertThat(text).contains("Barwright setup sheet", "Club hatchback", "2025-06-01", "Key figures",
                    "front share of load transfer", String.format(java.util.Locale.ROOT, "%.1f %%",
                            result.frontLoadTransferShare() * 100), "current", "Body roll", "Inside wheel loads",
                    "Not modelled", "solid 22.0 mm, spring steel");
            // the unit N·m/deg is written with the centred dot transliterated for the standard fonts
            assertThat(text).contains("N m/deg");
        }
    }

    @Test
    void charactersOutsideTheStandardFontsAreTransliterated() {
        assertThat(PdfCanvas.printable("kg/m³ N·m φ ≤ 3", PdfCanvas.REGULAR)).isEqualTo("kg/m^3 N m phi <= 3");
        assertThat(PdfCanvas.printable("日", PdfCanvas.REGULAR)).isEqualTo("?");
    }

    @Test
    void chartTicksAreRoundNumbers() {
        // 1, 2 or 5 times a power of ten giving about five intervals
        assertThat(ChartDrawing.niceStep(1.17)).isEqualTo(0.2);
        assertThat(ChartDrawing.niceStep(3150)).isEqualTo(500.0);
        assertThat(ChartDrawing.niceStep(9.0)).isEqualTo(2.0);
    }
}
