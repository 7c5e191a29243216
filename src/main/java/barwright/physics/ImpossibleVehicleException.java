package barwright.physics;

/**
 * The car as given cannot be analysed because it is physically impossible (for example, it has no stable
 * roll position). The message names the cause and the figures behind it, for a person to act on.
 */
public final class ImpossibleVehicleException extends RuntimeException {
    private static final long serialVersionUID = 1L;

    public ImpossibleVehicleException(String message) {
        super(message);
    }
}
