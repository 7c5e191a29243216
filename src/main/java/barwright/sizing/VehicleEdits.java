package barwright.sizing;

import barwright.io.VehicleDocument;
import barwright.io.VehicleFileException;
import barwright.io.VehicleFileReader;
import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;
import com.fasterxml.jackson.databind.node.TextNode;

import java.util.List;

/**
 * Changes to an open vehicle document, made on a copy of its JSON tree and validated again as a whole, so a
 * change keeps every unknown key and a bad value is refused with its key path like a bad file.
 */
public final class VehicleEdits {
    private static final ObjectMapper MAPPER = new ObjectMapper();

    private VehicleEdits() {
    }

    /** @return the document with a search's bar (or bars) in place */
    public static VehicleDocument withCandidate(VehicleDocument document, Candidate candidate)
            throws VehicleFileException {
        ObjectNode tree = document.editableTree();
        for (BarChoice choice : candidate.bars()) {
            putBar(tree, choice);
        }
        return VehicleFileReader.fromTree(tree);
    }

    /** @return the document with one bar's material, section and hole replaced */
    public static VehicleDocument withBar(VehicleDocument document, BarChoice choice) throws VehicleFileException {
        ObjectNode tree = document.editableTree();
        putBar(tree, choice);
        return VehicleFileReader.fromTree(tree);
    }

    private static void putBar(ObjectNode tree, BarChoice choice) throws VehicleFileException {
        JsonNode bar = tree.path(choice.axle().key()).path("bar");
        if (!bar.isObject()) {
            throw new VehicleFileException(List.of(new barwright.io.Problem(choice.axle().key() + ".bar",
                    "is not a bar object: a bar can only be sized where the file gives one")));
        }
        ObjectNode barNode = (ObjectNode) bar;
        barNode.set("material", BarNodes.material(choice.material()));
        barNode.set("section", BarNodes.section(choice.size().section()));
        barNode.put("selectedArm", choice.selectedArm());
    }

    /**
     * @param edits changes as {@code key.path=value}, e.g. {@code front.bar.selectedArm=2} or
     *              {@code rear.bar.armLengthsMm[0]=160}; the value is JSON (a number, null, an object...) or
     *              else taken as text
     * @return the document with every change made, validated as a whole
     * @throws VehicleFileException where a change is malformed, names no key of the file's shape, or the result
     *                              is refused
     */
    public static VehicleDocument withEdits(VehicleDocument document, List<String> edits) throws VehicleFileException {
        ObjectNode tree = document.editableTree();
        for (String edit : edits) {
            int equals = edit.indexOf('=');
            if (equals <= 0) {
                throw refused(edit, "is not a change of the form key.path=value");
            }
            set(tree, edit.substring(0, equals).trim(), value(edit.substring(equals + 1).trim()));
        }
        return VehicleFileReader.fromTree(tree);
    }

    /** Sets the value at a key path (dots between keys, [i] for a list entry), making objects on the way. */
    static void set(ObjectNode tree, String path, JsonNode value) throws VehicleFileException {
        String[] keys = path.split("\\.");
        JsonNode parent = tree;
        for (int k = 0; k < keys.length; k++) {
            String key = keys[k];
            int bracket = key.indexOf('[');
            String name = bracket < 0 ? key : key.substring(0, bracket);
            boolean last = k == keys.length - 1;
            if (name.isEmpty() || !(parent instanceof ObjectNode object)) {
                throw refused(path, "does not name a key of the vehicle file");
            }
            if (bracket < 0) {
                if (last) {
                    object.set(name, value);
                    return;
                }
                JsonNode child = object.get(name);
                parent = child == null || child.isNull() ? object.putObject(name) : child;
                continue;
            }
            int index = index(key, bracket, path);
            JsonNode list = object.get(name);
            if (!(list instanceof ArrayNode array) || index >= array.size()) {
                throw refused(path, "names no entry: " + name + " has " + (list instanceof ArrayNode a ? a.size() : 0)
                        + " entries");
            }
            if (last) {
                array.set(index, value);
                return;
            }
            parent = array.get(index);
        }
    }

    private static int index(String key, int bracket, String path) throws VehicleFileException {
        if (!key.endsWith("]")) {
            throw refused(path, "has an unclosed [");
        }
        try {
            int index = Integer.parseInt(key.substring(bracket + 1, key.length() - 1));
            if (index < 0) {
                throw new NumberFormatException();
            }
            return index;
        } catch (NumberFormatException bad) {
            throw refused(path, "has a list index that is not a whole number from 0");
        }
    }

    private static JsonNode value(String text) {
        try {
            JsonNode parsed = MAPPER.readTree(text);
            return parsed == null || parsed.isMissingNode() ? TextNode.valueOf(text) : parsed;
        } catch (JsonProcessingException notJson) {
            return TextNode.valueOf(text);
        }
    }

    private static VehicleFileException refused(String path, String message) {
        return new VehicleFileException(List.of(new barwright.io.Problem(path, message)));
    }
}
