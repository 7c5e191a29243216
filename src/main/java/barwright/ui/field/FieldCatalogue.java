package barwright.ui.field;

import barwright.units.Quantity;

import java.util.List;

import static barwright.units.Constants.RADIANS_PER_DEGREE;

import static barwright.io.VehicleKeys.ARM_LENGTHS_MM;
import static barwright.io.VehicleKeys.DENSITY_KG_PER_M3;
import static barwright.io.VehicleKeys.OUTER_DIAMETER_MM;
import static barwright.io.VehicleKeys.ROLL_CENTRE_HEIGHT_MM;
import static barwright.io.VehicleKeys.SHEAR_MODULUS_GPA;
import static barwright.io.VehicleKeys.TORSION_LENGTH_MM;
import static barwright.io.VehicleKeys.WALL_MM;
import static barwright.io.VehicleKeys.YIELD_STRENGTH_MPA;
import static barwright.io.VehicleKeys.YOUNGS_MODULUS_GPA;

/**
 * Every number of the vehicle file (files.md) with its label and help, grouped the way a person measures a
 * car: on the scales, on the car, per axle, from the tyre's data, on the bar.
 */
public final class FieldCatalogue {
    private static final double MM = 1e-3;
    private static final double N_PER_MM = 1e3;
    private static final double NONE = 1;

    private FieldCatalogue() {
    }

    private static FieldSpec field(String key, String label, Quantity quantity, double siPerFileUnit, String help) {
        return new FieldSpec(key, label, quantity, siPerFileUnit, false, help);
    }

    private static FieldSpec optional(String key, String label, Quantity quantity, double siPerFileUnit,
                                      String help) {
        return new FieldSpec(key, label, quantity, siPerFileUnit, true, help);
    }

    /** Under {@code vehicle}: the weight as a total and a front share (used when no corner masses are given). */
    public static final List<FieldSpec> WEIGHT = List.of(
            field("massKg", "Car mass", Quantity.MASS, NONE,
                    "Mass of the car as it runs: driver aboard, usual fuel and ballast. Weigh it on four wheel "
                            + "scales or a weighbridge."),
            field("frontMassFraction", "Front weight share", Quantity.SHARE, NONE,
                    "Share of the weight on the front wheels: the two front scale readings over the total, car "
                            + "level at ride height, driver aboard."));

    /** Under {@code vehicle.cornerMassesKg}: the four scale readings. */
    public static final List<FieldSpec> CORNERS = List.of(
            field("leftFront", "Left front", Quantity.MASS, NONE, cornerHelp("left front")),
            field("rightFront", "Right front", Quantity.MASS, NONE, cornerHelp("right front")),
            field("leftRear", "Left rear", Quantity.MASS, NONE, cornerHelp("left rear")),
            field("rightRear", "Right rear", Quantity.MASS, NONE, cornerHelp("right rear")));

    private static String cornerHelp(String wheel) {
        return "Reading of the scale under the " + wheel + " wheel, car level at ride height, driver aboard. "
                + "Left and right as seen from the driver's seat.";
    }

    /** Under {@code vehicle}: measured on the car. */
    public static final List<FieldSpec> BODY = List.of(
            field("wheelbaseMm", "Wheelbase", Quantity.LENGTH, MM,
                    "Distance from the front to the rear wheel centres, measured on both sides and averaged."),
            field("cgHeightMm", "Centre of mass height", Quantity.LENGTH, MM,
                    "Height of the whole car's centre of mass above the ground. Found by weighing the car level "
                            + "and again with one axle raised (the height follows from the change of axle load); "
                            + "many saloons sit near 500 mm, low sports cars near 400 mm."),
            optional("chassisTorsionalStiffnessNmPerDeg", "Body twist stiffness", Quantity.ROLL_STIFFNESS,
                    1 / RADIANS_PER_DEGREE,
                    "Moment that twists the body one degree between the axles. Measured on a jig with one "
                            + "axle held and a moment applied at the other, or from the maker. Leave empty to "
                            + "treat the body as rigid."));

