package barwright.sizing.preload;

import barwright.model.AntiRollBar;
import barwright.model.AxlePosition;
import barwright.model.Vehicle;
import barwright.physics.AxleStiffness;
import barwright.physics.MassProperties;
import barwright.sizing.AxleState;
import barwright.sizing.SetupEvaluator;

/**
 * Link preload (model.md 9). A link of axle X made longer by delta turns the bar's neutral position by
 * phi_0 = delta / (r t_X); the roll moment locked between the axles is
 * <pre>M = K_X K_Y' / (K_X + K_Y') * (K_bar,X / K_susp,X) * phi_0</pre>
 * with K_X, K_Y the axle roll stiffnesses (suspension in series with tyres), K_Y' = K_Y in series with the
 * chassis where one is given. It puts +M/t_X and -M/t_X on X's wheels and +M/t_Y, -M/t_Y on Y's, loading one
 * diagonal and unloading the other.
 */
public final class LinkPreload {
    /** Common practice (no single source): how links are set so that the bar carries no preload. */
    public static final String ADVICE = "Set the bar links with the car at ride height on level ground, the driver "
            + "(or equal ballast) aboard and the other bar's links free, so that each link fits at its neutral "
            + "length and the bar carries no preload (common practice). Check the corner weights after any link "
            + "change.";

    private LinkPreload() {
    }

    /**
     * @param axle       the axle whose link changes; it must have a bar
     * @param diagonal   the diagonal that gains load when that link gets longer
     * @param linkChange how much longer the link is made (m; negative for shorter)
     */
    public static PreloadResult of(Vehicle vehicle, AxlePosition axle, GainingDiagonal diagonal, double linkChange) {
        AntiRollBar bar = vehicle.axle(axle).bar();
        if (bar == null) {
            throw new IllegalArgumentException("the " + axle.key() + " axle has no bar: its links cannot preload "
                    + "anything");
        }
        if (!Double.isFinite(linkChange)) {
            throw new IllegalArgumentException("the link change must be a finite length, was " + linkChange);
        }
        SetupEvaluator evaluator = new SetupEvaluator(vehicle);
        AxleStiffness x = evaluator.axle(axle).stiffness();
        AxleState other = evaluator.axle(axle.other());
        double otherStiffness = other.stiffness().rollStiffness();
        Double chassis = vehicle.chassisTorsionalStiffness();
        double otherEffective = chassis == null ? otherStiffness : AxleStiffness.inSeries(otherStiffness, chassis);
        double trackX = vehicle.axle(axle).track();
        double trackY = vehicle.axle(axle.other()).track();
        double anglePerLength = 1 / (bar.linkMotionRatio() * trackX); // phi_0 / delta
        double momentPerLength = x.rollStiffness() * otherEffective / (x.rollStiffness() + otherEffective)
                * (x.barRollStiffness() / x.suspensionRollStiffness()) * anglePerLength;
        double front = momentPerLength / (axle == AxlePosition.FRONT ? trackX : trackY);
        double rear = momentPerLength / (axle == AxlePosition.FRONT ? trackY : trackX);
        int sign = diagonal.leftFrontSign();
        // the gaining diagonal's two wheels gain, the other two lose: left front with right rear
        CornerLoads change = new CornerLoads(sign * front, -sign * front, -sign * rear, sign * rear);
        MassProperties.StaticWheelLoads wheels = evaluator.masses().staticLoads();
        CornerLoads staticLoads = new CornerLoads(wheels.leftFront(), wheels.rightFront(), wheels.leftRear(),
                wheels.rightRear());
        return new PreloadResult(axle, diagonal, linkChange, anglePerLength, momentPerLength, change, staticLoads,
                staticLoads.plus(change.times(linkChange)));
    }
}
