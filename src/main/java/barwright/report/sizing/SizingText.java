package barwright.report.sizing;

import barwright.model.AxlePosition;
import barwright.sizing.BarChoice;
import barwright.sizing.BarFigures;
import barwright.sizing.Candidate;
import barwright.sizing.Constraints;
import barwright.sizing.ExactSolution;
import barwright.sizing.Rejection;
import barwright.sizing.SetupFigures;
import barwright.sizing.SizingRequest;
import barwright.sizing.SizingResult;
import barwright.sizing.Targets;
import barwright.sizing.TradeFlag;
import barwright.sizing.TradeLimits;
import barwright.units.Quantity;
import barwright.units.UnitSystem;

import java.util.ArrayList;
import java.util.List;
import java.util.Locale;
import java.util.Map;
import java.util.Optional;

/** The sizing result as the command line prints it for people. */
public final class SizingText {
    private SizingText() {
    }

    public static String of(SizingRequest request, SizingResult result, ExactSolution exactSolid,
                            ExactSolution exactWall, UnitSystem units) {
        StringBuilder out = new StringBuilder();
        List<String> axleWords = request.axles().stream().map(AxlePosition::key).toList();
        out.append("Sizing the ").append(String.join(" and ", axleWords)).append(request.axles().size() > 1 ? " bars" : " bar")
                .append(": ").append(targets(request, result, units)).append('\n');
        out.append("Constraints: ").append(constraints(request.constraints(), units)).append('\n');
        out.append(String.format(Locale.ROOT, "Tried %d %s; %d met every constraint%s.%n", result.evaluated(),
                request.axles().size() > 1 ? "pairs of bars" : "bars", result.accepted(), rejections(result)));
        reach(request, result).ifPresent(line -> out.append(line).append('\n'));
        out.append('\n');
        TradeLimits limits = TradeLimits.of(request);
        if (result.candidates().isEmpty()) {
            out.append("No stock size meets every constraint: relax the one that left most out, or add sizes.\n");
        } else {
            out.append(table(result, limits, units));
            String caution = TradeFlagText.bestCaution(result.candidates().get(0),
                    limits.flags(result.candidates().get(0)), units);
            out.append(TradeFlagText.legend(limits, units)).append('\n');
            if (!caution.isEmpty()) {
                out.append(caution).append('\n');
            }
        }
        out.append('\n');
        if (exactSolid != null) {
            out.append(exact("Exact solid diameter", exactSolid, units)).append('\n');
        }
        if (exactWall != null) {
            out.append(exact("Exact tube wall", exactWall, units)).append('\n');
        }
        out.append("Holes are counted from 1 here (hole 1 is the first arm length); in the vehicle file selectedArm "
                + "counts from 0. Miss is in steps: 1 step = 1 percentage point of front share or 0.1 deg/g.\n");
        return out.toString();
    }

    /**
     * @return the front shares the sized bars reach, and where the target lies outside them, the words of
     *         {@link ReachText} and what to do; empty where the reach is unknown
     */
    static Optional<String> reach(SizingRequest request, SizingResult result) {
        if (result.reach() == null) {
            return Optional.empty();
        }
        String bars = request.axles().size() > 1 ? "front and rear bars" : request.axles().get(0).key() + " bar";
        if (!result.targetOutOfReach()) {
            return Optional.of("Front share reachable with the " + bars + " tried: "
                    + ReachText.range(result.reach(), Locale.ROOT) + ".");
        }
        Targets targets = request.targets();
        double staticFront = targets.frontShareOffset() == null ? Double.NaN
                : result.targetShare() - targets.frontShareOffset();
        double aim = result.reach().aimFor(result.targetShare());
        return Optional.of("Out of reach: " + ReachText.outOfReach(bars, staticFront, result.targetShare(),
                result.reach(), Locale.ROOT) + ". The proposals below are the closest, not on target: aim inside "
                + "the range (for example --target-share " + String.format(Locale.ROOT, "%.3f", aim)
                + "), or change the other axle's bar or the springs.");
    }

