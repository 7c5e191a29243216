package barwright.report;

/** The safety cautions and the model's limits, worded once for the command line, the window and the PDF. */
public final class Cautions {
    /** One paragraph for wherever results are first seen. */
    public static final String SHORT = "Caution: these figures come from a steady-state model with stated limits "
            + "(see Help, or the model notes). A bar, a link or a car's balance that fails at speed can hurt "
            + "people. Have a qualified mechanic check every change, follow the car maker's data and the rules "
            + "of your event or local authority, and test with care.";

    /** What the model leaves out (model.md 10). */
    public static final String NOT_MODELLED = "Not modelled: transient behaviour and damping; camber's effect on "
            + "grip; roll-centre migration in the limits and handling curve (it is reported at the limit where an axle "
            + "has a linkage); compliance steer; aerodynamic loads; combined slip; stress "
            + "concentrations at bends and ends of the bar; fatigue (the safety factor is static, against yield: a "
            + "bar cycled for a season needs a fatigue margin on top). Roll-centre heights are inputs where an axle "
            + "has no linkage.";

    private Cautions() {
    }
}
