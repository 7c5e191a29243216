package barwright.cli;

import barwright.loading.VehicleLoader;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.JsonNodeFactory;
import com.fasterxml.jackson.databind.node.ObjectNode;

import java.nio.charset.StandardCharsets;
import java.util.ArrayList;
import java.util.List;
import java.util.Random;

/**
 * Seeded mutations of a vehicle file, the way a careless editor, a broken disk or a hostile script would
 * change one: keys deleted, values of the wrong type, numbers at and just past their bounds, tiny and huge
 * numbers, several numbers scaled at once, bytes flipped, the file cut short, a 1,500-digit number, a
 * 50,000-character key, a byte-order mark, bytes that are not UTF-8. Every mutation is a pure function of
 * the file and the random source, so a case is reproduced from its seed alone.
 */
final class VehicleFileMutations {
    private static final ObjectMapper MAPPER = new ObjectMapper();
    private static final JsonNodeFactory NODES = JsonNodeFactory.instance;

    /** Numbers no editor should be able to smuggle into a car: zero, signs, underflow, overflow, ulps. */
    private static final double[] EXTREMES = {0, -0.0, -1, 1, 1e-300, 4.9e-324, -4.9e-324, 1e-9, 1e300,
            Double.MAX_VALUE, -Double.MAX_VALUE, Double.MIN_NORMAL, 2147483648.0, 0.5, 1e6, -1e6};

    private VehicleFileMutations() {
    }

    /** One mutated file and what was done to it (for the failure message). */
    record Mutant(byte[] content, String description) {
    }

    /** A number's place in the tree, to set it in a copy. */
    private record NumberSlot(String path, JsonNode parent, String key, int index, double value) {
    }

    static Mutant mutate(String sampleName, JsonNode sample, Random random) {
        int kind = random.nextInt(14);
        ObjectNode tree = sample.deepCopy();
        return switch (kind) {
            case 0 -> deleteKey(tree, random, sampleName);
            case 1 -> wrongType(tree, random, sampleName);
            case 2, 3 -> extremeNumber(tree, random, sampleName);
            case 4 -> scaleNumbers(tree, random, sampleName);
            case 5 -> exactBound(tree, random, sampleName);
            case 6 -> nearBound(tree, random, sampleName);
            case 7 -> flipBytes(text(tree), random, sampleName);
            case 8 -> truncate(text(tree), random, sampleName);
            case 9 -> longNumber(tree, random, sampleName);
            case 10 -> longKey(tree, random, sampleName);
            case 11 -> byteOrderMark(text(tree), random, sampleName);
            case 12 -> invalidUtf8(text(tree), random, sampleName);
            default -> moveCentrelinePoint(tree, random, sampleName);
        };
    }

    private static Mutant deleteKey(ObjectNode tree, Random random, String sample) {
        List<String[]> members = new ArrayList<>();
        collectMembers(tree, "", members);
        String[] chosen = members.get(random.nextInt(members.size()));
        ((ObjectNode) at(tree, chosen[0])).remove(chosen[1]);
        return json(tree, sample + ": deleted " + NodePaths.child(chosen[0], chosen[1]));
    }

    private static Mutant wrongType(ObjectNode tree, Random random, String sample) {
        List<NumberSlot> slots = leaves(tree);
        NumberSlot slot = slots.get(random.nextInt(slots.size()));
        JsonNode replacement = switch (random.nextInt(6)) {
            case 0 -> NODES.textNode("12");
            case 1 -> NODES.booleanNode(true);
            case 2 -> NODES.arrayNode().add(1);
            case 3 -> NODES.objectNode().put("value", 1);
            case 4 -> NODES.nullNode();
            default -> NODES.textNode("");
        };
        set(slot, replacement);
        return json(tree, sample + ": " + slot.path() + " = " + replacement);
    }

