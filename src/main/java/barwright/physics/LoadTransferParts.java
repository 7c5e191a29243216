package barwright.physics;

/**
 * One axle's lateral load transfer per unit of lateral acceleration, in three parts (model.md 5), before any
 * wheel lifts. Each in N per m/s^2.
 *
 * @param unsprung  m_u a_y h_u / t per a_y
 * @param geometric m_s,axle a_y z / t per a_y (through the roll centre)
 * @param elastic   K phi / t per a_y (through springs, bar and tyres)
 */
public record LoadTransferParts(double unsprung, double geometric, double elastic) {
    /** @return the sum of the three parts (N per m/s^2) */
    public double total() {
        return unsprung + geometric + elastic;
    }
}
