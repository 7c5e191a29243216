package barwright.io;

import com.fasterxml.jackson.databind.node.ObjectNode;

import static barwright.io.VehicleKeys.CG_HEIGHT_MM;
import static barwright.io.VehicleKeys.CORNER_MASSES_KG;
import static barwright.io.VehicleKeys.FRONT_MASS_FRACTION;
import static barwright.io.VehicleKeys.LEFT_FRONT;
import static barwright.io.VehicleKeys.LEFT_REAR;
import static barwright.io.VehicleKeys.MASS_KG;
import static barwright.io.VehicleKeys.RIGHT_FRONT;
import static barwright.io.VehicleKeys.RIGHT_REAR;
import static barwright.io.VehicleKeys.VEHICLE;

/**
 * Workshop measurements written into a vehicle file's tree (model.md 12): the one place the command line's
 * {@code measure ... --apply} and the window's "Use this in the car" put a measured height or the corner
 * masses. The caller checks the changed tree as a whole car (the reader) before keeping it.
 */
public final class WorkshopEdits {
    private WorkshopEdits() {
    }

    /** The centre-of-mass height from the tilt method, to a tenth of a millimetre. @param height (m) */
    public static void putCentreOfMassHeight(ObjectNode tree, double height) {
        body(tree).put(CG_HEIGHT_MM, Math.round(height * 1e4) / 10.0);
    }

    /**
     * The four scale readings as the car's corner masses (kg); the mass and the front share then follow from
     * them (file-format.md), so the two keys they replace are taken out.
     */
    public static void putCornerMasses(ObjectNode tree, double leftFront, double rightFront, double leftRear,
                                       double rightRear) {
        ObjectNode body = body(tree);
        ObjectNode corners = body.putObject(CORNER_MASSES_KG);
        corners.put(LEFT_FRONT, leftFront);
        corners.put(RIGHT_FRONT, rightFront);
        corners.put(LEFT_REAR, leftRear);
        corners.put(RIGHT_REAR, rightRear);
        body.remove(MASS_KG);
        body.remove(FRONT_MASS_FRACTION);
    }

    private static ObjectNode body(ObjectNode tree) {
        return tree.has(VEHICLE) && tree.get(VEHICLE).isObject() ? (ObjectNode) tree.get(VEHICLE)
                : tree.putObject(VEHICLE);
    }
}
