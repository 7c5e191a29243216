package barwright.model;

/**
 * A round tube. With inside diameter d = D - 2w: J = pi (D^4 - d^4) / 32, I = J / 2 (Roark's Formulas for
 * Stress and Strain, torsion of circular sections).
 *
 * @param outerDiameter outside diameter D (m)
 * @param wall          wall thickness w (m), less than D / 2
 */
public record TubeSection(double outerDiameter, double wall) implements BarSection {
    public TubeSection {
        Checks.positive("outerDiameter", outerDiameter);
        Checks.positive("wall", wall);
        if (!(wall < outerDiameter / 2)) {
            throw new IllegalArgumentException("wall " + wall + " must be less than half of the outer diameter "
                    + outerDiameter);
        }
    }

    /** @return inside diameter (m) */
    public double innerDiameter() {
        return outerDiameter - 2 * wall;
    }

    @Override
    public double polarMoment() {
        double inner = innerDiameter();
        return Math.PI * (Math.pow(outerDiameter, 4) - Math.pow(inner, 4)) / 32;
    }

    @Override
    public double bendingMoment() {
        return polarMoment() / 2;
    }

    @Override
    public double area() {
        double inner = innerDiameter();
        return Math.PI * (outerDiameter * outerDiameter - inner * inner) / 4;
    }
}
