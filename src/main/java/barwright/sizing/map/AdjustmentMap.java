package barwright.sizing.map;

import barwright.model.AntiRollBar;
import barwright.model.AxlePosition;
import barwright.model.Vehicle;
import barwright.physics.ImpossibleVehicleException;
import barwright.sizing.AxleState;
import barwright.sizing.SetupEvaluator;
import barwright.solver.Progress;

import java.util.ArrayList;
import java.util.List;
import java.util.concurrent.atomic.AtomicLong;
import java.util.stream.IntStream;

/**
 * Every front option against every rear option: front share, roll gradient, limit, balance and lift. The
 * options are each bar of a list in each of its holes; by default the vehicle's own two bars.
 *
 * @param vehicle the car mapped
 * @param rows    the front options, top to bottom
 * @param columns the rear options, left to right
 * @param cells   rows x columns, row by row
 */
public record AdjustmentMap(Vehicle vehicle, List<BarOption> rows, List<BarOption> columns, List<MapCell> cells) {
    public AdjustmentMap {
        rows = List.copyOf(rows);
        columns = List.copyOf(columns);
        cells = List.copyOf(cells);
    }

    /** @return the cell at a row and column */
    public MapCell cell(int row, int column) {
        return cells.get(row * columns.size() + column);
    }

    /** @return the map of the vehicle's own bars in every pair of holes */
    public static AdjustmentMap of(Vehicle vehicle) {
        return of(vehicle, List.of(new LabelledBar("current", vehicle.front().bar())),
                List.of(new LabelledBar("current", vehicle.rear().bar())), Progress.NONE);
    }

    /**
     * @param frontBars the front bars to map, each in every hole (a null bar is "no bar")
     * @param rearBars  the rear bars
     */
    public static AdjustmentMap of(Vehicle vehicle, List<LabelledBar> frontBars, List<LabelledBar> rearBars,
                                   Progress progress) {
        SetupEvaluator evaluator = new SetupEvaluator(vehicle);
        List<BarOption> rows = options(frontBars, vehicle.front().bar());
        List<BarOption> columns = options(rearBars, vehicle.rear().bar());
        List<AxleState> frontStates = rows.stream().map(o -> evaluator.axle(AxlePosition.FRONT, o.bar())).toList();
        List<AxleState> rearStates = columns.stream().map(o -> evaluator.axle(AxlePosition.REAR, o.bar())).toList();
        int count = rows.size() * columns.size();
        MapCell[] cells = new MapCell[count];
        AtomicLong done = new AtomicLong();
        IntStream.range(0, count).parallel().forEach(i -> {
            progress.checkCancelled();
            int row = i / columns.size();
            int column = i % columns.size();
            try {
                cells[i] = new MapCell(rows.get(row), columns.get(column),
                        evaluator.figures(frontStates.get(row), rearStates.get(column)), null);
            } catch (ImpossibleVehicleException unstable) {
                cells[i] = new MapCell(rows.get(row), columns.get(column), null, unstable.getMessage());
            }
            progress.update(done.incrementAndGet(), count);
        });
        return new AdjustmentMap(vehicle, rows, columns, List.of(cells));
    }

    private static List<BarOption> options(List<LabelledBar> bars, AntiRollBar vehiclesBar) {
        List<BarOption> options = new ArrayList<>();
        for (LabelledBar labelled : bars) {
            AntiRollBar bar = labelled.bar();
            if (bar == null) {
                options.add(new BarOption(labelled.label(), null, Double.NaN, vehiclesBar == null));
                continue;
            }
            for (int hole = 0; hole < bar.holeCount(); hole++) {
                AntiRollBar inHole = bar.withSelectedArm(hole);
                double arm = bar.isShaped() ? Double.NaN : inHole.selectedArmLength();
                options.add(new BarOption(labelled.label(), inHole, arm, inHole.equals(vehiclesBar)));
            }
        }
        return options;
    }

    /**
     * A bar to map in each of its holes, with a label for people.
     *
     * @param label e.g. "current" or "26 x 3 mm spring steel"
     * @param bar   the bar (its selected hole does not matter), or null for no bar
     */
    public record LabelledBar(String label, AntiRollBar bar) {
    }
}
