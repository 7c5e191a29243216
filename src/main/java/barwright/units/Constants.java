package barwright.units;

/** Physical constants and exact conversion factors, each with its source. */
public final class Constants {
    /** Standard acceleration of gravity (m/s^2): the CGPM value, exact (NIST SP 811, appendix B). */
    public static final double STANDARD_GRAVITY = 9.80665;
    /** One inch in metres, exact by definition (NIST SP 811, appendix B). */
    public static final double METRES_PER_INCH = 0.0254;
    /** One foot in metres, exact by definition (NIST SP 811, appendix B). */
    public static final double METRES_PER_FOOT = 12 * METRES_PER_INCH;
    /** One avoirdupois pound (mass) in kilograms, exact by definition (NIST SP 811, appendix B). */
    public static final double KILOGRAMS_PER_POUND = 0.45359237;
    /** One pound-force in newtons: the pound mass times standard gravity (NIST SP 811, appendix B). */
    public static final double NEWTONS_PER_POUND_FORCE = KILOGRAMS_PER_POUND * STANDARD_GRAVITY;
    /** One pound-force per square inch in pascals (NIST SP 811, appendix B, derived exactly). */
    public static final double PASCALS_PER_PSI = NEWTONS_PER_POUND_FORCE / (METRES_PER_INCH * METRES_PER_INCH);
    /** Radians per degree. */
    public static final double RADIANS_PER_DEGREE = Math.PI / 180.0;

    private Constants() {
    }
}
