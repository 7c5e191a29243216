package barwright.io;

import com.fasterxml.jackson.databind.JsonNode;

import java.util.Iterator;
import java.util.Map;

/**
 * The one check every JSON text the program writes passes first: no NaN or Infinity anywhere in the tree.
 * JSON has no such numbers (RFC 8259, section 6), and a script reading a report must never meet one, nor the
 * strings "NaN" and "Infinity" Jackson would otherwise write in their place. A non-finite number here is a
 * fault of the program, not of the user's file, so nothing is written and the key path is named.
 */
public final class FiniteNumbers {
    private FiniteNumbers() {
    }

    /**
     * @throws IllegalStateException naming the first key path whose number is NaN or infinite
     */
    public static void require(JsonNode tree) {
        String path = firstNonFinite(tree, "");
        if (path != null) {
            throw new IllegalStateException("nothing was written: the value at " + (path.isEmpty() ? "the top" : path)
                    + " is not a finite number (NaN or Infinity), which no JSON file can hold; this is a fault in "
                    + "Barwright, not in your file");
        }
    }

    /** @return the key path of the first non-finite number, or null where every number is finite */
    static String firstNonFinite(JsonNode node, String path) {
        if (node.isNumber()) {
            return Double.isFinite(node.doubleValue()) ? null : path;
        }
        if (node.isObject()) {
            for (Iterator<Map.Entry<String, JsonNode>> fields = node.fields(); fields.hasNext(); ) {
                Map.Entry<String, JsonNode> field = fields.next();
                String found = firstNonFinite(field.getValue(), NodeReader.child(path, field.getKey()));
                if (found != null) {
                    return found;
                }
            }
        } else if (node.isArray()) {
            for (int i = 0; i < node.size(); i++) {
                String found = firstNonFinite(node.get(i), path + "[" + i + "]");
                if (found != null) {
                    return found;
                }
            }
        }
        return null;
    }
}
