package barwright.cli;

import barwright.io.VehicleFileWriter;
import barwright.report.Cautions;
import com.fasterxml.jackson.databind.JsonNode;

import java.io.PrintStream;
import java.util.function.Supplier;

/**
 * How a command prints its result: the JSON document with {@code --json}, else the text for people. Only the one
 * asked for is made.
 */
final class Printed {
    private Printed() {
    }

    /** Prints the JSON document or the text as it is (a text that carries its own cautions, or needs none). */
    static void jsonOrText(PrintStream out, Arguments parsed, Supplier<JsonNode> json, Supplier<String> text) {
        if (parsed.has("json")) {
            out.print(VehicleFileWriter.toJson(json.get()));
        } else {
            out.print(text.get());
        }
    }

    /** Prints the JSON document, or the text followed by the short safety caution (results used on a car). */
    static void jsonOrTextWithCaution(PrintStream out, Arguments parsed, Supplier<JsonNode> json,
                                      Supplier<String> text) {
        jsonOrText(out, parsed, json, () -> text.get() + Cautions.SHORT + System.lineSeparator());
    }
}
