package barwright.io.csv;

import java.util.List;

/** A CSV file that cannot be used, with every problem found (each naming its line and column). */
public final class CsvFileException extends Exception {
    private final List<String> problems;

    public CsvFileException(List<String> problems) {
        super(String.join("\n", problems));
        this.problems = List.copyOf(problems);
    }

    public CsvFileException(String problem) {
        this(List.of(problem));
    }

    public List<String> problems() {
        return problems;
    }
}
