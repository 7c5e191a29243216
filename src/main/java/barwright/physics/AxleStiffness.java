package barwright.physics;

import barwright.model.Axle;
import barwright.model.AxlePosition;
import barwright.physics.bar.BarResult;

import static barwright.units.Constants.STANDARD_GRAVITY;

/**
 * Roll stiffness and ride rates of one axle (model.md 3). Roll stiffnesses in N m/rad, rates in N/m.
 *
 * @param wheelRate               spring wheel rate k_w = k_spring MR^2, per wheel (N/m)
 * @param springRollStiffness     K_spr = k_w t^2 / 2 (N m/rad)
 * @param barRollStiffness        K_bar = k_link r^2 t^2, zero without a bar (N m/rad)
 * @param tyreRollStiffness       K_tyre = k_t t^2 / 2 (N m/rad)
 * @param suspensionRollStiffness K_spr + K_bar (N m/rad)
 * @param rollStiffness           the suspension in series with the tyres (N m/rad)
 * @param heaveRate               per wheel, both wheels rising together: k_w (N/m)
 * @param singleWheelBumpRate     per wheel, the other wheel held: k_w + k_link r^2 (N/m)
 * @param rideRate                k_w in series with the tyre rate k_t (N/m)
 * @param rideFrequency           sqrt(ride rate / corner sprung mass) / (2 pi) (Hz)
 */
public record AxleStiffness(double wheelRate, double springRollStiffness, double barRollStiffness,
                            double tyreRollStiffness, double suspensionRollStiffness, double rollStiffness,
                            double heaveRate, double singleWheelBumpRate, double rideRate, double rideFrequency) {

    /**
     * @param axle            the axle
     * @param bar             its bar's result, or null for no bar
     * @param cornerSprungMass half of (static axle load / g - unsprung axle mass) (kg)
     */
    public static AxleStiffness of(Axle axle, BarResult bar, double cornerSprungMass) {
        double track = axle.track();
        double wheelRate = axle.springRate() * axle.springMotionRatio() * axle.springMotionRatio();
        double springRoll = wheelRate * track * track / 2;
        double barWheelRate = bar == null ? 0 : bar.linkRate() * square(axle.bar().linkMotionRatio());
        double barRoll = barWheelRate * track * track;
        double tyreRoll = axle.tyreVerticalRate() * track * track / 2;
        double suspensionRoll = springRoll + barRoll;
        double rollStiffness = inSeries(suspensionRoll, tyreRoll);
        double rideRate = inSeries(wheelRate, axle.tyreVerticalRate());
        double rideFrequency = Math.sqrt(rideRate / cornerSprungMass) / (2 * Math.PI);
        return new AxleStiffness(wheelRate, springRoll, barRoll, tyreRoll, suspensionRoll, rollStiffness,
                wheelRate, wheelRate + barWheelRate, rideRate, rideFrequency);
    }

    /**
     * @param axleLoad the axle's static load (N)
     * @return the corner sprung mass, half of (static axle load / g - unsprung axle mass) (kg), model.md 3
     * @throws ImpossibleVehicleException where the unsprung mass is not less than the axle's static mass
     */
    public static double cornerSprungMass(Axle axle, AxlePosition position, double axleLoad) {
        double gravity = STANDARD_GRAVITY;
        double cornerSprungMass = (axleLoad / gravity - axle.unsprungMass()) / 2;
        if (!(cornerSprungMass > 0)) {
            throw new ImpossibleVehicleException(String.format(
                    "The %s unsprung mass %.1f kg is not less than the static mass on the %s axle %.1f kg.",
                    position.key(), axle.unsprungMass(), position.key(), axleLoad / gravity));
        }
        return cornerSprungMass;
    }

    /** @return two springs in series: 1 / (1/a + 1/b) */
    public static double inSeries(double first, double second) {
        return 1 / (1 / first + 1 / second);
    }

    private static double square(double value) {
        return value * value;
    }
}
