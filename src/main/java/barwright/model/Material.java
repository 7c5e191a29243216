package barwright.model;

/**
 * An isotropic bar material.
 *
 * @param name           a label for people
 * @param youngsModulus  Young's modulus E (Pa)
 * @param shearModulus   shear modulus G (Pa)
 * @param density        density (kg/m^3)
 * @param yieldStrength  tensile yield strength (Pa), the basis of the static safety factor
 */
public record Material(String name, double youngsModulus, double shearModulus, double density,
                       double yieldStrength) {
    public Material {
        Checks.positive("youngsModulus", youngsModulus);
        Checks.positive("shearModulus", shearModulus);
        Checks.positive("density", density);
        Checks.positive("yieldStrength", yieldStrength);
    }
}
