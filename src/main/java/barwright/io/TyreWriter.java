package barwright.io;

import barwright.model.LoadPoint;
import barwright.model.LoadTable;
import barwright.model.Tyre;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;

import java.math.BigDecimal;
import java.math.MathContext;
import java.util.List;

import static barwright.units.Constants.RADIANS_PER_DEGREE;

/**
 * Writes a tyre as the {@code tyre} object of a vehicle file (file version 2, file-format.md "The tyre"), in
 * the file's units, each number to 5 significant figures; and checks such an object by reading it back.
 */
public final class TyreWriter {
    private TyreWriter() {
    }

    /** @return the tyre object; friction and stiffness as points where the tyre has them, else as the law */
    public static ObjectNode toJson(Tyre tyre) {
        ObjectNode node = JsonNodeFactory.instance.objectNode();
        node.put(VehicleKeys.NOMINAL_LOAD_N, rounded(tyre.nominalLoad()));
        if (tyre.hasFrictionPoints()) {
            node.set(TyreReader.FRICTION_POINTS, points(tyre.frictionByLoad(), VehicleKeys.PEAK_FRICTION, 1));
        } else {
            node.put(VehicleKeys.FRICTION_AT_NOMINAL_LOAD, rounded(tyre.frictionAtNominalLoad()));
            node.put(VehicleKeys.FRICTION_LOAD_SENSITIVITY, rounded(tyre.frictionLoadSensitivity()));
        }
        if (tyre.hasStiffnessPoints()) {
            node.set(TyreReader.STIFFNESS_POINTS, points(tyre.corneringStiffnessByLoad(),
                    VehicleKeys.CORNERING_STIFFNESS_N_PER_DEG,
                    RADIANS_PER_DEGREE));
        } else {
            node.put(VehicleKeys.CORNERING_STIFFNESS_PER_LOAD, rounded(tyre.corneringStiffnessPerLoad()));
            node.put(VehicleKeys.CORNERING_STIFFNESS_PEAK_LOAD_RATIO, rounded(tyre.corneringStiffnessPeakLoadRatio()));
        }
        node.put(VehicleKeys.SHAPE_FACTOR, rounded(tyre.shapeFactor()));
        node.put(VehicleKeys.CURVATURE_FACTOR, rounded(tyre.curvatureFactor()));
        if (!tyre.camber().isNone()) {
            node.put(TyreReader.CAMBER_FOR_PEAK_GRIP, rounded(tyre.camber().camberForPeakGrip() / RADIANS_PER_DEGREE));
            node.put(TyreReader.FRICTION_LOSS, rounded(tyre.camber().peakFrictionLossPerRadSquared()
                    * RADIANS_PER_DEGREE * RADIANS_PER_DEGREE));
            node.put(TyreReader.CAMBER_STIFFNESS, rounded(tyre.camber().camberStiffnessPerLoad() * RADIANS_PER_DEGREE));
        }
        return node;
    }

    /**
     * @return the problems a vehicle file would report for this tyre object (key paths start at {@code tyre}),
     *     empty where it can be pasted into a file of version 2 as it is
     */
    public static List<Problem> check(ObjectNode tyre) {
        NodeReader reader = new NodeReader();
        TyreReader.read(tyre, "tyre", reader);
        return List.copyOf(reader.problems());
    }

    private static ArrayNode points(LoadTable table, String valueKey, double scale) {
        ArrayNode array = JsonNodeFactory.instance.arrayNode();
        for (LoadPoint point : table.points()) {
            ObjectNode entry = array.addObject();
            entry.put(VehicleKeys.LOAD_N, rounded(point.load()));
            entry.put(valueKey, rounded(point.value() * scale));
        }
        return array;
    }

    /** @return the value to 5 significant figures, as a decimal that prints without an exponent */
    private static BigDecimal rounded(double value) {
        BigDecimal decimal = new BigDecimal(value).round(new MathContext(5));
        return decimal.scale() < 0 ? decimal.setScale(0) : decimal.stripTrailingZeros().scale() < 0
                ? decimal.setScale(0) : decimal.stripTrailingZeros();
    }
}