    /** Under {@code analysis}. */
    public static final List<FieldSpec> CHECK = List.of(
            optional("differentialWheelTravelMm", "Bar check travel", Quantity.LENGTH, MM,
                    "Left wheel travel minus right wheel travel at which the bars' stresses and safety factors "
                            + "are checked. Use the largest difference the car meets, for example one wheel on a "
                            + "kerb at full bump and the other at droop. Empty means 60 mm."));

    /** Under {@code front} or {@code rear}: geometry of the axle. */
    public static final List<FieldSpec> AXLE_GEOMETRY = List.of(
            field("trackMm", "Track", Quantity.LENGTH, MM,
                    "Distance between the centres of this axle's two tyre contact patches at ride height: "
                            + "measure between the tyre centrelines on the ground."),
            field(ROLL_CENTRE_HEIGHT_MM, "Roll centre height", Quantity.LENGTH, MM,
                    "Height above the ground of the point the body rolls about at this axle, at ride height. "
                            + "Found by drawing the suspension links to scale from the front (their instant "
                            + "centres); a roll centre below the ground is negative."));

    /** Under {@code front} or {@code rear}: the unsprung parts. */
    public static final List<FieldSpec> AXLE_UNSPRUNG = List.of(
            field("unsprungMassKg", "Unsprung mass, both sides", Quantity.MASS, NONE,
                    "Mass that moves with the wheels on this axle, both sides together: wheels, tyres, hubs, "
                            + "brakes, uprights and about half of each link, spring and damper."),
            field("unsprungCgHeightMm", "Unsprung centre height", Quantity.LENGTH, MM,
                    "Height of the unsprung parts' centre of mass: close to the wheel centre, the tyre's loaded "
                            + "radius."));

    /** Under {@code front} or {@code rear}: springs and tyre rate. */
    public static final List<FieldSpec> AXLE_SPRINGS = List.of(
            field("springRateNPerMm", "Spring rate", Quantity.LINEAR_RATE, N_PER_MM,
                    "Rate of one road spring at the spring: force per unit of its compression, as stamped on it "
                            + "or measured on a spring tester."),
            field("springMotionRatio", "Spring motion ratio", Quantity.RATIO, NONE,
                    "Spring travel over wheel travel (1 when the spring sits on the wheel centre). With the "
                            + "spring out, raise the wheel a known amount and measure how far the spring seats "
                            + "close up."),
            field("tyreVerticalRateNPerMm", "Tyre vertical rate", Quantity.LINEAR_RATE, N_PER_MM,
                    "Vertical rate of one tyre at running pressure: load added per unit the tyre squashes. From "
                            + "the tyre maker, or load the wheel on a scale and measure the drop of the hub."));

    /** Under {@code front.tyre} or {@code rear.tyre}: grip data, from a tyre test or the maker. */
    public static final List<FieldSpec> TYRE = List.of(
            field("nominalLoadN", "Reference load", Quantity.FORCE, NONE,
                    "The load on one tyre at which the grip figures below are given; often near the static "
                            + "wheel load."),
            field("frictionAtNominalLoad", "Peak grip at reference", Quantity.RATIO, NONE,
                    "Peak sideways force over vertical load at the reference load (the friction coefficient). "
                            + "From tyre test data: road tyres near 0.9-1.1, track tyres 1.2-1.5."),
            field("frictionLoadSensitivity", "Grip change with load", Quantity.RATIO, NONE,
                    "s in mu = mu0 (1 + s (Fz/Fz0 - 1)). Negative for real tyres, typically -0.1 to -0.2: a "
                            + "more heavily loaded tyre grips less per unit of load. This is what turns load "
                            + "transfer into understeer or oversteer."),
            field("corneringStiffnessPerLoad", "Cornering stiffness / load (1/rad)", Quantity.RATIO, NONE,
                    "Slope of sideways force against slip angle near zero slip, at the reference load, over that "
                            + "load: per radian of slip. Tyre data usually give 12-20."),
            field("corneringStiffnessPeakLoadRatio", "Stiffest at (× reference load)", Quantity.RATIO,
                    NONE, "The load, as a multiple of the reference load, at which the tyre's cornering stiffness "
                            + "is highest; typically 1.5 to 3."),
            field("shapeFactor", "Force curve shape (C)", Quantity.RATIO, NONE,
                    "Magic Formula shape factor: how the force curve falls past its peak. Between 1 and 2; "
                            + "about 1.3 for car tyres."),
            field("curvatureFactor", "Force curve curvature (E)", Quantity.RATIO, NONE,
                    "Magic Formula curvature factor: how sharp the peak is. At most 1; tyre fits often give "
                            + "between -1 and 0.5."));

