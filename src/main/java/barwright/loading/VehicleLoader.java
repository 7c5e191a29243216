package barwright.loading;

import barwright.io.BarSetting;
import barwright.io.VehicleDocument;
import barwright.io.VehicleEdits;
import barwright.io.VehicleFileException;
import barwright.io.VehicleFileReader;
import com.fasterxml.jackson.databind.JsonNode;

import java.nio.file.Path;
import java.util.List;

/**
 * The one way the program loads a car, from a file, from bytes, from the open document's tree or from an edit
 * of a document: {@link VehicleFileReader} reads and validates the file with the physics side's checks
 * ({@link CalculatedChecks}), so every caller refuses the same files with the same messages. A refused file
 * throws {@link VehicleFileException} with every problem and its key path; nothing is returned unless the whole
 * car is good.
 */
public final class VehicleLoader {
    private VehicleLoader() {
    }

    /** @return the car in the file, checked */
    public static VehicleDocument read(Path file) throws VehicleFileException {
        return VehicleFileReader.read(file, CalculatedChecks.INSTANCE);
    }

    /** @return the car in the bytes of a vehicle file (UTF-8, with or without a byte-order mark), checked */
    public static VehicleDocument parse(byte[] content) throws VehicleFileException {
        return VehicleFileReader.parse(content, CalculatedChecks.INSTANCE);
    }

    /** @return the car of a tree (for example the open document after an edit), checked */
    public static VehicleDocument fromTree(JsonNode tree) throws VehicleFileException {
        return VehicleFileReader.fromTree(tree, CalculatedChecks.INSTANCE);
    }

    /** @return the document with each bar put in place ({@link VehicleEdits#putBar}), checked as a whole */
    public static VehicleDocument withBars(VehicleDocument document, List<BarSetting> bars)
            throws VehicleFileException {
        return VehicleEdits.withBars(document, bars, CalculatedChecks.INSTANCE);
    }

    /** @return the document with each key-path edit made ({@link VehicleEdits#withEdits}), checked as a whole */
    public static VehicleDocument withEdits(VehicleDocument document, List<String> edits)
            throws VehicleFileException {
        return VehicleEdits.withEdits(document, edits, CalculatedChecks.INSTANCE);
    }
}
