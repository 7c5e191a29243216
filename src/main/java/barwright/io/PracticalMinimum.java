package barwright.io;

/**
 * The smallest value of a "more than 0" key that still describes a real part. A number just above zero
 * (1e-300 mm of tube wall, a bushing span of a micrometre) passes "more than 0" but is no bar: it gives
 * stresses of NaN and bushing loads of Infinity. Each bound is one a practitioner would accept without a
 * second look, with its reason in the message (file-format.md, "Smallest values").
 *
 * @param key     the key in its object, e.g. {@code wallMm}
 * @param minimum the smallest value allowed, in the key's unit
 * @param unit    the unit printed after numbers
 * @param reason  why less is refused, in a practitioner's words
 * @param zero    whether exactly 0 is allowed as well (an idealised sharp corner, a hole at the arm's end)
 */
record PracticalMinimum(String key, double minimum, String unit, String reason, boolean zero) {
    /** A tube wall thinner than half a millimetre is foil (common practice for drawn steel tube). */
    static final PracticalMinimum WALL = new PracticalMinimum(VehicleKeys.WALL_MM, 0.5, "mm",
            "a tube wall under 0.5 mm is foil, not a bar", false);
    /** Two bushings closer than about their own width are one bushing (common practice). */
    static final PracticalMinimum BUSHING_SPAN = new PracticalMinimum("bushingSpanMm", 20, "mm",
            "bushings closer than 20 mm would overlap: a bar needs two bushings apart to turn in", false);
    /** A stress check over less than a millimetre of wheel travel checks nothing (common practice). */
    static final PracticalMinimum CHECK_TRAVEL = new PracticalMinimum("differentialWheelTravelMm", 1, "mm",
            "a stress check over less than 1 mm of wheel travel checks nothing", false);
    /** No bar is bent tighter than a millimetre; 0 stands for the idealised sharp corner (common practice). */
    static final PracticalMinimum BEND_RADIUS = new PracticalMinimum("bendRadiusMm", 1, "mm",
            "no bar is bent tighter than 1 mm (give 0 for an idealised sharp corner)", true);

    /**
     * Records a problem where a value that was read without a problem lies below the minimum.
     *
     * @param parentPath       the key path of the object holding the key
     * @param value            the value as read, in the key's unit
     * @param problemsBefore   the reader's problem count before the value was read
     */
    void check(NodeReader reader, String parentPath, double value, int problemsBefore) {
        if (reader.problems().size() == problemsBefore && value < minimum && !(zero && value == 0)) {
            reader.problem(NodeReader.child(parentPath, key), "= " + Range.format(value) + " " + unit + ": "
                    + reason + "; must be at least " + Range.format(minimum) + " " + unit + (zero ? " or 0" : ""));
        }
    }
}
