package barwright.model;

import org.junit.jupiter.api.Test;

import static org.assertj.core.api.Assertions.assertThat;

/** The built-in materials against the handbook figures their comments name. */
class MaterialLibraryTest {
    @Test
    void springSteelHasShigleysElasticConstants() {
        // Shigley's Mechanical Engineering Design, table of elastic constants: carbon steel E = 207 GPa,
        // G = 79.3 GPa (the library's named source; exact as typed)
        assertThat(MaterialLibrary.SPRING_STEEL.youngsModulus()).isEqualTo(207e9);
        assertThat(MaterialLibrary.SPRING_STEEL.shearModulus()).isEqualTo(79.3e9);
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