    private static Mutant extremeNumber(ObjectNode tree, Random random, String sample) {
        List<NumberSlot> slots = numbers(tree);
        NumberSlot slot = slots.get(random.nextInt(slots.size()));
        double value = EXTREMES[random.nextInt(EXTREMES.length)];
        set(slot, NODES.numberNode(value));
        return json(tree, sample + ": " + slot.path() + " = " + value);
    }

    /** Several numbers at once, each scaled by a factor from 1/100 to 100 (log-uniform) or negated. */
    private static Mutant scaleNumbers(ObjectNode tree, Random random, String sample) {
        List<NumberSlot> slots = numbers(tree);
        int count = 1 + random.nextInt(4);
        StringBuilder what = new StringBuilder(sample + ":");
        for (int i = 0; i < count; i++) {
            NumberSlot slot = slots.get(random.nextInt(slots.size()));
            double factor = random.nextInt(8) == 0 ? -1 : Math.pow(10, 4 * random.nextDouble() - 2);
            double value = slot.value() == 0 ? factor : slot.value() * factor;
            set(slot, NODES.numberNode(value));
            slots = numbers(tree); // the tree changed: find the slots again
            what.append(' ').append(slot.path()).append(" = ").append(value);
        }
        return json(tree, what.toString());
    }

    /**
     * A number at a round boundary of the kind the file format uses, or a hair past it: the fuzzer does not
     * know each key's range, so it tries the usual bounds of the format (0, 0.05, 0.1, 0.5, 1, 3, 10, ...)
     * and one part in 10^9 either side of them.
     */
    private static Mutant nearBound(ObjectNode tree, Random random, String sample) {
        double[] bounds = {0, 0.05, 0.1, 0.5, 0.95, 1, 2, 3, 5, 10, 50, 100, 200, 300, 500, 1000, 1500, 2000,
                3000, 4000, 5000, 10000, 20000, 25000, 1e5, 1e7, 1e8, -1, -10, -500, -5000};
        List<NumberSlot> slots = numbers(tree);
        NumberSlot slot = slots.get(random.nextInt(slots.size()));
        double bound = bounds[random.nextInt(bounds.length)];
        double nudge = switch (random.nextInt(3)) {
            case 0 -> 0;
            case 1 -> bound == 0 ? 1e-9 : Math.abs(bound) * 1e-9;
            default -> bound == 0 ? -1e-9 : -Math.abs(bound) * 1e-9;
        };
        set(slot, NODES.numberNode(bound + nudge));
        return json(tree, sample + ": " + slot.path() + " = " + (bound + nudge));
    }

    /** "must be between 0.1 and 3", "must be more than 0 and at most 500 mm", "must be at least 20 mm" */
    private static final java.util.regex.Pattern RANGE = java.util.regex.Pattern.compile(
            "must be (?:between|more than|at least) (-?[0-9.e+-]+)(?: and (?:at most )?(-?[0-9.e+-]+))?");

    /**
     * A number at its own key's bound, or a hair past it: the bound is learnt from the program's refusal of
     * an absurd value (-1e9) at that key, so every key's range is tried, as the file format states it.
     */
    private static Mutant exactBound(ObjectNode tree, Random random, String sample) {
        List<NumberSlot> slots = numbers(tree);
        NumberSlot slot = slots.get(random.nextInt(slots.size()));
        JsonNode original = slot.key() != null ? slot.parent().get(slot.key()) : slot.parent().get(slot.index());
        set(slot, NODES.numberNode(-1e9));
        java.util.regex.Matcher range = null;
        try {
            barwright.loading.VehicleLoader.fromTree(tree);
        } catch (barwright.io.VehicleFileException refused) {
            range = RANGE.matcher(refused.getMessage());
        }
        if (range == null || !range.find()) {
            set(slot, original);
            return extremeNumber(tree, random, sample); // no range in the message: a coordinate, say
        }
        String bound = range.group(random.nextInt(2) == 0 || range.group(2) == null ? 1 : 2);
        double value = Double.parseDouble(bound);
        double hair = Math.max(Math.abs(value) * 1e-9, 1e-12);
        value += switch (random.nextInt(3)) {
            case 0 -> 0;
            case 1 -> hair;
            default -> -hair;
        };
        set(slot, NODES.numberNode(value));
        return json(tree, sample + ": " + slot.path() + " = " + value + " (bound " + bound + ")");
    }

