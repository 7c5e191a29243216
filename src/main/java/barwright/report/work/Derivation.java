package barwright.report.work;

import java.util.List;

/**
 * How one key figure is computed, as plain data for a window, a report or a class: the formula, the numbers
 * put into it, the intermediate steps, the result and where the method comes from.
 *
 * @param title   the figure in words, e.g. "Front roll stiffness from the springs"
 * @param formula the formula, e.g. "K_spr = k_w t² / 2"
 * @param inputs  the numbers put in
 * @param steps   intermediate results, in order
 * @param result  the figure itself
 * @param source  the published method, as model.md names it
 * @param note    a remark for the reader (what the figure leaves out, what it means), or empty
 */
public record Derivation(String title, String formula, List<WorkValue> inputs, List<Step> steps, WorkValue result,
                         String source, String note) {
    public Derivation {
        inputs = List.copyOf(inputs);
        steps = List.copyOf(steps);
    }

    /** @return the input with this symbol */
    public WorkValue input(String symbol) {
        return inputs.stream().filter(v -> v.symbol().equals(symbol)).findFirst()
                .orElseThrow(() -> new IllegalArgumentException("no input " + symbol + " in " + title));
    }

    /** @return the intermediate value with this symbol */
    public WorkValue step(String symbol) {
        return steps.stream().map(Step::value).filter(v -> v.symbol().equals(symbol)).findFirst()
                .orElseThrow(() -> new IllegalArgumentException("no step " + symbol + " in " + title));
    }
}
