package barwright.io;

import barwright.cli.Cli;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;
import com.fasterxml.jackson.databind.node.ArrayNode;
import com.fasterxml.jackson.databind.node.ObjectNode;

import java.io.ByteArrayOutputStream;
import java.io.IOException;
import java.io.InputStream;
import java.io.PrintStream;
import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Files;
import java.nio.file.Path;

/** Test fixture files and a way to run the command line on them, for the io and cli tests. */
public final class Fixtures {
    private static final ObjectMapper MAPPER = new ObjectMapper();

    private Fixtures() {
    }

    /** @return the text of the invented test vehicle (src/test/resources/barwright/io/test-vehicle.json) */
    public static String testVehicleText() {
        try (InputStream in = Fixtures.class.getResourceAsStream("/barwright/io/test-vehicle.json")) {
            return new String(in.readAllBytes(), StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    public static ObjectNode testVehicleTree() {
        try {
            return (ObjectNode) MAPPER.readTree(testVehicleText());
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /**
     * Sets (or with a null value, removes) the value at a key path such as {@code front.bar.armLengthsMm[1]}.
     *
     * @param json the new value as JSON text, e.g. {@code 12}, {@code "tube"}, {@code null}; null to remove
     */
    public static ObjectNode with(ObjectNode tree, String path, String json) {
        ObjectNode copy = tree.deepCopy();
        String[] keys = path.split("\\.");
        JsonNode parent = copy;
        for (int i = 0; i < keys.length - 1; i++) {
            parent = step(parent, keys[i]);
        }
        String last = keys[keys.length - 1];
        JsonNode value = json == null ? null : parse(json);
        int bracket = last.indexOf('[');
        if (bracket >= 0) {
            ArrayNode array = (ArrayNode) parent.get(last.substring(0, bracket));
            int index = Integer.parseInt(last.substring(bracket + 1, last.length() - 1));
            if (value == null) {
                array.remove(index);
            } else {
                array.set(index, value);
            }
        } else if (value == null) {
            ((ObjectNode) parent).remove(last);
        } else {
            ((ObjectNode) parent).set(last, value);
        }
        return copy;
    }

    private static JsonNode step(JsonNode node, String key) {
        int bracket = key.indexOf('[');
        if (bracket < 0) {
            return node.get(key);
        }
        return node.get(key.substring(0, bracket)).get(Integer.parseInt(key.substring(bracket + 1, key.length() - 1)));
    }

    private static JsonNode parse(String json) {
        try {
            return MAPPER.readTree(json);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    public static String text(JsonNode tree) {
        return VehicleFileWriter.toJson(tree);
    }

    public static Path write(Path directory, String name, String text) {
        try {
            return Files.writeString(directory.resolve(name), text, StandardCharsets.UTF_8);
        } catch (IOException e) {
            throw new UncheckedIOException(e);
        }
    }

    /** What one run of the command line printed and returned. */
    public record Run(int exitCode, String out, String err) {
    }

    public static Run cli(String... args) {
        ByteArrayOutputStream out = new ByteArrayOutputStream();
        ByteArrayOutputStream err = new ByteArrayOutputStream();
        int code = Cli.run(args, new PrintStream(out, true, StandardCharsets.UTF_8),
                new PrintStream(err, true, StandardCharsets.UTF_8));
        return new Run(code, out.toString(StandardCharsets.UTF_8), err.toString(StandardCharsets.UTF_8));
    }
}
