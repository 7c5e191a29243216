package barwright.io;

import java.util.List;

/**
 * The vehicle file's key names for a bar, its rate calibration, a tyre and a linkage (docs/file-format.md),
 * defined here once: the readers, the tree edits, the loader's messages, the window's fields and the outputs that
 * write a bar all use these.
 */
public final class VehicleKeys {
    // the body (file-format.md, "The vehicle")
    public static final String VEHICLE = "vehicle";
    public static final String MASS_KG = "massKg";
    public static final String FRONT_MASS_FRACTION = "frontMassFraction";
    public static final String CG_HEIGHT_MM = "cgHeightMm";
    public static final String CORNER_MASSES_KG = "cornerMassesKg";
    public static final String LEFT_FRONT = "leftFront";
    public static final String RIGHT_FRONT = "rightFront";
    public static final String LEFT_REAR = "leftRear";
    public static final String RIGHT_REAR = "rightRear";
    /** The analysis settings object (its bar check travel). */
    public static final String ANALYSIS = "analysis";

    // an axle (file-format.md, "An axle")
    public static final String ROLL_CENTRE_HEIGHT_MM = "rollCentreHeightMm";
    public static final String TYRE = "tyre";

    public static final String BAR = "bar";
    public static final String MATERIAL = "material";
    public static final String SECTION = "section";
    public static final String SELECTED_ARM = "selectedArm";
    /** A plain U-bar's lengths: its torsion length, and one arm length per hole. */
    public static final String TORSION_LENGTH_MM = "torsionLengthMm";
    public static final String ARM_LENGTHS_MM = "armLengthsMm";
    /** A shaped bar's object, and its arm holes' set-backs inside it. */
    public static final String GEOMETRY = "geometry";
    public static final String HOLE_SETBACKS_MM = "holeSetbacksMm";

    // a bar's measured rate calibration (file-format.md, "Rate calibration")
    public static final String RATE_CALIBRATION = "rateCalibration";
    public static final String EFFECTIVE_RATE_FACTOR = "effectiveRateFactor";
    public static final String MEASURED_ON = "measuredOn";
    public static final String NOTE = "note";

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

    // the tyre (file-format.md, "The tyre")
    public static final String NOMINAL_LOAD_N = "nominalLoadN";
    public static final String FRICTION_AT_NOMINAL_LOAD = "frictionAtNominalLoad";
    public static final String FRICTION_LOAD_SENSITIVITY = "frictionLoadSensitivity";
    public static final String CORNERING_STIFFNESS_PER_LOAD = "corneringStiffnessPerLoad";
    public static final String CORNERING_STIFFNESS_PEAK_LOAD_RATIO = "corneringStiffnessPeakLoadRatio";
    public static final String SHAPE_FACTOR = "shapeFactor";
    public static final String CURVATURE_FACTOR = "curvatureFactor";
    public static final String PEAK_FRICTION_BY_LOAD = "peakFrictionByLoad";
    public static final String CORNERING_STIFFNESS_BY_LOAD = "corneringStiffnessByLoad";
    public static final String LOAD_N = "loadN";
    public static final String PEAK_FRICTION = "peakFriction";
    public static final String CORNERING_STIFFNESS_N_PER_DEG = "corneringStiffnessNPerDeg";
    public static final String CAMBER_FOR_PEAK_GRIP_DEG = "camberForPeakGripDeg";
    public static final String PEAK_FRICTION_LOSS_PER_DEG_SQUARED = "peakFrictionLossPerDegSquared";
    public static final String CAMBER_STIFFNESS_PER_LOAD = "camberStiffnessPerLoad";
    /** Optional fatigue keys (docs/file-format.md, fatigue): inside {@code material}, and a bar's own. */
    public static final String ULTIMATE_STRENGTH_MPA = "ultimateStrengthMPa";
    public static final String ENDURANCE_LIMIT_MPA = "enduranceLimitMPa";
    public static final String FATIGUE = "fatigue";
    public static final String SURFACE = "surface";
    public static final String STRESS_CONCENTRATION = "stressConcentration";

    // an axle's suspension linkage (file-format.md, "Suspension linkages")
    public static final String LINKAGE = "linkage";
    public static final String RIDE_HEIGHT_CHANGE_MM = "rideHeightChangeMm";
    public static final String STATIC_CAMBER_DEG = "staticCamberDeg";
    public static final String TYPE = "type";
    public static final String DOUBLE_WISHBONE = "double-wishbone";
    public static final String STRUT = "strut";
    public static final String LIVE_AXLE_PANHARD = "live-axle-panhard";
    public static final String LIVE_AXLE_WATTS = "live-axle-watts";
    public static final String TRAILING_ARM = "trailing-arm";
    public static final String SEMI_TRAILING_ARM = "semi-trailing-arm";
    /** Every linkage type, in the order messages list them. */
    public static final List<String> LINKAGE_TYPES = List.of(DOUBLE_WISHBONE, STRUT, LIVE_AXLE_PANHARD,
            LIVE_AXLE_WATTS, TRAILING_ARM, SEMI_TRAILING_ARM);
    public static final String UPPER_INNER_MM = "upperInnerMm";
    public static final String UPPER_OUTER_MM = "upperOuterMm";
    public static final String LOWER_INNER_MM = "lowerInnerMm";
    public static final String LOWER_OUTER_MM = "lowerOuterMm";
    public static final String STRUT_TOP_MM = "strutTopMm";
    public static final String STRUT_LOWER_MM = "strutLowerMm";
    public static final String PANHARD_BODY_MM = "panhardBodyMm";
    public static final String PANHARD_AXLE_MM = "panhardAxleMm";
    public static final String CENTRE_PIVOT_HEIGHT_MM = "centrePivotHeightMm";
    public static final String CENTRE_PIVOT_ON = "centrePivotOn";
    public static final String ON_AXLE = "axle";
    public static final String ON_BODY = "body";
    public static final String PIVOT_INNER_MM = "pivotInnerMm";
    public static final String PIVOT_OUTER_MM = "pivotOuterMm";

    private VehicleKeys() {
    }
}
