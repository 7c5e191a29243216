package barwright.physics.dynamics;

/**
 * One axle as the roll dynamics sees it (model.md 14): suspension (springs and bar at their motion ratios)
 * with its dampers, in series with the tyres.
 *
 * @param track                  t (m)
 * @param suspensionStiffness    K_spr + K_bar (N m/rad)
 * @param tyreStiffness          K_tyre (N m/rad); infinite for rigid tyres
 * @param damping                the dampers' roll moment, or null for an axle without dampers
 * @param directTransferPerAccel the unsprung and geometric load transfer per a_y, which follow a_y at once
 *                               (N per m/s^2)
 * @param liftMomentPerLoad      the suspension roll moment at which the steady model lifts the inside wheel,
 *                               per newton of that wheel's static load (m): K phi(a_lift) / W_inside
 */
public record AxleRoll(double track, double suspensionStiffness, double tyreStiffness, RollDamping damping,
                       double directTransferPerAccel, double liftMomentPerLoad) {

    /** @return the suspension in series with the tyres (N m/rad) */
    public double seriesStiffness() {
        return Double.isInfinite(tyreStiffness) ? suspensionStiffness
                : 1 / (1 / suspensionStiffness + 1 / tyreStiffness);
    }

    /** @return true where the axle needs its own state, the tyres' roll: dampers on tyres that give */
    boolean hasTyreState() {
        return damping != null && Double.isFinite(tyreStiffness);
    }

    /**
     * @param roll      the body's roll at this axle (rad)
     * @param rollRate  its rate (rad/s)
     * @param tyreRoll  the roll taken by the tyres (rad); used only where {@link #hasTyreState()}
     * @return the roll moment the suspension carries from the body to the axle, springs and dampers (N m)
     */
    double moment(double roll, double rollRate, double tyreRoll) {
        if (damping == null) {
            return seriesStiffness() * roll;
        }
        if (Double.isInfinite(tyreStiffness)) {
            return suspensionStiffness * roll + damping.moment(rollRate);
        }
        return tyreStiffness * tyreRoll;
    }

    /** @return the rate of the tyres' roll (rad/s): the dampers carry what the tyre moment leaves the springs */
    double tyreRollRate(double roll, double rollRate, double tyreRoll) {
        if (!hasTyreState()) {
            return 0;
        }
        double damperMoment = tyreStiffness * tyreRoll - suspensionStiffness * (roll - tyreRoll);
        return rollRate - damping.rateFor(damperMoment);
    }
}
