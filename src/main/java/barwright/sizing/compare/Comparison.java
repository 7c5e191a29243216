package barwright.sizing.compare;

import barwright.model.AxlePosition;
import barwright.model.TurnDirection;
import barwright.physics.AnalysisResult;
import barwright.physics.TurnResult;
import barwright.physics.VehicleAnalysis;
import barwright.physics.bar.BarResult;
import barwright.physics.curve.Chart;
import barwright.physics.curve.CorneringCurves;
import barwright.physics.curve.Series;
import barwright.units.Quantity;

import java.util.ArrayList;
import java.util.List;
import java.util.function.Function;

import static barwright.units.Conversions.fromG;

/**
 * Two to four setups side by side: their figures (with the difference of each from the first) and the main
 * charts with one line per setup (the turn to the left; a car with corner masses may differ to the right,
 * which the figures show).
 *
 * @param configurations the setups, the first being the reference
 * @param results        the full analysis of each
 * @param rows           the figures
 * @param balances       the balance at the limit of each, left turn / right turn
 * @param charts         handling curve, body roll and inside wheel loads against a_y
 */
public record Comparison(List<Configuration> configurations, List<AnalysisResult> results, List<FigureRow> rows,
                         List<String> balances, List<Chart> charts) {
    public static final int MIN_CONFIGURATIONS = 2;
    public static final int MAX_CONFIGURATIONS = 4;
    /** Points of the roll and wheel-load lines. */
    static final int CHART_POINTS = 60;
    /** Lifts past this a_y are shown as staying down, as the report does (files.md): 3 g, in m/s^2. */
    private static final double LIFT_CEILING = fromG(3);

    public Comparison {
        configurations = List.copyOf(configurations);
        results = List.copyOf(results);
        rows = List.copyOf(rows);
        balances = List.copyOf(balances);
        charts = List.copyOf(charts);
    }

    /**
     * @throws barwright.physics.ImpossibleVehicleException where a setup cannot be analysed
     */
    public static Comparison of(List<Configuration> configurations) {
        if (configurations.size() < MIN_CONFIGURATIONS || configurations.size() > MAX_CONFIGURATIONS) {
            throw new IllegalArgumentException("compare 2 to 4 setups, not " + configurations.size());
        }
        List<AnalysisResult> results = configurations.stream().map(c -> VehicleAnalysis.analyse(c.vehicle())).toList();
        List<FigureRow> rows = new ArrayList<>();
        for (AxlePosition axle : AxlePosition.values()) {
            rows.add(row(results, axle.key() + "RollStiffness", axle.key() + " roll stiffness", Quantity.ROLL_STIFFNESS,
                    r -> r.axle(axle).stiffness().rollStiffness()));
            rows.add(row(results, axle.key() + "BarRollStiffness", axle.key() + " bar roll stiffness",
                    Quantity.ROLL_STIFFNESS, r -> r.axle(axle).bar() == null ? null
                            : r.axle(axle).stiffness().barRollStiffness()));
        }
        rows.add(row(results, "frontLoadTransferShare", "front share of load transfer", Quantity.RATIO,
                AnalysisResult::frontLoadTransferShare));
        rows.add(row(results, "frontRollStiffnessShare", "front share of roll stiffness", Quantity.RATIO,
                AnalysisResult::frontRollStiffnessShare));
        rows.add(row(results, "rollGradient", "roll gradient", Quantity.ROLL_GRADIENT, AnalysisResult::rollGradient));
        rows.add(row(results, "understeerGradient", "understeer gradient", Quantity.ROLL_GRADIENT,
                AnalysisResult::understeerGradient));
        for (TurnDirection direction : TurnDirection.values()) {
            String turn = direction.word() + " turn";
            rows.add(row(results, direction.word() + "Limit", "limit, " + turn, Quantity.ACCELERATION,
                    r -> r.turn(direction).limit()));
            rows.add(row(results, direction.word() + "FrontInsideLift", "inside front lifts, " + turn,
                    Quantity.ACCELERATION, r -> lift(r.turn(direction).frontInsideLift())));
            rows.add(row(results, direction.word() + "RearInsideLift", "inside rear lifts, " + turn,
                    Quantity.ACCELERATION, r -> lift(r.turn(direction).rearInsideLift())));
        }
        for (AxlePosition axle : AxlePosition.values()) {
            rows.add(row(results, axle.key() + "BarMass", axle.key() + " bar mass", Quantity.MASS,
                    r -> bar(r, axle, BarResult::mass)));
            rows.add(row(results, axle.key() + "BarSafetyFactor", axle.key() + " bar safety factor", Quantity.RATIO,
                    r -> bar(r, axle, BarResult::safetyFactor)));
        }
        List<String> balances = results.stream()
                .map(r -> r.leftTurn().balance().key() + " / " + r.rightTurn().balance().key()).toList();
        return new Comparison(configurations, results, rows, balances, charts(configurations, results));
    }

    private static Double lift(double accel) {
        return accel <= LIFT_CEILING ? accel : null;
    }

    private static Double bar(AnalysisResult result, AxlePosition axle, Function<BarResult, Double> figure) {
        BarResult bar = result.axle(axle).bar();
        return bar == null ? null : figure.apply(bar);
    }

    private static FigureRow row(List<AnalysisResult> results, String key, String label, Quantity quantity,
                                 Function<AnalysisResult, Double> figure) {
        return new FigureRow(key, label, quantity, results.stream().map(figure).toList());
    }

    /** @return the handling curve, body roll and inside wheel loads against a_y, one line per setup */
    public static List<Chart> charts(List<Configuration> configurations, List<AnalysisResult> results) {
        List<Series> handling = new ArrayList<>();
        List<Series> roll = new ArrayList<>();
        List<Series> insideLoads = new ArrayList<>();
        for (int i = 0; i < results.size(); i++) {
            String name = configurations.get(i).name();
            TurnResult turn = results.get(i).leftTurn();
            CorneringCurves curves = CorneringCurves.sample(turn, CHART_POINTS);
            handling.add(CorneringCurves.handling(turn, name));
            roll.add(curves.roll(name));
            insideLoads.add(curves.frontInside(name + ", inside front"));
            insideLoads.add(curves.rearInside(name + ", inside rear"));
        }
        return List.of(
                new Chart("Handling curve, left turn (positive: understeer)", "lateral acceleration",
                        Quantity.ACCELERATION, "front minus rear slip angle", Quantity.ANGLE, handling),
                new Chart("Body roll, left turn", "lateral acceleration", Quantity.ACCELERATION, "roll angle",
                        Quantity.ANGLE, roll),
                new Chart("Inside wheel loads, left turn", "lateral acceleration", Quantity.ACCELERATION,
                        "wheel load", Quantity.FORCE, insideLoads));
    }
}