    /** Under {@code front.bar.material}: a custom material's values. */
    public static final List<FieldSpec> MATERIAL = List.of(
            field(YOUNGS_MODULUS_GPA, "Young's modulus E", Quantity.MODULUS, 1e9,
                    "Stiffness in bending: about 205-207 GPa for steels, 114 GPa for Ti-6Al-4V, 72 GPa for "
                            + "7075 aluminium. From the material's data sheet."),
            field(SHEAR_MODULUS_GPA, "Shear modulus G", Quantity.MODULUS, 1e9,
                    "Stiffness in twisting, which sets most of a bar's rate: about 79-80 GPa for steels. From the "
                            + "data sheet."),
            field(DENSITY_KG_PER_M3, "Density", Quantity.DENSITY, NONE,
                    "Mass per volume, for the bar's mass: about 7850 kg/m³ for steels."),
            field(YIELD_STRENGTH_MPA, "Yield strength", Quantity.STRESS, 1e6,
                    "Stress at which the material takes a permanent set; the bar's safety factor is measured "
                            + "against it. Use the certified value for the bar as heat-treated."));

    /** Under {@code front.bar.section}. */
    public static final FieldSpec DIAMETER = field(OUTER_DIAMETER_MM, "Outside diameter", Quantity.LENGTH, MM,
            "Outside diameter of the bar, measured with callipers on the straight middle section, away from "
                    + "bends and splines.");
    public static final FieldSpec WALL = field(WALL_MM, "Tube wall", Quantity.LENGTH, MM,
            "Wall thickness of a tubular bar, measured at a cut end or taken from the maker. It must be less "
                    + "than half the outside diameter.");

    /** Under {@code front.bar}: the plain U-bar's lengths. */
    public static final List<FieldSpec> BAR_LENGTHS = List.of(
            field(TORSION_LENGTH_MM, "Torsion length", Quantity.LENGTH, MM,
                    "Length of the straight middle section that twists, from the centre of one bend to the "
                            + "centre of the other, along the bar's axis."),
            optional("bushingSpanMm", "Bushing span", Quantity.LENGTH, MM,
                    "Distance between the centres of the two mounting bushings. Leave empty when the bushings "
                            + "sit at the bends (the span then equals the torsion length)."));

    /** One entry of {@code front.bar.armLengthsMm}; the key gets its index. */
    public static final FieldSpec ARM = field(ARM_LENGTHS_MM, "Arm length", Quantity.LENGTH, MM,
            "Effective arm length of this link hole: the distance from the bar's twisting axis to the centre "
                    + "of the hole, measured square to the axis (not along a bent arm).");

    /** Under {@code front.bar}. */
    public static final FieldSpec LINK_RATIO = field("linkMotionRatio", "Link motion ratio", Quantity.RATIO, NONE,
            "Drop-link travel over wheel travel. With the springs out, raise the wheel a known amount and "
                    + "measure how far the link's lower end moves along the link.");
}
