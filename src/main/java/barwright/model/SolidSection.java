package barwright.model;

/**
 * A solid round bar. J = pi d^4 / 32, I = pi d^4 / 64 (Roark's Formulas for Stress and Strain, torsion of
 * circular sections).
 *
 * @param outerDiameter diameter (m)
 */
public record SolidSection(double outerDiameter) implements BarSection {
    public SolidSection {
        Checks.positive("outerDiameter", outerDiameter);
    }

    @Override
    public double polarMoment() {
        return Math.PI * Math.pow(outerDiameter, 4) / 32;
    }

    @Override
    public double bendingMoment() {
        return Math.PI * Math.pow(outerDiameter, 4) / 64;
    }

    @Override
    public double area() {
        return Math.PI * outerDiameter * outerDiameter / 4;
    }
}
