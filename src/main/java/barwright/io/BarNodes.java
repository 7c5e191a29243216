package barwright.io;

import barwright.model.BarSection;
import barwright.model.Material;
import barwright.model.TubeSection;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;

import java.math.BigDecimal;
import java.math.MathContext;

import static barwright.io.VehicleKeys.DENSITY_KG_PER_M3;
import static barwright.io.VehicleKeys.NAME;
import static barwright.io.VehicleKeys.OUTER_DIAMETER_MM;
import static barwright.io.VehicleKeys.SHAPE;
import static barwright.io.VehicleKeys.SHEAR_MODULUS_GPA;
import static barwright.io.VehicleKeys.SOLID;
import static barwright.io.VehicleKeys.TUBE;
import static barwright.io.VehicleKeys.WALL_MM;
import static barwright.io.VehicleKeys.YIELD_STRENGTH_MPA;
import static barwright.io.VehicleKeys.YOUNGS_MODULUS_GPA;

/** The material and section objects of the vehicle file (docs/file-format.md), written from SI values. */
public final class BarNodes {
    private static final JsonNodeFactory NODES = JsonNodeFactory.instance;

    private BarNodes() {
    }

    /** @return the complete material object: name, youngsModulusGPa, shearModulusGPa, densityKgPerM3, yieldStrengthMPa */
    public static ObjectNode material(Material material) {
        ObjectNode node = NODES.objectNode();
        node.put(NAME, material.name());
        node.put(YOUNGS_MODULUS_GPA, tidy(material.youngsModulus() * 1e-9));
        node.put(SHEAR_MODULUS_GPA, tidy(material.shearModulus() * 1e-9));
        node.put(DENSITY_KG_PER_M3, tidy(material.density()));
        node.put(YIELD_STRENGTH_MPA, tidy(material.yieldStrength() * 1e-6));
        return node;
    }

    /** @return {"shape": "solid", "outerDiameterMm": ...} or the tube's, with wallMm */
    public static ObjectNode section(BarSection section) {
        ObjectNode node = NODES.objectNode();
        node.put(SHAPE, section instanceof TubeSection ? TUBE : SOLID);
        node.put(OUTER_DIAMETER_MM, tidy(section.outerDiameter() * 1e3));
        if (section instanceof TubeSection tube) {
            node.put(WALL_MM, tidy(tube.wall() * 1e3));
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
        return new BigDecimal(value).round(new MathContext(12)).doubleValue();
    }
}
