package barwright.io;

import java.util.List;
import java.util.stream.Collectors;

/** A vehicle file was refused; it lists every problem found, not only the first. */
public final class VehicleFileException extends Exception {
    private static final long serialVersionUID = 1L;
    private final transient List<Problem> problems;

    public VehicleFileException(List<Problem> problems) {
        super(problems.stream().map(Problem::toString).collect(Collectors.joining("\n")));
        this.problems = List.copyOf(problems);
    }

    public VehicleFileException(String message) {
        this(List.of(new Problem("", message)));
    }

    public List<Problem> problems() {
        return problems;
    }
}
