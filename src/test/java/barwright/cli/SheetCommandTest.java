package barwright.cli;

import org.apache.pdfbox.Loader;
import org.apache.pdfbox.pdmodel.PDDocument;
import org.apache.pdfbox.text.PDFTextStripper;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.file.Files;
import java.nio.file.Path;

import static barwright.cli.SizeCommandTest.HATCHBACK;
import static barwright.cli.SizeCommandTest.run;
import static org.assertj.core.api.Assertions.assertThat;

/** {@code sheet}: the PDF is parsed back with PDFBox and holds the expected text; the map CSV is written. */
class SheetCommandTest {
    @Test
    void theSheetOpensAndHoldsTheCarTheDateAndTheCautions(@TempDir Path folder) throws Exception {
        Path pdf = folder.resolve("sheet.pdf");
        Path csv = folder.resolve("map.csv");
        run(0, "sheet", HATCHBACK, "--output", pdf.toString(), "--date", "2025-06-01", "--map-csv", csv.toString(),
                "--units", "us");
        try (PDDocument document = Loader.loadPDF(pdf.toFile())) {
            String text = new PDFTextStripper().getText(document);
            assertThat(text).contains("Club hatchback", "2025-06-01", "Adjustment map", "Front bar", "Rear bar",
                    "Caution", "Not modelled", "ride height", "lbf", "Handling curve");
        }
        assertThat(Files.readAllLines(csv)).hasSize(1 + 12);
    }

    @Test
    void anOutputIsRequired() {
        assertThat(run(2, "sheet", HATCHBACK)[1]).contains("--output");
    }
}