    private static Mutant flipBytes(byte[] text, Random random, String sample) {
        int flips = 1 + random.nextInt(3);
        StringBuilder what = new StringBuilder(sample + ": bytes flipped at");
        for (int i = 0; i < flips; i++) {
            int at = random.nextInt(text.length);
            text[at] = (byte) (text[at] ^ (1 << random.nextInt(8)));
            what.append(' ').append(at);
        }
        return new Mutant(text, what.toString());
    }

    private static Mutant truncate(byte[] text, Random random, String sample) {
        int length = random.nextInt(text.length);
        byte[] cut = new byte[length];
        System.arraycopy(text, 0, cut, 0, length);
        return new Mutant(cut, sample + ": cut to " + length + " bytes");
    }

    private static Mutant longNumber(ObjectNode tree, Random random, String sample) {
        List<NumberSlot> slots = numbers(tree);
        NumberSlot slot = slots.get(random.nextInt(slots.size()));
        String marker = "\"@@LONG@@\"";
        set(slot, NODES.textNode("@@LONG@@"));
        StringBuilder digits = new StringBuilder(random.nextBoolean() ? "1" : "0.");
        for (int i = 0; i < 1500; i++) {
            digits.append((char) ('0' + random.nextInt(10)));
        }
        String text = new String(text(tree), StandardCharsets.UTF_8).replace(marker, digits);
        return new Mutant(text.getBytes(StandardCharsets.UTF_8), sample + ": " + slot.path() + " = a 1,500-digit number");
    }

    private static Mutant longKey(ObjectNode tree, Random random, String sample) {
        List<String[]> members = new ArrayList<>();
        collectMembers(tree, "", members);
        String[] chosen = members.get(random.nextInt(members.size()));
        ObjectNode parent = (ObjectNode) at(tree, chosen[0]);
        String key = "k".repeat(50_000);
        if (random.nextBoolean()) {
            parent.set(key, parent.remove(chosen[1])); // a known key renamed past recognition
        } else {
            parent.put(key, 1);
        }
        return json(tree, sample + ": a 50,000-character key in " + (chosen[0].isEmpty() ? "the top level" : chosen[0]));
    }

    private static Mutant byteOrderMark(byte[] text, Random random, String sample) {
        byte[] bom = random.nextBoolean() ? new byte[]{(byte) 0xEF, (byte) 0xBB, (byte) 0xBF}
                : new byte[]{(byte) 0xFE, (byte) 0xFF};
        byte[] withMark = new byte[bom.length + text.length];
        System.arraycopy(bom, 0, withMark, 0, bom.length);
        System.arraycopy(text, 0, withMark, bom.length, text.length);
        return new Mutant(withMark, sample + ": byte-order mark " + (bom.length == 3 ? "UTF-8" : "UTF-16"));
    }

    private static Mutant invalidUtf8(byte[] text, Random random, String sample) {
        // inside a string value (the name) or anywhere: both must be refused or read, never crash
        byte[] bad = {(byte) 0xC3, (byte) 0x28, (byte) 0xFF, (byte) 0xED, (byte) 0xA0, (byte) 0x80};
        int at = random.nextBoolean() ? indexOf(text, "\"name\": \"") + 9 : random.nextInt(text.length);
        at = Math.max(0, Math.min(text.length, at));
        int count = 1 + random.nextInt(3);
        byte[] out = new byte[text.length + count];
        System.arraycopy(text, 0, out, 0, at);
        for (int i = 0; i < count; i++) {
            out[at + i] = bad[random.nextInt(bad.length)];
        }
        System.arraycopy(text, at, out, at + count, text.length - at);
        return new Mutant(out, sample + ": " + count + " invalid UTF-8 bytes at " + at);
    }

