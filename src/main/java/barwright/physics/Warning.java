package barwright.physics;

/**
 * A result a person should act on, with a stable code for scripts and a message in words.
 *
 * @param code    stable identifier, e.g. {@code REAR_INSIDE_LIFT_BEFORE_LIMIT}
 * @param message what happens, with the figures, for people
 */
public record Warning(String code, String message) {
}
