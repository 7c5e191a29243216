package barwright.sizing;

import barwright.model.BarSection;
import barwright.model.Material;
import barwright.model.TubeSection;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;

/** The material and section objects of the vehicle file (files.md), written from SI values. */
public final class BarNodes {
    private static final JsonNodeFactory NODES = JsonNodeFactory.instance;

    private BarNodes() {
    }

    /** @return the complete material object: name, youngsModulusGPa, shearModulusGPa, densityKgPerM3, yieldStrengthMPa */
    public static ObjectNode material(Material material) {
        ObjectNode node = NODES.objectNode();
        node.put("name", material.name());
        node.put("youngsModulusGPa", tidy(material.youngsModulus() * 1e-9));
        node.put("shearModulusGPa", tidy(material.shearModulus() * 1e-9));
        node.put("densityKgPerM3", tidy(material.density()));
        node.put("yieldStrengthMPa", tidy(material.yieldStrength() * 1e-6));
        return node;
    }

    /** @return {"shape": "solid", "outerDiameterMm": ...} or the tube's, with wallMm */
    public static ObjectNode section(BarSection section) {
        ObjectNode node = NODES.objectNode();
        node.put("shape", section instanceof TubeSection ? "tube" : "solid");
        node.put("outerDiameterMm", tidy(section.outerDiameter() * 1e3));
        if (section instanceof TubeSection tube) {
            node.put("wallMm", tidy(tube.wall() * 1e3));
        }
        return node;
    }

    /**
     * @return the value rounded to 12 significant digits, so that a size read as 22.225 mm is written back
     *     as 22.225 and not 22.224999999999998 (the unit conversion's rounding)
     */
    static double tidy(double value) {
        if (value == 0 || !Double.isFinite(value)) {
            return value;
        }
        return new java.math.BigDecimal(value).round(new java.math.MathContext(12)).doubleValue();
    }
}