    /**
     * A shaped bar's centreline point moved a little or a lot (unequal arms, bends that no longer fit,
     * bushings off the bar); for a file without one, a U-bar's arm lengths made unequal in another way.
     */
    private static Mutant moveCentrelinePoint(ObjectNode tree, Random random, String sample) {
        List<NumberSlot> slots = numbers(tree).stream()
                .filter(slot -> slot.path().contains(".geometry.")).toList();
        if (slots.isEmpty()) {
            return scaleNumbers(tree, random, sample);
        }
        NumberSlot slot = slots.get(random.nextInt(slots.size()));
        double shift = (random.nextBoolean() ? 1 : -1) * Math.pow(10, 3 * random.nextDouble() - 1);
        set(slot, NODES.numberNode(slot.value() + shift));
        return json(tree, sample + ": " + slot.path() + " = " + (slot.value() + shift));
    }

    private static int indexOf(byte[] text, String what) {
        String whole = new String(text, StandardCharsets.UTF_8);
        return whole.indexOf(what);
    }

    private static byte[] text(JsonNode tree) {
        try {
            return MAPPER.writerWithDefaultPrettyPrinter().writeValueAsBytes(tree);
        } catch (Exception impossible) {
            throw new IllegalStateException(impossible);
        }
    }

    private static Mutant json(JsonNode tree, String description) {
        return new Mutant(text(tree), description);
    }

    private static void collectMembers(JsonNode node, String path, List<String[]> members) {
        if (node.isObject()) {
            node.fieldNames().forEachRemaining(key -> {
                if (!path.contains("[")) {
                    members.add(new String[]{path, key});
                }
                collectMembers(node.get(key), NodePaths.child(path, key), members);
            });
        } else if (node.isArray()) {
            for (int i = 0; i < node.size(); i++) {
                collectMembers(node.get(i), path + "[" + i + "]", members);
            }
        }
    }

    private static List<NumberSlot> numbers(JsonNode tree) {
        return leaves(tree).stream().filter(slot -> !Double.isNaN(slot.value())).toList();
    }

    /** @return every leaf (numbers with their value, other leaves with NaN) */
    private static List<NumberSlot> leaves(JsonNode tree) {
        List<NumberSlot> slots = new ArrayList<>();
        collectLeaves(tree, "", slots);
        return slots;
    }

    private static void collectLeaves(JsonNode node, String path, List<NumberSlot> slots) {
        if (node.isObject()) {
            node.fieldNames().forEachRemaining(key -> {
                JsonNode child = node.get(key);
                String childPath = NodePaths.child(path, key);
                if (child.isContainerNode()) {
                    collectLeaves(child, childPath, slots);
                } else {
                    slots.add(new NumberSlot(childPath, node, key, -1, child.isNumber() ? child.doubleValue() : Double.NaN));
                }
            });
        } else if (node.isArray()) {
            for (int i = 0; i < node.size(); i++) {
                JsonNode child = node.get(i);
                String childPath = path + "[" + i + "]";
                if (child.isContainerNode()) {
                    collectLeaves(child, childPath, slots);
                } else {
                    slots.add(new NumberSlot(childPath, node, null, i, child.isNumber() ? child.doubleValue() : Double.NaN));
                }
            }
        }
    }

    private static void set(NumberSlot slot, JsonNode value) {
        if (slot.key() != null) {
            ((ObjectNode) slot.parent()).set(slot.key(), value);
        } else {
            ((ArrayNode) slot.parent()).set(slot.index(), value);
        }
    }

    private static JsonNode at(JsonNode tree, String path) {
        JsonNode node = tree;
        if (path.isEmpty()) {
            return node;
        }
        for (String part : path.split("\\.")) {
            node = node.get(part);
        }
        return node;
    }

    /** Key paths as the program writes them. */
    static final class NodePaths {
        private NodePaths() {
        }

        static String child(String parent, String key) {
            return parent.isEmpty() ? key : parent + "." + key;
        }
    }
}
