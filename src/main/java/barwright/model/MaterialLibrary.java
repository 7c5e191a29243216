package barwright.model;

import java.util.List;
import java.util.Locale;
import java.util.Optional;

/**
 * Built-in bar materials. Typical handbook values; a maker's certificate for the actual bar always wins.
 * Each value's source is named beside it. "From memory" marks a value recalled, not read in print here.
 */
public final class MaterialLibrary {
    private static final double GPA = 1e9;
    private static final double MPA = 1e6;

    /**
     * Spring steel, quenched and tempered (SAE 5160 / 50CrV4 class). Yield 1005 MPa: a materials-data web page
     * on SAE/AISI 5160 (theworldmaterial.com, "SAE AISI 5160 Steel", table for a 25 mm (1 in.) bar) prints a
     * yield of at least 1005 MPa, tensile 1145 MPa, oil quenched from 830 C and tempered at 540 C; read there,
     * its primary source not named in what was read. Bars tempered lower are stronger; enter a maker's
     * certified yield as a custom material. E = 207 GPa and G = 79.3 GPa: Shigley's Mechanical Engineering
     * Design, table of elastic constants for carbon steel (from memory); density 7850 kg/m^3 (from memory;
     * the same 7.85 g/cm^3 is printed on the 4130 data sheet below). docs/validation.md, section "Materials".
     */
    public static final Material SPRING_STEEL = new Material("spring steel", 207 * GPA, 79.3 * GPA, 7850,
            1005 * MPA);

    /**
     * 4130-type chromoly, normalised. Yield 435 MPa, E = 205 GPa, G = 80 GPa, density 7.85 g/cm^3: the MatWeb
     * data sheet "AISI 4130 Steel, normalized at 870 C (1600 F)" (asm.matweb.com, read; it marks E and G
     * "typical for steel"). The annealed sheet of the same site prints 460 MPa, the figure used here before.
     * Heat-treated tube reaches far more; enter its certified yield as a custom material.
     * docs/validation.md, section "Materials".
     */
    public static final Material CHROMOLY_4130 = new Material("4130 chromoly", 205 * GPA, 80 * GPA, 7850,
            435 * MPA);

    /**
     * Titanium Ti-6Al-4V (grade 5), annealed. E = 113.8 GPa, G = 44 GPa, density 4430 kg/m^3, yield 880 MPa:
     * ASM Handbook vol. 2, Ti-6Al-4V data sheet (from memory).
     */
    public static final Material TITANIUM_6AL_4V = new Material("Ti-6Al-4V titanium", 113.8 * GPA, 44 * GPA, 4430,
            880 * MPA);

    /**
     * 7075-T6 aluminium. E = 71.7 GPa, G = 26.9 GPa, density 2810 kg/m^3, yield 503 MPa: ASM Handbook vol. 2,
     * 7075-T6 data sheet (from memory).
     */
    public static final Material ALUMINIUM_7075_T6 = new Material("7075-T6 aluminium", 71.7 * GPA, 26.9 * GPA, 2810,
            503 * MPA);

    private static final List<Material> ALL = List.of(SPRING_STEEL, CHROMOLY_4130, TITANIUM_6AL_4V,
            ALUMINIUM_7075_T6);

    private MaterialLibrary() {
    }

    /** @return every built-in material */
    public static List<Material> all() {
        return ALL;
    }

    /** @return the built-in material of that name (case does not matter) */
    public static Optional<Material> byName(String name) {
        String wanted = name.trim().toLowerCase(Locale.ROOT);
        return ALL.stream().filter(m -> m.name().toLowerCase(Locale.ROOT).equals(wanted)).findFirst();
    }

    /** @return the names of the built-in materials, for messages */
    public static List<String> names() {
        return ALL.stream().map(Material::name).toList();
    }
}
