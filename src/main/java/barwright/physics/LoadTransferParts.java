package barwright.physics;

import barwright.model.Axle;

/**
 * One axle's lateral load transfer per unit of lateral acceleration, in three parts (model.md 5), before any
 * wheel lifts. Each in N per m/s^2.
 *
 * @param unsprung  m_u a_y h_u / t per a_y
 * @param geometric m_s,axle a_y z / t per a_y (through the roll centre)
 * @param elastic   K phi / t per a_y (through springs, bar and tyres)
 */
public record LoadTransferParts(double unsprung, double geometric, double elastic) {
    /**
     * @param axle              the axle (track, unsprung mass and height)
     * @param rollCentreHeight  the axle's roll-centre height z (m)
     * @param axleSprungMass    the axle's share of the sprung mass m_sf or m_sr (kg)
     * @param rollStiffness     the axle's roll stiffness K (N m/rad)
     * @param axleRollPerAccel  the roll of the body at this axle per a_y (rad s^2/m)
     * @return unsprung m_u h_u / t, geometric m_s,axle z / t and elastic K phi / t, per a_y (model.md 5)
     */
    public static LoadTransferParts of(Axle axle, double rollCentreHeight, double axleSprungMass,
                                       double rollStiffness, double axleRollPerAccel) {
        double track = axle.track();
        return new LoadTransferParts(axle.unsprungMass() * axle.unsprungCgHeight() / track,
                axleSprungMass * rollCentreHeight / track, rollStiffness * axleRollPerAccel / track);
    }

    /** @return the sum of the three parts (N per m/s^2) */
    public double total() {
        return unsprung + geometric + elastic;
    }
}
