package barwright.physics;


import static barwright.units.Constants.RADIANS_PER_DEGREE;
import static barwright.units.Constants.STANDARD_GRAVITY;

/**
 * Body roll per unit of lateral acceleration, steady state, with the lateral shift of the sprung CG under
 * gravity (model.md 5 for a rigid chassis, model.md 6 for a flexible one). Angles in rad per m/s^2.
 *
 * @param frontRollPerAccel the front body end's roll phi_f / a_y (rad s^2/m)
 * @param rearRollPerAccel  the rear body end's roll phi_r / a_y (rad s^2/m)
 * @param rollPerAccel      the sprung-mass-weighted mean (m_sf phi_f + m_sr phi_r) / m_s per a_y (rad s^2/m)
 */
public record RollResponse(double frontRollPerAccel, double rearRollPerAccel, double rollPerAccel) {

    /**
     * @param frontRollStiffness K_f (N m/rad)
     * @param rearRollStiffness  K_r (N m/rad)
     * @param chassisStiffness   K_c (N m/rad), or null for a rigid chassis
     * @throws ImpossibleVehicleException where the body has no stable roll position
     */
    public static RollResponse of(MassProperties masses, double frontRollStiffness, double rearRollStiffness,
                                  Double chassisStiffness) {
        requireStable(masses, frontRollStiffness + rearRollStiffness);
        RollResponse roll = withRollArm(masses, masses.rollArm(), frontRollStiffness, rearRollStiffness,
                chassisStiffness);
        if (roll == null) {
            throw new ImpossibleVehicleException(String.format(
                    "No stable roll position with this chassis: the flexible body (chassis %.0f N·m/deg) with "
                            + "front %.0f and rear %.0f N·m/deg at the axles cannot hold the sprung mass %.0f kg on "
                            + "a roll arm of %.0f mm. Stiffen the chassis or the axles, or lower the sprung CG.",
                    chassisStiffness * RADIANS_PER_DEGREE, frontRollStiffness * RADIANS_PER_DEGREE,
                    rearRollStiffness * RADIANS_PER_DEGREE, masses.sprungMass(), masses.rollArm() * 1e3));
        }
        return roll;
    }

    /**
     * The same response with the roll arm h' given instead of the masses' own (the roll axis moved, as by
     * roll-centre migration, model.md 11).
     *
     * @param rollArm h' (m)
     * @return the roll per a_y, or null where the body has no stable roll position with that arm
     */
    static RollResponse withRollArm(MassProperties masses, double rollArm, double frontRollStiffness,
                                    double rearRollStiffness, Double chassisStiffness) {
        double sprungMass = masses.sprungMass();
        double gravity = STANDARD_GRAVITY;
        double total = frontRollStiffness + rearRollStiffness;
        double gravityRollMoment = sprungMass * gravity * rollArm;
        if (!(total > gravityRollMoment)) {
            return null;
        }
        if (chassisStiffness == null) {
            // phi = m_s a_y h' / (K_f + K_r - m_s g h'), model.md 5
            double roll = sprungMass * rollArm / (total - gravityRollMoment);
            return new RollResponse(roll, roll, roll);
        }
        // (K_f + K_c - m_sf g h') phi_f - K_c phi_r = m_sf h' a_y, and its twin at the rear (model.md 6)
        double frontDiagonal = frontRollStiffness + chassisStiffness - masses.frontSprungMass() * gravity * rollArm;
        double rearDiagonal = rearRollStiffness + chassisStiffness - masses.rearSprungMass() * gravity * rollArm;
        double determinant = frontDiagonal * rearDiagonal - chassisStiffness * chassisStiffness;
        if (!(frontDiagonal > 0 && determinant > 0)) {
            return null;
        }
        // the 2 x 2 system by Cramer's rule: no matrix objects in the inner loop of the migrating roll (model.md 11)
        double frontMoment = masses.frontSprungMass() * rollArm;
        double rearMoment = masses.rearSprungMass() * rollArm;
        double front = (frontMoment * rearDiagonal + chassisStiffness * rearMoment) / determinant;
        double rear = (frontDiagonal * rearMoment + chassisStiffness * frontMoment) / determinant;
        double mean = (masses.frontSprungMass() * front + masses.rearSprungMass() * rear) / sprungMass;
        return new RollResponse(front, rear, mean);
    }

    /**
     * The chassis stiffness above which the flexible body of model.md 6 has a stable roll position: there the
     * two-end equations' matrix is positive definite. With a = K_f - m_sf g h' and b = K_r - m_sr g h' its
     * determinant is a b + K_c (a + b), so where one end cannot stand alone (a or b not positive) the body needs
     * K_c > -a b / (a + b); where both can it is stable at any K_c.
     *
     * @return the limit (N m/rad): 0 where each end stands alone, infinite where no chassis helps (a + b not
     *     positive: the total roll stiffness does not exceed m_s g h')
     */
    public static double chassisStabilityLimit(MassProperties masses, double frontRollStiffness,
                                               double rearRollStiffness) {
        double gravityArm = STANDARD_GRAVITY * masses.rollArm();
        double front = frontRollStiffness - masses.frontSprungMass() * gravityArm;
        double rear = rearRollStiffness - masses.rearSprungMass() * gravityArm;
        if (!(front + rear > 0)) {
            return Double.POSITIVE_INFINITY;
        }
        return front > 0 && rear > 0 ? 0 : -front * rear / (front + rear);
    }

    /** Refuses a car whose total roll stiffness does not exceed m_s g h' (model.md 5). */
    static void requireStable(MassProperties masses, double totalRollStiffness) {
        double needed = masses.gravityRollMoment();
        if (!(totalRollStiffness > needed)) {
            throw new ImpossibleVehicleException(String.format(
                    "No stable roll position: the total roll stiffness %.0f N·m/deg must exceed m_s g h' = "
                            + "%.0f N·m/deg (sprung mass %.0f kg on a roll arm of %.0f mm). Stiffen the springs "
                            + "or bars, or lower the sprung CG or raise the roll centres.",
                    totalRollStiffness * RADIANS_PER_DEGREE, needed * RADIANS_PER_DEGREE, masses.sprungMass(),
                    masses.rollArm() * 1e3));
        }
    }
}
