package barwright.io;

import com.fasterxml.jackson.databind.JsonNode;

import java.util.ArrayList;
import java.util.List;

/**
 * Reads typed values out of a JSON tree, collecting every problem with its key path instead of stopping at
 * the first. A value that is wrong yields a harmless stand-in so reading can go on; the caller refuses the
 * file when {@link #problems()} is not empty.
 */
final class NodeReader {
    private final List<Problem> problems = new ArrayList<>();
    private final BuildChecks buildChecks;

    /** A reader for files that hold no bar and no linkage. */
    NodeReader() {
        this(null);
    }

    /** @param buildChecks the checks that need the calculation, run on each shaped bar and linkage read well */
    NodeReader(BuildChecks buildChecks) {
        this.buildChecks = buildChecks;
    }

    /** @return the checks that need the calculation; only a vehicle file's reader has them */
    BuildChecks buildChecks() {
        if (buildChecks == null) {
            throw new IllegalStateException("this reader was made without the build checks a vehicle file needs");
        }
        return buildChecks;
    }

    List<Problem> problems() {
        return problems;
    }

    boolean hasProblems() {
        return !problems.isEmpty();
    }

    void problem(String path, String message) {
        problems.add(new Problem(path, message));
    }

    void problems(List<Problem> more) {
        problems.addAll(more);
    }

    static String child(String parentPath, String key) {
        return parentPath.isEmpty() ? key : parentPath + "." + key;
    }

    /** @return true where the key is absent or JSON null */
    static boolean isAbsent(JsonNode parent, String key) {
        JsonNode node = parent.get(key);
        return node == null || node.isNull();
    }

    /** @return the object at the key, or null (with a problem recorded unless it may be absent) */
    JsonNode object(JsonNode parent, String parentPath, String key, boolean required) {
        String path = child(parentPath, key);
        JsonNode node = parent.get(key);
        if (node == null || node.isNull()) {
            if (required) {
                problem(path, "is missing: an object is required");
            }
            return null;
        }
        if (!node.isObject()) {
            problem(path, "= " + shown(node) + ": must be an object ({...})");
            return null;
        }
        return node;
    }

    /** @return the number at the key in the file's unit, checked against the range; the range's minimum if bad */
    double number(JsonNode parent, String parentPath, String key, Range range) {
        return numberAt(parent.get(key), child(parentPath, key), range);
    }

    /** @return the number at the key, or the fallback where it is absent or null */
    double optionalNumber(JsonNode parent, String parentPath, String key, Range range, double fallback) {
        return isAbsent(parent, key) ? fallback : number(parent, parentPath, key, range);
    }

    double numberAt(JsonNode node, String path, Range range) {
        if (node == null || node.isNull()) {
            problem(path, "is missing: a number is required (" + range.describe() + ")");
            return stand(range);
        }
        if (!node.isNumber()) {
            problem(path, "= " + shown(node) + ": must be a number (" + range.describe() + ")");
            return stand(range);
        }
        double value = node.doubleValue();
        if (!Double.isFinite(value)) {
            problem(path, "= " + shown(node) + ": must be a finite number (" + range.describe() + ")");
            return stand(range);
        }
        if (!range.contains(value)) {
            problem(path, "= " + Range.format(value) + unitSuffix(range) + ": " + range.describe());
            return stand(range);
        }
        return value;
    }

    /** @return the whole number at the key, between min and max; min if bad */
    int integer(JsonNode parent, String parentPath, String key, int min, int max) {
        String path = child(parentPath, key);
        JsonNode node = parent.get(key);
        String allowed = "must be a whole number from " + min + " to " + max;
        if (node == null || node.isNull()) {
            problem(path, "is missing: " + allowed);
            return min;
        }
        if (!node.isNumber() || !Double.isFinite(node.doubleValue()) || node.doubleValue() != Math.rint(node.doubleValue())) {
            problem(path, "= " + shown(node) + ": " + allowed);
            return min;
        }
        double value = node.doubleValue();
        if (value < min || value > max) {
            problem(path, "= " + Range.format(value) + ": " + allowed);
            return min;
        }
        return (int) value;
    }

    /** @return the text at the key; "" if bad */
    String text(JsonNode parent, String parentPath, String key, boolean required) {
        String path = child(parentPath, key);
        JsonNode node = parent.get(key);
        if (node == null || node.isNull()) {
            if (required) {
                problem(path, "is missing: a text is required");
            }
            return "";
        }
        if (!node.isTextual()) {
            problem(path, "= " + shown(node) + ": must be a text in quotes");
            return "";
        }
        return node.textValue();
    }

    /** @return the array at the key with at least minSize elements, or null */
    JsonNode array(JsonNode parent, String parentPath, String key, int minSize, int maxSize, boolean required) {
        String path = child(parentPath, key);
        JsonNode node = parent.get(key);
        if (node == null || node.isNull()) {
            if (required) {
                problem(path, "is missing: a list of " + minSize + " to " + maxSize + " values is required");
            }
            return null;
        }
        if (!node.isArray()) {
            problem(path, "= " + shown(node) + ": must be a list [...]");
            return null;
        }
        if (node.size() < minSize || node.size() > maxSize) {
            problem(path, "has " + node.size() + " entries: must have " + minSize + " to " + maxSize);
            return null;
        }
        return node;
    }

    /** @return the numbers of an array, each checked against the range */
    List<Double> numbers(JsonNode array, String path, Range range) {
        List<Double> values = new ArrayList<>(array.size());
        for (int i = 0; i < array.size(); i++) {
            values.add(numberAt(array.get(i), path + "[" + i + "]", range));
        }
        return values;
    }

    private static double stand(Range range) {
        if (range.minInclusive()) {
            return range.min();
        }
        return range.maxInclusive() ? range.max() : (range.min() + range.max()) / 2;
    }

    private static String unitSuffix(Range range) {
        return range.unit().isEmpty() ? "" : " " + range.unit();
    }

    /** @return the value as written, shortened for a message */
    static String shown(JsonNode node) {
        String text = node.isNumber() && !Double.isFinite(node.doubleValue())
                ? Double.toString(node.doubleValue()) : node.toString();
        return text.length() > 40 ? text.substring(0, 37) + "..." : text;
    }
}
