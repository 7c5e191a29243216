package barwright.units;

import static barwright.units.Constants.KILOGRAMS_PER_POUND;
import static barwright.units.Constants.METRES_PER_FOOT;
import static barwright.units.Constants.METRES_PER_INCH;
import static barwright.units.Constants.NEWTONS_PER_POUND_FORCE;
import static barwright.units.Constants.PASCALS_PER_PSI;
import static barwright.units.Constants.RADIANS_PER_DEGREE;
import static barwright.units.Constants.STANDARD_GRAVITY;

/**
 * The kinds of figure Barwright shows, each with its display unit in SI (metric, as in the files) and in US
 * customary units. The core holds every value in SI base units (m, kg, N, Pa, rad, m/s^2); these units are
 * for the edges only. Factors follow NIST SP 811, appendix B.
 */
public enum Quantity {
    LENGTH(new DisplayUnit("mm", 1e-3), new DisplayUnit("in", METRES_PER_INCH)),
    MASS(new DisplayUnit("kg", 1), new DisplayUnit("lb", KILOGRAMS_PER_POUND)),
    FORCE(new DisplayUnit("N", 1), new DisplayUnit("lbf", NEWTONS_PER_POUND_FORCE)),
    /** Linear rate of a spring, tyre, wheel or bar link (SI base: N/m). */
    LINEAR_RATE(new DisplayUnit("N/mm", 1e3), new DisplayUnit("lbf/in", NEWTONS_PER_POUND_FORCE / METRES_PER_INCH)),
    /** Roll or torsional stiffness (SI base: N m/rad). */
    ROLL_STIFFNESS(new DisplayUnit("N·m/deg", 1 / RADIANS_PER_DEGREE),
            new DisplayUnit("lbf·ft/deg", NEWTONS_PER_POUND_FORCE * METRES_PER_FOOT / RADIANS_PER_DEGREE)),
    STRESS(new DisplayUnit("MPa", 1e6), new DisplayUnit("ksi", 1e3 * PASCALS_PER_PSI)),
    MODULUS(new DisplayUnit("GPa", 1e9), new DisplayUnit("Msi", 1e6 * PASCALS_PER_PSI)),
    DENSITY(new DisplayUnit("kg/m³", 1),
            new DisplayUnit("lb/in³", KILOGRAMS_PER_POUND / (METRES_PER_INCH * METRES_PER_INCH * METRES_PER_INCH))),
    ANGLE(new DisplayUnit("deg", RADIANS_PER_DEGREE), new DisplayUnit("deg", RADIANS_PER_DEGREE)),
    /** Body roll per unit of lateral acceleration (SI base: rad per m/s^2). */
    ROLL_GRADIENT(new DisplayUnit("deg/g", RADIANS_PER_DEGREE / STANDARD_GRAVITY),
            new DisplayUnit("deg/g", RADIANS_PER_DEGREE / STANDARD_GRAVITY)),
    /** Acceleration, shown in multiples of standard gravity in both systems (SI base: m/s^2). */
    ACCELERATION(new DisplayUnit("g", STANDARD_GRAVITY), new DisplayUnit("g", STANDARD_GRAVITY)),
    /** Load transferred per unit of lateral acceleration (SI base: N per m/s^2). */
    FORCE_PER_G(new DisplayUnit("N/g", 1 / STANDARD_GRAVITY), new DisplayUnit("lbf/g", NEWTONS_PER_POUND_FORCE / STANDARD_GRAVITY)),
    /** Cornering stiffness of a tyre or axle (SI base: N/rad). */
    CORNERING_STIFFNESS(new DisplayUnit("N/deg", 1 / RADIANS_PER_DEGREE),
            new DisplayUnit("lbf/deg", NEWTONS_PER_POUND_FORCE / RADIANS_PER_DEGREE)),
    FREQUENCY(new DisplayUnit("Hz", 1), new DisplayUnit("Hz", 1)),
    /** Cross-section area (SI base: m^2). */
    AREA(new DisplayUnit("mm²", 1e-6), new DisplayUnit("in²", METRES_PER_INCH * METRES_PER_INCH)),
    /** Second moment of area of a section, polar or about a diameter (SI base: m^4). */
    SECOND_MOMENT_OF_AREA(new DisplayUnit("mm⁴", 1e-12),
            new DisplayUnit("in⁴", METRES_PER_INCH * METRES_PER_INCH * METRES_PER_INCH * METRES_PER_INCH)),
    /** A share of a whole, shown in percent in both systems (SI base: a fraction, 1 = 100 %). */
    SHARE(new DisplayUnit("%", 0.01), new DisplayUnit("%", 0.01)),
    /** A plain number: fractions, ratios, friction, factors. */
    RATIO(new DisplayUnit("", 1), new DisplayUnit("", 1));

    private final DisplayUnit si;
    private final DisplayUnit us;

    Quantity(DisplayUnit si, DisplayUnit us) {
        this.si = si;
        this.us = us;
    }

    /** @return the display unit of this quantity in the given system */
    public DisplayUnit unit(UnitSystem system) {
        return system == UnitSystem.US ? us : si;
    }
}
