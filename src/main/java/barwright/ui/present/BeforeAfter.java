package barwright.ui.present;

import barwright.model.TurnDirection;
import barwright.physics.AnalysisResult;
import barwright.physics.TurnResult;
import barwright.ui.panel.FigureFormat;
import barwright.units.Quantity;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;

/** The few figures a class watches, for the pinned setup and the car now: "before -> after" in words. */
final class BeforeAfter {
    private BeforeAfter() {
    }

    /** One figure: its name, shown above its value ("before -> after" where a setup is pinned). */
    record Figure(String name, String value) {
        /** @return the figure on one line, "name: value" */
        String line() {
            return name + ": " + value;
        }
    }

    /** @param pinned the pinned setup's analysis, or null: then the figures of now alone */
    static List<Figure> lines(AnalysisResult pinned, AnalysisResult now, TurnDirection turn, FigureFormat format) {
        List<Figure> lines = new ArrayList<>();
        lines.add(line("Front share", pinned == null ? null : percent(pinned.frontLoadTransferShare()),
                percent(now.frontLoadTransferShare())));
        lines.add(line("Roll gradient", pinned == null ? null : format.text(pinned.rollGradient(), Quantity.ROLL_GRADIENT),
                format.text(now.rollGradient(), Quantity.ROLL_GRADIENT)));
        TurnResult nowTurn = now.turn(turn);
        TurnResult pinnedTurn = pinned == null ? null : pinned.turn(turn);
        lines.add(line("Grip limit", pinnedTurn == null ? null : format.text(pinnedTurn.limit(), Quantity.ACCELERATION),
                format.text(nowTurn.limit(), Quantity.ACCELERATION)));
        lines.add(line("At the limit", pinnedTurn == null ? null : pinnedTurn.balance().key(), nowTurn.balance().key()));
        lines.add(line("Inside rear lifts", pinnedTurn == null ? null : format.lift(pinnedTurn.rearInsideLift()),
                format.lift(nowTurn.rearInsideLift())));
        lines.add(line("Inside front lifts", pinnedTurn == null ? null : format.lift(pinnedTurn.frontInsideLift()),
                format.lift(nowTurn.frontInsideLift())));
        return lines;
    }

    private static String percent(double share) {
        return String.format(Locale.ROOT, "%.1f %%", share * 100);
    }

    private static Figure line(String what, String before, String after) {
        return new Figure(what, before == null ? after : before + " \u2192 " + after);
    }
}
