package barwright.sizing;

import barwright.io.Problem;
import barwright.model.SolidSection;
import barwright.model.TubeSection;
import barwright.sizing.catalogue.Catalogue;
import barwright.sizing.catalogue.CatalogueFileException;
import barwright.sizing.catalogue.CatalogueReader;
import barwright.sizing.catalogue.Catalogues;
import barwright.sizing.catalogue.StockSize;
import org.junit.jupiter.api.Test;
import org.junit.jupiter.api.io.TempDir;

import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

import static org.assertj.core.api.Assertions.assertThat;
import static org.assertj.core.api.Assertions.assertThatThrownBy;
import static org.assertj.core.api.Assertions.within;

/** The built-in catalogues and users' own files. */
class CatalogueTest {
    @Test
    void everyBuiltInCatalogueStatesItsBasisAndHoldsValidSizes() {
        for (Catalogue catalogue : Catalogues.builtIn()) {
            assertThat(catalogue.basis()).as(catalogue.id()).containsAnyOf("Common practice", "EN 10305");
            assertThat(catalogue.sizes()).as(catalogue.id()).isNotEmpty();
            for (StockSize size : catalogue.sizes()) {
                assertThat(size.label()).isNotBlank();
                if (size.section() instanceof TubeSection tube) {
                    assertThat(tube.wall()).isLessThan(tube.outerDiameter() / 2);
                }
            }
        }
    }

    @Test
    void inchSizesAreExactInMillimetres() {
        // 1 in = 25.4 mm exactly (NIST SP 811, appendix B): 7/8 in = 22.225 mm, 1 in x 0.083 in = 25.4 x 2.1082 mm
        Catalogue solids = Catalogues.builtIn("solid-inch").orElseThrow();
        StockSize sevenEighths = solids.sizes().stream().filter(s -> s.label().equals("7/8 in")).findFirst().orElseThrow();
        assertThat(sevenEighths.section().outerDiameter()).isCloseTo(22.225e-3, within(1e-12));
        Catalogue tubes = Catalogues.builtIn("tube-inch").orElseThrow();
        StockSize oneInch = tubes.sizes().stream().filter(s -> s.label().startsWith("1 in x 0.083")).findFirst()
                .orElseThrow();
        assertThat(((TubeSection) oneInch.section()).wall()).isCloseTo(2.1082e-3, within(1e-12));
    }

    @Test
    void aUsersOwnFileIsRead(@TempDir Path folder) throws Exception {
        Path file = folder.resolve("mine.json");
        Files.writeString(file, """
                {"format": "barwright.catalogue", "version": 1, "name": "my stockist", "basis": "their price list",
                 "sizes": [{"shape": "solid", "outerDiameterMm": 21.5},
                           {"shape": "tube", "outerDiameterMm": 27, "wallMm": 2.6, "label": "27 x 2.6 offcut"}]}
                """, StandardCharsets.UTF_8);
        Catalogue catalogue = Catalogues.find(file.toString());
        assertThat(catalogue.sizes()).extracting(StockSize::label).containsExactly("21.5 mm", "27 x 2.6 offcut");
        // millimetres to metres as the vehicle file converts them (value x 1e-3), so equal bit for bit
        assertThat(catalogue.sizes().get(0).section()).isEqualTo(new SolidSection(21.5 * 1e-3));
    }

    @Test
    void badSizesAreRefusedWithTheirKeyPaths() {
        byte[] bad = """
                {"format": "barwright.catalogue", "version": 1, "name": "x", "basis": "y",
                 "sizes": [{"shape": "tube", "outerDiameterMm": 25, "wallMm": 14},
                           {"shape": "hex", "outerDiameterMm": 25},
                           {"shape": "solid", "outerDiameterMm": 500}]}
                """.getBytes(StandardCharsets.UTF_8);
        assertThatThrownBy(() -> CatalogueReader.parse("bad", bad)).isInstanceOfSatisfying(CatalogueFileException.class,
                refused -> assertThat(refused.problems()).extracting(Problem::toString).containsExactly(
                        "sizes[0].wallMm = 14 mm: must be less than half of outerDiameterMm (12.5 mm)",
                        "sizes[1].shape = \"hex\": must be \"solid\" or \"tube\"",
                        "sizes[2].outerDiameterMm = 500 mm: must be between 3 and 200 mm"));
    }

    @Test
    void aMissingFileOrNameSaysWhatExists() {
        assertThatThrownBy(() -> Catalogues.find("no-such-catalogue"))
                .hasMessageContaining("solid-metric, solid-inch, tube-metric, tube-inch");
    }
}
