package barwright.model;

/** The cross-section of a bar: the same in its arms and its torsion tube (model.md 1). */
public sealed interface BarSection permits SolidSection, TubeSection {
    /** @return outside diameter (m) */
    double outerDiameter();

    /** @return polar second moment of area J (m^4) */
    double polarMoment();

    /** @return second moment of area about a diameter I (m^4) */
    double bendingMoment();

    /** @return cross-section area (m^2) */
    double area();

    /** @return outer radius (m), where the torsional and bending stresses peak */
    default double outerRadius() {
        return outerDiameter() / 2;
    }
}
