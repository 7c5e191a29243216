package barwright.model;

import org.junit.jupiter.api.Test;

import static org.assertj.core.api.Assertions.assertThat;

/** The built-in materials against the handbook figures their comments name. */
class MaterialLibraryTest {
    @Test
    void springSteelHasShigleysElasticConstants() {
        // Shigley's Mechanical Engineering Design, table of elastic constants: carbon steel E = 207 GPa,
        // G = 79.3 GPa (from memory: docs/validation.md, section "Materials"; exact as typed)
        assertThat(MaterialLibrary.SPRING_STEEL.youngsModulus()).isEqualTo(207e9);
        assertThat(MaterialLibrary.SPRING_STEEL.shearModulus()).isEqualTo(79.3e9);
    }

    @Test
    void yieldStrengthsAreThePublishedFiguresRead() {
        // docs/validation.md, section "Materials": the MatWeb sheet "AISI 4130 Steel, normalized at 870 C" prints
        // a yield of 435 MPa (its annealed sheet 460 MPa); a materials-data page on SAE/AISI 5160 prints at least
        // 1005 MPa for a 25 mm bar oil quenched and tempered at 540 C. Whole megapascals as printed.
        assertThat(MaterialLibrary.CHROMOLY_4130.yieldStrength()).isEqualTo(435e6);
        assertThat(MaterialLibrary.CHROMOLY_4130.youngsModulus()).isEqualTo(205e9);
        assertThat(MaterialLibrary.CHROMOLY_4130.shearModulus()).isEqualTo(80e9);
        assertThat(MaterialLibrary.SPRING_STEEL.yieldStrength()).isEqualTo(1005e6);
    }

    @Test
    void everyMaterialHasAPlausiblePoissonRatio() {
        // For an isotropic metal G = E / (2 (1 + nu)) with nu about 0.25-0.35 (any strength-of-materials text;
        // common practice for steels, titanium and aluminium): catches a modulus typed in the wrong unit.
        for (Material material : MaterialLibrary.all()) {
            double poisson = material.youngsModulus() / (2 * material.shearModulus()) - 1;
            assertThat(poisson).as(material.name()).isBetween(0.25, 0.35);
        }
    }

    @Test
    void namesAreFoundWhateverTheirCase() {
        assertThat(MaterialLibrary.byName("  SPRING Steel ")).contains(MaterialLibrary.SPRING_STEEL);
        assertThat(MaterialLibrary.byName("unobtainium")).isEmpty();
        assertThat(MaterialLibrary.names()).hasSize(MaterialLibrary.all().size());
    }
}
