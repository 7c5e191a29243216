package barwright.io;

import com.fasterxml.jackson.core.JsonProcessingException;
import com.fasterxml.jackson.core.util.DefaultIndenter;
import com.fasterxml.jackson.core.util.DefaultPrettyPrinter;
import com.fasterxml.jackson.databind.JsonNode;

import java.io.IOException;
import java.io.UncheckedIOException;
import java.nio.ByteBuffer;
import java.nio.channels.FileChannel;
import java.nio.charset.StandardCharsets;
import java.nio.file.AtomicMoveNotSupportedException;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.nio.file.StandardOpenOption;

/**
 * Saves a vehicle tree. The text goes to a temporary file beside the target, is flushed to disk, then moved
 * over the target in one step, so a failed save never damages the file that was there.
 */
public final class VehicleFileWriter {
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
            return VehicleFileReader.mapper().writer(printer).writeValueAsString(tree) + "\n";
        } catch (JsonProcessingException impossible) {
            throw new UncheckedIOException(impossible); // a tree of plain JSON nodes always serialises
        }
    }

    /** Writes the document atomically; the old file stays whole if anything fails. */
    public static void save(VehicleDocument document, Path target) throws IOException {
        writeAtomically(target, toJson(document.tree()));
    }

    /** Writes text to a file atomically (temporary file, flush, move into place). */
    public static void writeAtomically(Path target, String text) throws IOException {
        Path absolute = target.toAbsolutePath();
        Path directory = absolute.getParent();
        Path temporary = Files.createTempFile(directory, "." + absolute.getFileName(), ".tmp");
        try {
            try (FileChannel channel = FileChannel.open(temporary, StandardOpenOption.WRITE,
                    StandardOpenOption.TRUNCATE_EXISTING)) {
                ByteBuffer bytes = ByteBuffer.wrap(text.getBytes(StandardCharsets.UTF_8));
                while (bytes.hasRemaining()) {
                    channel.write(bytes);
                }
                channel.force(true);
            }
            try {
                Files.move(temporary, absolute, StandardCopyOption.ATOMIC_MOVE, StandardCopyOption.REPLACE_EXISTING);
            } catch (AtomicMoveNotSupportedException noAtomicMove) {
                Files.move(temporary, absolute, StandardCopyOption.REPLACE_EXISTING);
            }
        } finally {
            Files.deleteIfExists(temporary);
        }
    }
}