    private static String table(SizingResult result, TradeLimits limits, UnitSystem units) {
        TextTable table = new TextTable("#", "bar", "material", "hole", "front share", "roll gradient", "limit",
                "lifts (front/rear)", "bar mass", "safety", "miss", "flags");
        int rank = 1;
        for (Candidate candidate : result.candidates()) {
            SetupFigures figures = candidate.figures();
            List<TradeFlag> flags = limits.flags(candidate);
            for (int b = 0; b < candidate.bars().size(); b++) {
                BarChoice choice = candidate.bars().get(b);
                BarFigures bar = figures.bar(choice.axle());
                boolean first = b == 0;
                String size = (candidate.bars().size() > 1 ? choice.axle().key() + ": " : "") + choice.size().label();
                table.add(first ? Integer.toString(rank) : "", size, choice.material().name(),
                        Integer.toString(choice.selectedArm() + 1),
                        first ? TextTable.percent(figures.frontLoadTransferShare()) : "",
                        first ? TextTable.figure(figures.rollGradient(), Quantity.ROLL_GRADIENT, units, 2) : "",
                        first ? TextTable.figure(figures.limit(), Quantity.ACCELERATION, units, 2) + " "
                                + figures.balance().key() : "",
                        first ? TextTable.lift(figures.frontInsideLift(), units) + " / "
                                + TextTable.lift(figures.rearInsideLift(), units) : "",
                        TextTable.figure(bar.mass(), Quantity.MASS, units, 2),
                        String.format(Locale.ROOT, "%.2f", bar.safetyFactor()),
                        first ? String.format(Locale.ROOT, "%.2f", candidate.miss()) : "",
                        TradeFlagText.words(flags, choice.axle()));
            }
            rank++;
        }
        return table.render();
    }

    private static String targets(SizingRequest request, SizingResult result, UnitSystem units) {
        List<String> parts = new ArrayList<>();
        if (!Double.isNaN(result.targetShare())) {
            parts.add("front share of load transfer " + TextTable.percent(result.targetShare()));
        }
        if (request.targets().rollGradient() != null) {
            parts.add("roll gradient " + TextTable.figure(request.targets().rollGradient(), Quantity.ROLL_GRADIENT,
                    units, 2));
        }
        return "target " + String.join(" and ", parts);
    }

    private static String constraints(Constraints constraints, UnitSystem units) {
        List<String> parts = new ArrayList<>();
        parts.add(String.format(Locale.ROOT, "safety factor at least %.2f at the check travel",
                constraints.minSafetyFactor()));
        for (AxlePosition axle : AxlePosition.values()) {
            if (constraints.mustNotLiftBeforeLimit().contains(axle)) {
                parts.add("inside " + axle.key() + " wheel stays down to the limit");
            }
        }
        if (constraints.maxBarMass() != null) {
            parts.add("bar mass at most " + TextTable.figure(constraints.maxBarMass(), Quantity.MASS, units, 2));
        }
        if (constraints.maxOuterDiameter() != null) {
            parts.add("outside diameter at most " + TextTable.figure(constraints.maxOuterDiameter(), Quantity.LENGTH,
                    units, units == UnitSystem.US ? 3 : 1));
        }
        if (constraints.minimumLife() != null) {
            parts.add(String.format(Locale.ROOT, "fatigue life at least %.0f laps of %s",
                    constraints.minimumLife().minLaps(), constraints.minimumLife().lap().description()));
        }
        return String.join("; ", parts);
    }

    private static String rejections(SizingResult result) {
        if (result.rejections().isEmpty()) {
            return "";
        }
        List<String> parts = new ArrayList<>();
        for (Map.Entry<Rejection, Long> entry : result.rejections().entrySet()) {
            parts.add(entry.getValue() + " " + entry.getKey().words());
        }
        return "; left out: " + String.join(", ", parts);
    }

    private static String exact(String what, ExactSolution exact, UnitSystem units) {
        boolean share = exact.figure() == ExactSolution.TargetFigure.FRONT_SHARE;
        String target = share ? "front share " + TextTable.percent(exact.target())
                : "roll gradient " + TextTable.figure(exact.target(), Quantity.ROLL_GRADIENT, units, 3);
        if (!exact.found()) {
            String low = share ? TextTable.percent(exact.lowestReach())
                    : TextTable.figure(exact.lowestReach(), Quantity.ROLL_GRADIENT, units, 2);
            String high = share ? TextTable.percent(exact.highestReach())
                    : TextTable.figure(exact.highestReach(), Quantity.ROLL_GRADIENT, units, 2);
            return what + ": none gives " + target + " (this bar reaches " + low + " to " + high + ")";
        }
        return what + " for " + target + ": " + TextTable.figure(exact.dimension(), Quantity.LENGTH, units,
                units == UnitSystem.US ? 4 : 3) + " (first material and hole tried)";
    }
}
