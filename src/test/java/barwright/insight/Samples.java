package barwright.insight;

import barwright.loading.VehicleLoader;
import barwright.model.Vehicle;

import java.nio.file.Path;
import java.util.List;

/** The shipped sample vehicles (invented demonstration cars) as inputs for the insight tests. */
final class Samples {
    static final List<String> NAMES = List.of("club-hatchback", "road-saloon", "sprint-roadster");

    private Samples() {
    }

    static Path path(String name) {
        return Path.of("sample-vehicles", name + ".json");
    }

    static Vehicle vehicle(String name) {
        try {
            return VehicleLoader.read(path(name)).vehicle();
        } catch (Exception unreadable) {
            throw new IllegalStateException("sample " + name + " does not load", unreadable);
        }
    }
}
