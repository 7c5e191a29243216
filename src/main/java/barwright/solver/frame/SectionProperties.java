package barwright.solver.frame;

/**
 * The elastic properties of a beam's cross-section and material, about its principal axes.
 *
 * @param youngsModulus    Young's modulus E (Pa)
 * @param shearModulus     shear modulus G (Pa)
 * @param area             cross-section area A (m^2)
 * @param secondMomentY    second moment of area about the local y' axis, I_y (m^4): resists bending in x'-z'
 * @param secondMomentZ    second moment of area about the local z' axis, I_z (m^4): resists bending in x'-y'
 * @param torsionConstant  torsion constant J (m^4); the polar moment for a round section
 */
public record SectionProperties(double youngsModulus, double shearModulus, double area, double secondMomentY,
                                double secondMomentZ, double torsionConstant) {
    public SectionProperties {
        positive("youngsModulus", youngsModulus);
        positive("shearModulus", shearModulus);
        positive("area", area);
        positive("secondMomentY", secondMomentY);
        positive("secondMomentZ", secondMomentZ);
        positive("torsionConstant", torsionConstant);
    }

    /**
     * A section with equal bending stiffness about every diameter (round bar or tube).
     *
     * @param youngsModulus   E (Pa)
     * @param shearModulus    G (Pa)
     * @param area            A (m^2)
     * @param secondMoment    I about any diameter (m^4)
     * @param torsionConstant J (m^4)
     */
    public static SectionProperties round(double youngsModulus, double shearModulus, double area,
                                          double secondMoment, double torsionConstant) {
        return new SectionProperties(youngsModulus, shearModulus, area, secondMoment, secondMoment, torsionConstant);
    }

    private static void positive(String name, double value) {
        if (!(value > 0) || Double.isInfinite(value)) {
            throw new IllegalArgumentException(name + " must be positive and finite, was " + value);
        }
    }
}
