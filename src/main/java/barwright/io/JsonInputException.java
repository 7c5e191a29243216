package barwright.io;

import java.util.List;
import java.util.stream.Collectors;

/**
 * A file was refused before its content was looked at: it could not be read, is too large, is not UTF-8 or
 * not JSON, or breaks a limit of {@link JsonInput}. The problem names the line and column (and the key path
 * where one is known); the reader of the file's kind passes it on in its own exception.
 */
public final class JsonInputException extends Exception {
    private static final long serialVersionUID = 1L;
    private final transient List<Problem> problems;

    public JsonInputException(String message) {
        super(message);
        this.problems = List.of(new Problem("", message));
    }

    /** @return the one problem, as the vehicle and catalogue readers list them */
    public List<Problem> problems() {
        return problems;
    }

    @Override
    public String toString() {
        return problems.stream().map(Problem::toString).collect(Collectors.joining("\n"));
    }
}
