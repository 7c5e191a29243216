package barwright.sizing.catalogue;

import barwright.io.Problem;

import java.util.List;
import java.util.stream.Collectors;

/** A catalogue file was refused; it lists every problem with its key path, as the vehicle file does. */
public final class CatalogueFileException extends Exception {
    private static final long serialVersionUID = 1L;
    private final transient List<Problem> problems;

    public CatalogueFileException(List<Problem> problems) {
        super(problems.stream().map(Problem::toString).collect(Collectors.joining("\n")));
        this.problems = List.copyOf(problems);
    }

    public List<Problem> problems() {
        return problems;
    }
}
