package barwright.cli;

/** The arguments are not of the command's form; the message says what is wrong. */
public final class UsageException extends Exception {
    private static final long serialVersionUID = 1L;

    public UsageException(String message) {
        super(message);
    }
}
