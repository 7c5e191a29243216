package barwright.tyrefit;

/**
 * The Magic Formula with a vertical shift, F_y = D sin(C atan(B a - E (B a - atan(B a)))) + S_V (Pacejka,
 * Tyre and Vehicle Dynamics; the same curve as model.md 8 with S_V carrying the camber thrust), and its
 * partial derivatives for the least-squares fit.
 *
 * @param stiffnessFactor B (1/rad)
 * @param shapeFactor     C
 * @param peak            D (N)
 * @param curvatureFactor E
 * @param verticalShift   S_V (N)
 */
public record MagicFormula(double stiffnessFactor, double shapeFactor, double peak, double curvatureFactor,
                           double verticalShift) {
    /** Parameter order in a vector: B, C, D, E, S_V. */
    static MagicFormula of(double[] p) {
        return new MagicFormula(p[0], p[1], p[2], p[3], p[4]);
    }

    /** @return F_y at a slip angle (N) */
    public double force(double slipAngle) {
        double u = stiffnessFactor * slipAngle;
        double phi = u - curvatureFactor * (u - Math.atan(u));
        return peak * Math.sin(shapeFactor * Math.atan(phi)) + verticalShift;
    }

    /** @return the cornering stiffness at zero slip, B C D (N/rad) */
    public double corneringStiffness() {
        return stiffnessFactor * shapeFactor * peak;
    }

    /** @return dF/dB, dF/dC, dF/dD, dF/dE, dF/dS_V at a slip angle */
    double[] gradient(double slipAngle) {
        double u = stiffnessFactor * slipAngle;
        double arcU = Math.atan(u);
        double phi = u - curvatureFactor * (u - arcU);
        double arcPhi = Math.atan(phi);
        double theta = shapeFactor * arcPhi;
        double dForceDPhi = peak * Math.cos(theta) * shapeFactor / (1 + phi * phi);
        double dPhiDU = 1 - curvatureFactor * u * u / (1 + u * u);
        return new double[]{dForceDPhi * dPhiDU * slipAngle, peak * Math.cos(theta) * arcPhi, Math.sin(theta),
                -dForceDPhi * (u - arcU), 1};
    }
}
