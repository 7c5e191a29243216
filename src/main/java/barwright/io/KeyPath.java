package barwright.io;

import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.NullNode;
import com.fasterxml.jackson.databind.node.ObjectNode;

import java.util.ArrayList;
import java.util.List;
import java.util.Objects;
import java.util.regex.Matcher;
import java.util.regex.Pattern;

/**
 * Where a value sits in a vehicle file, written as the core writes it in its messages:
 * {@code front.bar.section.wallMm} or {@code front.bar.armLengthsMm[1]}.
 */
public final class KeyPath {
    private static final Pattern SEGMENT = Pattern.compile("([A-Za-z][A-Za-z0-9]*)((?:\\[\\d+])*)");
    private static final Pattern INDEX = Pattern.compile("\\[(\\d+)]");

    private final String text;
    private final List<Object> steps; // String keys and Integer indices, in order

    private KeyPath(String text, List<Object> steps) {
        this.text = text;
        this.steps = List.copyOf(steps);
    }

    /** @return the path of a key path text; refuses anything that is not keys and [indices] joined by dots */
    public static KeyPath of(String text) {
        List<Object> steps = new ArrayList<>();
        for (String part : text.split("\\.", -1)) {
            Matcher segment = SEGMENT.matcher(part);
            if (!segment.matches()) {
                throw new IllegalArgumentException("not a key path: '" + text + "'");
            }
            steps.add(segment.group(1));
            Matcher index = INDEX.matcher(segment.group(2));
            while (index.find()) {
                steps.add(Integer.parseInt(index.group(1)));
            }
        }
        return new KeyPath(text, steps);
    }

    /** @return this path followed by a key */
    public KeyPath child(String key) {
        return of(text + "." + key);
    }

    /** @return this path followed by an index, e.g. {@code armLengthsMm[2]} */
    public KeyPath index(int index) {
        return of(text + "[" + index + "]");
    }

    /** @return the value at this path, or null where any step is missing */
    public JsonNode get(JsonNode tree) {
        JsonNode node = tree;
        for (Object step : steps) {
            if (node == null) {
                return null;
            }
            node = step instanceof String key ? node.get(key) : node.get((Integer) step);
        }
        return node;
    }

    /**
     * @return why this path names no list entry of the tree, e.g. {@code names no entry: armLengthsMm has 2
     *     entries}, or null where every index on the way is in its list (a key may be new)
     */
    public String missingEntry(JsonNode tree) {
        JsonNode node = tree;
        String lastKey = "";
        for (Object step : steps) {
            if (node == null || node.isNull()) {
                return null; // objects are made on the way; a list is never made to hold an index
            }
            if (step instanceof String key) {
                lastKey = key;
                node = node.get(key);
            } else {
                int index = (Integer) step;
                if (!node.isArray() || index >= node.size()) {
                    return "names no entry: " + lastKey + " has " + (node.isArray() ? node.size() : 0) + " entries";
                }
                node = node.get(index);
            }
        }
        return null;
    }

    /**
     * Puts a value at this path, making objects on the way where a step is missing or null.
     *
     * @param value the new value; Java null writes JSON null
     */
    public void set(ObjectNode tree, JsonNode value) {
        JsonNode node = tree;
        for (int i = 0; i < steps.size() - 1; i++) {
            Object step = steps.get(i);
            JsonNode next = step instanceof String key ? node.get(key) : node.get((Integer) step);
            if (next == null || !next.isContainerNode()) {
                if (!(step instanceof String key) || !(node instanceof ObjectNode object)) {
                    throw new IllegalArgumentException("no list at " + text + " to put a value in");
                }
                next = steps.get(i + 1) instanceof Integer ? object.putArray(key) : object.putObject(key);
            }
            node = next;
        }
        JsonNode written = value == null ? NullNode.getInstance() : value;
        Object last = steps.get(steps.size() - 1);
        if (last instanceof String key && node instanceof ObjectNode object) {
            object.set(key, written);
        } else if (last instanceof Integer index && node instanceof ArrayNode array) {
            while (array.size() <= index) {
                array.addNull();
            }
            array.set(index, written);
        } else {
            throw new IllegalArgumentException("cannot put a value at " + text);
        }
    }

    /** Takes the key away (a missing optional key); a list entry is removed and the rest move up. */
    public void remove(ObjectNode tree) {
        JsonNode parent = tree;
        for (int i = 0; i < steps.size() - 1 && parent != null; i++) {
            Object step = steps.get(i);
            parent = step instanceof String key ? parent.get(key) : parent.get((Integer) step);
        }
        Object last = steps.get(steps.size() - 1);
        if (last instanceof String key && parent instanceof ObjectNode object) {
            object.remove(key);
        } else if (last instanceof Integer index && parent instanceof ArrayNode array && index < array.size()) {
            array.remove(index);
        }
    }

    /** @return the last key of the path, e.g. {@code wallMm} */
    public String lastKey() {
        for (int i = steps.size() - 1; i >= 0; i--) {
            if (steps.get(i) instanceof String key) {
                return key;
            }
        }
        throw new IllegalStateException("a key path starts with a key");
    }

    @Override
    public boolean equals(Object other) {
        return other instanceof KeyPath path && path.text.equals(text);
    }

    @Override
    public int hashCode() {
        return Objects.hash(text);
    }

    @Override
    public String toString() {
        return text;
    }
}
