package barwright.sizing;

import barwright.io.BarSetting;
import barwright.model.AxlePosition;

import java.util.List;
import java.util.Optional;

/**
 * One result of a search: the bar (or both bars) and what the car does with it.
 *
 * @param bars    one choice per sized axle, front first
 * @param figures the car's figures with these bars
 * @param miss    how far it misses the targets, in steps (see {@link Targets})
 */
public record Candidate(List<BarChoice> bars, SetupFigures figures, double miss) {
    public Candidate {
        bars = List.copyOf(bars);
    }

    /** @return the choice for that axle, where it was sized */
    public Optional<BarChoice> bar(AxlePosition axle) {
        return bars.stream().filter(choice -> choice.axle() == axle).findFirst();
    }

    /** @return what goes into the vehicle file for these bars */
    public List<BarSetting> settings() {
        return bars.stream().map(BarChoice::setting).toList();
    }

    /** @return the mass of the sized bars (kg) */
    public double sizedBarMass() {
        return bars.stream().mapToDouble(choice -> figures.bar(choice.axle()).mass()).sum();
    }
}
