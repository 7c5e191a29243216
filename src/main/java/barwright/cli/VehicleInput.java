package barwright.cli;

import barwright.io.VehicleDocument;
import barwright.io.VehicleFileException;
import barwright.loading.VehicleLoader;

import java.io.IOException;
import java.nio.file.Path;

/** Reading the vehicle file a command is given. */
final class VehicleInput {
    private VehicleInput() {
    }

    static VehicleDocument read(String file) throws VehicleFileException, IOException {
        return VehicleLoader.read(Path.of(file));
    }
}
