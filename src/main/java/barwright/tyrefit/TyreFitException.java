package barwright.tyrefit;

import java.util.List;

/** Measured data that cannot support a fit, with every reason, each naming the lines concerned. */
public final class TyreFitException extends Exception {
    private final List<String> problems;

    public TyreFitException(List<String> problems) {
        super(String.join("\n", problems));
        this.problems = List.copyOf(problems);
    }

    public List<String> problems() {
        return problems;
    }
}
