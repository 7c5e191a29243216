package barwright.io;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.util.DefaultIndenter;
import com.fasterxml.jackson.core.util.DefaultPrettyPrinter;
import com.fasterxml.jackson.databind.JsonNode;
import com.fasterxml.jackson.databind.ObjectMapper;

import java.io.UncheckedIOException;
import java.nio.charset.StandardCharsets;
import java.nio.file.Path;

/** Saves a vehicle tree as JSON text, through the atomic writer, in a form the reader accepts again. */
public final class VehicleFileWriter {
    private static final ObjectMapper MAPPER = new ObjectMapper();

    private VehicleFileWriter() {
    }

    /**
     * @return the tree as pretty-printed JSON text, two-space indent, ending in a newline
     * @throws IllegalStateException where a number in the tree is NaN or infinite ({@link FiniteNumbers})
     */
    public static String toJson(JsonNode tree) {
        FiniteNumbers.require(tree);
        DefaultPrettyPrinter printer = new DefaultPrettyPrinter()
                .withObjectIndenter(new DefaultIndenter("  ", "\n"))
                .withArrayIndenter(new DefaultIndenter("  ", "\n"));
        try {
            return MAPPER.writer(printer).writeValueAsString(tree) + "\n";
        } catch (JsonProcessingException impossible) {
            throw new UncheckedIOException(impossible); // a tree of plain JSON nodes always serialises
        }
    }

    /**
     * Writes the document atomically ({@link AtomicFileWriter}); the old file stays whole if anything fails.
     * The text is pretty-printed where that stays within the reader's {@link JsonInput#MAX_BYTES}, else
     * written compact, so that every file saved opens again; a tree too large even compact is refused.
     */
    public static void save(VehicleDocument document, Path target) throws FileWriteException {
        save(document.tree(), target);
    }

    /** Writes a vehicle tree (the open document's, validated by the caller) as {@link #save(VehicleDocument, Path)}. */
    public static void save(JsonNode tree, Path target) throws FileWriteException {
        AtomicFileWriter.writeBytes(target, readableBytes(tree, target));
    }

    /** @return the tree as UTF-8 text the reader accepts again: pretty where that fits, else compact */
    static byte[] readableBytes(JsonNode tree, Path target) throws FileWriteException {
        byte[] pretty = toJson(tree).getBytes(StandardCharsets.UTF_8);
        if (pretty.length <= JsonInput.MAX_BYTES) {
            return pretty;
        }
        byte[] compact = (tree.toString() + "\n").getBytes(StandardCharsets.UTF_8);
        if (compact.length <= JsonInput.MAX_BYTES) {
            return compact;
        }
        throw new FileWriteException(target, String.format("the vehicle file would be %.1f MB, over the %d MB "
                + "a vehicle file may have; it is not written", compact.length / 1048576.0,
                JsonInput.MAX_BYTES / 1048576));
    }
}
