package barwright.io;

import java.util.List;

/**
 * The vehicle file's key names for a bar (docs/file-format.md), defined here once: the readers, the tree
 * edits, the window's fields and the outputs that write a bar all use these.
 */
public final class VehicleKeys {
    public static final String BAR = "bar";
    public static final String MATERIAL = "material";
    public static final String SECTION = "section";
    public static final String SELECTED_ARM = "selectedArm";

    public static final String NAME = "name";
    public static final String YOUNGS_MODULUS_GPA = "youngsModulusGPa";
    public static final String SHEAR_MODULUS_GPA = "shearModulusGPa";
    public static final String DENSITY_KG_PER_M3 = "densityKgPerM3";
    public static final String YIELD_STRENGTH_MPA = "yieldStrengthMPa";
    /** The four properties a material given in full has (one given without a built-in name). */
    public static final List<String> MATERIAL_PROPERTIES = List.of(YOUNGS_MODULUS_GPA, SHEAR_MODULUS_GPA,
            DENSITY_KG_PER_M3, YIELD_STRENGTH_MPA);

    public static final String SHAPE = "shape";
    public static final String SOLID = "solid";
    public static final String TUBE = "tube";
    public static final String OUTER_DIAMETER_MM = "outerDiameterMm";
    public static final String WALL_MM = "wallMm";

    private VehicleKeys() {
    }
}
