package barwright.io;

import barwright.model.Vehicle;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ObjectNode;

/**
 * A vehicle file as read: the JSON tree exactly as the file had it (unknown keys included, so that saving
 * keeps them) and the car it describes, in SI.
 *
 * @param tree    the file's JSON object; treat as read-only (copy before changing)
 * @param vehicle the validated car
 */
public record VehicleDocument(JsonNode tree, Vehicle vehicle) {
    public VehicleDocument {
        if (!(tree instanceof ObjectNode)) {
            throw new IllegalArgumentException("a vehicle document is a JSON object");
        }
    }

    /** @return a copy of the tree that may be changed */
    public ObjectNode editableTree() {
        return ((ObjectNode) tree).deepCopy();
    }
}
