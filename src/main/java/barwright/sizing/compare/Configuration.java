package barwright.sizing.compare;

import barwright.model.Vehicle;

import java.util.Objects;

/**
 * One setup to compare: a saved vehicle file, or a variant of the open one.
 *
 * @param name    what the comparison calls it
 * @param vehicle the car
 */
public record Configuration(String name, Vehicle vehicle) {
    public Configuration {
        Objects.requireNonNull(name, "name");
        Objects.requireNonNull(vehicle, "vehicle");
    }
}
