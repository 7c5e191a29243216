package barwright.solver.frame;

/**
 * The stress resultants at one cross-section of an element, in the element's local axes: what the part of
 * the element on the +x' side of the cut exerts on the part on the -x' side.
 *
 * @param axial   axial force N along x' (N), tension positive
 * @param shearY  shear force V_y along y' (N)
 * @param shearZ  shear force V_z along z' (N)
 * @param torque  twisting moment T about x' (N m), right-handed
 * @param momentY bending moment M_y about y' (N m), right-handed
 * @param momentZ bending moment M_z about z' (N m), right-handed
 */
public record SectionForces(double axial, double shearY, double shearZ, double torque, double momentY,
                            double momentZ) {
    /** @return the resultant bending moment sqrt(M_y^2 + M_z^2) (N m) */
    public double bendingMoment() {
        return Math.hypot(momentY, momentZ);
    }
}
