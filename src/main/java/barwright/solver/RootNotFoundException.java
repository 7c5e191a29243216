package barwright.solver;

/**
 * A root search found no root: the quantity a result depends on could not be solved for. The message says what
 * was sought and why it failed, for a person to act on; the command line refuses with it (exit 2) and the window
 * shows it.
 */
public final class RootNotFoundException extends RuntimeException {
    private static final long serialVersionUID = 1L;

    /** Why the search failed. */
    public enum Reason {
        /** the function has the same sign at both ends of the bracket */
        NO_BRACKET,
        /** the function is NaN or infinite at an end of the bracket */
        NOT_FINITE,
        /** the evaluation budget ran out before the accuracy was reached */
        BUDGET_SPENT
    }

    private final Reason reason;

    public RootNotFoundException(String subject, Reason reason, String detail) {
        super("Could not solve for " + subject + ": " + detail + ".");
        this.reason = reason;
    }

    public Reason reason() {
        return reason;
    }
}
